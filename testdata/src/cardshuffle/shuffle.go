// Package cardshuffle counts deals and orderings of a card deck for the
// shuffle tester.
package cardshuffle

// Orderings returns the number of ways to order n cards.
func Orderings(n int64) int64 { // want Orderings:`factorial of parameter 0, breaks from 21` Orderings:`wrong for some n`
	f := int64(1)
	for i := int64(2); i <= n; i++ { // want `factorial of n in int64 wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n is not bounded here`
		f *= i
	}
	return f
}

// orderingsRec is the recursive form, used only for the seven-card
// check below, so its argument is always 7.
func orderingsRec(n int) int { // want orderingsRec:`factorial of parameter 0, breaks from 21`
	if n <= 1 {
		return 1
	}
	return n * orderingsRec(n-1)
}

// SevenCards checks the tester's seven-card hand.
func SevenCards() int { return orderingsRec(7) }

// Arrangements is the recursive form with the base case last.
func Arrangements(n uint32) uint32 { // want Arrangements:`factorial of parameter 0, breaks from 13` Arrangements:`wrong for n ≥ 13`
	if n > 1 {
		return n * Arrangements(n-1) // want `recursive factorial of n in uint32 wraps for n ≥ 13 \(12! ≈ 4.79e8 is the largest that fits\); n is not bounded here`
	}
	return 1
}

// Deck is a deck of cards.
type Deck struct{ Size int }

// Shuffles is a method computing Size! recursively inside an expression.
func (d Deck) Shuffles(n int) float64 { // want Shuffles:`factorial of parameter 0, breaks from 171`
	if n == 0 {
		return 1
	}
	return 1 * (float64(n) * d.Shuffles(n-1)) // want `recursive factorial of n in float64 overflows to \+Inf for n ≥ 171`
}

// FullDeck counts the orders of a whole 52-card deck, which int64 can
// never hold.
func FullDeck() int64 {
	f := int64(1)
	for i := int64(1); i <= 52; i++ { // want `factorial of 52 in int64 wraps \(20! ≈ 2.43e18 is the largest that fits\)`
		f *= i
	}
	return f
}

// Bridge counts hands of 13 from a deck that is always at least 40
// cards.
func Bridge(n int) int64 { // want Bridge:`wrong for some n`
	if n < 40 {
		n = 40
	}
	f := int64(1)
	for i := range n { // want `factorial of n in int64 wraps for n ≥ 21 .*; n is at least 40 here`
		f *= int64(i + 1)
	}
	return f
}

// SmallDeal counts the orders of a five-card deal.
func SmallDeal() int64 {
	f := int64(1)
	for i := int64(5); i >= 1; i-- {
		f *= i
	}
	return f
}

// Guarded bounds the deck before counting.
func Guarded(n int) int64 {
	if n > 20 {
		return -1
	}
	f := int64(1)
	for i := 1; i <= n; i++ {
		f = f * int64(i)
	}
	return f * 1
}

// Perfect counts the perfect shuffles of a deck: odd double factorial.
func Perfect(n int) int64 { // want Perfect:`wrong for some n`
	f := int64(1)
	for i := n; i > 1; i -= 2 { // want `double factorial of n in int64 wraps for n ≥ 34 \(33!! ≈ 6.33e18 is the largest that fits\)`
		f *= int64(i)
	}
	return f * 1
}

// TopCards counts ordered draws of k cards from n: a falling factorial.
func TopCards(n, k int) int64 { // want TopCards:`wrong for some n or some k`
	p := int64(1)
	for i := 0; i < k; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		p *= int64(n - i)
	}
	return p * 1
}

// CountDown counts orders with a while-style loop.
func CountDown(n int) int64 { // want CountDown:`wrong for some n`
	f := int64(1)
	for n > 1 { // want `factorial of n in int64 wraps for n ≥ 21`
		f = int64(n) * f
		n--
	}
	return f * 1
}

