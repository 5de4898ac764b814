package exacteval

import (
	"errors"
	"fmt"
	"go/token"
	"go/types"
	"math/big"

	"golang.org/x/tools/go/ssa"
)

// SkipError says why a call could not be evaluated faithfully.
type SkipError struct{ Reason string }

func (e *SkipError) Error() string { return "skipped: " + e.Reason }

func skipf(format string, args ...any) error {
	return &SkipError{Reason: fmt.Sprintf(format, args...)}
}

// PanicError is a call that panics in exact arithmetic: a panic
// statement, an integer division by zero, an index out of range, a nil
// dereference.
type PanicError struct{ What string }

func (e *PanicError) Error() string { return "panic: " + e.What }

// Evaluator evaluates the functions of one SSA program.
type Evaluator struct {
	// MaxSteps bounds the instructions one Call executes; MaxDepth the
	// nesting of calls. Zero means the defaults (500,000 and 1,000).
	MaxSteps, MaxDepth int

	steps   int
	globals map[*ssa.Global]*any
	inits   map[*ssa.Package]error
}

// New returns an evaluator.
func New() *Evaluator {
	return &Evaluator{globals: make(map[*ssa.Global]*any), inits: make(map[*ssa.Package]error)}
}

// Call evaluates fn on args (receiver first for a method). The result
// is the function's only result, or a Struct of its results when it has
// several. err is a *SkipError or a *PanicError.
func (ev *Evaluator) Call(fn *ssa.Function, args []any) (result any, err error) {
	if ev.MaxSteps == 0 {
		ev.MaxSteps = 500_000
	}
	if ev.MaxDepth == 0 {
		ev.MaxDepth = 1000
	}
	ev.steps = 0
	defer func() {
		if r := recover(); r != nil {
			if e, ok := r.(big.ErrNaN); ok {
				result, err = nil, skipf("NaN: %s", e.Error())
				return
			}
			panic(r)
		}
	}()
	v, err := ev.call(fn, args, nil, 0)
	if t, ok := v.(tuple); ok {
		v = Struct(t)
	}
	return v, err
}

type frame struct {
	env map[ssa.Value]any
}

func (ev *Evaluator) call(fn *ssa.Function, args, freeVars []any, depth int) (any, error) {
	if depth > ev.MaxDepth {
		return nil, skipf("call depth over %d", ev.MaxDepth)
	}
	if fn.Blocks == nil {
		return nil, skipf("call of %s, which has no body here", fn)
	}
	if fn.Recover != nil {
		return nil, skipf("recover in %s", fn)
	}
	if len(args) != len(fn.Params) {
		return nil, skipf("call of %s with %d arguments for %d parameters", fn, len(args), len(fn.Params))
	}
	fr := &frame{env: make(map[ssa.Value]any, 32)}
	for i, p := range fn.Params {
		fr.env[p] = args[i]
	}
	for i, fv := range fn.FreeVars {
		fr.env[fv] = freeVars[i]
	}
	var prev *ssa.BasicBlock
	b := fn.Blocks[0]
	for {
		// Phis read their operands as they were on entry to the block.
		var phis []*ssa.Phi
		var vals []any
		for _, instr := range b.Instrs {
			phi, ok := instr.(*ssa.Phi)
			if !ok {
				break
			}
			idx := -1
			for i, p := range b.Preds {
				if p == prev {
					idx = i
				}
			}
			if idx < 0 {
				return nil, skipf("phi without its edge in %s", fn)
			}
			v, err := ev.value(fr, phi.Edges[idx])
			if err != nil {
				return nil, err
			}
			phis = append(phis, phi)
			vals = append(vals, v)
		}
		for i, phi := range phis {
			fr.env[phi] = vals[i]
		}
		var next *ssa.BasicBlock
	instrs:
		for _, instr := range b.Instrs[len(phis):] {
			ev.steps++
			if ev.steps > ev.MaxSteps {
				return nil, skipf("more than %d steps", ev.MaxSteps)
			}
			switch instr := instr.(type) {
			case *ssa.Jump:
				next = b.Succs[0]
				break instrs
			case *ssa.If:
				c, err := ev.value(fr, instr.Cond)
				if err != nil {
					return nil, err
				}
				if c.(bool) {
					next = b.Succs[0]
				} else {
					next = b.Succs[1]
				}
				break instrs
			case *ssa.Return:
				var rs tuple
				for _, r := range instr.Results {
					v, err := ev.value(fr, r)
					if err != nil {
						return nil, err
					}
					rs = append(rs, v)
				}
				switch len(rs) {
				case 0:
					return nil, nil
				case 1:
					return rs[0], nil
				}
				return rs, nil
			case *ssa.Panic:
				return nil, &PanicError{What: "panic in " + fn.Name()}
			case *ssa.DebugRef:
			default:
				v, err := ev.instr(fr, instr, depth)
				if err != nil {
					return nil, err
				}
				if val, ok := instr.(ssa.Value); ok {
					fr.env[val] = v
				}
			}
		}
		if next == nil {
			return nil, skipf("block without an exit in %s", fn)
		}
		prev, b = b, next
	}
}

