// Package ranges computes integer ranges of the numeric variables and
// expressions of one Go function, so that a caller can tell whether a
// value provably stays below some threshold where it is used.
//
// # Domain
//
// Each local variable of integer or float type (or of a type parameter
// whose type set holds only integers, or only floats) is mapped to an
// Interval [Lo, Hi], and so is each direct numeric field of a local
// struct variable (c.Batch for a parameter c of type Config, not of
// type *Config). MinInt64 and MaxInt64 stand for −∞ and +∞. Float
// intervals have integer bounds rounded outwards.
//
// The walk follows the syntax of the function in execution order,
// carrying a state (a persistent map from variables to intervals, so
// that snapshots and joins cost only the differences) and refining it
// at conditions: dominating guards that leave (return, panic, os.Exit,
// log.Fatal, t.Fatal, break, continue, goto), branch conditions with
// &&, || and !, switch cases, loop conditions and range loops.
//
// Beside the intervals a state carries up to 16 difference facts
// x − y ≤ c, taken from guards that compare two variables (each plus a
// constant) and from "for i := range n". They narrow one variable when
// the other is narrowed and bound x − y, so that after
// "if k < 0 || k > n { return }" and "if n > 20 { return }" both k and
// n−k lie in [0, 20].
//
// A range over a table of constants gives each trip's value the join
// of the table's constants (per field, for a table of structs) and the
// key the table's index range. A table is a composite literal ranged
// over directly, a local declared with one whose every use is a range
// over it or len or cap, or a package-level variable the caller vouches
// for (Options.Tables, found by PackageTables: unexported, and every use
// in the package such a use). Facts about the variables a block
// declares are dropped when the block ends.
//
// Loops are iterated to a fixpoint, widening after Options.MaxVisits
// trips (after one trip inside two or more enclosing loops), then given one
// narrowing trip; the loop condition re-narrows the body on every trip.
// The exit by the loop's own test is taken apart from the entry state and
// from the states that come back after a trip, so a loop whose test holds
// on entry keeps at its exit what its body established: after
// "if i > 4 { break outer }" in a nested loop, i ≤ 4 below that loop.
// A loop that assigns nothing living across trips is walked once. No
// SSA form or control-flow graph is built. The work per function is
// capped at ten statement visits per syntax node (plus a constant):
// past that, and for a loop inside four or more enclosing loops, a
// loop forgets what it assigns instead of iterating.
//
// # Soundness
//
// The result over-approximates: the interval returned by Func.Of or
// Func.At contains every value the expression or variable can take at
// that point in any execution that starts in the Options.Entry ranges.
// Integer arithmetic follows Go's wrapping semantics: when a result
// might leave its type, the range is the whole type. Package-level
// variables, fields reached through pointers, elements and results of
// calls are unknown. A variable whose address (or a field's address)
// is taken, that a closure assigns, or that has a pointer method
// called on it is unknown, fields included, from that point on (and
// throughout any loop containing that point, or everywhere if the
// function uses goto). Closures are analysed on their own, knowing
// nothing of the variables they capture. Code nested deeper than 1000
// levels is not walked: what it assigns becomes unknown.
//
// # Known limits
//
// Apart from the difference facts, which are not closed transitively
// and die when either variable is assigned, the domain is
// non-relational: it does not know that s = 3·i. Because of the wrap
// rule, a value widened to +∞ and then incremented, or widened to −∞
// and then decremented, becomes unknown on both sides. Conditions on
// derived values (x := f(n); if x > 3) refine only x. Comparisons
// involving NaN are assumed false and their negations true, so a float
// guard such as "if x > 170 { return }" is taken to bound x even though
// a NaN would pass it. Labels targeted by goto reset every fact. The
// int and uint types are taken to be 64 bits wide.
//
// Options.NoWrap trades the wrap rule for precision on unbounded
// values: it reads the extreme bounds as infinite, so n−1 after
// "if n > 20 { return }" is (−∞, 19] rather than unknown; results are
// then sound only for executions in which no unbounded variable sits
// at the limits of its type.
package ranges
