package main

import (
	"os"
	"runtime/debug"
	"testing"
)

// TestPaceCollector checks that the standalone mode's collector setting
// applies only where the environment sets neither GOGC nor GOMEMLIMIT,
// and is undone after the run.
func TestPaceCollector(t *testing.T) {
	for _, v := range []string{"GOGC", "GOMEMLIMIT"} {
		if old, set := os.LookupEnv(v); set {
			os.Unsetenv(v)
			t.Cleanup(func() { os.Setenv(v, old) })
		}
	}
	current := func() int {
		p := debug.SetGCPercent(-1)
		debug.SetGCPercent(p)
		return p
	}
	before := current()
	restore := paceCollector()
	if got := current(); got != collectorPercent {
		t.Errorf("GOGC during the run %d; want %d", got, collectorPercent)
	}
	restore()
	if got := current(); got != before {
		t.Errorf("GOGC after the run %d; want the previous %d", got, before)
	}
	for _, v := range []string{"GOGC", "GOMEMLIMIT"} {
		t.Run(v, func(t *testing.T) {
			t.Setenv(v, "off")
			restore := paceCollector()
			defer restore()
			if got := current(); got != before {
				t.Errorf("with %s set, GOGC during the run %d; want the default %d", v, got, before)
			}
		})
	}
}