func (ev *Evaluator) value(fr *frame, v ssa.Value) (any, error) {
	switch v := v.(type) {
	case *ssa.Const:
		return constValue(v.Value, v.Type())
	case *ssa.Function:
		return &closure{fn: v}, nil
	case *ssa.Global:
		return ev.global(v)
	case *ssa.Builtin:
		return v, nil
	}
	x, ok := fr.env[v]
	if !ok {
		return nil, skipf("value %s not computed", v.Name())
	}
	return x, nil
}

// global returns the cell of a package variable, after running its
// package's init once.
func (ev *Evaluator) global(g *ssa.Global) (any, error) {
	if err, done := ev.inits[g.Pkg]; !done {
		ev.inits[g.Pkg] = nil
		if init := g.Pkg.Func("init"); init != nil {
			saved := ev.steps
			ev.steps = 0
			_, err = ev.call(init, nil, nil, 0)
			ev.steps = saved
			ev.inits[g.Pkg] = err
		}
	} else if err != nil {
		return nil, skipf("package variable %s: init: %v", g.Name(), err)
	}
	if err := ev.inits[g.Pkg]; err != nil {
		return nil, skipf("package variable %s: init: %v", g.Name(), err)
	}
	c, ok := ev.globals[g]
	if !ok {
		c = new(any)
		*c = zero(g.Type().(*types.Pointer).Elem())
		ev.globals[g] = c
	}
	return c, nil
}

func (ev *Evaluator) operands(fr *frame, vs ...ssa.Value) ([]any, error) {
	out := make([]any, len(vs))
	for i, v := range vs {
		x, err := ev.value(fr, v)
		if err != nil {
			return nil, err
		}
		out[i] = x
	}
	return out, nil
}

func (ev *Evaluator) instr(fr *frame, instr ssa.Instruction, depth int) (any, error) {
	switch in := instr.(type) {
	case *ssa.BinOp:
		xs, err := ev.operands(fr, in.X, in.Y)
		if err != nil {
			return nil, err
		}
		return binop(in.Op, in.X.Type(), xs[0], xs[1])
	case *ssa.UnOp:
		x, err := ev.value(fr, in.X)
		if err != nil {
			return nil, err
		}
		return unop(in, x)
	case *ssa.Convert:
		x, err := ev.value(fr, in.X)
		if err != nil {
			return nil, err
		}
		return convert(x, in.X.Type(), in.Type())
	case *ssa.ChangeType:
		return ev.value(fr, in.X)
	case *ssa.MakeInterface:
		return ev.value(fr, in.X)
	case *ssa.ChangeInterface:
		return ev.value(fr, in.X)
	case *ssa.Alloc:
		c := new(any)
		*c = zero(in.Type().(*types.Pointer).Elem())
		return c, nil
	case *ssa.Store:
		xs, err := ev.operands(fr, in.Addr, in.Val)
		if err != nil {
			return nil, err
		}
		p, ok := xs[0].(*any)
		if !ok {
			return nil, &PanicError{What: "nil pointer store"}
		}
		store(p, xs[1])
		return nil, nil
	case *ssa.FieldAddr:
		x, err := ev.value(fr, in.X)
		if err != nil {
			return nil, err
		}
		p, ok := x.(*any)
		if !ok {
			return nil, &PanicError{What: "nil pointer field"}
		}
		s, ok := (*p).(Struct)
		if !ok {
			return nil, skipf("field of %T", *p)
		}
		return &s[in.Field], nil
	case *ssa.Field:
		x, err := ev.value(fr, in.X)
		if err != nil {
			return nil, err
		}
		s, ok := x.(Struct)
		if !ok {
			return nil, skipf("field of %T", x)
		}
		return clone(s[in.Field]), nil
	case *ssa.IndexAddr:
		xs, err := ev.operands(fr, in.X, in.Index)
		if err != nil {
			return nil, err
		}
		elems, err := elements(xs[0])
		if err != nil {
			return nil, err
		}
		i, err := index(xs[1], len(elems))
		if err != nil {
			return nil, err
		}
		return &elems[i], nil
	case *ssa.Index:
		xs, err := ev.operands(fr, in.X, in.Index)
		if err != nil {
			return nil, err
		}
		a, ok := xs[0].(array)
		if !ok {
			return nil, skipf("index of %T", xs[0])
		}
		i, err := index(xs[1], len(a))
		if err != nil {
			return nil, err
		}
		return clone(a[i]), nil
	case *ssa.Slice:
		return ev.slice(fr, in)
	case *ssa.MakeSlice:
		xs, err := ev.operands(fr, in.Len, in.Cap)
		if err != nil {
			return nil, err
		}
		n, c := xs[0].(*big.Int), xs[1].(*big.Int)
		if !n.IsInt64() || !c.IsInt64() || n.Sign() < 0 || c.Cmp(n) < 0 || c.Int64() > 1<<20 {
			return nil, &PanicError{What: "makeslice: len out of range"}
		}
		arr := make([]any, c.Int64())
		elem := in.Type().Underlying().(*types.Slice).Elem()
		for i := range arr {
			arr[i] = zero(elem)
		}
		return slice{arr: arr, len: int(n.Int64()), cap: int(c.Int64())}, nil
	case *ssa.Extract:
		x, err := ev.value(fr, in.Tuple)
		if err != nil {
			return nil, err
		}
		t, ok := x.(tuple)
		if !ok {
			return nil, skipf("extract from %T", x)
		}
		return t[in.Index], nil
	case *ssa.MakeClosure:
		bs, err := ev.operands(fr, in.Bindings...)
		if err != nil {
			return nil, err
		}
		return &closure{fn: in.Fn.(*ssa.Function), env: bs}, nil
	case *ssa.Call:
		v, err := ev.callInstr(fr, in.Common(), depth)
		if err == nil && lgammaSignLost(in, v) {
			return nil, skipf("math.Lgamma sign dropped where Γ < 0")
		}
		return v, err
	}
	return nil, skipf("instruction %T", instr)
}

