package lgamma_test

import (
	"fmt"

	"github.com/overfact/overfact/fixes/lgamma"
)

// A bottling line inspects 5 bottles out of a crate of 52: the number of
// possible samples is C(52,5) = 2598960 (the count of five-card hands,
// common practice).
func ExampleChoose() {
	fmt.Printf("%.0f\n", lgamma.Choose(52, 5))
	fmt.Printf("%.4f\n", lgamma.LogChoose(52, 5)) // ln 2598960 = 14.77062… (Python math.log)
	// Output:
	// 2598960
	// 14.7706
}

// The exact form reports when the result does not fit instead of
// wrapping: C(66,33) is the largest central binomial in an int64 (checked
// against math/big in the tests), C(70,35) is not representable.
func ExampleChooseInt64() {
	fmt.Println(lgamma.ChooseInt64(66, 33))
	fmt.Println(lgamma.ChooseInt64(70, 35))
	// Output:
	// 7219428434016265740 true
	// 0 false
}

func ExampleMustFactorialInt64() {
	defer func() { fmt.Println(recover()) }()
	fmt.Println(lgamma.MustFactorialInt64(20)) // OEIS A000142
	fmt.Println(lgamma.MustFactorialInt64(21))
	// Output:
	// 2432902008176640000
	// lgamma: MustFactorialInt64(21): result does not fit in int64
}

// A support desk receives on average 2 tickets a minute; the chance of a
// quiet minute is e^(−2) ≈ 0.135335 (math.Exp(-2)), and the Poisson law
// stays finite where λ^k/k! alone would overflow.
func ExamplePoissonPMF() {
	fmt.Printf("%.6f\n", lgamma.PoissonPMF(0, 2))
	// P(200; 200) = e^(−δ(200))/√(400π) with δ(200) ≈ 1/2400 (Stirling
	// with Robbins' bound), = 0.0281977…
	fmt.Printf("%.6g\n", lgamma.PoissonPMF(200, 200))
	// Output:
	// 0.135335
	// 0.0281977
}
