package assess

import (
	"bytes"
	"encoding/json"
	"strings"
	"testing"
	"time"
)

func samplesProject(t *testing.T) *Project {
	rows := synthYear(24*90, 7, 1.5)
	proj := wallProject + "\n[[element.variant]]\nid = \"half\"\nwall_factor = 0.25\n\n[[scenario]]\nid = \"warm\"\ntemp_shift_c = 2\n"
	return testProject(t, proj, map[string]string{"c.csv": csvRecord(testStart, rows)})
}

// TestSamplesReproducible: the same seed gives the same JSON, byte for
// byte apart from the run date (which Options.Now fixes here).
func TestSamplesReproducible(t *testing.T) {
	enc := func(seed uint64) []byte {
		out := runOne(t, samplesProject(t), Options{Samples: 64, Seed: seed, SeedGiven: true, Now: time.Date(2026, 3, 1, 0, 0, 0, 0, time.UTC)})
		b, err := json.Marshal(out)
		if err != nil {
			t.Fatal(err)
		}
		return b
	}
	a, b := enc(11), enc(11)
	if !bytes.Equal(a, b) {
		t.Error("two runs with seed 11 differ")
	}
	if c := enc(12); bytes.Equal(a, c) {
		t.Error("seeds 11 and 12 give the same output")
	}
}

// TestBandsOrdered: p10 ≤ p50 ≤ p90 for every result, and the ranking
// covers every sampled input.
func TestBandsOrdered(t *testing.T) {
	out := runOne(t, samplesProject(t), Options{Samples: 100, Seed: 3, SeedGiven: true})
	for _, e := range out.Elements {
		l := e.Leaching
		if l.RecessionMMPerYearP10 == nil || l.YearsToLimitP90 == nil {
			t.Fatalf("%s/%s/%s: bands missing", e.ID, e.Variant, e.Scenario)
		}
		if !(*l.RecessionMMPerYearP10 <= *l.RecessionMMPerYearP50 && *l.RecessionMMPerYearP50 <= *l.RecessionMMPerYearP90) {
			t.Errorf("%s: recession bands out of order %g %g %g", e.ID, *l.RecessionMMPerYearP10, *l.RecessionMMPerYearP50, *l.RecessionMMPerYearP90)
		}
		if !(*l.YearsToLimitP10 <= *l.YearsToLimitP50 && *l.YearsToLimitP50 <= *l.YearsToLimitP90) {
			t.Errorf("%s: years bands out of order", e.ID)
		}
		if len(l.Sensitivity) != int(numMC) {
			t.Errorf("%s: %d inputs ranked, want %d", e.ID, len(l.Sensitivity), numMC)
		}
	}
}

// TestDeterministicInsideSymmetricBand: with every sampled input
// symmetric about its default, the deterministic recession lies inside
// the p10–p90 band.
func TestDeterministicInsideSymmetricBand(t *testing.T) {
	saved := rateRange
	rateRange = [2]float64{1.0 / 3, 3}
	defer func() { rateRange = saved }()
	out := runOne(t, samplesProject(t), Options{Samples: 200, Seed: 5, SeedGiven: true})
	for _, e := range out.Elements {
		l := e.Leaching
		if d := l.RecessionMMPerYear; d < *l.RecessionMMPerYearP10 || d > *l.RecessionMMPerYearP90 {
			t.Errorf("%s/%s/%s: deterministic %.5f outside [%.5f, %.5f]", e.ID, e.Variant, e.Scenario, d, *l.RecessionMMPerYearP10, *l.RecessionMMPerYearP90)
		}
	}
}

// TestVariantWallFactorInProportion: a variant that halves the wall factor
// halves the water deposited on a vertical wall (ISO 15927-3 clause 5:
// I_WA is proportional to W).
func TestVariantWallFactorInProportion(t *testing.T) {
	out := runOne(t, samplesProject(t), Options{})
	base := find(t, out, "wall", "base", "present").Water.DepositedLM2PerYear
	half := find(t, out, "wall", "half", "present").Water.DepositedLM2PerYear
	if !within(half/base, 0.5, 1e-12) {
		t.Errorf("water ratio %.15f, want 0.5", half/base)
	}
}

func TestScenarioAndVariantShape(t *testing.T) {
	out := runOne(t, samplesProject(t), Options{})
	var keys []string
	for _, e := range out.Elements {
		keys = append(keys, e.ID+"/"+e.Variant+"/"+e.Scenario)
	}
	want := "wall/base/present wall/half/present wall/base/warm wall/half/warm"
	if got := strings.Join(keys, " "); got != want {
		t.Errorf("results %q, want %q", got, want)
	}
}

// TestNullSampleMatchesDeterministic: a sample whose every input sits at
// its default reproduces the deterministic recession through the Monte
// Carlo plan (saturated hours summed once, the rest through the film
// table), to within the table's interpolation error; with a repellent
// finish both the finished and the bare rates agree.
func TestNullSampleMatchesDeterministic(t *testing.T) {
	rows := synthYear(24*120, 7, 1.5)
	proj := wallProject + "runoff_height_m = 3\n\n[[element.variant]]\nid = \"finish\"\nrepellent_fraction = 0.6\n\n[[element.variant]]\nid = \"top\"\ntilt_deg = 20\n"
	p := testProject(t, proj, map[string]string{"c.csv": csvRecord(testStart, rows)})
	sh, chem := outdoorHours(t, p)
	null := [numMC]float64{mcSolubility: 1, mcRateConst: 1, mcFilmThick: 1, mcContact: 1, mcWallFactor: 1, mcDensity: 1, mcAbsorptance: 0}
	for _, v := range []*ElementSpec{nil, &p.Elements[0].Variants[0], &p.Elements[0].Variants[1]} {
		e, err := resolve(&p.Elements[0], v)
		if err != nil {
			t.Fatal(err)
		}
		r, err := assessElement(e, sh, nil, chem, true)
		if err != nil {
			t.Fatal(err)
		}
		res := r.result("present")
		got, bare := r.sampleRecession(r.plan(), &null)
		want := res.Leaching.RecessionMMPerYear
		if !within(got, want, 2e-3*want) {
			t.Errorf("%s: null sample %.6f mm/yr, deterministic %.6f", e.variant, got, want)
		}
		if wantBare := r.bareRecession(want); !within(bare, wantBare, 5e-3*wantBare) {
			t.Errorf("%s: null sample bare %.6f mm/yr, deterministic %.6f", e.variant, bare, wantBare)
		}
	}
}
