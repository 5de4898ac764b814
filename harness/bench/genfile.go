package main

import (
	"fmt"
	"os"
	"path/filepath"
)

// genFile writes into dir a module of one package whose single file is
// at least size bytes of the many-functions case (manyFuncs): a large
// generated file full of factorial functions, each a finding with a fix.
func genFile(dir string, size int) error {
	if dir == "" {
		return fmt.Errorf("-dir is required")
	}
	n := 1
	for len(manyFuncs(n)) < size {
		n *= 2
	}
	lo, hi := n/2, n
	for lo+1 < hi {
		if mid := (lo + hi) / 2; len(manyFuncs(mid)) < size {
			lo = mid
		} else {
			hi = mid
		}
	}
	src := manyFuncs(hi)
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return err
	}
	if err := os.WriteFile(filepath.Join(dir, "go.mod"), []byte("module example.com/gen\n\ngo 1.26\n"), 0o644); err != nil {
		return err
	}
	fmt.Printf("%s: %d functions, %d bytes\n", filepath.Join(dir, "gen.go"), hi, len(src))
	return os.WriteFile(filepath.Join(dir, "gen.go"), []byte(src), 0o644)
}
