package puzzlebox

// Count is a number of arrangements.
type Count uint64

func factorial(n int) Count { // want factorial:`factorial of parameter 0,`
	f := Count(1)
	for i := 2; i <= n; i++ { // want `factorial of n in uint64 wraps for`
		f *= Count(i)
	}
	return f
}

// Catalan is the nth Catalan number, (2n)!/((n+1)! n!).
func Catalan(n int) Count { // want Catalan:`value Γ\(2\*p0 \+ 1\)/\(Γ\(p0` Catalan:`wrong for n ≥ 10\.5`
	return factorial(2*n) / (factorial(n+1) * factorial(n)) // want `Catalan number as \(2n\)!/\(\(n\+1\)!n!\) in uint64: the`
}

// CatalanRec steps C(k+1) = C(k)·2(2k+1)/(k+2).
func CatalanRec(n int) Count { // want CatalanRec:`wrong for some n`
	c := Count(1)
	for k := 0; k < n; k++ { // want `running product c \* Count\(2 \* \(2\*k \+ 1\)\) in uint64 wraps before the division by Count\(k \+ 2\) for n ≥ 34, although its value after the loop fits up to n = 36`
		c = c * Count(2*(2*k+1)) / Count(k+2)
	}
	return c
}

// Bell is the nth Bell number from the Bell triangle; ok is false past
// B(25), the last that fits.
func Bell(n int) (Count, bool) {
	if n > 25 {
		return 0, false
	}
	row := []Count{1}
	for i := 1; i <= n; i++ {
		next := make([]Count, 0, i+1)
		next = append(next, row[len(row)-1])
		for j := 0; j < len(row); j++ {
			next = append(next, next[j]+row[j])
		}
		row = next
	}
	return row[0], true
}
