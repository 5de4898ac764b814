package exacteval

import (
	"math/big"
	"testing"
)

// ref parses a reference value at 400 bits.
func ref(t *testing.T, s string) *big.Float {
	t.Helper()
	v, _, err := big.ParseFloat(s, 10, 400, big.ToNearestEven)
	if err != nil {
		t.Fatal(err)
	}
	return v
}

// within200 reports whether got agrees with want to 200 bits, relative.
func within200(got, want *big.Float) bool {
	d := new(big.Float).SetPrec(400).Sub(got, want)
	d.Abs(d)
	tol := new(big.Float).SetPrec(400).Abs(want)
	tol.SetMantExp(tol, -200)
	return d.Cmp(tol) <= 0
}

// The values below were computed with mpmath 1.3.0 (Debian's
// python3-mpmath) at mp.dps = 90: gamma, log(fabs(gamma)), exp, log,
// log1p, expm1, power and pi, printed to 80 digits.
func TestTranscendentalsAgainstMpmath(t *testing.T) {
	type fn func(x *big.Float) (*big.Float, error)
	lg := func(x *big.Float) (*big.Float, error) { l, _, err := Lgamma(x); return l, err }
	exp := func(x *big.Float) (*big.Float, error) { return Exp(x), nil }
	expm1 := func(x *big.Float) (*big.Float, error) { return Expm1(x), nil }
	tests := []struct {
		name string
		f    fn
		x    string
		want string
	}{
		{"Gamma", Gamma, "0.3", "2.9915689876875906283125165159049177911128060249217151127441196509563887678763202"},
		{"Gamma", Gamma, "-2.7", "-0.93108278483896378098740009832085832278643200277675540390417667318904101085475264"},
		{"Gamma", Gamma, "10.25", "639232.59877957679428375840187608496715342528499682114681209799377892603841819992"},
		{"Gamma", Gamma, "171.6", "1.5858969096673028652360090452379596855365213502025825507174409967622391529969543e+308"},
		{"Lgamma", lg, "100000.25", "1051290.5872040856366767159704378627395665392509045141858778976984361873992009328"},
		{"Lgamma", lg, "-3.4", "-1.1211918156538386069819374093077334317625192569397406030868676793239263643695468"},
		{"Lgamma", lg, "0.001", "6.9071788853838536825123446680769825021599616174461091529457710800058321100855136"},
		{"Exp", exp, "100.5", "44319559098458954160107061979564816895899481.870630649074876911854925125932971528"},
		{"Exp", exp, "-700.25", "7.6787238131108722116498874443789444596925344636010727402511464389581813877611046e-305"},
		{"Exp", exp, "1e-5", "1.0000100000500001666670833341666680555575396850198440255759479742865180408599245"},
		{"Log", Log, "3", "1.098612288668109691395245236922525704647490557822749451734694333637494293218609"},
		{"Log", Log, "1e-300", "-690.77552789821370520539743640530926228033044658863189280999837029027178290320574"},
		{"Log", Log, "12345.678", "9.4210613212918319765267839910714460489418336300805245840399264439152165030395168"},
		{"Log1p", Log1p, "1e-10", "0.000000000099999999995000000000333333333308333333335333333333166666666680952380951130952381"},
		{"Log1p", Log1p, "0.75", "0.55961578793542268627088850052682659348608446086135068021803013095079261881267984"},
		{"Expm1", expm1, "1e-8", "0.000000010000000050000000166666667083333334166666668055555557539682542162698415454144624"},
		{"Expm1", expm1, "-0.5", "-0.39346934028736657639620046500881954655808186451281304431710784126494348058625158"},
	}
	for _, tt := range tests {
		x, _, _ := big.ParseFloat(tt.x, 10, Prec, big.ToNearestEven)
		got, err := tt.f(x)
		if err != nil {
			t.Errorf("%s(%s): %v", tt.name, tt.x, err)
			continue
		}
		if want := ref(t, tt.want); !within200(got, want) {
			t.Errorf("%s(%s) = %s, mpmath %s", tt.name, tt.x, got.Text('g', 70), want.Text('g', 70))
		}
	}
	pow := []struct{ x, y, want string }{
		{"2.5", "0.3", "1.3163822043342374135034702201930514340981702145154523475426779883848268395289972"},
		{"1.5", "-40", "0.00000009043772683816628192400549525035572818667949938454137487949098382846191941761138"},
	}
	for _, p := range pow {
		x, _, _ := big.ParseFloat(p.x, 10, Prec, big.ToNearestEven)
		y, _, _ := big.ParseFloat(p.y, 10, Prec, big.ToNearestEven)
		got, err := Pow(x, y)
		if err != nil || !within200(got, ref(t, p.want)) {
			t.Errorf("Pow(%s, %s) = %v, %v; mpmath %s", p.x, p.y, got, err, p.want)
		}
	}
	if want := ref(t, "3.141592653589793238462643383279502884197169399375105820974944592307816406286209"); !within200(Pi(), want) {
		t.Errorf("Pi = %s", Pi().Text('g', 70))
	}
}

