package factorialratio

// A multinomial (Σ parts)!/Π part! written as the factorial of the total
// with each part's factorial divided out of it in a loop. 20! =
// 2432902008176640000 fits uint64 and 21! does not (math/big), so the
// start wraps from a total of 21, while the quotient, C(24, 12) =
// 2704156 for parts [12 12], fits.

func factorial64(n int) uint64 { // want factorial64:`factorial of parameter 0, breaks from 21`
	var f uint64 = 1
	for i := uint64(2); i <= uint64(n); i++ { // want `factorial of uint64\(n\) in uint64 wraps for uint64\(n\) ≥ 21`
		f *= i
	}
	return f
}

// SeedTray is a seed tray's counts per cultivar.
type SeedTray struct{ Counts []int }

// Size is the number of seeds in the tray.
func (t SeedTray) Size() int {
	n := 0
	for _, c := range t.Counts {
		n += c
	}
	return n
}

// Orders counts the distinct sowing orders of the tray.
func (t SeedTray) Orders() uint64 { // want Orders:`wrong for`
	w := factorial64(t.Size())
	for _, c := range t.Counts { // want `Orders divides w = factorial64\(t\.Size\(\)\) by factorials over a loop in uint64: the quotient fits where they cancel most of it, but factorial64\(t\.Size\(\)\) already wraps from t\.Size\(\) = 21; t\.Size\(\) is not bounded here`
		w /= factorial64(c)
	}
	return w
}

// OrdersOf takes the total from its caller, and divides by w = w / f(x).
func OrdersOf(total int, parts []int) uint64 { // want OrdersOf:`wrong for`
	w := factorial64(total)
	for i := 0; i < len(parts); i++ { // want `OrdersOf divides w = factorial64\(total\) by factorials over a loop in uint64: .* from total = 21; total is not bounded here`
		w = w / factorial64(parts[i])
	}
	return w
}

// SmallOrders refuses more than 20 seeds: silent.
func SmallOrders(total int, parts []int) uint64 {
	if total > 20 {
		return 0
	}
	w := factorial64(total)
	for _, c := range parts {
		w /= factorial64(c)
	}
	return w
}

// Halved divides by a constant, not by factorials: silent here.
func Halved(total int) uint64 {
	w := factorial64(total)
	for i := 0; i < 3; i++ {
		w /= 2
	}
	return w
}