// elements returns the addressable elements behind a pointer to an
// array or a slice.
func elements(x any) ([]any, error) {
	switch x := x.(type) {
	case *any:
		if a, ok := (*x).(array); ok {
			return a, nil
		}
		return nil, skipf("index through a pointer to %T", *x)
	case slice:
		return x.arr[x.off : x.off+x.len], nil
	case nil:
		return nil, &PanicError{What: "index of nil"}
	}
	return nil, skipf("index of %T", x)
}

func index(i any, n int) (int, error) {
	b, ok := i.(*big.Int)
	if !ok {
		return 0, skipf("index %T", i)
	}
	if !b.IsInt64() || b.Sign() < 0 || b.Int64() >= int64(n) {
		return 0, &PanicError{What: fmt.Sprintf("index %s out of range [0:%d]", b, n)}
	}
	return int(b.Int64()), nil
}

func (ev *Evaluator) slice(fr *frame, in *ssa.Slice) (any, error) {
	x, err := ev.value(fr, in.X)
	if err != nil {
		return nil, err
	}
	var s slice
	switch x := x.(type) {
	case *any:
		a, ok := (*x).(array)
		if !ok {
			return nil, skipf("slice of %T", *x)
		}
		s = slice{arr: a, len: len(a), cap: len(a)}
	case slice:
		s = x
	case nil:
		s = slice{}
	default:
		return nil, skipf("slice of %T", x)
	}
	lo, hi, max := 0, s.len, s.cap
	for i, v := range []ssa.Value{in.Low, in.High, in.Max} {
		if v == nil {
			continue
		}
		b, err := ev.value(fr, v)
		if err != nil {
			return nil, err
		}
		n, ok := b.(*big.Int)
		if !ok || !n.IsInt64() {
			return nil, skipf("slice bound %T", b)
		}
		switch i {
		case 0:
			lo = int(n.Int64())
		case 1:
			hi = int(n.Int64())
		case 2:
			max = int(n.Int64())
		}
	}
	if lo < 0 || hi < lo || max < hi || max > s.cap {
		return nil, &PanicError{What: "slice bounds out of range"}
	}
	return slice{arr: s.arr, off: s.off + lo, len: hi - lo, cap: max - lo}, nil
}

