package main

import (
	"encoding/json"
	"io"
	"os"
	"strings"
)

// isVetConfig reports whether arg names a go vet unit configuration: a
// regular file whose name ends in ".cfg" (the go command writes vet.cfg,
// and unitchecker insists on the suffix) holding the JSON object the go
// command writes, with the unit's ID or import path. A directory that
// merely ends in ".cfg" is a package pattern like any other.
func isVetConfig(arg string) bool {
	if !strings.HasSuffix(arg, ".cfg") {
		return false
	}
	f, err := os.Open(arg)
	if err != nil {
		return false
	}
	defer f.Close()
	if fi, err := f.Stat(); err != nil || !fi.Mode().IsRegular() {
		return false
	}
	// A vet config lists the unit's files and its dependencies' export
	// data: some megabytes at most.
	data, err := io.ReadAll(io.LimitReader(f, 64<<20))
	if err != nil {
		return false
	}
	var cfg struct {
		ID, ImportPath string
		GoFiles        []string
	}
	return json.Unmarshal(data, &cfg) == nil && (cfg.ID != "" || cfg.ImportPath != "")
}