// Hands returns C(n, k), the number of k-card hands from n cards.
func Hands(n, k int64) int64 { // want Hands:`binomial of parameter 0, breaks from 21` Hands:`wrong for n ≥ 21`
	return Orderings(n) / (Orderings(k) * Orderings(n-k)) // want `binomial coefficient as a ratio of factorials in int64`
}

// Catalan counts the balanced cut sequences of n pairs.
func Catalan(n int64) int64 { // want Catalan:`value Γ\(2\*p0 \+ 1\)/\(Γ\(p0 \+ 2\)·Γ\(p0 \+ 1\)\), wrong once 2\*p0 ≥ 21` Catalan:`wrong for n ≥ 10\.5`
	return Orderings(2*n) / (Orderings(n+1) * Orderings(n)) // want `Catalan number as \(2n\)!/\(\(n\+1\)!n!\) in int64: the numerator \(2 \* n\)! wraps for n ≥ 11 although the Catalan number itself fits up to n = 35; n is not bounded here`
}

// TwoPiles counts the orders of two piles kept apart.
func TwoPiles(a, b int64) int64 { // want TwoPiles:`value Γ\(p0 \+ 1\)·Γ\(p1 \+ 1\), wrong once p0 ≥ 21` TwoPiles:`wrong for a ≥ 21 or b ≥ 21`
	return Orderings(a) * Orderings(b) // want `product of factorials in int64: the factor a! alone wraps for a ≥ 21`
}

// Pinochle uses a double deck of 48, always past the limit.
func Pinochle() int64 {
	return Orderings(48) / (Orderings(12) * Orderings(36)) // want `binomial coefficient as a ratio of factorials in int64: the numerator 48! wraps, as every factorial from 21! does, although C\(n, n/2\) itself fits up to n = 66`
}

// Euchre deals 5 from 24: a constant, but 24! already wraps.
func Euchre(k int64) int64 {
	if k < 0 || k > 5 {
		return 0
	}
	return Orderings(20) / (Orderings(k) * Orderings(20-k))
}

// Interleavings counts riffle interleavings as a recursive double
// factorial.
func Interleavings(n int64) int64 { // want Interleavings:`double-factorial of parameter 0, breaks from 34` Interleavings:`wrong for n ≥ 34`
	if n <= 1 {
		return 1
	}
	return n * Interleavings(n-2) // want `recursive double factorial of n in int64 wraps for n ≥ 34 \(33!! ≈ 6.33e18 is the largest that fits\); n is not bounded here`
}

// Suits counts suit orders; the caller promises at most 12 suits.
//
//overfact:assume n <= 12
func Suits(n uint32) uint32 { // want Suits:`factorial of parameter 0, safe for \[2, 12\]`
	if n < 2 {
		return 1
	}
	return n * Suits(n-1)
}

// Jokers refuses decks past 12 jokers, the most a uint32 count holds.
func Jokers(n uint32) uint32 { // want Jokers:`factorial of parameter 0, safe for \[2, 12\]`
	if n > 12 {
		return 0
	}
	if n < 2 {
		return 1
	}
	return n * Jokers(n-1)
}

// Draws counts ordered draws of k cards from n: a falling factorial
// function.
func Draws(n, k int64) int64 { // want Draws:`falling-factorial of parameter 0, breaks from 21` Draws:`wrong for some n or some k`
	p := int64(1)
	for i := int64(0); i < k; i++ { // want `falling factorial of k factors from n down in int64 wraps`
		p *= n - i
	}
	return p
}

// DealTable lists the ordered deals of k cards (at most five) from decks
// of every size below maxDeck.
func DealTable(maxDeck, k int) []int64 {
	if k < 0 || k > 5 {
		return nil
	}
	var out []int64
	for n := k; n < maxDeck; n++ {
		p := int64(1)
		for i := 0; i < k; i++ { // want `falling factorial of k factors in int64 wraps: with k = 5, for a largest factor ≥ \d+; n is not bounded here`
			p *= int64(n - i)
		}
		out = append(out, p)
	}
	return out
}
