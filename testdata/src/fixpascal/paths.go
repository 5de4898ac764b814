// Package fixpascal is a seating planner's counting helpers: the ways
// to pick k of n guests for a table, by Pascal's rule with a memo, and
// the walks across its hall, by the lattice-path rule. Its
// .golden file shows the range guard put before each sum, which panics
// exactly where the count leaves its type.
package fixpascal

var picks = map[[2]int64]int64{}

// Picks counts the ways to seat k of n guests at the head table.
func Picks(n, k int64) int64 { // want Picks:`wrong for some n or some k`
	if k < 0 || k > n {
		return 0
	}
	if k == 0 || k == n {
		return 1
	}
	if v, ok := picks[[2]int64{n, k}]; ok {
		return v
	}
	// The last guest is at the table or not.
	v := Picks(n-1, k-1) + Picks(n-1, k) // want `recursion computes C\(n, k\) by Pascal's rule \(Picks\(n-1, k-1\) \+ Picks\(n-1, k\)\) in int64`
	picks[[2]int64{n, k}] = v
	return v
}

var small = map[[2]int]int32{}

// SmallPicks is Picks over int32 counts, the k argument first.
func SmallPicks(k, n int) int32 { // want SmallPicks:`wrong for some k or some n`
	if k < 0 || k > n {
		return 0
	}
	if k == 0 || k == n {
		return 1
	}
	if v, ok := small[[2]int{n, k}]; ok {
		return v
	}
	v := SmallPicks(k-1, n-1) + SmallPicks(k, n-1) // want `recursion computes C\(n, k\) by Pascal's rule .* in int32: the sum wraps where C\(n, k\) leaves int32, from n = 34`
	small[[2]int{n, k}] = v
	return v
}

var routes = map[[2]int64]int64{}

// Routes counts the walks from one corner of a hall of r by c tiles to
// the other, one tile right or up at a time, with a memo.
func Routes(r, c int64) int64 { // want Routes:`wrong for some r or some c`
	if r < 0 || c < 0 {
		return 0
	}
	if r == 0 || c == 0 {
		return 1
	}
	if v, ok := routes[[2]int64{r, c}]; ok {
		return v
	}
	v := Routes(r-1, c) + Routes(r, c-1) // want `recursion counts lattice paths, C\(r \+ c, r\), by the rule Routes\(r-1, c\) \+ Routes\(r, c-1\) in int64`
	routes[[2]int64{r, c}] = v
	return v
}
