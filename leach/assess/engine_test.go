package assess

import (
	"errors"
	"math"
	"strings"
	"testing"
	"time"
)

// runOne assesses a project and returns its output.
func runOne(t testing.TB, p *Project, opt Options) *Output {
	t.Helper()
	if opt.Now.IsZero() {
		opt.Now = time.Date(2026, 1, 1, 0, 0, 0, 0, time.UTC)
	}
	out, err := Run(p, opt)
	if err != nil {
		t.Fatal(err)
	}
	return out
}

func find(t testing.TB, out *Output, id, variant, scenario string) *ElementResult {
	t.Helper()
	for i := range out.Elements {
		e := &out.Elements[i]
		if e.ID == id && e.Variant == variant && e.Scenario == scenario {
			return e
		}
	}
	t.Fatalf("no result %s/%s/%s", id, variant, scenario)
	return nil
}

const wallProject = `
[site]
name = "test"
latitude_deg = 50
longitude_deg = 0
terrain = "II"
climate = "c.csv"

[[element]]
id = "wall"
material = "gypsum-plaster"
azimuth_deg = 225
tilt_deg = 90
height_m = 10
wall_factor = 0.5
thickness_mm = 10
`

// TestWallIndexByHand checks the water deposited on a wall against the
// ISO 15927-3:2009 wall index worked by hand for a four-hour record.
//
// Clause 3 (hourly airfield index): each hour contributes
// (2/9)·v·r^(8/9)·cos(D − Θ) where the cosine is positive. For a wall
// facing Θ = 225°:
//
//	hour 1: r = 2 mm, v = 5 m/s from 225°: (2/9)·5·2^(8/9)·1      = 2.05750 L/m²
//	hour 2: r = 1 mm, v = 4 m/s from 270°: (2/9)·4·1·cos 45°      = 0.62854 L/m²
//	hour 3: r = 3 mm, v = 6 m/s from 45°: cos 180° < 0             = 0
//	hour 4: no rain                                                = 0
//	airfield sum I_A                                               = 2.68604 L/m²
//
// Clause 5 (wall index): I_W = I_A·C_R·C_T·O·W, with terrain category II
// (K_R = 0.19, z0 = 0.05 m, z_min = 4 m; ISO 15927-3:2009 Table 1, from
// memory) at z = 10 m: C_R = 0.19·ln(10/0.05) = 1.006680; C_T = 1; no
// obstruction, O = 1; W = 0.5 as given:
//
//	I_W = 2.68604 · 1.006680 · 1 · 1 · 0.5 = 1.35199 L/m²
func TestWallIndexByHand(t *testing.T) {
	rows := []hourRow{
		{tempC: 8, rhPct: 95, rainMM: 2, windMS: 5, dirDeg: 225},
		{tempC: 8, rhPct: 95, rainMM: 1, windMS: 4, dirDeg: 270},
		{tempC: 8, rhPct: 95, rainMM: 3, windMS: 6, dirDeg: 45},
		{tempC: 8, rhPct: 90, rainMM: 0, windMS: 3, dirDeg: 225},
	}
	p := testProject(t, wallProject, map[string]string{"c.csv": csvRecord(testStart, rows)})
	out := runOne(t, p, Options{})
	e := find(t, out, "wall", "base", "present")
	years := 4.0 / 8766
	got := e.Water.DepositedLM2PerYear * years
	if want := 1.35199; !within(got, want, 2e-5) {
		t.Errorf("deposited = %.5f L/m², want %.5f (ISO 15927-3 by hand)", got, want)
	}
	if got := e.Inputs.RoughnessCoeff; !within(got, 1.006680, 1e-6) {
		t.Errorf("C_R = %.6f, want 1.006680", got)
	}
}

// TestUpwardSurfaceGetsRainTotal: a horizontal surface facing up gets the
// rain total with no exposure factors (the rule; ISO 15927-3 treats
// only walls).
func TestUpwardSurfaceGetsRainTotal(t *testing.T) {
	rows := synthYear(500, 10, 1.5)
	var rain float64
	for _, r := range rows {
		rain += r.rainMM
	}
	proj := strings.Replace(wallProject, "tilt_deg = 90", "tilt_deg = 0", 1)
	p := testProject(t, proj, map[string]string{"c.csv": csvRecord(testStart, rows)})
	e := find(t, runOne(t, p, Options{}), "wall", "base", "present")
	got := e.Water.DepositedLM2PerYear * 500 / 8766
	if !within(got, rain, 1e-9*rain) {
		t.Errorf("deposited %.6f L/m², want the rain total %.6f", got, rain)
	}
}

