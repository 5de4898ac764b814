package fixes_test

// The running binomials of a glyph rasteriser: one ratio per step.
func init() { fixPackages = append(fixPackages, "fixbinompeak") }
