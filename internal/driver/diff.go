package driver

import (
	"bytes"
	"fmt"
	"io"
	"strings"
)

// An op is one line of an edit script: kept, deleted from a or inserted
// from b.
type op struct {
	kind byte // ' ', '-' or '+'
	line string
}

// lineDiff returns an edit script turning lines a into lines b.
//
// It is the greedy O((N+M)D) algorithm of E. W. Myers, "An O(ND)
// Difference Algorithm and Its Variations", Algorithmica 1 (1986),
// section 2 (forward search keeping each round's frontier for the
// backtrack). Fixes change a few lines, so D is small.
func lineDiff(a, b []string) []op {
	n, m := len(a), len(b)
	max := n + m
	v := make([]int, 2*max+2)
	var trace [][]int
	for d := 0; d <= max; d++ {
		trace = append(trace, append([]int(nil), v...))
		for k := -d; k <= d; k += 2 {
			var x int
			if k == -d || (k != d && v[max+k-1] < v[max+k+1]) {
				x = v[max+k+1] // down: an insertion
			} else {
				x = v[max+k-1] + 1 // right: a deletion
			}
			y := x - k
			for x < n && y < m && a[x] == b[y] {
				x, y = x+1, y+1
			}
			v[max+k] = x
			if x >= n && y >= m {
				return backtrack(trace, a, b, d, max)
			}
		}
	}
	return nil // unreachable: d = n+m always reaches the end
}

func backtrack(trace [][]int, a, b []string, d, max int) []op {
	var rev []op
	x, y := len(a), len(b)
	for ; d > 0; d-- {
		v := trace[d]
		k := x - y
		var prevK int
		if k == -d || (k != d && v[max+k-1] < v[max+k+1]) {
			prevK = k + 1
		} else {
			prevK = k - 1
		}
		prevX := v[max+prevK]
		prevY := prevX - prevK
		for x > prevX && y > prevY {
			x, y = x-1, y-1
			rev = append(rev, op{' ', a[x]})
		}
		if x == prevX {
			y--
			rev = append(rev, op{'+', b[y]})
		} else {
			x--
			rev = append(rev, op{'-', a[x]})
		}
	}
	for x > 0 {
		x, y = x-1, y-1
		rev = append(rev, op{' ', a[x]})
	}
	ops := make([]op, len(rev))
	for i, o := range rev {
		ops[len(rev)-1-i] = o
	}
	return ops
}

// splitLines splits text into lines that keep their newline, so that a
// missing final newline survives the round trip.
func splitLines(text []byte) []string {
	if len(text) == 0 {
		return nil
	}
	lines := strings.SplitAfter(string(text), "\n")
	if lines[len(lines)-1] == "" {
		lines = lines[:len(lines)-1]
	}
	return lines
}

const diffContext = 3

// writeUnified writes the unified diff (POSIX diff -u format, as GNU
// diff and git print it) of old and new under the given name.
func writeUnified(w io.Writer, name string, old, new []byte) error {
	ops := lineDiff(splitLines(old), splitLines(new))
	var buf bytes.Buffer
	fmt.Fprintf(&buf, "--- a/%s\n+++ b/%s\n", name, name)
	hunks := 0
	for i := 0; i < len(ops); {
		if ops[i].kind == ' ' {
			i++
			continue
		}
		start := max(i-diffContext, 0)
		end := hunkEnd(ops, i)
		writeHunk(&buf, ops, start, end)
		hunks++
		i = end
	}
	if hunks == 0 {
		return nil
	}
	_, err := w.Write(buf.Bytes())
	return err
}

// hunkEnd returns the end of the hunk holding the change at i: changes
// closer than twice the context share a hunk.
func hunkEnd(ops []op, i int) int {
	last := i
	for j := i; j < len(ops); j++ {
		if ops[j].kind != ' ' {
			last = j
		} else if j-last > 2*diffContext {
			break
		}
	}
	return min(last+1+diffContext, len(ops))
}

func writeHunk(buf *bytes.Buffer, ops []op, start, end int) {
	oldLine, newLine := 1, 1
	for _, o := range ops[:start] {
		if o.kind != '+' {
			oldLine++
		}
		if o.kind != '-' {
			newLine++
		}
	}
	oldN, newN := 0, 0
	for _, o := range ops[start:end] {
		if o.kind != '+' {
			oldN++
		}
		if o.kind != '-' {
			newN++
		}
	}
	fmt.Fprintf(buf, "@@ -%s +%s @@\n", hunkRange(oldLine, oldN), hunkRange(newLine, newN))
	for _, o := range ops[start:end] {
		buf.WriteByte(o.kind)
		buf.WriteString(o.line)
		if !strings.HasSuffix(o.line, "\n") {
			buf.WriteString("\n\\ No newline at end of file\n")
		}
	}
}

// hunkRange formats a hunk range; an empty range names the line before it.
func hunkRange(line, n int) string {
	switch n {
	case 0:
		return fmt.Sprintf("%d,0", line-1)
	case 1:
		return fmt.Sprint(line)
	}
	return fmt.Sprintf("%d,%d", line, n)
}
