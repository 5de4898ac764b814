// Package raffle prices the draws of a charity raffle from fixed tables
// of pools and picks: table-driven code whose tables bound what it
// computes.
package raffle

// orderings is n! in int64, which holds up to 20! (OEIS A000142); the
// raffle calls it only with values drawn from its own tables.
func orderings(n int) int64 { // want orderings:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ {
		f *= int64(i)
	}
	return f
}

// draws are the evening's draws: a pool of tickets and how many are
// picked in order.
var draws = []struct{ pool, pick int }{
	{pool: 10, pick: 3},
	{pool: 12, pick: 5},
	{pool: 8, pick: 2},
}

// OrderedPicks counts the ordered picks of each draw, pool!/(pool−pick)!:
// every pool is at most 12, so no factorial here passes 12!.
func OrderedPicks() []int64 {
	out := make([]int64, 0, len(draws))
	for _, d := range draws {
		out = append(out, orderings(d.pool)/orderings(d.pool-d.pick))
	}
	return out
}

// Lineups counts the orders a judging panel can line up in, for panel
// sizes from a table declared where it is used.
func Lineups() int64 {
	var total int64
	for _, size := range []int{3, 5, 7} {
		total += orderings(size)
	}
	return total
}

// grandOrderings is orderings for the grand draw's pools.
func grandOrderings(n int) int64 { // want grandOrderings:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n may reach 25 here`
		f *= int64(i)
	}
	return f
}

// grandPools holds a pool of 25 tickets, past 20.
var grandPools = []int{18, 25}

// GrandOrders prices the grand draw: 25! wraps int64.
func GrandOrders() int64 {
	var total int64
	for _, p := range grandPools {
		total += grandOrderings(p)
	}
	return total
}

// lateOrderings is orderings for pools that can be added at the door.
func lateOrderings(n int) int64 { // want lateOrderings:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		f *= int64(i)
	}
	return f
}

// latePools starts small, but AddLatePool appends to it.
var latePools = []int{4, 6}

// AddLatePool adds a pool sold at the door.
func AddLatePool(n int) { latePools = append(latePools, n) }

// LateOrders prices the late pools, whatever was added.
func LateOrders() int64 {
	var total int64
	for _, p := range latePools {
		total += lateOrderings(p)
	}
	return total
}

// sharedOrderings is orderings for a table other packages may change.
func sharedOrderings(n int) int64 { // want sharedOrderings:`factorial of parameter 0, breaks from 21`
	f := int64(1)
	for i := 2; i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21`
		f *= int64(i)
	}
	return f
}

// SharedPools is exported, so an importer may change its values.
var SharedPools = []int{4, 6}

// SharedOrders prices the shared pools.
func SharedOrders() int64 {
	var total int64
	for _, p := range SharedPools {
		total += sharedOrderings(p)
	}
	return total
}
