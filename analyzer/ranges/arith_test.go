package ranges

import (
	"go/token"
	"go/types"
	"math"
	"math/big"
	"math/rand"
	"testing"
)

// goOp applies op with Go's own int64 operators: the reference for
// wrap-around and truncated division (the Go specification).
func goOp(op token.Token, a, b int64) (int64, bool) {
	switch op {
	case token.ADD:
		return a + b, true
	case token.SUB:
		return a - b, true
	case token.MUL:
		return a * b, true
	case token.QUO:
		if b == 0 {
			return 0, false
		}
		return a / b, true
	case token.REM:
		if b == 0 {
			return 0, false
		}
		return a % b, true
	case token.SHL:
		if b < 0 {
			return 0, false
		}
		return a << uint(b), true
	case token.SHR:
		if b < 0 {
			return 0, false
		}
		return a >> uint(b), true
	case token.AND:
		return a & b, true
	case token.OR:
		return a | b, true
	case token.XOR:
		return a ^ b, true
	case token.AND_NOT:
		return a &^ b, true
	}
	panic(op)
}

// goOpSmall is goOp in a small integer type, where wrapping is easy
// to reach; operators other than + − * / % fall back to int64.
func goOpSmall[T int8 | uint8](op token.Token, a, b int64) (int64, bool) {
	x, y := T(a), T(b)
	switch op {
	case token.ADD:
		return int64(x + y), true
	case token.SUB:
		return int64(x - y), true
	case token.MUL:
		return int64(x * y), true
	case token.QUO:
		if y == 0 {
			return 0, false
		}
		return int64(x / y), true
	case token.REM:
		if y == 0 {
			return 0, false
		}
		return int64(x % y), true
	}
	return goOp(op, a, b)
}

var arithOps = []token.Token{token.ADD, token.SUB, token.MUL, token.QUO, token.REM, token.SHL, token.SHR, token.AND, token.OR, token.XOR, token.AND_NOT}

// TestArithContainsEveryValue enumerates small operand intervals and
// checks that arith's interval holds every result Go computes.
func TestArithContainsEveryValue(t *testing.T) {
	i64 := kindOf(types.Typ[types.Int64])
	i8 := kindOf(types.Typ[types.Int8])
	rng := rand.New(rand.NewSource(1))
	for trial := 0; trial < 3000; trial++ {
		x := randSmall(rng, 60)
		y := randSmall(rng, 60)
		for _, op := range arithOps {
			kinds := []struct {
				k   numKind
				ref func(token.Token, int64, int64) (int64, bool)
			}{{i64, goOp}, {i8, goOpSmall[int8]}}
			for _, kk := range kinds {
				if kk.k.safe.Lo < 0 && (x.Lo < kk.k.safe.Lo || x.Hi > kk.k.safe.Hi || y.Lo < kk.k.safe.Lo || y.Hi > kk.k.safe.Hi) {
					continue
				}
				if (op == token.SHL || op == token.SHR) && kk.k.safe != Top() {
					continue // int8 shifts are covered by the int64 reference
				}
				got := arith(op, x, y, kk.k, false)
				for a := x.Lo; a <= x.Hi; a++ {
					for b := y.Lo; b <= y.Hi; b++ {
						v, ok := kk.ref(op, a, b)
						if ok && !got.Contains(v) {
							t.Fatalf("%v %v %v in %v: %d %v %d = %d not in %v", x, op, y, kk.k.top, a, op, b, v, got)
						}
					}
				}
			}
		}
	}
}

// TestArithExactCorners checks that + − * / are as tight as possible
// on bounded int64 operands: the hull of the values Go computes.
func TestArithExactCorners(t *testing.T) {
	i64 := kindOf(types.Typ[types.Int64])
	rng := rand.New(rand.NewSource(2))
	for trial := 0; trial < 2000; trial++ {
		x, y := randSmall(rng, 40), randSmall(rng, 40)
		for _, op := range []token.Token{token.ADD, token.SUB, token.MUL, token.QUO} {
			want := Empty()
			for a := x.Lo; a <= x.Hi; a++ {
				for b := y.Lo; b <= y.Hi; b++ {
					if v, ok := goOp(op, a, b); ok {
						want = want.Join(Point(v))
					}
				}
			}
			if got := arith(op, x, y, i64, false); got != want {
				t.Fatalf("%v %v %v = %v, want %v", x, op, y, got, want)
			}
		}
	}
}

// TestArithNearLimits samples operands at the ends of int64, where Go
// wraps, and checks containment against Go's operators.
func TestArithNearLimits(t *testing.T) {
	i64 := kindOf(types.Typ[types.Int64])
	ends := []int64{math.MinInt64, math.MinInt64 + 1, -3, -1, 0, 1, 2, 3, math.MaxInt64 - 1, math.MaxInt64}
	for _, xl := range ends {
		for _, xh := range ends {
			for _, yl := range ends {
				for _, yh := range ends {
					x, y := Span(xl, xh), Span(yl, yh)
					if x.IsEmpty() || y.IsEmpty() {
						continue
					}
					for _, op := range arithOps {
						got := arith(op, x, y, i64, false)
						for _, a := range ends {
							for _, b := range ends {
								if !x.Contains(a) || !y.Contains(b) {
									continue
								}
								if v, ok := goOp(op, a, b); ok && !got.Contains(v) {
									t.Fatalf("%v %v %v: %d %v %d = %d not in %v", x, op, y, a, op, b, v, got)
								}
							}
						}
					}
				}
			}
		}
	}
}

