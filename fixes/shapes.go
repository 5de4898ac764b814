package fixes

import "go/constant"

// A shapeRow is all the fixer knows of one shape: adding a shape is one
// row of shapes, beside its Shape constant in match.go.
type shapeRow struct {
	// name says what the shape computes, in refusals.
	name string
	// build writes the fix into a builder.
	build func(*builder) error
	// helpers are the helper functions the fix calls, by the class of
	// the result: float, signed, unsigned (empty: no helper for it).
	helpers family
	// operands is how many operands the expression check takes
	// (anyOperands: one or more; 0 for shapes without the check).
	operands int
	// factors, for shapes whose expression the fixer checks before
	// replacing it, returns the factors the expression must multiply
	// (num) and divide by (den), of the operands read as linear forms,
	// and for the binomial pmf a second accepted form. nil: the build
	// function checks the code itself (loops, guards, series terms).
	factors func(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern)
}

// anyOperands is shapeRow.operands for a shape that takes any number of
// operands, one or more.
const anyOperands = -1

// The helper families. Their identities are common practice: C(n,k) =
// n!/(k!(n−k)!), n!/(n−k)! = n(n−1)…(n−k+1), the multinomial
// n!/(k1!…km!) with n = k1+…+km, and the Catalan number (2n)!/((n+1)!n!).
var (
	chooseHelpers    = family{"Choose", "MustChooseInt64", "MustChooseUint64"}
	fallingHelpers   = family{"Falling", "MustFallingInt64", "MustFallingUint64"}
	factorialHelpers = family{"Factorial", "MustFactorialInt64", "MustFactorialUint64"}
)

// shapes is the fixer's table: one row a shape. A bare math.Gamma has
// no value-preserving rewrite (no float64 holds Γ(172)); its row serves
// only the logarithm of one, math.Log(math.Gamma(x)).
var shapes map[Shape]shapeRow

func init() {
	shapes = map[Shape]shapeRow{
		ShapeBinomial:         {"binomial coefficient", buildRatio, chooseHelpers, 2, binomialFactors},
		ShapePermutation:      {"falling factorial", buildRatio, fallingHelpers, 2, permutationFactors},
		ShapeMultinomial:      {"multinomial coefficient", buildRatio, family{"Multinomial", "MustMultinomialInt64", ""}, anyOperands, multinomialFactors},
		ShapeCatalan:          {"Catalan number", buildRatio, family{"Catalan", "MustCatalanInt64", ""}, 1, catalanFactors},
		ShapeHypergeometric:   {"hypergeometric probability", buildTerm, family{float: "HypergeometricPMF"}, 4, hypergeometricFactors},
		ShapePowOverFactorial: {"power over factorial", buildTerm, family{float: "PowOverFactorial"}, 2, powOverFactorialFactors},
		ShapePoisson:          {"Poisson term", buildTerm, family{float: "PoissonTerm"}, 2, poissonFactors},
		ShapeBinomialPMF:      {"binomial probability", buildTerm, family{float: "BinomialPMF"}, 3, binomialPMFFactors},
		ShapeGammaRatio:       {"gamma ratio", buildGammaRatio, family{float: "GammaRatio"}, 2, gammaRatioFactors},
		ShapeBeta:             {"beta function", buildTerm, family{float: "Beta"}, 2, betaFactors},
		ShapeInverseBeta:      {"inverse beta function", buildInverseBeta, family{float: "Beta"}, 2, inverseBetaFactors},
		ShapeBinomialLoop:     {"binomial loop", buildLoop, chooseHelpers, 0, nil},
		ShapeFallingLoop:      {"falling-factorial loop", buildLoop, fallingHelpers, 0, nil},
		ShapeFactorial:        {"factorial", buildGuard, family{}, 0, nil},
		ShapeLoopGuard:        {"product loop", buildLoopGuard, family{}, 0, nil},
		ShapePascalGuard:      {"Pascal's-rule recursion", buildPascalGuard, family{signed: "ChooseInt64", unsigned: "ChooseUint64"}, 0, nil},
		ShapeFactorialValue:   {"converted factorial", buildValue, factorialHelpers, 1, factorialValueFactors},
		ShapeSeriesTerm:       {"series term", buildSeriesTerm, family{}, 0, nil},
		ShapeModelBinomLoop:   {"binomial loop", buildModelLoop, chooseHelpers, 0, nil},
		ShapeModelFallingLoop: {"falling-factorial loop", buildModelLoop, fallingHelpers, 0, nil},
		ShapeNegBinomialPMF:   {"negative binomial probability", buildTerm, family{float: "NegativeBinomialPMF"}, 3, negBinomialPMFFactors},
		ShapeLgammaSign:       {"exponential of signed log-gamma values", buildLgammaSign, family{}, 0, nil},
		ShapeStirling:         {"Stirling approximation", buildStirling, family{}, 0, nil},
		ShapeLogStirling:      {"log Stirling approximation", buildStirling, family{}, 0, nil},
		ShapeExpChoose:        {"exponential of a log-gamma binomial", buildExpLgamma, chooseHelpers, 0, nil},
		ShapeExpBeta:          {"exponential of a log-gamma beta function", buildExpLgamma, family{float: "Beta"}, 0, nil},
		ShapeExpGammaRatio:    {"exponential of a log-gamma ratio", buildExpLgamma, family{float: "GammaRatio"}, 0, nil},
		ShapeExpFactorial:     {"factorial read back from an exponential", buildExpLgamma, factorialHelpers, 0, nil},
		ShapeExpBinomialPMF:   {"exponential of a log-space binomial probability", buildExpLgamma, family{float: "BinomialPMF"}, 0, nil},
		ShapeModelSeriesTerm:  {"series term", buildModelSeriesTerm, family{}, 0, nil},
		ShapeGamma:            {"logarithm of a gamma value", buildLogOfGamma, family{float: "LogGamma"}, 1, logOfGammaFactors},
		ShapeModelPoissonRun:  {"running Poisson term", buildModelPoissonRun, family{float: "PoissonTerm"}, 0, nil},
		ShapeGammaRatioAmong:  {"gamma ratio among other factors", buildGammaRatioAmong, family{float: "GammaRatio"}, 0, nil},
		ShapePowOverGamma:     {"power over gamma", buildTerm, family{float: "PowOverGamma"}, 3, powOverGammaFactors},
		ShapeLogSpaceTerm:     {"series term over running products", buildLogSpaceTerm, family{float: "ProductOf"}, 0, nil},
		ShapeProductChain:     {"product of powers and gamma values", buildProductChain, family{float: "GammaProduct"}, 0, nil},
		ShapeLogSum:           {"logarithm of a sum", buildLogSum, family{float: "SumOf"}, 0, nil},
		ShapeLogOfValue:       {"logarithm of a factorial value", buildLogOfValue, family{float: "FactorialProduct"}, 0, nil},
		ShapeRunSum:           {"running sum scaled after its loop", buildRunSum, family{float: "SumOf"}, 0, nil},
		ShapeLoopQuotient:     {"falling-factorial loop over a factorial loop", buildLoopQuotient, chooseHelpers, 0, nil},
		ShapeBinomialValue:    {"converted binomial", buildBinomialValue, family{float: "ChooseOrZero"}, 0, nil},
	}
}

