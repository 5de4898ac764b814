package oddcode

import "math"

// studentT holds its Γ ratio in a local and uses it on the next line:
// the finding is at the ratio, where the allow directive is.
func studentT(nu, t float64) float64 {
	c := math.Gamma((nu+1)/2) / (math.Sqrt(nu*math.Pi) * math.Gamma(nu/2)) //overfact:allow nu is a small integer
	return c * math.Pow(1+t*t/nu, -(nu+1)/2)
}

// studentT2 is studentT without the directive.
func studentT2(nu, t float64) float64 {
	c := math.Gamma((nu+1)/2) / (math.Sqrt(nu*math.Pi) * math.Gamma(nu/2)) // want `^ratio of math.Gamma values in float64: math.Gamma\(\(nu \+ 1\) / 2\) is \+Inf`
	return c * math.Pow(1+t*t/nu, -(nu+1)/2)
}

// betaDensity divides by a Beta function held in a local.
func betaDensity(a, b, x float64) float64 {
	c := math.Gamma(a) * math.Gamma(b) / math.Gamma(a+b) // want `^ratio of math.Gamma values in float64: math.Gamma\(a \+ b\) is \+Inf`
	return math.Pow(x, a-1) * math.Pow(1-x, b-1) / c
}

// rfact is called only as rfact(25): one root cause, reported once at
// the call. Nothing in rfact itself is certain: its recursion runs n
// down from 25 to 1.
func rfact(n int) int { // want rfact:"factorial of parameter 0"
	if n < 2 {
		return 1
	}
	return n * rfact(n-1)
}

func rfactUse() int {
	return rfact(25) // want `^rfact\(25\): factorial of 25 in int wraps \(20! ≈ 2.43e18 is the largest that fits\)$`
}

// lfact is a loop called only as lfact(25) and lfact(3): the call past
// the limit is the finding; the loop has nothing to add.
func lfact(n int) int { // want lfact:"factorial of parameter 0"
	r := 1
	for i := 2; i <= n; i++ {
		r *= i
	}
	return r
}

func lfactUse() int {
	return lfact(25) + lfact(3) // want `^lfact\(25\): factorial of 25 in int wraps`
}

// mfact is called with a value that may or may not break it: the
// finding is at its recursion, which says how far n may reach.
func mfact(n int) int { // want mfact:"factorial of parameter 0"
	if n < 2 {
		return 1
	}
	return n * mfact(n-1) // want `^recursive factorial of n in int wraps for n ≥ 21 \(20! ≈ 2.43e18 is the largest that fits\); n may reach 30 here$`
}

func mfactUse(k int) int { // want mfactUse:"factorial of parameter 0, breaks from 21"
	if k < 10 || k > 30 {
		return 0
	}
	return mfact(k)
}

// gfact is the factorial teams and orders use.
func gfact(n int) int { // want gfact:"factorial of parameter 0"
	r := 1
	for i := 2; i <= n; i++ { // want `^factorial of n in int wraps for n ≥ 21`
		r *= i
	}
	return r
}

// teams names its own variables m and j: the message speaks of them.
func teams(m, j int) int { // want teams:"binomial of parameter 0, breaks from 21"
	return gfact(m) / (gfact(j) * gfact(m-j)) // want `^binomial coefficient as a ratio of factorials in int: the numerator m! wraps for m ≥ 21, although C\(m, m/2\) itself fits up to m = 66; m is not bounded here$`
}

// orders names its own variables too.
func orders(m, j int) int {
	return gfact(m) / gfact(m-j) // want `^permutation count m!/\(m - j\)! as a ratio of factorials in int: the numerator m! wraps for m ≥ 21, although the product of the top j factors may still fit; m is not bounded here$`
}
