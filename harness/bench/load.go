package main

import (
	"fmt"
	"os"
	"os/exec"
	"strings"

	"golang.org/x/tools/go/packages"

	"github.com/overfact/overfact/analyzer"
	"github.com/overfact/overfact/internal/driver"
)

// load loads the packages matching patterns from dir and fails on any
// load or type error, so that a measurement never runs on a broken corpus.
// The strategy says where the dependencies come from:
//
//	driver  as the command loads for overfact (driver.LoadForFacts): source
//	        for the dependencies that may carry facts, export data for the rest
//	source  syntax and types of every dependency from source, what
//	        checker.Analyze documents for analyzers with facts
//	roots   syntax of the named packages only, export data for every
//	        dependency: what an analyzer without facts needs
func load(dir, strategy string, tests bool, patterns []string) ([]*packages.Package, error) {
	cfg := &packages.Config{Dir: dir, Tests: tests, Env: append(os.Environ(), "GOWORK=off")}
	var pkgs []*packages.Package
	var err error
	switch strategy {
	case "driver":
		pkgs, err = driver.LoadForFacts(cfg, patterns, analyzer.MayCarryFacts)
	case "source":
		cfg.Mode = packages.LoadAllSyntax | packages.NeedModule
		pkgs, err = packages.Load(cfg, patterns...)
	case "roots":
		cfg.Mode = packages.LoadSyntax | packages.NeedModule
		pkgs, err = packages.Load(cfg, patterns...)
	default:
		return nil, fmt.Errorf("unknown load strategy %q", strategy)
	}
	if err != nil {
		return nil, err
	}
	if n := packages.PrintErrors(pkgs); n > 0 {
		return nil, fmt.Errorf("%d errors loading %v", n, patterns)
	}
	if len(pkgs) == 0 {
		return nil, fmt.Errorf("no packages match %v", patterns)
	}
	return pkgs, nil
}

var goEnvCache = map[string]string{}

// goEnv returns the value of a go command environment variable.
func goEnv(name string) string {
	if v, ok := goEnvCache[name]; ok {
		return v
	}
	out, err := exec.Command("go", "env", name).Output()
	v := ""
	if err == nil {
		v = strings.TrimSpace(string(out))
	}
	goEnvCache[name] = v
	return v
}
