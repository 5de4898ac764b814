package queuedesk

import "math"

// EngsetBlocking is the call congestion of servers lines shared by a
// finite number of sources, each offering alpha when idle.
func EngsetBlocking(sources, servers int, alpha float64) float64 { // want EngsetBlocking:`wrong for sources ≥ 22`
	den := 0.0
	for i := 0; i <= servers; i++ {
		den += float64(binom(sources-1, i)) * math.Pow(alpha, float64(i)) // want `binom\(sources-1, i\) computes C\(sources - 1, i\) in int, which wraps for sources - 1 ≥ 21 at i = \(sources - 1\)/2, before the conversion to float64`
	}
	return float64(binom(sources-1, servers)) * math.Pow(alpha, float64(servers)) / den // want `binom\(sources-1, servers\) computes C\(sources - 1, servers\) in int, which wraps for sources - 1 ≥ 21`
}

// EngsetLog is EngsetBlocking with the terms in log space.
func EngsetLog(sources, servers int, alpha float64) float64 {
	if alpha <= 0 {
		return 0
	}
	la := math.Log(alpha)
	s := float64(sources - 1)
	logs := make([]float64, 0, servers+1)
	hi := math.Inf(-1)
	for i := 0; i <= servers; i++ {
		t := lg(s+1) - lg(float64(i)+1) - lg(s-float64(i)+1) + float64(i)*la
		logs = append(logs, t)
		hi = math.Max(hi, t)
	}
	den := 0.0
	for _, t := range logs {
		den += math.Exp(t - hi)
	}
	return math.Exp(logs[servers]-hi) / den
}
