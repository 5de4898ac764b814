package ranges

// This file is both compiled into the tests and parsed by them: the
// brute-force check runs each function below for every argument in a
// small range, records what each probe call sees, and checks that the
// range computed for the probed expression holds every recorded value.
// The functions are factorial-shaped code from made-up scenarios.

var probes = map[int][]int{}

// probe records v under id and returns it.
func probe(id, v int) int {
	probes[id] = append(probes[id], v)
	return v
}

func seatingOrders(n int) int {
	if n < 0 || n > 20 {
		return -1
	}
	r := 1
	for i := 2; i <= n; i++ {
		r *= probe(1, i)
	}
	return r
}

func seatingDown(n int) int {
	r := 1
	for i := n; i > 1; i-- {
		r *= probe(2, i)
	}
	return probe(3, n)
}

func crateDrain(n int) int {
	if n > 12 {
		return 0
	}
	s := 0
	for n > 1 {
		s += probe(4, n)
		n -= 2
	}
	return probe(5, n) + s
}

func diceTable(n int) int {
	if n < 1 || n > 6 {
		return 0
	}
	s := 0
	for i := 1; i <= n; i++ {
		for j := i; j <= 6; j++ {
			s += probe(6, i*j)
		}
	}
	return s
}

func samplingPlan(n int) int {
	k := 0
	for i := 0; i < 50; i += 3 {
		if i*i > n {
			break
		}
		k = probe(7, i)
	}
	return probe(8, k)
}

func shiftKind(n int) int {
	switch {
	case n < 0:
		return 0
	case n <= 4:
		return probe(9, n*2)
	case n <= 9:
		return probe(10, n-5)
	}
	return probe(11, n)
}

func rangeCount(n int) int {
	if n > 9 {
		n = 9
	}
	s := 0
	for i := range n {
		s += probe(12, i)
	}
	return probe(13, s)
}

func topDose(short bool, n int) (dose int) {
	if short {
		dose = 3
	} else if n > 0 && n < 8 {
		dose = n
	}
	return probe(14, dose)
}

func doseBool(n int) int { return topDose(n%2 == 0, n/2) }

func gasShells(n int) int {
	if n < 0 {
		n = -n
	}
	if n > 40 {
		return 0
	}
	t := 0
	for k := 1; k*k <= n; k++ {
		t += probe(15, n/k)
		t += probe(16, n%k)
	}
	return t
}

func tallyOdds(n int) int {
	s := 0
	for i := 0; i < 10; i++ {
		if i%2 == 0 {
			continue
		}
		if i > n {
			break
		}
		s += probe(17, i)
	}
	return probe(18, s)
}

func multiset(n int) int {
	if n < 0 || n > 7 {
		return 0
	}
	var parts [4]int
	c := 0
	for i := range parts {
		parts[i] = n - i
		c += probe(19, n-i)
	}
	return c
}

func clampedTerm(n int) int {
	m := min(max(n, 2), 15)
	return probe(20, m) + probe(21, m*m-1)
}

func chooseRow(n int) int {
	if n > 12 {
		return 0
	}
	s := 0
	for k := 0; k <= n; k++ {
		s += probe(22, n-k)
	}
	return s
}

func splitCrew(n int) int {
	k := n % 7
	if k < 0 || k > n {
		return 0
	}
	if n > 25 {
		return 1
	}
	return probe(23, n-k) + probe(24, k)
}

func rangeShrink(n int) int {
	if n > 20 || n < 0 {
		return 0
	}
	r := 0
	m := n % 9
	for i := range n {
		n--
		r += probe(25, n-i)
	}
	for i := range m {
		r += probe(26, m-i)
	}
	return r
}

type crewPlan struct{ size, spare int }

func crewFields(n int) int {
	c := crewPlan{size: n}
	if c.size > 9 || c.size < -4 {
		return 0
	}
	c.spare = c.size * 2
	for c.size > 0 {
		c.size--
		probe(29, c.size)
	}
	return probe(27, c.spare) + probe(28, c.size)
}

// ticketTable draws draws from fixed tables of a raffle plan; one table
// is changed by the argument before it is read.
func ticketTable(n int) int {
	s := 0
	for i, tc := range []struct{ pool, draw int }{{49, 6}, {20, 3}, {10, 0}} {
		s += probe(30, tc.pool) + probe(31, tc.draw) + probe(32, i)
	}
	prizes := []int{5, 1, 12}
	for _, p := range prizes {
		s += probe(33, p)
	}
	bumped := []int{2, 4}
	bumped[1] = n
	for _, b := range bumped {
		s += probe(34, b)
	}
	var sparse [4]int
	sparse = [4]int{2: 8}
	for _, v := range sparse {
		s += probe(35, v)
	}
	return s + len(prizes)
}

// packCrates multiplies crate sizes until a check in a nested loop finds
// a crate too large and leaves both loops.
func packCrates(n int) int {
	r := 1
outer:
	for i := 1; i <= n; i++ {
		for j := 0; j < 3; j++ {
			if i > 4 {
				break outer
			}
		}
		r *= probe(36, i)
	}
	return r + probe(37, n)
}

// skipShelves skips to the next shelf from a nested loop; only shelves
// whose inner loop ran out reach the tally.
func skipShelves(n int) int {
	s := 0
shelves:
	for i := 0; i < n; i++ {
		for j := i; j < n; j++ {
			if j-i > 2 {
				continue shelves
			}
			s += probe(38, j-i)
		}
		s += probe(39, i)
	}
	return s
}

// drainGoto leaves two loops with a goto.
func drainGoto(n int) int {
	i := 0
	for ; i < n; i++ {
		for j := 0; j < 2; j++ {
			if i >= 7 {
				goto done
			}
		}
		probe(40, i)
	}
	probe(41, i)
done:
	return probe(42, i)
}

// firstFit breaks out of a loop from inside a switch.
func firstFit(n int) int {
	k := 0
search:
	for k = 0; k < 40; k++ {
		switch {
		case k*k > n:
			break search
		case k > 25:
			break
		}
	}
	return probe(43, k)
}

// onePass leaves on its first trip or runs to the end.
func onePass(n int) int {
	i := 0
	for i = 0; i < 10; i++ {
		if n > 0 {
			break
		}
	}
	return probe(44, i)
}

// tallyRows leaves range loops by labelled continue and break.
func tallyRows(n int) int {
	s := 0
rows:
	for i := range 6 {
		for j := range n {
			if j > i {
				continue rows
			}
			if i+j > 8 {
				break rows
			}
		}
		s += probe(45, i)
	}
	return s + probe(46, n)
}

var corpus = map[string]func(int) int{
	"packCrates":    packCrates,
	"skipShelves":   skipShelves,
	"drainGoto":     drainGoto,
	"firstFit":      firstFit,
	"onePass":       onePass,
	"tallyRows":     tallyRows,
	"ticketTable":   ticketTable,
	"crewFields":    crewFields,
	"rangeShrink":   rangeShrink,
	"chooseRow":     chooseRow,
	"splitCrew":     splitCrew,
	"seatingOrders": seatingOrders,
	"seatingDown":   seatingDown,
	"crateDrain":    crateDrain,
	"diceTable":     diceTable,
	"samplingPlan":  samplingPlan,
	"shiftKind":     shiftKind,
	"rangeCount":    rangeCount,
	"doseBool":      doseBool,
	"gasShells":     gasShells,
	"tallyOdds":     tallyOdds,
	"multiset":      multiset,
	"clampedTerm":   clampedTerm,
}
