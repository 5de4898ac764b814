package main

import (
	"regexp"
	"strings"
	"testing"
)

// relatedLines returns the related-position lines of a text report,
// "file:line:col: \tmessage".
func relatedLines(out string) []string {
	var rel []string
	for _, l := range strings.Split(out, "\n") {
		if strings.Contains(l, ": \t") {
			rel = append(rel, l)
		}
	}
	return rel
}

// TestRelatedPositionSameUnderVet checks that the related position of a
// finding ("Of is defined here", a function of another package) is the
// same standalone and under go vet, where the function comes from export
// data that keeps only its line.
func TestRelatedPositionSameUnderVet(t *testing.T) {
	if testing.Short() {
		t.Skip("runs go vet")
	}
	dir := writeModule(t, twoPackages)
	r := runIn(t, dir, isolated, "./...")
	_, vet, _ := goTool(t, dir, "vet", "-vettool="+overfactBin, "./...")
	alone, under := relatedLines(r.stderr), relatedLines(vet)
	if len(alone) == 0 || strings.Join(alone, "\n") != strings.Join(under, "\n") {
		t.Errorf("related positions differ:\nstandalone:\n%s\ngo vet:\n%s", strings.Join(alone, "\n"), strings.Join(under, "\n"))
	}
	if want := regexp.MustCompile(`fact.go:4:1: \tOf is defined here`); !want.MatchString(r.stderr) {
		t.Errorf("standalone output lacks the definition at the start of line 4:\n%s", r.stderr)
	}
}
