package main

import (
	"encoding/json"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/overfact/overfact/analyzer"
)

// sarifLog holds the parts of a SARIF 2.1.0 log this test reads; the
// full log is checked against the SARIF schema in internal/sarif.
type sarifLog struct {
	Version string `json:"version"`
	Runs    []struct {
		Tool struct {
			Driver struct {
				Name  string `json:"name"`
				Rules []struct {
					ID               string `json:"id"`
					HelpURI          string `json:"helpUri"`
					ShortDescription struct {
						Text string `json:"text"`
					} `json:"shortDescription"`
					DefaultConfiguration struct {
						Level string `json:"level"`
					} `json:"defaultConfiguration"`
				} `json:"rules"`
			} `json:"driver"`
		} `json:"tool"`
		OriginalURIBaseIDs map[string]struct {
			URI string `json:"uri"`
		} `json:"originalUriBaseIds"`
		ColumnKind string `json:"columnKind"`
		Results    []struct {
			RuleID    string `json:"ruleId"`
			RuleIndex int    `json:"ruleIndex"`
			Level     string `json:"level"`
			Message   struct {
				Text string `json:"text"`
			} `json:"message"`
			Locations []struct {
				PhysicalLocation struct {
					ArtifactLocation struct {
						URI       string `json:"uri"`
						URIBaseID string `json:"uriBaseId"`
					} `json:"artifactLocation"`
					Region struct {
						StartLine, StartColumn, EndLine, EndColumn int
					} `json:"region"`
				} `json:"physicalLocation"`
			} `json:"locations"`
		} `json:"results"`
	} `json:"runs"`
}

func repoRoot(t *testing.T) string {
	t.Helper()
	root, err := filepath.Abs(filepath.Join("..", ".."))
	if err != nil {
		t.Fatal(err)
	}
	return root
}

// TestSARIF runs the command on the demo with -sarif and checks the
// mapping of docs/command.md: one rule per analyzer category, each
// result's rule and level, artifact URIs relative to SRCROOT, and as
// many results as text findings.
func TestSARIF(t *testing.T) {
	root := repoRoot(t)
	out := filepath.Join(t.TempDir(), "demo.sarif")
	r := runIn(t, root, nil, "-C", filepath.Join("testdata", "demo"), "-sarif", out, "./...")
	if r.code != 3 {
		t.Fatalf("exit code %d, want 3 (findings)\n%s", r.code, r.stderr)
	}
	// Related positions follow their finding as "pos: \tmessage" lines.
	textFindings := strings.Count(r.stderr, "\n") - strings.Count(r.stderr, ": \t")
	data, err := os.ReadFile(out)
	if err != nil {
		t.Fatal(err)
	}
	var log sarifLog
	if err := json.Unmarshal(data, &log); err != nil {
		t.Fatal(err)
	}
	if log.Version != "2.1.0" || len(log.Runs) != 1 {
		t.Fatalf("version %q with %d runs", log.Version, len(log.Runs))
	}
	run := log.Runs[0]
	cats := analyzer.Categories()
	if len(run.Tool.Driver.Rules) < len(cats) {
		t.Errorf("%d rules for %d categories", len(run.Tool.Driver.Rules), len(cats))
	}
	for i, c := range cats {
		rule := run.Tool.Driver.Rules[i]
		wantLevel := "warning"
		if strings.HasSuffix(c.ID, ".definite") {
			wantLevel = "error"
		}
		if rule.ID != c.ID || rule.HelpURI != c.Help || rule.ShortDescription.Text != c.Title || rule.DefaultConfiguration.Level != wantLevel {
			t.Errorf("rule %d = %+v, want category %+v at level %s", i, rule, c, wantLevel)
		}
	}
	base := run.OriginalURIBaseIDs["SRCROOT"].URI
	if !strings.HasPrefix(base, "file://") || !strings.HasSuffix(base, "/testdata/demo/") {
		t.Errorf("SRCROOT = %q, want the file URI of the demo directory", base)
	}
	if run.ColumnKind != "utf16CodeUnits" {
		t.Errorf("columnKind = %q", run.ColumnKind)
	}
	if len(run.Results) != textFindings || textFindings == 0 {
		t.Errorf("%d SARIF results, %d text findings", len(run.Results), textFindings)
	}
	levels := make(map[string]int)
	for _, res := range run.Results {
		levels[res.Level]++
		rule := run.Tool.Driver.Rules[res.RuleIndex]
		loc := res.Locations[0].PhysicalLocation
		if rule.ID != res.RuleID || res.Level != rule.DefaultConfiguration.Level {
			t.Errorf("result %q: rule %q level %q, its rule %q level %q", res.Message.Text, res.RuleID, res.Level, rule.ID, rule.DefaultConfiguration.Level)
		}
		if loc.ArtifactLocation.URIBaseID != "SRCROOT" || strings.HasPrefix(loc.ArtifactLocation.URI, "/") || !strings.HasSuffix(loc.ArtifactLocation.URI, ".go") {
			t.Errorf("result %q: artifact %+v, want a relative .go URI", res.Message.Text, loc.ArtifactLocation)
		}
		if rg := loc.Region; rg.StartLine < 1 || rg.StartColumn < 1 || rg.EndLine < rg.StartLine {
			t.Errorf("result %q: region %+v", res.Message.Text, rg)
		}
	}

	// The demo has one definite finding (perms(24)) and many possible ones.
	if levels["error"] != 1 || levels["warning"] != len(run.Results)-1 {
		t.Errorf("levels %v, want 1 error and the rest warnings", levels)
	}

	// -sarif - writes the same log to stdout.
	r2 := runIn(t, root, nil, "-C", filepath.Join("testdata", "demo"), "-sarif", "-", "./...")
	if r2.code != 3 || r2.stdout != string(data) {
		t.Errorf("-sarif -: code %d, stdout differs from the file: %v", r2.code, r2.stdout != string(data))
	}
}
