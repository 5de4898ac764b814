package ranges

// facts is a persistent map from variable ids to intervals: a treap
// whose priorities are a hash of the key, so its shape depends only on
// the key set. Two states that share history share subtrees, which
// lets join, widen and equality skip everything but the differences,
// and lets a snapshot of a state be kept for free. (Treaps: Seidel and
// Aragon, "Randomized search trees", Algorithmica 16, 1996; the
// hashed-priority form makes the shape canonical.) A missing key means
// the variable is unconstrained.
type facts struct {
	key         int32
	prio        uint32
	val         Interval
	left, right *facts
}

func prioOf(k int32) uint32 {
	x := uint32(k) * 0x9E3779B1
	x ^= x >> 15
	x *= 0x85EBCA77
	x ^= x >> 13
	return x
}

// above reports whether key a (priority pa) sits above node b.
func above(a int32, pa uint32, b *facts) bool {
	return pa > b.prio || (pa == b.prio && a < b.key)
}

func (t *facts) get(k int32) (Interval, bool) {
	for t != nil {
		switch {
		case k < t.key:
			t = t.left
		case k > t.key:
			t = t.right
		default:
			return t.val, true
		}
	}
	return Interval{}, false
}

// split returns the parts of t below and above k, and the node for k.
func split(t *facts, k int32) (l, m, r *facts) {
	if t == nil {
		return nil, nil, nil
	}
	switch {
	case k < t.key:
		l, m, r = split(t.left, k)
		n := *t
		n.left = r
		return l, m, &n
	case k > t.key:
		l, m, r = split(t.right, k)
		n := *t
		n.right = l
		return &n, m, r
	}
	return t.left, t, t.right
}

// merge joins two treaps whose keys are all ordered l < r.
func merge(l, r *facts) *facts {
	switch {
	case l == nil:
		return r
	case r == nil:
		return l
	case above(l.key, l.prio, r):
		n := *l
		n.right = merge(l.right, r)
		return &n
	}
	n := *r
	n.left = merge(l, r.left)
	return &n
}

func (t *facts) set(k int32, v Interval) *facts {
	p := prioOf(k)
	if t == nil || above(k, p, t) {
		l, _, r := split(t, k)
		return &facts{key: k, prio: p, val: v, left: l, right: r}
	}
	n := *t
	switch {
	case k < t.key:
		n.left = t.left.set(k, v)
	case k > t.key:
		n.right = t.right.set(k, v)
	default:
		if t.val == v {
			return t
		}
		n.val = v
	}
	return &n
}

func (t *facts) del(k int32) *facts {
	if t == nil {
		return nil
	}
	n := *t
	switch {
	case k < t.key:
		n.left = t.left.del(k)
		if n.left == t.left {
			return t
		}
	case k > t.key:
		n.right = t.right.del(k)
		if n.right == t.right {
			return t
		}
	default:
		return merge(t.left, t.right)
	}
	return &n
}

// combine keeps the keys present in both a and b, with values f(a, b);
// a Top value drops the key. f must satisfy f(x, x) = x.
func combine(a, b *facts, f func(x, y Interval) Interval) *facts {
	switch {
	case a == nil || b == nil:
		return nil
	case a == b:
		return a
	}
	var key int32
	var va, vb Interval
	var l, r *facts
	var keep bool
	orig := a
	if above(a.key, a.prio, b) {
		bl, bm, br := split(b, a.key)
		l, r = combine(a.left, bl, f), combine(a.right, br, f)
		key, va = a.key, a.val
		if bm != nil {
			vb, keep = bm.val, true
		}
	} else {
		al, am, ar := split(a, b.key)
		l, r = combine(al, b.left, f), combine(ar, b.right, f)
		key, vb, orig = b.key, b.val, nil
		if am != nil {
			va, keep = am.val, true
		}
	}
	if !keep {
		return merge(l, r)
	}
	v := f(va, vb)
	if v.IsTop() {
		return merge(l, r)
	}
	if orig != nil && l == orig.left && r == orig.right && v == orig.val {
		return orig
	}
	return &facts{key: key, prio: prioOf(key), val: v, left: l, right: r}
}

// equal reports whether a and b hold the same facts; canonical shapes
// make a structural walk exact.
func equal(a, b *facts) bool {
	switch {
	case a == b:
		return true
	case a == nil || b == nil || a.key != b.key || a.val != b.val:
		return false
	}
	return equal(a.left, b.left) && equal(a.right, b.right)
}

// widen sends every bound of next that moved past old to infinity
// (Cousot and Cousot, "Abstract interpretation", POPL 1977).
func widen(old, next Interval) Interval {
	w := old
	if next.Lo < old.Lo {
		w.Lo = negInf
	}
	if next.Hi > old.Hi {
		w.Hi = posInf
	}
	return w
}

// state is the abstract state at a program point: the facts about
// tracked variables, or unreachable when live is false.
type state struct {
	facts *facts
	rels  []rel // difference facts, never changed in place
	live  bool
}

var dead = state{}

func (s state) join(t state) state {
	switch {
	case !s.live:
		return t
	case !t.live:
		return s
	}
	return state{combine(s.facts, t.facts, Interval.Join), joinRels(s.rels, t.rels), true}
}

func (s state) widen(t state) state {
	switch {
	case !s.live:
		return t
	case !t.live:
		return s
	}
	return state{combine(s.facts, t.facts, widen), widenRels(s.rels, t.rels), true}
}

func (s state) equal(t state) bool {
	return s.live == t.live && equal(s.facts, t.facts) && equalRels(s.rels, t.rels)
}

func joinAll(s state, more []state) state {
	for _, t := range more {
		s = s.join(t)
	}
	return s
}
