package climate

import (
	"math"
	"reflect"
	"testing"
	"time"
)

// Hand calculations below use the ISO 13788:2012 Annex E saturation
// pressure of psychro.go; they are stated as such beside each value.

func TestTemperatureFactorRoundTrip(t *testing.T) {
	tests := []struct {
		outdoorC, indoorC, fRsi, wantSurfC, tol float64
		src                                     string
	}{
		{-5, 20, 0.75, 13.75, 1e-12, "hand calculation: −5 + 0.75 × 25 (ISO 13788:2012 definition of f_Rsi)"},
		{0, 20, 0.7928, 15.856, 1e-12, "hand calculation: 0.7928 × 20"},
		{10, 20, 1, 20, 0, "f_Rsi = 1: surface at room temperature (definition)"},
		{10, 20, 0, 10, 0, "f_Rsi = 0: surface at outdoor temperature (definition)"},
		{30, 25, 0.5, 27.5, 1e-12, "summer, outdoor warmer than indoor: midway (definition)"},
	}
	for _, tt := range tests {
		got := InteriorSurfaceTempC(tt.outdoorC, tt.indoorC, tt.fRsi)
		if math.Abs(got-tt.wantSurfC) > tt.tol {
			t.Errorf("InteriorSurfaceTempC(%v, %v, %v) = %v, want %v (%s)", tt.outdoorC, tt.indoorC, tt.fRsi, got, tt.wantSurfC, tt.src)
		}
		f, err := TemperatureFactor(got, tt.outdoorC, tt.indoorC)
		if err != nil || math.Abs(f-tt.fRsi) > 1e-12 {
			t.Errorf("TemperatureFactor(%v, %v, %v) = %v, %v, want %v", got, tt.outdoorC, tt.indoorC, f, err, tt.fRsi)
		}
	}
	if _, err := TemperatureFactor(15, 20, 20.05); err == nil {
		t.Error("TemperatureFactor with θi − θe = 0.05 K succeeded, want an error")
	}
	if _, err := TemperatureFactor(math.NaN(), 0, 20); err == nil {
		t.Error("TemperatureFactor(NaN, …) succeeded, want an error")
	}
	for _, f := range []float64{-0.01, 1.01, math.NaN()} {
		if CheckTemperatureFactor(f) == nil {
			t.Errorf("CheckTemperatureFactor(%v) = nil, want an error", f)
		}
	}
	if err := CheckTemperatureFactor(0.7); err != nil {
		t.Errorf("CheckTemperatureFactor(0.7) = %v", err)
	}
}

func TestHumidityClassExcessPa(t *testing.T) {
	tests := []struct {
		class          int
		outdoorC, want float64
		src            string
	}{
		{1, -10, 270, "ISO 13788:2012 Annex A, class 1 below 0 °C (from memory)"},
		{2, 0, 540, "ISO 13788:2012 Annex A, class 2 at 0 °C (from memory)"},
		{3, 5, 607.5, "810 × (1 − 5/20), ISO 13788:2012 Annex A linear fall to 20 °C (from memory), hand calculation"},
		{4, 10, 540, "1080 × (1 − 10/20), hand calculation"},
		{5, -20, 1350, "ISO 13788:2012 Annex A, class 5 (from memory)"},
		{5, 15, 337.5, "1350 × (1 − 15/20), hand calculation"},
		{3, 20, 0, "no excess at 20 °C and above (ISO 13788:2012 Annex A, from memory)"},
		{1, 30, 0, "no excess above 20 °C"},
	}
	for _, tt := range tests {
		got, err := HumidityClassExcessPa(tt.class, tt.outdoorC)
		if err != nil || math.Abs(got-tt.want) > 1e-9 {
			t.Errorf("HumidityClassExcessPa(%d, %v) = %v, %v, want %v (%s)", tt.class, tt.outdoorC, got, err, tt.want, tt.src)
		}
	}
	for _, c := range []int{0, 6, -1} {
		if _, err := HumidityClassExcessPa(c, 0); err == nil {
			t.Errorf("HumidityClassExcessPa(%d, 0) succeeded, want an error", c)
		}
	}
	if _, err := HumidityClassExcessPa(3, math.NaN()); err == nil {
		t.Error("HumidityClassExcessPa(3, NaN) succeeded, want an error")
	}
}

