package exacteval

import (
	"math/big"
)

// mathCall evaluates a call of package math's function name.
func mathCall(name string, args []any) (any, error) {
	fs := make([]*big.Float, 0, len(args))
	for i, a := range args {
		switch a := a.(type) {
		case NaN:
			return nanMath(name, args, i)
		case *big.Float:
			fs = append(fs, a)
		case *big.Int: // math.Inf's sign
			fs = append(fs, new(big.Float).SetPrec(Prec).SetInt(a))
		default:
			return nil, skipf("math.%s of %T", name, a)
		}
	}
	one := func(f func(*big.Float) (*big.Float, error)) (any, error) {
		r, err := f(fs[0])
		if err == errNaN {
			return NaN{}, nil
		}
		return r, err
	}
	switch name {
	case "Exp":
		return Exp(fs[0]), nil
	case "Expm1":
		return Expm1(fs[0]), nil
	case "Log":
		return one(Log)
	case "Log1p":
		return one(Log1p)
	case "Log2", "Log10":
		l, err := Log(fs[0])
		if err != nil {
			return NaN{}, nil
		}
		base := big.NewFloat(2)
		if name == "Log10" {
			base = big.NewFloat(10)
		}
		lb, _ := Log(base)
		return round(newFloat().Quo(l, lb)), nil
	case "Pow":
		r, err := Pow(fs[0], fs[1])
		if err == errNaN {
			return NaN{}, nil
		}
		return r, err
	case "Sqrt":
		if fs[0].Sign() < 0 {
			return NaN{}, nil
		}
		if fs[0].Sign() == 0 || fs[0].IsInf() {
			return fs[0], nil
		}
		return round(newFloat().Sqrt(newFloat().Set(fs[0]))), nil
	case "Gamma":
		return one(Gamma)
	case "Lgamma":
		l, sign, err := Lgamma(fs[0])
		if err != nil {
			return tuple{NaN{}, big.NewInt(1)}, nil
		}
		return tuple{l, big.NewInt(int64(sign))}, nil
	case "Abs":
		return new(big.Float).SetPrec(Prec).Abs(fs[0]), nil
	case "Max", "Min":
		c := fs[0].Cmp(fs[1])
		if (c >= 0) == (name == "Max") {
			return fs[0], nil
		}
		return fs[1], nil
	case "Inf":
		return new(big.Float).SetPrec(Prec).SetInf(fs[0].Sign() < 0), nil
	case "IsInf":
		sign := args[1].(*big.Int).Sign()
		x := fs[0]
		return x.IsInf() && (sign == 0 || sign > 0 && x.Sign() > 0 || sign < 0 && x.Sign() < 0), nil
	case "IsNaN":
		return false, nil
	case "NaN":
		return NaN{}, nil
	case "Floor", "Ceil", "Trunc", "Round":
		x := fs[0]
		if x.IsInf() || x.IsInt() {
			return x, nil
		}
		i, _ := x.Int(nil) // toward zero
		fi := new(big.Float).SetPrec(Prec).SetInt(i)
		switch name {
		case "Floor":
			if x.Sign() < 0 {
				fi.Sub(fi, big.NewFloat(1))
			}
		case "Ceil":
			if x.Sign() > 0 {
				fi.Add(fi, big.NewFloat(1))
			}
		case "Round": // half away from zero
			frac := new(big.Float).Sub(x, fi)
			frac.Abs(frac)
			if frac.Cmp(big.NewFloat(0.5)) >= 0 {
				if x.Sign() > 0 {
					fi.Add(fi, big.NewFloat(1))
				} else {
					fi.Sub(fi, big.NewFloat(1))
				}
			}
		}
		return fi, nil
	}
	return nil, skipf("math.%s", name)
}

// nanMath is math's function name with args[i] a NaN, by math's special
// cases: Pow(NaN, 0) = Pow(1, NaN) = 1, IsNaN is true, IsInf false, and
// NaN otherwise.
func nanMath(name string, args []any, i int) (any, error) {
	switch name {
	case "IsNaN":
		return true, nil
	case "IsInf":
		return false, nil
	case "Pow":
		if i == 1 {
			if x, ok := args[0].(*big.Float); ok && x.Cmp(big.NewFloat(1)) == 0 {
				return new(big.Float).SetPrec(Prec).SetInt64(1), nil
			}
		} else if y, ok := args[1].(*big.Float); ok && y.Sign() == 0 {
			return new(big.Float).SetPrec(Prec).SetInt64(1), nil
		}
	case "Lgamma":
		return tuple{NaN{}, big.NewInt(1)}, nil
	}
	return NaN{}, nil
}
