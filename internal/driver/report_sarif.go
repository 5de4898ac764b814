package driver

import (
	"os"

	"golang.org/x/tools/go/analysis/checker"

	"github.com/overfact/overfact/internal/sarif"
)

// writeSARIF writes the root findings as a SARIF log to the -sarif file
// or, for "-", to stdout.
func (r *run) writeSARIF(roots []*checker.Action) {
	root := r.opts.SourceRoot
	if root == "" {
		root = r.dir
	}
	b, err := sarif.NewBuilder(sarif.ToolComponent{
		Name:           "overfact",
		Version:        r.opts.Version,
		InformationURI: "https://github.com/overfact/overfact",
	}, r.opts.Rules, root)
	if err != nil {
		r.errorf("%v", err)
		return
	}
	for _, act := range roots {
		if act.Err != nil {
			continue
		}
		for _, d := range act.Diagnostics {
			if err := b.Add(act.Package.Fset, d, act.Analyzer.Name); err != nil {
				r.errorf("%v", err)
			}
		}
	}
	if r.opts.SARIF == "-" {
		if err := b.Write(r.opts.Stdout); err != nil {
			r.errorf("%v", err)
		}
		return
	}
	f, err := os.Create(r.opts.SARIF)
	if err != nil {
		r.errorf("%v", err)
		return
	}
	if err := b.Write(f); err != nil {
		r.errorf("%v", err)
	}
	if err := f.Close(); err != nil {
		r.errorf("%v", err)
	}
}
