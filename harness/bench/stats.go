package main

import (
	"bufio"
	"fmt"
	"io"
	"slices"
	"strconv"
	"strings"
	"time"
)

// median returns the middle value of xs (the mean of the two middle values
// when len(xs) is even), so one slow run caused by a neighbour on the
// machine does not move the figure.
//
// Special cases are:
//
//	median(nil) = 0
func median(xs []float64) float64 {
	if len(xs) == 0 {
		return 0
	}
	s := slices.Clone(xs)
	slices.Sort(s)
	m := len(s) / 2
	if len(s)%2 == 1 {
		return s[m]
	}
	return (s[m-1] + s[m]) / 2
}

// ratio formats a/b as "1.07×".
//
// Special cases are:
//
//	ratio(a, 0) = "n/a"
func ratio(a, b float64) string {
	if b == 0 {
		return "n/a"
	}
	return fmt.Sprintf("%.2f×", a/b)
}

// seconds returns d as float seconds.
func seconds(d time.Duration) float64 { return d.Seconds() }

// parseHWM reads the peak resident set size, in KiB, from the text of
// /proc/self/status (the VmHWM line, see proc(5)).
func parseHWM(r io.Reader) (int64, error) {
	sc := bufio.NewScanner(r)
	for sc.Scan() {
		rest, ok := strings.CutPrefix(sc.Text(), "VmHWM:")
		if !ok {
			continue
		}
		f := strings.Fields(rest)
		if len(f) != 2 || f[1] != "kB" {
			return 0, fmt.Errorf("unexpected VmHWM line %q", sc.Text())
		}
		return strconv.ParseInt(f[0], 10, 64)
	}
	if err := sc.Err(); err != nil {
		return 0, err
	}
	return 0, fmt.Errorf("no VmHWM line")
}

// mib formats a size in KiB as MiB.
func mib(kib float64) string { return fmt.Sprintf("%.0f MiB", kib/1024) }
