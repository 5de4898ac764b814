package main

import (
	"bytes"
	"fmt"
	"io/fs"
	"os"
	"os/exec"
	"path/filepath"
	"strings"
	"syscall"
	"time"
)

// edges runs the command at the edges of its budget, each run a process
// of its own timed from start to exit, with its peak memory (rusage
// maxrss, the largest of it and its children, such as go list):
// "overfact std" with tests, the analysis of one 5 MB generated file, and
// -fix on it (each time on the original text, put back in one directory); and prints the
// medians of n runs against the targets. With a baseline command, the two
// alternate run by run (the first in turn goes first), and the ratios of
// the command to the baseline, measured under the same machine load, are
// printed beside. The load average is printed before and after each case.
func edges(overfact, baseline string, n int) error {
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
	// The fixes import the helper module: the generated module keeps a
	// copy of it, from this checkout, as a user would (overfact helper).
	helper, err := filepath.Abs(*helperFlag)
	if err != nil {
		return err
	}
	if _, _, _, err := runMeasured(gen, overfact, "helper", "-from", helper); err != nil {
		return fmt.Errorf("copying the helper module into the generated one: %v", err)
	}
	// A warm-up run builds what go list -export needs into the build
	// cache, as any earlier build of the same code would have.
	if _, _, _, err := runMeasured(std, overfact, "std"); err != nil {
		return err
	}
	if _, _, _, err := runMeasured(gen, overfact, "-test=false", "."); err != nil {
		return err
	}
	// -fix runs in one directory, the generated module copied back into
	// it before each run: go list compiles the named package too, and its
	// compilation is cached by directory as well as by content, so a
	// fresh directory per run would time that compilation of the 5 MB file
	// (minutes on a busy machine) in every run.
	fixDir := filepath.Join(work, "fix")
	if err := copyModule(gen, fixDir); err != nil {
		return err
	}
	if _, _, _, err := runMeasured(fixDir, overfact, "-test=false", "."); err != nil {
		return err
	}
	sides := []string{overfact}
	if baseline != "" {
		sides = append(sides, baseline)
	}
	for _, c := range []struct {
		label      string
		dir        string
		args       []string
		maxSeconds float64
		maxMiB     float64
	}{
		{"overfact std (tests included)", std, []string{"std"}, 0, 1536},
		{"one 5 MB generated file", gen, []string{"-test=false", "."}, 10, 0},
		{"the same file, -fix", "", []string{"-test=false", "-fix", "."}, 30, 2048},
	} {
		fmt.Printf("  %s: load average %s\n", c.label, loadAverage())
		walls := make([][]float64, len(sides))
		cpus := make([][]float64, len(sides))
		kibs := make([][]float64, len(sides))
		for i := 0; i < n; i++ {
			for j := range sides {
				side := (i + j) % len(sides)
				dir := c.dir
				if dir == "" { // -fix rewrites the file: the original text each run
					dir = fixDir
					if err := copyModule(gen, dir); err != nil {
						return err
					}
				}
				wall, cpu, kib, err := runMeasured(dir, sides[side], c.args...)
				if err != nil {
					return fmt.Errorf("%s (%s): %v", c.label, sides[side], err)
				}
				walls[side] = append(walls[side], wall.Seconds())
				cpus[side] = append(cpus[side], cpu.Seconds())
				kibs[side] = append(kibs[side], float64(kib))
			}
		}
		for side, name := range sides {
			wall, mibs := median(walls[side]), median(kibs[side])/1024
			line := fmt.Sprintf("  %-10s %-32s wall %7.2fs", []string{"[target]", "[baseline]"}[side], c.label, wall)
			if c.maxSeconds > 0 {
				line += fmt.Sprintf(" (target %.0fs, ratio %.2f×)", c.maxSeconds, wall/c.maxSeconds)
			}
			line += fmt.Sprintf("  CPU %7.2fs", median(cpus[side]))
			line += fmt.Sprintf("  peak RSS %6.0f MiB", mibs)
			if c.maxMiB > 0 {
				line += fmt.Sprintf(" (target %.0f MiB, ratio %.2f×)", c.maxMiB, mibs/c.maxMiB)
			}
			fmt.Printf("%s  (median of %d; %s)\n", line, n, name)
		}
		if baseline != "" {
			fmt.Printf("  %-10s %-32s wall %s  CPU %s  peak RSS %s\n", "", "target / baseline",
				ratio(median(walls[0]), median(walls[1])), ratio(median(cpus[0]), median(cpus[1])), ratio(median(kibs[0]), median(kibs[1])))
		}
		fmt.Printf("  %s: done, load average %s\n", c.label, loadAverage())
	}
	return nil
}

// copyModule copies the generated module in src (regular files and
// directories, the helper module's copy among them) to dst.
func copyModule(src, dst string) error {
	return filepath.WalkDir(src, func(path string, e fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		rel, err := filepath.Rel(src, path)
		if err != nil {
			return err
		}
		to := filepath.Join(dst, rel)
		switch {
		case e.IsDir():
			return os.MkdirAll(to, 0o755)
		case !e.Type().IsRegular():
			return nil
		}
		data, err := os.ReadFile(path)
		if err != nil {
			return err
		}
		return os.WriteFile(to, data, 0o644)
	})
}

// loadAverage returns the first three fields of /proc/loadavg, or "?".
func loadAverage() string {
	data, err := os.ReadFile("/proc/loadavg")
	if err != nil {
		return "?"
	}
	f := strings.Fields(string(data))
	if len(f) < 3 {
		return "?"
	}
	return strings.Join(f[:3], " ")
}

// runMeasured runs the command in dir and returns its wall time, the CPU
// time (user and system) and the peak RSS in KiB of it and its children. Exit status 3 (findings) is
// success here; so is 1 after -fix, which stops with fixes still to apply
// once its rounds are spent (the 5 MB file has more findings than its
// rounds fix), and says so on its standard error, which is kept.
func runMeasured(dir, name string, args ...string) (wall, cpu time.Duration, kib int64, err error) {
	cmd := exec.Command(name, args...)
	cmd.Dir = dir
	cmd.Env = append(os.Environ(), "GOWORK=off")
	var stderr bytes.Buffer
	cmd.Stderr = &stderr
	start := time.Now()
	err = cmd.Run()
	wall = time.Since(start)
	if ee, ok := err.(*exec.ExitError); ok && (ee.ExitCode() == 3 || ee.ExitCode() == 1 && bytes.Contains(stderr.Bytes(), []byte("rounds of fixes"))) {
		if ee.ExitCode() == 1 {
			fmt.Printf("    (%s: %s)\n", filepath.Base(name), firstLine(stderr.String()))
		}
		err = nil
	}
	if err != nil {
		return 0, 0, 0, fmt.Errorf("%v: %s", err, firstLine(stderr.String()))
	}
	if ru, ok := cmd.ProcessState.SysUsage().(*syscall.Rusage); ok {
		kib = ru.Maxrss
	}
	return wall, cmd.ProcessState.UserTime() + cmd.ProcessState.SystemTime(), kib, nil
}

func firstLine(s string) string {
	line, _, _ := strings.Cut(s, "\n")
	return line
}