// TestSaturatingMethods compares the exported arithmetic with exact
// math/big results clamped to the int64 range.
func TestSaturatingMethods(t *testing.T) {
	clamp := func(z *big.Int) int64 {
		if z.IsInt64() {
			return z.Int64()
		}
		if z.Sign() > 0 {
			return math.MaxInt64
		}
		return math.MinInt64
	}
	big64 := func(v int64) *big.Int { return big.NewInt(v) }
	rng := rand.New(rand.NewSource(3))
	for trial := 0; trial < 20000; trial++ {
		x, y := randWide(rng), randWide(rng)
		if !x.Bounded() || !y.Bounded() {
			continue
		}
		add := Span(clamp(new(big.Int).Add(big64(x.Lo), big64(y.Lo))), clamp(new(big.Int).Add(big64(x.Hi), big64(y.Hi))))
		if got := x.Add(y); got != add {
			t.Fatalf("%v.Add(%v) = %v, want %v", x, y, got, add)
		}
		mul := Empty()
		for _, a := range []int64{x.Lo, x.Hi} {
			for _, b := range []int64{y.Lo, y.Hi} {
				mul = mul.Join(Point(clamp(new(big.Int).Mul(big64(a), big64(b)))))
			}
		}
		if got := x.Mul(y); got != mul {
			t.Fatalf("%v.Mul(%v) = %v, want %v", x, y, got, mul)
		}
	}
}

func TestIntervalBasics(t *testing.T) {
	tests := []struct {
		got, want Interval
	}{
		{Span(3, 1), Empty()},
		{Span(2, 20).Join(Span(25, 30)), Span(2, 30)},
		{Span(2, 20).Meet(Span(25, 30)), Empty()},
		{Empty().Join(Point(4)), Point(4)},
		{Top().Add(Point(1)), Top()},
		{Span(0, posInf).Neg(), Span(negInf, 0)},
		{Span(5, 9).Div(Point(0)), Empty()},
		{Span(5, 9).Div(Span(-1, 1)), Span(-9, 9)},
		{Span(-7, 7).Rem(Point(4)), Span(-3, 3)},
		{Span(0, posInf).Sub(Point(1)), Span(-1, posInf)},
	}
	for i, tt := range tests {
		if tt.got != tt.want {
			t.Errorf("%d: got %v, want %v", i, tt.got, tt.want)
		}
	}
	strs := map[Interval]string{
		Span(2, 20):      "[2, 20]",
		Span(21, posInf): "[21, +inf)",
		Top():            "(-inf, +inf)",
		Empty():          "empty",
		Span(negInf, 20): "(-inf, 20]",
	}
	for r, want := range strs {
		if r.String() != want {
			t.Errorf("String(%#v) = %q, want %q", r, r.String(), want)
		}
	}
	if !Span(1, 2).Bounded() || Span(0, posInf).Bounded() || Empty().Bounded() || !Top().IsTop() {
		t.Error("Bounded/IsTop")
	}
}

func randSmall(rng *rand.Rand, w int) Interval {
	a := rng.Int63n(int64(2*w+1)) - int64(w)
	b := a + rng.Int63n(int64(w/3+1))
	return Span(a, b)
}

func randWide(rng *rand.Rand) Interval {
	pick := func() int64 {
		switch rng.Intn(4) {
		case 0:
			return rng.Int63n(100) - 50
		case 1:
			return rng.Int63() - rng.Int63()
		case 2:
			return math.MaxInt64 - rng.Int63n(5)
		}
		return math.MinInt64 + rng.Int63n(5)
	}
	a, b := pick(), pick()
	return Span(min(a, b), max(a, b))
}

// TestArithUint8 checks unsigned wrapping against Go's uint8 operators.
func TestArithUint8(t *testing.T) {
	u8 := kindOf(types.Typ[types.Uint8])
	ref := goOpSmall[uint8]
	rng := rand.New(rand.NewSource(4))
	for trial := 0; trial < 3000; trial++ {
		x, y := randSmall(rng, 200).Meet(Span(0, 255)), randSmall(rng, 200).Meet(Span(0, 255))
		if x.IsEmpty() || y.IsEmpty() {
			continue
		}
		for _, op := range []token.Token{token.ADD, token.SUB, token.MUL, token.QUO, token.REM} {
			got := arith(op, x, y, u8, false)
			for a := x.Lo; a <= x.Hi; a++ {
				for b := y.Lo; b <= y.Hi; b++ {
					if v, ok := ref(op, a, b); ok && !got.Contains(v) {
						t.Fatalf("uint8 %v %v %v: %d %v %d = %d not in %v", x, op, y, a, op, b, v, got)
					}
				}
			}
		}
	}
}
