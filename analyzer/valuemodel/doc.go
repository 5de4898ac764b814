// Package valuemodel is a small algebra of factorial arithmetic and an
// evaluator that maps the numeric expressions, locals and loop
// accumulators of one Go function onto it.
//
// # The algebra
//
// A Term is
//
//	c · √π^s · ∏ Γ(aᵢ)^pᵢ · ∏ bⱼ^eⱼ · exp(x)
//
// where c is an exact rational, every aᵢ, bⱼ, eⱼ and x is an Affine form
// (a rational constant plus rational multiples of the function's
// variables, Sym), and pᵢ is a small integer. n! is Γ(n+1), C(n, k) is
// Γ(n+1)/(Γ(k+1)Γ(n−k+1)), x^k/k! is x^k/Γ(k+1). Terms are kept in a
// normal form (factors merged, x·Γ(x) folded into Γ(x+1), Legendre's
// duplication formula Γ(z)Γ(z+½) = 2^(1−2z)·√π·Γ(2z) applied), so that
// Recognise names the same value however it is written (DLMF 5.5.1 and
// 5.5.5 for the two identities, from memory). A Sum is a term summed over
// a loop's iterations.
//
// ProductOver turns the factor a loop multiplies in at each iteration
// into a closed form: ∏_{t<n} (αt+β) = α^n·Γ(n+β/α)/Γ(β/α) for α > 0 and
// |α|^n·Γ(β/|α|+1)/Γ(β/|α|−n+1) for α < 0.
//
// # The evaluator
//
// Evaluate walks one function body in execution order, giving each
// numeric expression a Term where it can (a constant, a variable, a
// field of a local, math.Pow, math.Exp, math.Gamma, exp of math.Lgamma
// differences, a call the caller knows through Options.Callee), and
// summarises each counting loop: the counter of any numeric type with
// its start, step and direction, further variables stepped once per
// trip, every accumulator multiplied or divided in the body (also under
// a condition on the counter), in the order the body does it, and every
// sum the body adds to. Anything else is unknown (a nil *Term), which
// can only lose a finding, never invent one.
//
// A variable moved to the other end of a symmetric range, the reduction
// if k > n−k { k = n − k } or k = min(k, n−k) that binomial helpers make
// before their loop, is read after the move as a fresh variable k′ that
// holds k or n − k (Result.Reflections, with whether it ends in the
// smaller half); a value the move does not change, C(n, k′) = C(n, k),
// is then given in k itself.
//
// The work per function is capped (Options.MaxNodes); past the cap the
// evaluation stops and Result.Capped says so.
package valuemodel