// TestMassBalance: the dissolved gypsum never exceeds the water times the
// saturated solubility, hour by hour and in total.
func TestMassBalance(t *testing.T) {
	rows := synthYear(24*120, 7, 2)
	p := testProject(t, wallProject, map[string]string{"c.csv": csvRecord(testStart, rows)})
	e := find(t, runOne(t, p, Options{}), "wall", "base", "present")
	l := e.Leaching
	if !(l.DissolvedGM2PerYear > 0) {
		t.Fatalf("nothing dissolved: %+v", l)
	}
	if l.DissolvedGM2PerYear > l.SaturationBoundGM2PerYear*(1+1e-12) {
		t.Errorf("dissolved %.4f g/m²·a exceeds the saturation bound %.4f", l.DissolvedGM2PerYear, l.SaturationBoundGM2PerYear)
	}
	if f := l.MeanSaturationFraction; !(f > 0 && f <= 1) {
		t.Errorf("mean saturation fraction %g outside (0, 1]", f)
	}
}

// TestMoreRainNeverLessLoss and TestLowerWallFactorNeverMoreWater are
// property tests over a range of rain amounts and wall factors.
func TestMoreRainNeverLessLoss(t *testing.T) {
	prev := -1.0
	for _, mm := range []float64{0.2, 0.5, 1, 2, 4, 8} {
		rows := synthYear(24*60, 9, mm)
		p := testProject(t, wallProject, map[string]string{"c.csv": csvRecord(testStart, rows)})
		e := find(t, runOne(t, p, Options{}), "wall", "base", "present")
		if e.Leaching.DissolvedGM2PerYear < prev {
			t.Errorf("rain %g mm/h: dissolved %.4f < %.4f at less rain", mm, e.Leaching.DissolvedGM2PerYear, prev)
		}
		prev = e.Leaching.DissolvedGM2PerYear
	}
}

func TestLowerWallFactorNeverMoreWater(t *testing.T) {
	rows := synthYear(24*60, 9, 1.5)
	files := map[string]string{"c.csv": csvRecord(testStart, rows)}
	prevWater, prevLoss := math.Inf(1), math.Inf(1)
	for _, w := range []string{"1.0", "0.8", "0.5", "0.3", "0.1"} {
		p := testProject(t, strings.Replace(wallProject, "wall_factor = 0.5", "wall_factor = "+w, 1), files)
		e := find(t, runOne(t, p, Options{}), "wall", "base", "present")
		if e.Water.DepositedLM2PerYear > prevWater || e.Leaching.DissolvedGM2PerYear > prevLoss {
			t.Errorf("wall factor %s: water %.3f, loss %.3f rose above %.3f, %.3f", w,
				e.Water.DepositedLM2PerYear, e.Leaching.DissolvedGM2PerYear, prevWater, prevLoss)
		}
		prevWater, prevLoss = e.Water.DepositedLM2PerYear, e.Leaching.DissolvedGM2PerYear
	}
}

// TestTrapezoidWeightsMatchGonum: the running total (precomputed weights)
// ends where gonum's integrate.Trapezoidal does, on an irregular axis with
// a gap.
func TestTrapezoidWeightsMatchGonum(t *testing.T) {
	x := []float64{0, 3600, 7200, 9000, 12600, 30000, 33600, 37200}
	dt := []float64{3600, 3600, 3600, 1800, 3600, 3600, 3600, 3600}
	segs := [][2]int{{0, 5}, {5, 8}}
	f := []float64{1, 2, 0, 4, 3, 1, 1, 5}
	got, err := integrateRate(x, dt, f, segs)
	if err != nil {
		t.Fatal(err)
	}
	w := trapezoidWeights(x, dt, segs)
	var sum float64
	for i := range f {
		sum += w[i] * f[i]
	}
	if !within(sum, got, 1e-9*got) {
		t.Errorf("Σ w·f = %g, integrate = %g", sum, got)
	}
	// Regular run: the rule equals Σ f·Δt exactly (hand sum for the
	// second run: (1 + 1 + 5)·3600 = 25200).
	if g, _ := integrateRate(x[5:], dt[5:], f[5:], [][2]int{{0, 3}}); !within(g, 25200, 1e-9) {
		t.Errorf("regular run = %g, want 25200", g)
	}
	if _, err := integrateRate([]float64{0, 0}, []float64{1, 1}, []float64{1, 1}, [][2]int{{0, 2}}); err == nil {
		t.Error("repeated abscissa accepted; it must be an error before gonum sees it")
	}
}