// TestMinTemperatureFactor follows the ISO 13788:2012 clause 5 design steps
// by hand for two months (the standard's own worked example was not at hand).
func TestMinTemperatureFactor(t *testing.T) {
	tests := []struct {
		class                        int
		outdoorC, outdoorRH, indoorC float64
		wantPi, wantF, tolPi, tolF   float64
		src                          string
	}{
		{3, 0, 90, 20, 1440.45, 0.79277, 0.01, 1e-4,
			"hand calculation: p_e = 0.9 × 610.5 = 549.45 Pa; p_i = p_e + 1.1 × 810 = 1440.45 Pa; p_sat,min = p_i/0.8 = 1800.56 Pa; θ_si,min = 15.855 °C; f = 15.855/20"},
		{2, 5, 80, 20, 1142.99, 0.48593, 0.01, 1e-4,
			"hand calculation: p_e = 0.8 × 871.86 = 697.49 Pa; Δp = 540 × 0.75 = 405 Pa; p_i = 697.49 + 445.5; θ_si,min = 12.289 °C; f = 7.289/15"},
	}
	for _, tt := range tests {
		pi, err := IndoorVapourPressureClassPa(tt.class, tt.outdoorC, tt.outdoorRH)
		if err != nil || math.Abs(pi-tt.wantPi) > tt.tolPi {
			t.Errorf("IndoorVapourPressureClassPa(%d, %v, %v) = %v, %v, want %v (%s)", tt.class, tt.outdoorC, tt.outdoorRH, pi, err, tt.wantPi, tt.src)
		}
		f, err := MinTemperatureFactor(tt.outdoorC, tt.indoorC, pi, MouldCriterionRHPct)
		if err != nil || math.Abs(f-tt.wantF) > tt.tolF {
			t.Errorf("MinTemperatureFactor(%v, %v, %v, 80) = %v, %v, want %v (%s)", tt.outdoorC, tt.indoorC, pi, f, err, tt.wantF, tt.src)
		}
		// At exactly f_Rsi,min the surface sits at the criterion.
		surf := InteriorSurfaceTempC(tt.outdoorC, tt.indoorC, f)
		if rh := RHAtPct(pi, surf); math.Abs(rh-MouldCriterionRHPct) > 1e-9 {
			t.Errorf("surface RH at f_Rsi,min = %v %%, want 80 %%", rh)
		}
	}
	if _, err := MinTemperatureFactor(0, 20, 0, 80); err == nil {
		t.Error("MinTemperatureFactor with p_i = 0 succeeded, want an error")
	}
	if _, err := MinTemperatureFactor(0, 20, 1000, 0); err == nil {
		t.Error("MinTemperatureFactor with φ_cr = 0 succeeded, want an error")
	}
}

func TestEN15026IndoorClimate(t *testing.T) {
	tests := []struct {
		outdoorC             float64
		load                 MoistureLoad
		wantTempC, wantRHPct float64
		src                  string
	}{
		{-15, NormalMoistureLoad, 20, 30, "EN 15026:2007 Annex C, below −10 °C (from memory; cross-checked, RIBuild delphin_6_automation)"},
		{-15, HighMoistureLoad, 20, 40, "EN 15026:2007 Annex C, high load +10 % (from memory; cross-checked)"},
		{0, NormalMoistureLoad, 20, 40, "EN 15026 Annex C: φ = 40 + θ_e, hand calculation"},
		{10, NormalMoistureLoad, 20, 50, "EN 15026 Annex C: θ_i = 20 °C up to 10 °C, hand calculation"},
		{15, NormalMoistureLoad, 22.5, 55, "EN 15026 Annex C: θ_i = 15 + θ_e/2, φ = 40 + θ_e, hand calculation"},
		{15, HighMoistureLoad, 22.5, 65, "EN 15026 Annex C, high load, hand calculation"},
		{25, NormalMoistureLoad, 25, 60, "EN 15026 Annex C, above 20 °C (from memory; cross-checked)"},
		{25, HighMoistureLoad, 25, 70, "EN 15026 Annex C, above 20 °C, high load"},
	}
	for _, tt := range tests {
		gt, grh, err := EN15026IndoorClimate(tt.outdoorC, tt.load)
		if err != nil || gt != tt.wantTempC || grh != tt.wantRHPct {
			t.Errorf("EN15026IndoorClimate(%v, %d) = %v, %v, %v, want %v, %v (%s)", tt.outdoorC, tt.load, gt, grh, err, tt.wantTempC, tt.wantRHPct, tt.src)
		}
	}
	if _, _, err := EN15026IndoorClimate(0, 0); err == nil {
		t.Error("EN15026IndoorClimate with load 0 succeeded, want an error")
	}
	if _, _, err := EN15026IndoorClimate(math.NaN(), NormalMoistureLoad); err == nil {
		t.Error("EN15026IndoorClimate(NaN) succeeded, want an error")
	}
}