// Γ(n+1) = n! and Γ(n+½) = (2n)!·√π/(4^n·n!) (DLMF 5.4.1, 5.4.6), with
// the factorials from math/big: the exact paths and the Stirling path
// (forced by an argument just past exactLimit, and by the shifted
// series on a non-half-integer near an integer) agree with them.
func TestGammaIdentities(t *testing.T) {
	sqrtPi := new(big.Float).SetPrec(400).Sqrt(new(big.Float).SetPrec(400).Set(piConstInit()))
	for _, n := range []int64{1, 2, 5, 20, 21, 100, 170, 171, 500, exactLimit - 1, exactLimit + 7} {
		x := new(big.Float).SetPrec(Prec).SetInt64(n + 1)
		got, err := Gamma(x)
		if err != nil {
			t.Fatal(err)
		}
		want := new(big.Float).SetPrec(400).SetInt(new(big.Int).MulRange(1, n))
		if !within200(got, want) {
			t.Errorf("Gamma(%d) = %s, want %d!", n+1, got.Text('g', 40), n)
		}
		l, sign, err := Lgamma(x)
		lw, _ := Log(want)
		if err != nil || sign != 1 || !within200(l, lw) {
			t.Errorf("Lgamma(%d) = %s, %d, %v; want ln %d!", n+1, l.Text('g', 40), sign, err, n)
		}
		h := new(big.Float).SetPrec(Prec).SetFloat64(float64(n) + 0.5)
		got, err = Gamma(h)
		if err != nil {
			t.Fatal(err)
		}
		num := new(big.Float).SetPrec(400).SetInt(new(big.Int).MulRange(1, 2*n))
		den := new(big.Float).SetPrec(400).SetInt(new(big.Int).Lsh(new(big.Int).MulRange(1, n), uint(2*n)))
		want = num.Quo(num, den)
		want.Mul(want, sqrtPi)
		if !within200(got, want) {
			t.Errorf("Gamma(%d.5) = %s, want %s", n, got.Text('g', 40), want.Text('g', 40))
		}
	}
	// The shifted Stirling series against the recurrence Γ(x+1) = x·Γ(x)
	// (DLMF 5.5.1) across the shift boundary.
	for _, s := range []string{"0.1", "7.3", "63.9", "64.1", "-0.7"} {
		x, _, _ := big.ParseFloat(s, 10, Prec, big.ToNearestEven)
		g0, err0 := Gamma(x)
		g1, err1 := Gamma(new(big.Float).SetPrec(Prec).Add(x, big.NewFloat(1)))
		if err0 != nil || err1 != nil {
			t.Fatal(err0, err1)
		}
		if want := new(big.Float).SetPrec(400).Mul(g0, x); !within200(g1, want) {
			t.Errorf("Gamma(%s+1) = %s, x·Gamma(x) = %s", s, g1.Text('g', 40), want.Text('g', 40))
		}
	}
}

// Bernoulli numbers B_2 … B_12 (DLMF table 24.2.1).
func TestBernoulli(t *testing.T) {
	want := []string{"1", "1/6", "-1/30", "1/42", "-1/30", "5/66", "-691/2730"}
	b := bernoulli()
	for i, w := range want {
		r, _ := new(big.Rat).SetString(w)
		if b[i].Cmp(r) != 0 {
			t.Errorf("B_%d = %s, want %s", 2*i, b[i].RatString(), w)
		}
	}
}
