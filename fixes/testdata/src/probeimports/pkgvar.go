// Package probeimports checks how fixes name and place the helper's
// import: a bottling line's sampling-plan code.
package probeimports

// lgamma is a package-level name, so fixes in this package must import
// the helper under another name.
var lgamma = "line-gamma calibration"
