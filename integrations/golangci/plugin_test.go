package golangci

import (
	"testing"

	"github.com/golangci/plugin-module-register/register"

	"github.com/overfact/overfact/analyzer"
)

// TestRegistered checks the contract of golangci-lint's module plugins
// (github.com/golangci/plugin-module-register): the plugin is registered
// under its linter name, builds overfact's analyzer, and asks for type
// information.
func TestRegistered(t *testing.T) {
	newPlugin, err := register.GetPlugin("overfact")
	if err != nil {
		t.Fatal(err)
	}
	p, err := newPlugin(map[string]any{})
	if err != nil {
		t.Fatal(err)
	}
	as, err := p.BuildAnalyzers()
	if err != nil || len(as) != 1 || as[0] != analyzer.Analyzer {
		t.Errorf("BuildAnalyzers = %v, %v; want overfact's analyzer", as, err)
	}
	if m := p.GetLoadMode(); m != register.LoadModeTypesInfo {
		t.Errorf("load mode %q, want %q", m, register.LoadModeTypesInfo)
	}
}

// TestSettings checks that settings.flags sets the analyzer's flags and
// that a mistyped setting or flag is an error rather than ignored.
func TestSettings(t *testing.T) {
	if _, err := New(map[string]any{"flags": map[string]any{"debug": "true"}}); err != nil {
		t.Fatal(err)
	}
	if got := analyzer.Analyzer.Flags.Lookup("debug").Value.String(); got != "true" {
		t.Errorf("debug = %s after settings.flags.debug: true", got)
	}
	analyzer.Analyzer.Flags.Set("debug", "false")
	for _, conf := range []map[string]any{
		{"flag": map[string]any{"debug": "true"}},
		{"flags": map[string]any{"nosuch": "1"}},
		{"flags": map[string]any{"debug": "maybe"}},
	} {
		if _, err := New(conf); err == nil {
			t.Errorf("New(%v) accepted it", conf)
		}
	}
}