// The factors of each checked shape, with o its operands in the order
// match.go documents. b.userCall accepts a call of the user's factorial
// (or binomial) function on the forms, b.mathCall a call of package math.

func binomialFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // n, k
	return []factorPattern{b.userCall(o[0])}, []factorPattern{b.userCall(o[1]), b.userCall(o[0].add(o[1].neg()))}, nil
}

func permutationFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // n, k
	return []factorPattern{b.userCall(o[0])}, []factorPattern{b.userCall(o[0].add(o[1].neg()))}, nil
}

func multinomialFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // k1..km
	sum := newLinear()
	for _, k := range o {
		sum = sum.add(k)
		den = append(den, b.userCall(k))
	}
	return []factorPattern{b.userCall(sum)}, den, nil
}

func catalanFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // n
	return []factorPattern{b.userCall(o[0].scale(constant.MakeInt64(2)))}, []factorPattern{b.userCall(o[0].add(linearOne())), b.userCall(o[0])}, nil
}

func hypergeometricFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // k, N, K, n
	k, total, bad, n := o[0], o[1], o[2], o[3]
	return []factorPattern{b.userCall(bad, k), b.userCall(total.add(bad.neg()), n.add(k.neg()))}, []factorPattern{b.userCall(total, n)}, nil
}

func powOverFactorialFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // x, k
	return []factorPattern{b.vouched(b.mathCall("Pow", o[0], o[1]))}, []factorPattern{b.userCall(o[1])}, nil
}

func poissonFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // k, lambda
	return []factorPattern{b.vouched(b.mathCall("Pow", o[1], o[0])), b.mathCall("Exp", o[1].neg())}, []factorPattern{b.userCall(o[0])}, nil
}

func binomialPMFFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // k, n, p
	k, n, p := o[0], o[1], o[2]
	pk, qnk := b.mathCall("Pow", p, k), b.mathCall("Pow", linearOne().add(p.neg()), n.add(k.neg()))
	return []factorPattern{b.vouched(b.userCall(n, k)), pk, qnk}, nil,
		&[2][]factorPattern{{b.userCall(n), pk, qnk}, {b.userCall(k), b.userCall(n.add(k.neg()))}}
}

func negBinomialPMFFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // f, s, p: C(f+s−1, f) or C(f+s−1, s−1), p^s, (1−p)^f
	f, s, p := o[0], o[1], o[2]
	n := f.add(s).add(linearOne().neg())
	ps, qf := b.mathCall("Pow", p, s), b.mathCall("Pow", linearOne().add(p.neg()), f)
	return []factorPattern{b.vouched(b.userCall(n, f)), ps, qf}, nil,
		&[2][]factorPattern{{b.vouched(b.userCall(n, s.add(linearOne().neg()))), ps, qf}, nil}
}

func gammaRatioFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // a, b
	return []factorPattern{b.mathCall("Gamma", o[0])}, []factorPattern{b.mathCall("Gamma", o[1])}, nil
}

func powOverGammaFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // x, p, a
	return []factorPattern{b.mathCall("Pow", o[0], o[1])}, []factorPattern{b.mathCall("Gamma", o[2])}, nil
}

func betaFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // a, b
	return []factorPattern{b.mathCall("Gamma", o[0]), b.mathCall("Gamma", o[1])}, []factorPattern{b.mathCall("Gamma", o[0].add(o[1]))}, nil
}

func inverseBetaFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // a, b
	// Or through a function whose value is Γ (the analyzer's value fact).
	return []factorPattern{b.mathCall("Gamma", o[0].add(o[1]))}, []factorPattern{b.mathCall("Gamma", o[0]), b.mathCall("Gamma", o[1])},
		&[2][]factorPattern{{b.userCall(o[0].add(o[1]))}, {b.userCall(o[0]), b.userCall(o[1])}}
}

func factorialValueFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // n
	return []factorPattern{b.converted(b.userCall(o[0]))}, nil, nil
}

func logOfGammaFactors(b *builder, o []linear) (num, den []factorPattern, alt *[2][]factorPattern) { // x
	return []factorPattern{b.mathCall("Gamma", o[0])}, nil, nil
}

// linearOne is the constant form 1.
func linearOne() linear {
	return constLinear(1)
}
