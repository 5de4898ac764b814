package thresholds

import (
	"math"
	"math/big"
	"math/bits"
)

// CountRule is a one-dimensional table of counts filled row by row,
// the shape of the dynamic programs that count subsets by their sum,
// partitions and the rows of Pascal's triangle (common practice):
//
//	c[0] = 1
//	for r := Start; r <= R; r++ {
//		for s := top; s >= d; s-- { // Falling; else s := d; s <= top; s++
//			c[s] += c[s-d]          // d = Alpha·r + Beta
//		}
//	}
//
// After row R, c[s] is the coefficient of x^s in ∏ (1 + x^d) over the
// rows when s falls (each part used at most once: d = r counts the
// subsets of {1, …, R} with sum s, OEIS A053632 (from memory), whose
// largest entry is A025591; d = 1 makes row R of Pascal's triangle, C(R, s)) and in
// ∏ 1/(1 − x^d) when it rises (each part any number of times: d = r
// counts the partitions of s into parts at most R, whose entry at
// s = R is the partition number p(R), OEIS A000041).
type CountRule struct {
	Falling     bool
	Start       int64
	Alpha, Beta int64 // the part of row r, Alpha·r + Beta; Alpha is 0 or 1
}

// part returns the part of row r.
func (cr CountRule) part(r int64) int64 { return cr.Alpha*r + cr.Beta }

// countCells bounds the work of one question: rows times table entries.
const countCells = 1 << 25

// countTop is the largest table a question follows entry by entry.
const countTop = 1 << 16

// countRow applies row r's rule to c in place and reports whether a
// sum passed max: the entries are exact until then. With over, an
// entry past max is marked there instead (with every entry built on
// it) and the row goes on.
func (cr CountRule) countRow(c []uint64, over []bool, r int64, max uint64) bool {
	d := cr.part(r)
	top := int64(len(c)) - 1
	if d < 1 || d > top {
		return false
	}
	add := func(s int64) bool {
		v, carry := bits.Add64(c[s], c[s-d], 0)
		c[s] = v
		past := carry != 0 || v > max
		if over != nil {
			over[s] = over[s] || over[s-d] || past
			return false
		}
		return past
	}
	if cr.Falling {
		for s := top; s >= d; s-- {
			if add(s) {
				return true
			}
		}
		return false
	}
	for s := d; s <= top; s++ {
		if add(s) {
			return true
		}
	}
	return false
}

// valid reports whether the rule is one these questions answer: parts
// of at least 1 from the first row on, rows and parts within ±2^40.
func (cr CountRule) valid() bool {
	return (cr.Alpha == 0 || cr.Alpha == 1) && cr.Start >= -1<<40 && cr.Start <= 1<<40 &&
		cr.Beta >= -1<<40 && cr.Beta <= 1<<40 && cr.part(cr.Start) >= 1
}

// countRows is the last row a question follows past Start.
const countRows = 1 << 12

// CountTable returns the first row R (the counter's last value) at
// which the table, ending at entry top(R), holds an entry that leaves
// t; top says false where the code's table end is not known, which
// ends the question. A falling rule's entries past the sum of its
// parts are 0, so any top past that sum is that sum. FirstBad is
// math.MaxInt64 when no row up to countRows past Start leaves t, when
// the work passes its bound, or when a table would pass 2^16 entries.
// LastGood and Peak are the largest entry at or below top of the row
// before. int64, subsets of {1…R} by their sum with the whole table:
// from R = 72, uint64 from 73 (A025591); Pascal's rows: 67, as
// CentralBinomial; partitions of n into parts at most n, the table
// ending at n (p(n), A000041): 406; subsets of {1…n} with sum n
// (A000009): 770 (TestCountTable checks the entries against a count
// over every subset, math/big's binomials and Euler's pentagonal
// recurrence, and the first rows against math/big products of the
// generating functions).
func CountTable(t Num, cr CountRule, top func(R int64) (int64, bool)) Limit {
	none := Limit{FirstBad: math.MaxInt64}
	if !cr.valid() || t.Float {
		return none
	}
	max := t.maxInt().Uint64()
	var c []uint64
	var over []bool
	best, sum, work := uint64(1), int64(0), int64(0)
	for r := cr.Start; r <= cr.Start+countRows; r++ {
		end, ok := top(r)
		if !ok || end < 0 {
			return none
		}
		sum += cr.part(r)
		if cr.Falling {
			end = min64(end, sum)
		}
		if end > countTop {
			return none
		}
		if int64(len(c)) <= end {
			// Entries below an end read only entries below them, so a
			// table longer than the code's holds the same values up to
			// its end; a table that must grow is filled again from the
			// first row, twice as long, to keep that rare.
			size := min64(max64s(2*int64(len(c)), end+1), countTop+1)
			c, over = make([]uint64, size), make([]bool, size)
			c[0] = 1
			for q := cr.Start; q < r; q++ {
				cr.countRow(c, over, q, max)
			}
			work += (r - cr.Start) * size
		}
		cr.countRow(c, over, r, max)
		if work += int64(len(c)); work > countCells {
			return none
		}
		top, past := uint64(0), false
		for s := int64(0); s <= end; s++ {
			top, past = max64(top, c[s]), past || over[s]
		}
		if past {
			return Limit{FirstBad: r, LastGood: new(big.Int).SetUint64(best), Peak: new(big.Int).SetUint64(best)}
		}
		best = top
	}
	return none
}

func max64(a, b uint64) uint64 {
	if a > b {
		return a
	}
	return b
}

func min64(a, b int64) int64 {
	if a < b {
		return a
	}
	return b
}

func max64s(a, b int64) int64 {
	if a > b {
		return a
	}
	return b
}
