package driver

import (
	"errors"
	"testing"

	"golang.org/x/tools/go/analysis"
)

// TestPassReadsOnce checks that a pass reads each file from the disk once
// however many fixes read it, still refuses a file that changed since it
// was parsed, and serves the files of the overlay from it.
func TestPassReadsOnce(t *testing.T) {
	src := newSources()
	src.record("a.go", []byte("package a\n"))
	src.record("b.go", []byte("package b\n"))
	disk := map[string]string{"a.go": "package a\n", "b.go": "package b // edited\n"}
	reads := make(map[string]int)
	var got []error
	a := &analysis.Analyzer{Name: "reader", Doc: "reads files", Run: func(pass *analysis.Pass) (any, error) {
		for i := 0; i < 5; i++ {
			for _, name := range []string{"a.go", "b.go", "c.go"} {
				_, err := pass.ReadFile(name)
				got = append(got, err)
			}
		}
		return nil, nil
	}}
	pass := &analysis.Pass{ReadFile: func(name string) ([]byte, error) {
		reads[name]++
		if s, ok := disk[name]; ok {
			return []byte(s), nil
		}
		return nil, errors.New("no such file")
	}}
	overlay := map[string][]byte{"c.go": []byte("package c\n")}
	if _, err := withSources(a, overlay, src).Run(pass); err != nil {
		t.Fatal(err)
	}
	if reads["a.go"] != 1 {
		t.Errorf("a.go read %d times from the disk by 5 fixes; want once", reads["a.go"])
	}
	if reads["c.go"] != 0 {
		t.Errorf("c.go, in the overlay, read %d times from the disk", reads["c.go"])
	}
	for i, err := range got {
		if name := []string{"a.go", "b.go", "c.go"}[i%3]; (err != nil) != (name == "b.go") {
			t.Errorf("read %d of %s: error %v; want one for b.go alone, which changed since it was parsed", i/3+1, name, err)
		}
	}
}