// lgammaSignLost reports whether call is math.Lgamma of an argument
// where Γ < 0 whose sign result the code never reads. The code then
// computes with |Γ|, and whether it means |Γ| or Γ is not in the code:
// no value of it is the reference there.
func lgammaSignLost(call *ssa.Call, v any) bool {
	fn := call.Common().StaticCallee()
	if fn == nil || fn.Pkg == nil || fn.Pkg.Pkg.Path() != "math" || fn.Name() != "Lgamma" {
		return false
	}
	t, ok := v.(tuple)
	if !ok || len(t) != 2 {
		return false
	}
	if sign, ok := t[1].(*big.Int); !ok || sign.Sign() >= 0 {
		return false
	}
	for _, r := range *call.Referrers() {
		if ex, ok := r.(*ssa.Extract); ok && ex.Index == 1 && len(*ex.Referrers()) > 0 {
			return false
		}
	}
	return true
}

func (ev *Evaluator) callInstr(fr *frame, c *ssa.CallCommon, depth int) (any, error) {
	if c.IsInvoke() {
		return nil, skipf("dynamic method call %s", c.Method.Name())
	}
	args, err := ev.operands(fr, c.Args...)
	if err != nil {
		return nil, err
	}
	if b, ok := c.Value.(*ssa.Builtin); ok {
		return builtin(b.Name(), args, c)
	}
	f, err := ev.value(fr, c.Value)
	if err != nil {
		return nil, err
	}
	cl, ok := f.(*closure)
	if !ok {
		if f == nil {
			return nil, &PanicError{What: "call of nil function"}
		}
		return nil, skipf("call of %T", f)
	}
	fn := cl.fn.(*ssa.Function)
	if fn.Pkg != nil && fn.Pkg.Pkg.Path() == "math" && fn.Signature.Recv() == nil && fn.Parent() == nil {
		// math's functions are evaluated to Prec bits, not interpreted:
		// their Go bodies compute float64 approximations.
		if fn.Name() == "init" {
			return nil, nil
		}
		return mathCall(fn.Name(), args)
	}
	if fn.Pkg != nil && fn.Blocks == nil {
		if fn.Name() == "init" {
			return nil, nil
		}
		switch path := fn.Pkg.Pkg.Path(); path {
		case "fmt", "errors", "strconv":
			if fn.Signature.Results().Len() > 1 {
				rs := make(tuple, fn.Signature.Results().Len())
				for i := range rs {
					rs[i] = opaque{}
				}
				return rs, nil
			}
			return opaque{}, nil
		}
	}
	return ev.call(fn, args, cl.env, depth+1)
}

func builtin(name string, args []any, c *ssa.CallCommon) (any, error) {
	switch name {
	case "len", "cap":
		switch x := args[0].(type) {
		case slice:
			if name == "len" {
				return big.NewInt(int64(x.len)), nil
			}
			return big.NewInt(int64(x.cap)), nil
		case array:
			return big.NewInt(int64(len(x))), nil
		case *any:
			if a, ok := (*x).(array); ok {
				return big.NewInt(int64(len(a))), nil
			}
		case string:
			return big.NewInt(int64(len(x))), nil
		case nil:
			return new(big.Int), nil
		}
		return nil, skipf("%s of %T", name, args[0])
	case "append":
		s, _ := args[0].(slice)
		var add []any
		switch x := args[1].(type) {
		case slice:
			add = x.arr[x.off : x.off+x.len]
		case nil:
		default:
			return nil, skipf("append of %T", x)
		}
		if s.len+len(add) <= s.cap {
			for i, v := range add {
				s.arr[s.off+s.len+i] = clone(v)
			}
			s.len += len(add)
			return s, nil
		}
		arr := make([]any, s.len+len(add), 2*(s.len+len(add))+1)
		copy(arr, s.arr[s.off:s.off+s.len])
		for i, v := range add {
			arr[s.len+i] = clone(v)
		}
		arr = arr[:cap(arr)]
		return slice{arr: arr, len: s.len + len(add), cap: len(arr)}, nil
	case "min", "max":
		best := args[0]
		for _, a := range args[1:] {
			less, err := binop(token.LSS, c.Args[0].Type(), a, best)
			if err != nil {
				return nil, err
			}
			if less.(bool) == (name == "min") {
				best = a
			}
		}
		return best, nil
	case "ssa:wrapnilchk":
		if args[0] == nil {
			return nil, &PanicError{What: "nil pointer method call"}
		}
		return args[0], nil
	case "print", "println":
		return nil, nil
	}
	return nil, skipf("builtin %s", name)
}

var errDivZero = errors.New("integer divide by zero")

