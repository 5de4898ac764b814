package fixes

import "testing"

// TestShapeRows checks the fixer's table against the helper module's
// declared API (helperAPI, itself checked against the module by
// TestHelperAPIMatchesModule): every helper a row names exists, a row
// that checks its expression says how many operands it takes, and every
// shape the analyzer may hand over but a bare math.Gamma has a row.
func TestShapeRows(t *testing.T) {
	for s, row := range shapes {
		if row.name == "" || row.build == nil {
			t.Errorf("shape %d: row lacks its name or its build function", s)
		}
		for _, h := range []string{row.helpers.float, row.helpers.signed, row.helpers.unsigned} {
			if h != "" && helperFunc(h) == nil {
				t.Errorf("shape %s: helper %s is not in the helper API", row.name, h)
			}
		}
		if row.factors != nil && row.operands == 0 {
			t.Errorf("shape %s: checked, but takes no operands", row.name)
		}
	}
	for s := ShapeNone + 1; s <= ShapeModelBinomLoop; s++ {
		if _, ok := shapes[s]; !ok && s != ShapeGamma {
			t.Errorf("shape %d has no row", s)
		}
	}
}