// TestDeltaChangeByHand checks the scenario transform on one hour, worked
// by hand: θ = 10 °C, φ = 95 %, r = 2 mm, v = 4 m/s, with Δθ = +2 K,
// Δφ = +8 %, f_r = 1.2, f_v = 0.9 gives θ' = 12 °C, φ' = 100 % (clipped
// from 103, counted), r' = 2.4 mm, v' = 3.6 m/s.
func TestDeltaChangeByHand(t *testing.T) {
	sc := Scenario{ID: "s", TempShiftC: 2, RHShiftPct: 8, RainFactor: 1.2, WindFactor: 0.9}
	in := hourRowRecords{{10, 95, 2, 4}}
	recs := in.records()
	got, clipped := sc.Apply(recs)
	r := got[0]
	if r.TempC != 12 || r.RHPct != 100 || !within(r.RainMM, 2.4, 1e-12) || !within(r.WindMS, 3.6, 1e-12) || clipped != 1 {
		t.Errorf("got θ=%g φ=%g r=%g v=%g clipped=%d; want 12, 100, 2.4, 3.6, 1", r.TempC, r.RHPct, r.RainMM, r.WindMS, clipped)
	}
	if recs[0].TempC != 10 {
		t.Error("Apply changed its input")
	}
}

// TestRainFactorScalesWater: a rain factor of 1.2 scales the deposited
// water on a wall by 1.2^(8/9) (driving rain ∝ r^(8/9), ISO 15927-3 clause 3)
// and on an upward surface by 1.2.
func TestRainFactorScalesWater(t *testing.T) {
	rows := synthYear(24*40, 8, 1)
	proj := wallProject + "\n[[scenario]]\nid = \"wetter\"\nrain_factor = 1.2\n"
	p := testProject(t, proj, map[string]string{"c.csv": csvRecord(testStart, rows)})
	out := runOne(t, p, Options{})
	base := find(t, out, "wall", "base", "present").Water.DepositedLM2PerYear
	wet := find(t, out, "wall", "base", "wetter").Water.DepositedLM2PerYear
	if want := math.Pow(1.2, 8.0/9); !within(wet/base, want, 1e-9) {
		t.Errorf("wall water ratio %.9f, want 1.2^(8/9) = %.9f", wet/base, want)
	}
}

func TestUnknownKeyNamesKeyAndLine(t *testing.T) {
	src := strings.Replace(wallProject, "wall_factor = 0.5", "wall_factr = 0.5", 1)
	_, err := Parse("site.toml", []byte(src))
	var pe *ProjectError
	if !errors.As(err, &pe) || !errors.Is(err, ErrUnknownKey) {
		t.Fatalf("err = %v, want an unknown-key ProjectError", err)
	}
	if pe.Line != 15 || !strings.Contains(err.Error(), "wall_factr") || !strings.Contains(err.Error(), "site.toml:15") {
		t.Errorf("err = %q (line %d), want site.toml:15 naming wall_factr", err, pe.Line)
	}
}

func TestMissingColumnNamesElementAndColumn(t *testing.T) {
	csv := "time,temp_c,rh_pct,wind_ms,wind_dir_deg,solar_wm2\n2021-01-01T01:00:00Z,5,80,3,200,0\n2021-01-01T02:00:00Z,5,80,3,200,0\n"
	p := testProject(t, wallProject, map[string]string{"c.csv": csv})
	_, err := Run(p, Options{})
	if err == nil || !strings.Contains(err.Error(), `"wall"`) || !strings.Contains(err.Error(), "rain_mm") {
		t.Errorf("err = %v, want one naming element \"wall\" and column rain_mm", err)
	}
}

func TestBrokenRecordNamesLine(t *testing.T) {
	csv := "time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n2021-01-01T01:00:00Z,5,80,0,3,200,0\n2021-01-01T02:00:00Z,5,180,0,3,200,0\n"
	p := testProject(t, wallProject, map[string]string{"c.csv": csv})
	_, err := Run(p, Options{})
	if err == nil || !strings.Contains(err.Error(), ":3:") {
		t.Errorf("err = %v, want the record's line 3", err)
	}
}

// TestRangeErrorPointsAtTheRightElement: a value out of range in the
// second element is reported at its own line and column, not at the first
// element's key of the same name.
func TestRangeErrorPointsAtTheRightElement(t *testing.T) {
	src := wallProject + `
[[element]]
id = "second"
material = "gypsum-plaster"
azimuth_deg = 90
tilt_deg =  200
height_m = 3
thickness_mm = 10

  [[element.variant]]
  id = "v"
  wall_factor = 7
`
	_, err := Parse("site.toml", []byte(src))
	if err == nil || !strings.Contains(err.Error(), "site.toml:22:13 (element.tilt_deg)") {
		t.Errorf("err = %v, want it at site.toml:22:13", err)
	}
	src = strings.Replace(src, "tilt_deg =  200", "tilt_deg = 90", 1)
	_, err = Parse("site.toml", []byte(src))
	if err == nil || !strings.Contains(err.Error(), "site.toml:28:17 (element.variant.wall_factor)") {
		t.Errorf("err = %v, want it at site.toml:28:17", err)
	}
}