func TestIndoorModel(t *testing.T) {
	fixed, err := FixedIndoor(18, 50)
	if err != nil {
		t.Fatal(err)
	}
	class3, err := ClassIndoor(3, 20)
	if err != nil {
		t.Fatal(err)
	}
	en, err := EN15026Indoor(NormalMoistureLoad)
	if err != nil {
		t.Fatal(err)
	}
	tests := []struct {
		m                    IndoorModel
		outdoorC, outdoorRH  float64
		wantC, wantPa, tolPa float64
		src                  string
	}{
		{fixed, -5, 90, 18, 0.5 * SatVapourPressurePa(18), 1e-9, "set point: p = 0.5 · p_sat(18 °C)"},
		{class3, 0, 90, 20, 1440.45, 0.01, "class 3 at 0 °C, 90 %: hand calculation as in TestMinTemperatureFactor"},
		{en, 15, 70, 22.5, 0.55 * SatVapourPressurePa(22.5), 1e-9, "EN 15026 Annex C at 15 °C: 22.5 °C, 55 %"},
	}
	for _, tt := range tests {
		c, p := tt.m.At(tt.outdoorC, tt.outdoorRH)
		if c != tt.wantC || math.Abs(p-tt.wantPa) > tt.tolPa {
			t.Errorf("%v: At(%v, %v) = %v °C, %v Pa, want %v °C, %v Pa (%s)", tt.m, tt.outdoorC, tt.outdoorRH, c, p, tt.wantC, tt.wantPa, tt.src)
		}
	}
	if c, p := (IndoorModel{}).At(0, 80); !math.IsNaN(c) || !math.IsNaN(p) {
		t.Errorf("zero IndoorModel At = %v, %v, want NaN", c, p)
	}
	for name, fn := range map[string]func() error{
		"set point RH 120": func() error { _, err := FixedIndoor(20, 120); return err },
		"set point NaN":    func() error { _, err := FixedIndoor(math.NaN(), 50); return err },
		"class 6":          func() error { _, err := ClassIndoor(6, 20); return err },
		"class temp 200":   func() error { _, err := ClassIndoor(2, 200); return err },
		"EN 15026 load 7":  func() error { _, err := EN15026Indoor(7); return err },
	} {
		if fn() == nil {
			t.Errorf("%s: no error", name)
		}
	}
}

func TestIndoorModelAtAllocatesNothing(t *testing.T) {
	m, _ := ClassIndoor(4, 20)
	allocs := testing.AllocsPerRun(100, func() { _, _ = m.At(3, 85) })
	if allocs != 0 {
		t.Errorf("At allocates %v times per call, want 0", allocs)
	}
}

// TestMonthlyRH feeds three invented months of hourly surface states whose
// monthly humidity is known by hand.
func TestMonthlyRH(t *testing.T) {
	var acc MonthlyRH
	start := time.Date(2021, 1, 1, 0, 0, 0, 0, time.UTC)
	end := time.Date(2021, 4, 1, 0, 0, 0, 0, time.UTC)
	ps10 := SatVapourPressurePa(10)
	for ti := start.Add(time.Hour); !ti.After(end); ti = ti.Add(time.Hour) {
		mid := ti.Add(-30 * time.Minute)
		var surfC, p float64
		switch mid.Month() {
		case time.January: // 85 % at a 10 °C surface: fails
			surfC, p = 10, 0.85*ps10
		case time.February: // 70 %: passes
			surfC, p = 10, 0.70*ps10
		case time.March: // 5 °C on even days, 15 °C on odd days, at 1000 Pa
			surfC, p = 15, 1000
			if mid.Day()%2 == 0 {
				surfC = 5
			}
		}
		if err := acc.Add(ti, 1, surfC, p); err != nil {
			t.Fatal(err)
		}
	}
	months := acc.Months()
	if len(months) != 3 {
		t.Fatalf("got %d months, want 3: %+v", len(months), months)
	}
	// March: 15 days at 5 °C, 16 at 15 °C; mean θ = (15·5 + 16·15)/31 = 10.161 °C.
	marchT := (15*5.0 + 16*15.0) / 31
	tests := []struct {
		i                 int
		month             string
		hours, rh, meanRH float64
		src               string
	}{
		{0, "2021-01", 744, 85, 85, "constant 85 % (invented input; by construction)"},
		{1, "2021-02", 672, 70, 70, "constant 70 % (by construction)"},
		{2, "2021-03", 744, 100 * 1000 / SatVapourPressurePa(marchT), (15*100 + 16*100*1000/SatVapourPressurePa(15)) / 31,
			"ISO 13788 form from monthly means (hand calculation: 1000 Pa over p_sat(10.161 °C)), against the mean of hourly RH capped at 100 %"},
	}
	for _, tt := range tests {
		m := months[tt.i]
		if m.Month != tt.month || m.Hours != tt.hours || math.Abs(m.SurfaceRHPct-tt.rh) > 1e-9 || math.Abs(m.MeanOfHourlyRHPct-tt.meanRH) > 1e-9 {
			t.Errorf("month %d = %+v, want %s, %v h, RH %v (mean of hourly %v) (%s)", tt.i, m, tt.month, tt.hours, tt.rh, tt.meanRH, tt.src)
		}
	}
	// March fails on the monthly means (80.6 %) although the mean of the
	// hourly values (78.7 %) would pass: the criterion uses the former.
	if got, want := acc.Failing(), []string{"2021-01", "2021-03"}; !reflect.DeepEqual(got, want) {
		t.Errorf("Failing() = %v, want %v (months 1 and 3: %.1f %%, %.1f %%; mean of hourly in March %.1f %%)",
			got, want, months[0].SurfaceRHPct, months[2].SurfaceRHPct, months[2].MeanOfHourlyRHPct)
	}
	if months[2].MeanOfHourlyRHPct >= MouldCriterionRHPct || months[2].SurfaceRHPct <= MouldCriterionRHPct {
		t.Errorf("March: monthly-mean RH %.2f %%, mean of hourly %.2f %%; the test month should straddle 80 %%",
			months[2].SurfaceRHPct, months[2].MeanOfHourlyRHPct)
	}
}

