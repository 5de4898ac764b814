package main

import (
	"os"
	"runtime/debug"
)

// collectorPercent is the collector's GOGC the standalone mode runs with
// unless the environment sets GOGC or GOMEMLIMIT. The driver holds the
// heap under its soft limit (1.25 GiB, internal/driver/memory.go), so a
// run whose live heap is small lets the heap grow up to five times it
// before collecting, instead of twice, and collects a few times instead
// of many; a run whose live heap nears the limit (overfact std) is paced
// by the limit as before. The limit is the ceiling that makes this safe,
// which is why a GOMEMLIMIT the user chose leaves the default pacing too.
// Only the standalone mode: go vet's and go fix's unit runs, one process
// per package, set no limit, and the language server lives long.
const collectorPercent = 400

// paceCollector sets collectorPercent unless GOGC or GOMEMLIMIT is set,
// and returns the function that restores the previous setting.
func paceCollector() (restore func()) {
	for _, v := range []string{"GOGC", "GOMEMLIMIT"} {
		if _, set := os.LookupEnv(v); set {
			return func() {}
		}
	}
	prev := debug.SetGCPercent(collectorPercent)
	return func() { debug.SetGCPercent(prev) }
}
