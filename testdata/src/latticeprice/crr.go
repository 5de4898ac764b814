package latticeprice

import "math"

// factInt is n! in int.
func factInt(n int) int { // want factInt:`factorial of parameter 0, breaks from 21`
	f := 1
	for i := 2; i <= n; i++ { // want `factorial of n in int wraps for n ≥ 21 \(20! ≈ 2\.43e18`
		f *= i
	}
	return f
}

// chooseInt is C(n, k) from factorials.
func chooseInt(n, k int) int { // want chooseInt:`binomial of parameter 0, breaks from 21`
	return factInt(n) / (factInt(k) * factInt(n-k)) // want `binomial coefficient as a ratio of factorials in int:`
}

// DigitalProb is the risk-neutral probability that at least j of n
// steps go up, each with probability p.
func DigitalProb(n, j int, p float64) float64 { // want DigitalProb:`wrong for n ≥ 21`
	prob := 0.0
	for k := j; k <= n; k++ {
		prob += float64(chooseInt(n, k)) * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) // want `binomial probability C\(n, k\)·p\^k·\(1−p\)\^\(n−k\) in int:`
	}
	return prob
}

// crrParams gives the Cox–Ross–Rubinstein up and down factors and the
// risk-neutral up probability for n steps over T years.
func crrParams(r, sigma, T float64, n int) (u, d, p float64) {
	dt := T / float64(n)
	u = math.Exp(sigma * math.Sqrt(dt))
	d = 1 / u
	p = (math.Exp(r*dt) - d) / (u - d)
	return u, d, p
}

func payoff(s, k float64, call bool) float64 {
	if call {
		return math.Max(s-k, 0)
	}
	return math.Max(k-s, 0)
}

// CRRPriceDirect prices a European option on the n-step tree by the
// closed-form sum over terminal nodes.
func CRRPriceDirect(S, K, r, sigma, T float64, n int, call bool) float64 { // want CRRPriceDirect:`wrong for some n`
	u, d, p := crrParams(r, sigma, T, n)
	coef := 1.0
	sum := 0.0
	for k := 0; k <= n; k++ { // want `multiplicative binomial loop steps through C\(n, k\) for every k ≤ n in float64: the product coef\*\(float64\(n - k\)\) overflows to \+Inf before the division for n ≥ 1021 at k = n/2`
		st := S * math.Pow(u, float64(k)) * math.Pow(d, float64(n-k))
		sum += coef * math.Pow(p, float64(k)) * math.Pow(1-p, float64(n-k)) * payoff(st, K, call)
		coef = coef * float64(n-k) / float64(k+1)
	}
	return math.Exp(-r*T) * sum
}

// maxSteps bounds the trees CRRPriceLog builds.
const maxSteps = 100000

// CRRPriceLog is CRRPriceDirect with each node's weight formed in log
// space. It returns NaN for trees above maxSteps.
func CRRPriceLog(S, K, r, sigma, T float64, n int, call bool) float64 {
	if n < 1 || n > maxSteps {
		return math.NaN()
	}
	u, d, p := crrParams(r, sigma, T, n)
	ln1, _ := math.Lgamma(float64(n + 1))
	lp, lq := math.Log(p), math.Log(1-p)
	sum := 0.0
	for k := 0; k <= n; k++ {
		lk, _ := math.Lgamma(float64(k + 1))
		lr, _ := math.Lgamma(float64(n - k + 1))
		w := math.Exp(ln1 - lk - lr + float64(k)*lp + float64(n-k)*lq)
		st := S * math.Exp(float64(k)*math.Log(u)+float64(n-k)*math.Log(d))
		sum += w * payoff(st, K, call)
	}
	return math.Exp(-r*T) * sum
}

// Delta is the option's delta by central differences of the closed form.
func Delta(S, K, r, sigma, T float64, n int, call bool) float64 { // want Delta:`wrong for some n`
	h := 0.01 * S
	up := CRRPriceDirect(S+h, K, r, sigma, T, n, call) // want `Delta builds its result from CRRPriceDirect\(S\+h, K, r, sigma, T, n, call\), which is wrong for some values of n`
	down := CRRPriceDirect(S-h, K, r, sigma, T, n, call)
	return (up - down) / (2 * h)
}