func binop(op token.Token, t types.Type, x, y any) (any, error) {
	switch x := x.(type) {
	case *big.Int:
		y, ok := y.(*big.Int)
		if !ok {
			return nil, skipf("%s of an integer and %T", op, y)
		}
		return intBinop(op, t, x, y)
	case *big.Float:
		if _, ok := y.(NaN); ok {
			return nanBinop(op), nil
		}
		y, ok := y.(*big.Float)
		if !ok {
			return nil, skipf("%s of a float and %T", op, y)
		}
		return floatBinop(op, x, y)
	case NaN:
		return nanBinop(op), nil
	case bool:
		if y, ok := y.(bool); ok {
			if r, ok := equality(op, x, y); ok {
				return r, nil
			}
		}
	case string:
		if y, ok := y.(string); ok {
			if op == token.ADD {
				return x + y, nil
			}
			if r, ok := equality(op, x, y); ok {
				return r, nil
			}
		}
	}
	// nil against something: an error compared with nil.
	if op == token.EQL || op == token.NEQ {
		xn, yn := x == nil, y == nil
		if xn || yn {
			return (xn == yn) == (op == token.EQL), nil
		}
	}
	return nil, skipf("%s of %T and %T", op, x, y)
}

func equality[T comparable](op token.Token, x, y T) (bool, bool) {
	switch op {
	case token.EQL:
		return x == y, true
	case token.NEQ:
		return x != y, true
	}
	return false, false
}

func intBinop(op token.Token, t types.Type, x, y *big.Int) (any, error) {
	z := new(big.Int)
	switch op {
	case token.ADD:
		return z.Add(x, y), nil
	case token.SUB:
		return z.Sub(x, y), nil
	case token.MUL:
		return z.Mul(x, y), nil
	case token.QUO:
		if y.Sign() == 0 {
			return nil, &PanicError{What: errDivZero.Error()}
		}
		return z.Quo(x, y), nil
	case token.REM:
		if y.Sign() == 0 {
			return nil, &PanicError{What: errDivZero.Error()}
		}
		return z.Rem(x, y), nil
	case token.AND:
		return z.And(x, y), nil
	case token.OR:
		return z.Or(x, y), nil
	case token.XOR:
		return z.Xor(x, y), nil
	case token.AND_NOT:
		return z.AndNot(x, y), nil
	case token.SHL, token.SHR:
		if y.Sign() < 0 {
			return nil, &PanicError{What: "negative shift amount"}
		}
		if !y.IsInt64() || y.Int64() > 1<<16 {
			return nil, skipf("shift by %s", y)
		}
		if op == token.SHL {
			return z.Lsh(x, uint(y.Int64())), nil
		}
		return z.Rsh(x, uint(y.Int64())), nil
	case token.EQL:
		return x.Cmp(y) == 0, nil
	case token.NEQ:
		return x.Cmp(y) != 0, nil
	case token.LSS:
		return x.Cmp(y) < 0, nil
	case token.LEQ:
		return x.Cmp(y) <= 0, nil
	case token.GTR:
		return x.Cmp(y) > 0, nil
	case token.GEQ:
		return x.Cmp(y) >= 0, nil
	}
	return nil, skipf("integer %s", op)
}

// closeRel is how near two different floats may be before a comparison
// of them is refused: float64 rounding in the real program could order
// them either way.
var closeRel = new(big.Float).SetMantExp(big.NewFloat(1), -40)

// nanBinop is op with a NaN operand, as IEEE 754 has it: arithmetic
// gives NaN, every comparison but != is false.
func nanBinop(op token.Token) any {
	switch op {
	case token.EQL, token.LSS, token.LEQ, token.GTR, token.GEQ:
		return false
	case token.NEQ:
		return true
	}
	return NaN{}
}

