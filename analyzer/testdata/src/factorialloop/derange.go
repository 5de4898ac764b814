package factorialloop

// SecretSanta lays out the derangement counts of 0 … n players.
func SecretSanta(n int) []int64 {
	d := make([]int64, n+1)
	d[0] = 1
	for i := 2; i <= n; i++ {
		d[i] = int64(i-1) * (d[i-1] + d[i-2]) // want `table d is filled with derangement numbers, d\[i\] = int64\(i-1\) \* \(d\[i-1\] \+ d\[i-2\]\), in int64: the entry d\[i\] wraps for i ≥ 21`
	}
	return d
}

// SmallSanta fills a table of 15 entries: silent.
func SmallSanta() [15]int64 {
	var d [15]int64
	d[0] = 1
	for i := 2; i < 15; i++ {
		d[i] = int64(i-1) * (d[i-1] + d[i-2])
	}
	return d
}

// ModSanta reduces every entry: silent.
func ModSanta(n int) []int64 {
	d := make([]int64, n+1)
	d[0] = 1
	for i := 2; i <= n; i++ {
		d[i] = int64(i-1) * (d[i-1] + d[i-2])
		d[i] %= 1_000_000_007
	}
	return d
}
