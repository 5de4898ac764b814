package ranges

import (
	"math/rand"
	"testing"
)

// TestFactsModel drives the persistent map with random operations and
// compares it with a plain Go map after each step; join and widen are
// checked key by key against their definitions.
func TestFactsModel(t *testing.T) {
	rng := rand.New(rand.NewSource(5))
	randIv := func() Interval {
		a := rng.Int63n(40) - 20
		return Span(a, a+rng.Int63n(10))
	}
	var versions []*facts
	var models []map[int32]Interval
	var cur *facts
	model := map[int32]Interval{}
	for step := 0; step < 4000; step++ {
		k := int32(rng.Intn(60))
		switch rng.Intn(3) {
		case 0, 1:
			v := randIv()
			cur = cur.set(k, v)
			model[k] = v
		case 2:
			cur = cur.del(k)
			delete(model, k)
		}
		if step%50 == 0 {
			versions = append(versions, cur)
			copyM := make(map[int32]Interval, len(model))
			for k, v := range model {
				copyM[k] = v
			}
			models = append(models, copyM)
		}
		for k := int32(0); k < 60; k++ {
			got, ok := cur.get(k)
			want, wok := model[k]
			if ok != wok || got != want {
				t.Fatalf("step %d key %d: got %v,%v want %v,%v", step, k, got, ok, want, wok)
			}
		}
	}
	// Old versions are untouched by later updates.
	for i, v := range versions {
		for k := int32(0); k < 60; k++ {
			got, ok := v.get(k)
			want, wok := models[i][k]
			if ok != wok || got != want {
				t.Fatalf("version %d key %d changed", i, k)
			}
		}
	}
	for i := range versions {
		for j := range versions {
			a, b := versions[i], versions[j]
			checkCombine(t, a, b, models[i], models[j], Interval.Join)
			checkCombine(t, a, b, models[i], models[j], widen)
			if equal(a, b) != sameMap(models[i], models[j]) {
				t.Fatalf("equal(%d, %d) wrong", i, j)
			}
		}
	}
}

func checkCombine(t *testing.T, a, b *facts, ma, mb map[int32]Interval, f func(x, y Interval) Interval) {
	t.Helper()
	c := combine(a, b, f)
	for k := int32(0); k < 60; k++ {
		x, xok := ma[k]
		y, yok := mb[k]
		got, ok := c.get(k)
		want := Top()
		if xok && yok {
			want = f(x, y)
		}
		if want.IsTop() {
			if ok {
				t.Fatalf("key %d kept as %v, want dropped", k, got)
			}
			continue
		}
		if !ok || got != want {
			t.Fatalf("key %d: got %v, want %v", k, got, want)
		}
	}
}

func sameMap(a, b map[int32]Interval) bool {
	if len(a) != len(b) {
		return false
	}
	for k, v := range a {
		if w, ok := b[k]; !ok || w != v {
			return false
		}
	}
	return true
}
