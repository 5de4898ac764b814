// Package repocheck holds tests of the repository's own shape: that
// DEVELOPERS.md names every file of analyzer/ and fixes/, and no file
// that is gone, and that no exported identifier of the module is used
// by tests alone (test-only helpers belong in export_test.go). It has
// no code of its own.
package repocheck