func floatBinop(op token.Token, x, y *big.Float) (r any, err error) {
	z := new(big.Float).SetPrec(Prec)
	// ∞−∞, 0·∞ and ∞/∞ have no value in exact arithmetic either (an
	// infinity here is a true division by zero or math.Inf): NaN, as
	// IEEE 754 gives.
	defer func() {
		if e := recover(); e != nil {
			if _, ok := e.(big.ErrNaN); !ok {
				panic(e)
			}
			r, err = NaN{}, nil
		}
	}()
	switch op {
	case token.ADD:
		return z.Add(x, y), nil
	case token.SUB:
		return z.Sub(x, y), nil
	case token.MUL:
		return z.Mul(x, y), nil
	case token.QUO:
		if y.Sign() == 0 {
			if x.Sign() == 0 {
				return NaN{}, nil
			}
			return z.SetInf(x.Sign() < 0), nil
		}
		return z.Quo(x, y), nil
	}
	c := x.Cmp(y)
	if c != 0 && !x.IsInf() && !y.IsInf() {
		d := new(big.Float).Sub(x, y)
		d.Abs(d)
		m := new(big.Float).Abs(x)
		if ay := new(big.Float).Abs(y); ay.Cmp(m) > 0 {
			m = ay
		}
		if d.Cmp(m.Mul(m, closeRel)) <= 0 {
			return nil, skipf("float comparison of %s and %s, closer than rounding", x.Text('g', 20), y.Text('g', 20))
		}
	}
	switch op {
	case token.EQL:
		return c == 0, nil
	case token.NEQ:
		return c != 0, nil
	case token.LSS:
		return c < 0, nil
	case token.LEQ:
		return c <= 0, nil
	case token.GTR:
		return c > 0, nil
	case token.GEQ:
		return c >= 0, nil
	}
	return nil, skipf("float %s", op)
}

func unop(in *ssa.UnOp, x any) (any, error) {
	switch in.Op {
	case token.SUB:
		switch x := x.(type) {
		case NaN:
			return x, nil
		case *big.Int:
			return new(big.Int).Neg(x), nil
		case *big.Float:
			return new(big.Float).SetPrec(Prec).Neg(x), nil
		}
	case token.NOT:
		if b, ok := x.(bool); ok {
			return !b, nil
		}
	case token.XOR:
		if i, ok := x.(*big.Int); ok {
			if isUnsigned(in.X.Type()) {
				size := 64
				if b, ok := in.X.Type().Underlying().(*types.Basic); ok {
					switch b.Kind() {
					case types.Uint8:
						size = 8
					case types.Uint16:
						size = 16
					case types.Uint32:
						size = 32
					}
				}
				m := new(big.Int).Lsh(big.NewInt(1), uint(size))
				m.Sub(m, big.NewInt(1))
				return m.Xor(m, i), nil
			}
			return new(big.Int).Not(i), nil
		}
	case token.MUL:
		p, ok := x.(*any)
		if !ok {
			return nil, &PanicError{What: "nil pointer dereference"}
		}
		return clone(*p), nil
	}
	return nil, skipf("unary %s of %T", in.Op, x)
}

// nearInt is how near an integer a float may be, without being one,
// before its conversion to an integer is refused: the real program's
// rounding could land on either side.
var nearInt = new(big.Float).SetMantExp(big.NewFloat(1), -30)

// snapInt is how near an integer a float is taken to be that integer:
// the evaluator's own rounding at Prec bits.
var snapInt = new(big.Float).SetMantExp(big.NewFloat(1), -(Prec - 40))

func convert(x any, from, to types.Type) (any, error) {
	switch {
	case isInteger(to):
		switch x := x.(type) {
		case *big.Int:
			return x, nil
		case *big.Float:
			if x.IsInf() {
				return nil, skipf("conversion of %s to an integer", x.Text('g', 5))
			}
			i, _ := x.Int(nil) // truncates
			if x.IsInt() {
				return i, nil
			}
			fi := new(big.Float).SetPrec(Prec).SetInt(i)
			frac := new(big.Float).Sub(x, fi)
			frac.Abs(frac)
			scale := new(big.Float).Abs(x)
			if scale.Cmp(big.NewFloat(1)) < 0 {
				scale = big.NewFloat(1)
			}
			for _, dir := range []int64{1, -1} {
				// distance to the next integer away from the truncation
				next := new(big.Float).SetPrec(Prec).SetInt(new(big.Int).Add(i, big.NewInt(dir)))
				d := new(big.Float).Sub(x, next)
				d.Abs(d)
				if d.Cmp(new(big.Float).Mul(scale, snapInt)) <= 0 {
					return new(big.Int).Add(i, big.NewInt(dir)), nil
				}
				if d.Cmp(new(big.Float).Mul(scale, nearInt)) <= 0 {
					return nil, skipf("conversion of %s to an integer, too near %s", x.Text('g', 30), next.Text('g', 20))
				}
			}
			return i, nil
		}
	case isFloat(to):
		switch x := x.(type) {
		case *big.Int:
			return new(big.Float).SetPrec(Prec).SetInt(x), nil
		case *big.Float, NaN:
			return x, nil
		}
	}
	return nil, skipf("conversion of %T from %s to %s", x, from, to)
}
