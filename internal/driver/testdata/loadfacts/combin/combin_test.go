package combin_test

import (
	"testing"

	"example.com/loadfacts/stats"
)

func TestWays(t *testing.T) {
	if stats.Ways(4) != 24 {
		t.Fatal("4 pallets stack in 24 orders")
	}
}
