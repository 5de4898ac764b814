// Package golangci is overfact's module plugin for golangci-lint v2: built
// into a custom golangci-lint (golangci-lint custom, configured by
// .custom-gcl.yml), it registers the linter "overfact", which runs
// analyzer.Analyzer with its facts across packages and its suggested
// fixes (golangci-lint run --fix).
//
// In .golangci.yml:
//
//	version: "2"
//	linters:
//	  enable:
//	    - overfact
//	  settings:
//	    custom:
//	      overfact:
//	        type: module
//	        description: factorial arithmetic that overflows its type
//	        settings:
//	          flags:
//	            debug: "false"
//
// settings.flags sets the analyzer's own flags, as -NAME=VALUE does on
// overfact's command line.
package golangci

import (
	"fmt"
	"sort"

	"github.com/golangci/plugin-module-register/register"
	"golang.org/x/tools/go/analysis"

	"github.com/overfact/overfact/analyzer"
)

func init() {
	register.Plugin("overfact", New)
}

// Settings is the settings block of the linter in .golangci.yml.
type Settings struct {
	// Flags maps an analyzer flag's name to its value.
	Flags map[string]string `json:"flags"`
}

type plugin struct{}

// New is the plugin's constructor, called by golangci-lint with the
// settings block; unknown settings and flags are errors.
func New(conf any) (register.LinterPlugin, error) {
	s, err := register.DecodeSettings[Settings](conf)
	if err != nil {
		return nil, err
	}
	names := make([]string, 0, len(s.Flags))
	for name := range s.Flags {
		names = append(names, name)
	}
	sort.Strings(names)
	for _, name := range names {
		if analyzer.Analyzer.Flags.Lookup(name) == nil {
			return nil, fmt.Errorf("overfact: unknown flag %q in settings.flags", name)
		}
		if err := analyzer.Analyzer.Flags.Set(name, s.Flags[name]); err != nil {
			return nil, fmt.Errorf("overfact: settings.flags.%s: %v", name, err)
		}
	}
	return plugin{}, nil
}

// BuildAnalyzers returns overfact's analyzer.
func (plugin) BuildAnalyzers() ([]*analysis.Analyzer, error) {
	return []*analysis.Analyzer{analyzer.Analyzer}, nil
}

// GetLoadMode asks for type information: the analyzer needs types, and
// facts of the packages it depends on.
func (plugin) GetLoadMode() string {
	return register.LoadModeTypesInfo
}