func TestMonthlyRHErrors(t *testing.T) {
	var acc MonthlyRH
	t0 := time.Date(2021, 1, 1, 1, 0, 0, 0, time.UTC)
	if err := acc.Add(t0, 1, 10, 1000); err != nil {
		t.Fatal(err)
	}
	for name, err := range map[string]error{
		"same time":     acc.Add(t0, 1, 10, 1000),
		"earlier":       acc.Add(t0.Add(-time.Hour), 1, 10, 1000),
		"zero duration": acc.Add(t0.Add(2*time.Hour), 0, 10, 1000),
		"NaN surface":   acc.Add(t0.Add(3*time.Hour), 1, math.NaN(), 1000),
		"negative p":    acc.Add(t0.Add(4*time.Hour), 1, 10, -1),
	} {
		if err == nil {
			t.Errorf("%s: no error", name)
		}
	}
	if got := acc.Months(); len(got) != 1 || got[0].Hours != 1 {
		t.Errorf("after refused intervals: %+v, want one month of 1 h", got)
	}
}

func TestMonthlyRHLocation(t *testing.T) {
	// An hour ending 00:20 UTC on 1 February has its midpoint at 23:50 UTC
	// on 31 January, but at 00:50 on 1 February at UTC+1.
	zone := time.FixedZone("UTC+1", 3600)
	utc, local := MonthlyRH{}, MonthlyRH{Location: zone}
	end := time.Date(2021, 2, 1, 0, 20, 0, 0, time.UTC)
	_ = utc.Add(end, 1, 10, 1000)
	_ = local.Add(end, 1, 10, 1000)
	if utc.Months()[0].Month != "2021-01" || local.Months()[0].Month != "2021-02" {
		t.Errorf("UTC month %s, UTC+1 month %s, want 2021-01 and 2021-02", utc.Months()[0].Month, local.Months()[0].Month)
	}
}

var indoorSink float64

// BenchmarkIndoorAt times the per-hour indoor model beside a baseline that
// only computes the outdoor vapour pressure, for 1 and 30 years of hours.
func BenchmarkIndoorAt(b *testing.B) {
	m, _ := ClassIndoor(3, 20)
	for _, n := range []int{8766, 30 * 8766} {
		b.Run(map[int]string{8766: "1y", 30 * 8766: "30y"}[n], func(b *testing.B) {
			for i := 0; i < b.N; i++ {
				s := 0.0
				for h := 0; h < n; h++ {
					te := float64(h%40) - 10
					_, p := m.At(te, 80)
					s += p
				}
				indoorSink += s
			}
		})
	}
}

func BenchmarkIndoorBaseline(b *testing.B) {
	for _, n := range []int{8766, 30 * 8766} {
		b.Run(map[int]string{8766: "1y", 30 * 8766: "30y"}[n], func(b *testing.B) {
			for i := 0; i < b.N; i++ {
				s := 0.0
				for h := 0; h < n; h++ {
					te := float64(h%40) - 10
					s += VapourPressurePa(te, 80)
				}
				indoorSink += s
			}
		})
	}
}
