package fuzz

// underTest is the analyzer fuzzed.
var underTest = expand
