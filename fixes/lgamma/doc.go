// Package lgamma is the helper library that code rewritten by overfact imports.
package lgamma
