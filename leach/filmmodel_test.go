package leach

import (
	"math"
	"testing"
)

// TestFilmModelMatchesFilmSaturation: the tabulated evaluator answers as
// the reference closed form (itself checked against an RK4 integration in
// film_test.go) to within 10⁻⁶ in saturation, over films from 10 µm to
// 3 mm, contact times from 10 ms to an hour, 0–60 °C, and rate constants
// from the Colombani 2008 to the Jeschke et al. 2001 value.
func TestFilmModelMatchesFilmSaturation(t *testing.T) {
	sol, err := NewSolubilityTable(0, 100, 0.1, 0)
	if err != nil {
		t.Fatal(err)
	}
	for _, kf := range []float64{1, 0.1, 1.0 / 30} {
		law := Jeschke2001(sol)
		law.K1MolPerM2S *= kf
		m, err := NewFilmModel(Jeschke2001(sol), 0, 100, 0.1)
		if err != nil {
			t.Fatal(err)
		}
		m = m.WithRateFactor(kf)
		for _, tc := range []float64{0.5, 7.3, 15, 25.05, 40, 59.9} {
			for _, h := range []float64{1e-5, 5e-5, 2e-4, 1e-3, 3e-3} {
				for _, ts := range []float64{0.01, 0.3, 3, 30, 300, 3600} {
					want := FilmSaturation(law, tc, h, ts)
					got := m.Saturation(tc, h, ts)
					if math.Abs(got-want) > 1e-6 {
						t.Errorf("k×%.3g θ=%g h=%g t=%g: model %.9f, FilmSaturation %.9f", kf, tc, h, ts, got, want)
					}
				}
			}
		}
	}
}

func TestFilmModelFilmMatchesFallingFilm(t *testing.T) {
	sol, _ := NewSolubilityTable(0, 100, 0.1, 0)
	m, err := NewFilmModel(Jeschke2001(sol), 0, 100, 0.1)
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []float64{1, 12.34, 30, 75} {
		for _, q := range []float64{1e-8, 1e-6, 1e-4} {
			for _, s := range []float64{2, 30, 90} {
				d0, v0 := FallingFilm(q, s, tc)
				d, v := m.Film(q, s, tc)
				if math.Abs(d/d0-1) > 1e-5 || math.Abs(v/v0-1) > 1e-5 {
					t.Errorf("θ=%g q=%g slope=%g: (%g, %g), FallingFilm (%g, %g)", tc, q, s, d, v, d0, v0)
				}
			}
		}
	}
}

var sinkFilm float64

// BenchmarkFilm compares the tabulated evaluator with FilmSaturation on a
// spread of wet-hour films.
func BenchmarkFilm(b *testing.B) {
	sol, _ := NewSolubilityTable(0, 100, 0.1, 0)
	law := Jeschke2001(sol)
	m, _ := NewFilmModel(law, 0, 100, 0.1)
	hs := []float64{2e-5, 5e-5, 1e-4, 3e-4}
	ts := []float64{5, 60, 300, 3600}
	b.Run("FilmSaturation", func(b *testing.B) {
		for i := 0; b.Loop(); i++ {
			sinkFilm = FilmSaturation(law, 12, hs[i%4], ts[(i/4)%4])
		}
	})
	b.Run("FilmModel", func(b *testing.B) {
		for i := 0; b.Loop(); i++ {
			sinkFilm = m.Saturation(12, hs[i%4], ts[(i/4)%4])
		}
	})
}

// TestFilmTableMatchesFilmModel bounds the table's interpolation error
// against the closed forms on films and contact times of every kind the
// engine meets (the grid of TestFilmModelMatchesFilmSaturation and
// off-node points between them).
func TestFilmTableMatchesFilmModel(t *testing.T) {
	sol, _ := NewSolubilityTable(0, 100, 0.1, 0)
	base, err := NewFilmModel(Jeschke2001(sol), 0, 100, 0.1)
	if err != nil {
		t.Fatal(err)
	}
	tab := base.Table()
	worst := 0.0
	for _, kf := range []float64{1, 0.3, 0.1, 1.0 / 30} {
		m := base.WithRateFactor(kf)
		for _, tc := range []float64{0.5, 7.3, 15, 25.05, 40, 59.9} {
			for h := 7e-6; h < 4e-3; h *= 1.37 {
				for ts := 0.013; ts < 4000; ts *= 1.9 {
					want := m.Saturation(tc, h, ts)
					got := tab.Saturation(m.Groups(tc, h, ts))
					if d := math.Abs(got - want); d > worst {
						worst = d
					}
					if math.Abs(got-want) > 1e-3 {
						t.Errorf("k×%.3g θ=%g h=%.3g t=%.3g: table %.6f, closed form %.6f", kf, tc, h, ts, got, want)
					}
				}
			}
		}
	}
	t.Logf("largest table error in saturation: %.2g", worst)
}

func BenchmarkFilmTable(b *testing.B) {
	sol, _ := NewSolubilityTable(0, 100, 0.1, 0)
	m, _ := NewFilmModel(Jeschke2001(sol), 0, 100, 0.1)
	tab := m.Table()
	hs := []float64{2e-5, 5e-5, 1e-4, 3e-4}
	ts := []float64{5, 60, 300, 3600}
	for i := 0; b.Loop(); i++ {
		sinkFilm = tab.Saturation(m.Groups(12, hs[i%4], ts[(i/4)%4]))
	}
}

func TestFilmTableLogForm(t *testing.T) {
	sol, _ := NewSolubilityTable(0, 100, 0.1, 0)
	m, _ := NewFilmModel(Jeschke2001(sol), 0, 100, 0.1)
	tab := m.Table()
	for _, tc := range []float64{3, 20, 45} {
		lk, lc, ld := m.LnProperties(tc)
		for _, h := range []float64{3e-5, 4e-4} {
			for _, ts := range []float64{2, 200} {
				tau, da := m.Groups(tc, h, ts)
				lt := lk + math.Log(ts) - math.Log(h) - lc
				lda := lk + math.Log(h) - math.Ln2 - math.Log(1.5) - ld - lc
				if got, want := tab.SaturationLn(lt, lda), tab.Saturation(tau, da); math.Abs(got-want) > 1e-12 {
					t.Errorf("θ=%g h=%g t=%g: log form %.15f, direct %.15f", tc, h, ts, got, want)
				}
			}
		}
	}
}
