package analyzer

import (
	"bytes"
	"encoding/gob"
	"testing"
)

// TestFactRoundTrip encodes a fact with encoding/gob, as the unitchecker
// driver of go vet -vettool does between packages, and decodes it.
func TestFactRoundTrip(t *testing.T) {
	for _, f := range []FactorialFact{
		{Kind: "factorial", Param: 0, Param2: -1, FirstBad: 21},
		{Kind: "binomial", Param: 1, Param2: 2, Safe: true, Lo: -1 << 63, Hi: 20, FirstBad: 62},
		{Kind: "rising-factorial", Param: 1, Param2: 0, Offset: -1, FirstBad: 171},
	} {
		var buf bytes.Buffer
		if err := gob.NewEncoder(&buf).Encode(&f); err != nil {
			t.Fatal(err)
		}
		var got FactorialFact
		if err := gob.NewDecoder(&buf).Decode(&got); err != nil {
			t.Fatal(err)
		}
		if got != f {
			t.Errorf("round trip of %+v gave %+v", f, got)
		}
	}
}
