package puzzlebox

import (
	"errors"
	"math/bits"
	"sort"
)

func ifact(n int) int { // want ifact:`factorial of parameter 0,`
	if n < 2 {
		return 1
	}
	return n * ifact(n-1) // want `recursive factorial of n in int wraps`
}

// Multinomial is (sum of counts)!/Π count!.
func Multinomial(counts ...int) int {
	total := 0
	den := 1
	for _, c := range counts {
		total += c
		den *= ifact(c)
	}
	return ifact(total) / den // want `Multinomial computes the multinomial coefficient \(Σ parts\)!/Π`
}

// FallingPower is n·(n−1)···(n−k+1), the ordered picks of k from n.
func FallingPower(n, k int) int64 { // want FallingPower:`value Γ\(p0 \+ 1\)/Γ\(p0` FallingPower:`wrong for n ≥ 21`
	return int64(ifact(n) / ifact(n-k)) // want `permutation count n!/\(n - k\)! as a`
}

var errTooMany = errors.New("puzzlebox: count overflows uint64")

func chooseChecked(n, k uint64) (uint64, error) {
	if k > n-k {
		k = n - k
	}
	r := uint64(1)
	for i := uint64(1); i <= k; i++ {
		hi, lo := bits.Mul64(r, n-k+i)
		if hi >= i {
			return 0, errTooMany
		}
		q, _ := bits.Div64(hi, lo, i)
		r = q
	}
	return r, nil
}

// MultinomialChecked is Multinomial as a product of checked binomials.
func MultinomialChecked(counts []int) (uint64, error) {
	res, seen := uint64(1), uint64(0)
	for _, c := range counts {
		seen += uint64(c)
		b, err := chooseChecked(seen, uint64(c))
		if err != nil {
			return 0, err
		}
		hi, lo := bits.Mul64(res, b)
		if hi != 0 {
			return 0, errTooMany
		}
		res = lo
	}
	return res, nil
}

// Arrangements counts the distinct orderings of the letters of word.
func Arrangements(word string) uint64 {
	tally := map[rune]int{}
	for _, r := range word {
		tally[r]++
	}
	keys := make([]rune, 0, len(tally))
	for r := range tally {
		keys = append(keys, r)
	}
	sort.Slice(keys, func(i, j int) bool { return keys[i] < keys[j] })
	res, pos := uint64(1), uint64(0)
	for _, r := range keys {
		for i := 1; i <= tally[r]; i++ {
			pos++
			res = res * pos / uint64(i)
		}
	}
	return res
}
