package main

import (
	"fmt"
	"os"
	"os/exec"
	"strings"

	"golang.org/x/tools/go/analysis"
	"golang.org/x/tools/go/packages"
)

// loadMode picks the go/packages mode for the analyzers: checker.Analyze
// runs fact-using analyzers on every dependency, which then needs syntax
// for the whole import graph, as in x/tools' own checker-based drivers.
func loadMode(flagValue string, as []*analysis.Analyzer) (packages.LoadMode, error) {
	switch flagValue {
	case "all":
		return packages.LoadAllSyntax, nil
	case "roots":
		return packages.LoadSyntax | packages.NeedModule, nil
	case "auto":
		for _, a := range as {
			if usesFacts(a) {
				return packages.LoadAllSyntax | packages.NeedModule, nil
			}
		}
		return packages.LoadSyntax | packages.NeedModule, nil
	}
	return 0, fmt.Errorf("unknown load mode %q", flagValue)
}

// usesFacts reports whether a or anything it requires declares facts.
func usesFacts(a *analysis.Analyzer) bool {
	if len(a.FactTypes) > 0 {
		return true
	}
	for _, r := range a.Requires {
		if usesFacts(r) {
			return true
		}
	}
	return false
}

// load loads the packages matching patterns from dir and fails on any
// load or type error, so that a measurement never runs on a broken corpus.
func load(dir string, mode packages.LoadMode, tests bool, patterns []string) ([]*packages.Package, error) {
	cfg := &packages.Config{Mode: mode, Dir: dir, Tests: tests, Env: append(os.Environ(), "GOWORK=off")}
	pkgs, err := packages.Load(cfg, patterns...)
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
