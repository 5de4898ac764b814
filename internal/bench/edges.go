package main

import (
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"syscall"
	"time"
)

// edges runs the command at the edges of its budget, each run a process
// of its own timed from start to exit, with its peak memory (rusage
// maxrss, the largest of it and its children, such as go list):
// "overfact std" with tests, the analysis of one 5 MB generated file, and
// -fix on it; and prints each against its target.
func edges(overfact string) error {
	if overfact == "" {
		return fmt.Errorf("-overfact is required")
	}
	work, err := os.MkdirTemp("", "overfact-edges-")
	if err != nil {
		return err
	}
	defer os.RemoveAll(work)
	std := filepath.Join(work, "std")
	if err := os.MkdirAll(std, 0o755); err != nil {
		return err
	}
	if err := os.WriteFile(filepath.Join(std, "go.mod"), []byte("module example.com/std\n\ngo 1.26\n"), 0o644); err != nil {
		return err
	}
	gen := filepath.Join(work, "gen")
	if err := genFile(gen, 5<<20); err != nil {
		return err
	}
	// A warm-up run builds what go list -export needs into the build
	// cache, as any earlier build of the same code would have.
	if _, _, err := runMeasured(std, overfact, "std"); err != nil {
		return err
	}
	for _, c := range []struct {
		label      string
		dir        string
		args       []string
		maxSeconds float64
		maxMiB     float64
	}{
		{"overfact std (tests included)", std, []string{"std"}, 0, 1536},
		{"one 5 MB generated file", gen, []string{"."}, 10, 0},
		{"the same file, -fix", gen, []string{"-fix", "."}, 30, 2048},
	} {
		wall, kib, err := runMeasured(c.dir, overfact, c.args...)
		if err != nil {
			return fmt.Errorf("%s: %v", c.label, err)
		}
		mib := float64(kib) / 1024
		line := fmt.Sprintf("  %-32s wall %7.2fs", c.label, wall.Seconds())
		if c.maxSeconds > 0 {
			line += fmt.Sprintf(" (target %.0fs, ratio %.2f×)", c.maxSeconds, wall.Seconds()/c.maxSeconds)
		}
		line += fmt.Sprintf("  peak RSS %6.0f MiB", mib)
		if c.maxMiB > 0 {
			line += fmt.Sprintf(" (target %.0f MiB, ratio %.2f×)", c.maxMiB, mib/c.maxMiB)
		}
		fmt.Println(line)
	}
	return nil
}

// runMeasured runs the command in dir and returns its wall time and the
// peak RSS in KiB of it and its children. Exit status 3 (findings) is
// success here.
func runMeasured(dir, name string, args ...string) (time.Duration, int64, error) {
	cmd := exec.Command(name, args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), "GOWORK=off")
	start := time.Now()
	err := cmd.Run()
	wall := time.Since(start)
	if ee, ok := err.(*exec.ExitError); ok && ee.ExitCode() == 3 {
		err = nil
	}
	if err != nil {
		return 0, 0, err
	}
	var kib int64
	if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
		kib = ru.Maxrss
	}
	return wall, kib, nil
}
