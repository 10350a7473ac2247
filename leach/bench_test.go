package leach

import (
	"math"
	"testing"
)

var sink float64

// BenchmarkBaselineExp is the yardstick: one math.Exp per call.
func BenchmarkBaselineExp(b *testing.B) {
	x := 0.0
	for i := 0; i < b.N; i++ {
		x += math.Exp(-float64(i&1023) * 1e-3)
	}
	sink = x
}

func BenchmarkSolubilityTableAt(b *testing.B) {
	for _, size := range []struct {
		name string
		step float64
	}{{"step1C", 1}, {"step0.1C", 0.1}} {
		tab, err := NewSolubilityTable(0, 60, size.step, 0)
		if err != nil {
			b.Fatal(err)
		}
		b.Run(size.name, func(b *testing.B) {
			b.ReportAllocs()
			x := 0.0
			for i := 0; i < b.N; i++ {
				x += tab.At(float64(i%600) * 0.1)
			}
			sink = x
		})
	}
}

func BenchmarkFilmSaturation(b *testing.B) {
	tab, err := NewSolubilityTable(0, 60, 1, 0)
	if err != nil {
		b.Fatal(err)
	}
	law := Jeschke2001(tab)
	for _, c := range []struct {
		name  string
		h, ts float64
	}{
		{"linear/1mm-10s", 1e-3, 10},   // closed-form branch
		{"tail/0.1mm-1h", 1e-4, 3600},  // Newton on the near-equilibrium branch
		{"tail/1mm-1day", 1e-3, 86400}, // transport-limited start
	} {
		b.Run(c.name, func(b *testing.B) {
			b.ReportAllocs()
			x := 0.0
			for i := 0; i < b.N; i++ {
				x += FilmSaturation(law, 15+float64(i&15), c.h, c.ts)
			}
			sink = x
		})
	}
}

func BenchmarkSolubility(b *testing.B) {
	for i := 0; i < b.N; i++ {
		s, _ := Solubility(Gypsum, 25, 0)
		sink += s.GPerL
	}
}
