package pickroute

import "math/big"

// Planner describes one picking wave in a warehouse.
type Planner struct {
	Aisles int
	Picks  int
	cache  map[int]int64
}

// RouteCount is the number of distinct orders in which the picks can be visited.
func (p *Planner) RouteCount() uint64 { // want RouteCount:`wrong for some p`
	r := uint64(1)
	for n := uint64(p.Picks); n > 1; n-- { // want `factorial of uint64\(p\.Picks\) in uint64 wraps for uint64\(p\.Picks\) ≥ 21`
		r *= n
	}
	return r
}

// AisleChoices counts the ways to pick which aisles get visited.
func (p *Planner) AisleChoices() int64 { // want AisleChoices:`wrong for some p`
	n := int64(p.Aisles)
	r := int64(1)
	for i := int64(0); i < int64(p.Picks); i++ { // want `multiplicative binomial loop in int64: the product r \* \(n - i\) wraps b`
		r = r * (n - i) / (i + 1)
	}
	return r
}

// catalanPaths counts monotone lattice paths that stay below the diagonal.
func catalanPaths(n int) uint64 {
	return fact(2*n) / (fact(n+1) * fact(n)) // want `Catalan number as \(2n\)!/\(\(n\+1\)!n!\) in uint64: the numerator \(2 \* n\)! w`
}

// Derangements counts re-slottings where no item keeps its bin.
func (p *Planner) Derangements(n int) int64 { // want Derangements:`wrong for some p or some n`
	if p.cache == nil {
		p.cache = map[int]int64{0: 1, 1: 0}
	}
	if v, ok := p.cache[n]; ok {
		return v
	}
	v := int64(n-1) * (p.Derangements(n-1) + p.Derangements(n-2)) // want `recursion computes the derangement number D\(n\) = \(n-1\)·\(D\(n-1\) \+ D\(n-2\)\) in int64: it wraps for n ≥ 21`
	p.cache[n] = v
	return v
}

// smallOrderings is only asked about a single tote, which never holds more than 20 items.
func smallOrderings(k int) int { // want smallOrderings:`factorial of parameter 0`
	if k < 0 || k > 20 {
		return -1
	}
	out := 1
	for k > 1 {
		out *= k
		k--
	}
	return out
}

// RouteCountBig is the exact count for reports.
func RouteCountBig(n int) *big.Int {
	return new(big.Int).MulRange(1, int64(n))
}

// ZoneSplits counts how many ways the picks split into zones of the given sizes.
func ZoneSplits(sizes []int) float64 {
	total := 0
	for _, s := range sizes {
		total += s
	}
	den := 1.0
	for _, s := range sizes {
		den *= factf(float64(s))
	}
	return factf(float64(total)) / den // want `ZoneSplits computes the multinomial coefficient \(Σ parts\)!/Π part! as`
}
