// Package fixconv is a dice-odds table that counts the orderings of n
// dice in one type and converts the count to another afterwards, when it
// has already broken; its .golden file computes each count in the type
// it is converted to.
package fixconv

func orderings(n int64) int64 { // want orderings:"factorial of parameter 0"
	r := int64(1)
	for i := int64(2); i <= n; i++ { // want "factorial of n in int64"
		r *= i
	}
	return r
}

func orderingsF(n int) float64 { // want orderingsF:"factorial of parameter 0"
	r := 1.0
	for i := 2; i <= n; i++ {
		r *= float64(i)
	}
	return r
}

// Spread is the number of orderings of n dice as a float, for odds: the
// int64 count has wrapped from 21 dice on, where a float64 still holds it.
func Spread(n int64) float64 { // want Spread:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` Spread:`wrong for n ≥ 21`
	return float64(orderings(n)) // want `n! is computed in int64, which wraps for n ≥ 21, before the conversion to float64`
}

// Spread32 is Spread in float32, which holds n! up to 34.
func Spread32(n int64) float32 { // want Spread32:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 21` Spread32:`wrong for n ≥ 21`
	return float32(orderings(n)) // want `before the conversion to float32`
}

// Count is the float count back in int64: exact up to 22 dice, and
// beyond int64 from 21 on.
func Count(n int) int64 { // want Count:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Count:`wrong for n ≥ 171`
	return int64(orderingsF(n)) // want `of a float64 factorial`
}

// Count32 is Count in int32, which holds n! up to 12.
func Count32(n int) int32 { // want Count32:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 171` Count32:`wrong for n ≥ 171`
	return int32(orderingsF(n)) // want `of a float64 factorial`
}

// CountU is Count in uint64, which holds n! up to 20 as int64 does.
func CountU(n int) uint64 { // want CountU:`value Γ\(p0 \+ 1\), wrong once p0 ≥ 171` CountU:`wrong for n ≥ 171`
	return uint64(orderingsF(n)) // want `of a float64 factorial`
}

// Board is the count for a full board of 24 dice: certainly past int64,
// and no rewrite can make it fit, so the call gets no fix (the guard in
// orderings is where it fails).
func Board() int64 {
	return orderings(24) // want `orderings\(24\)`
}
