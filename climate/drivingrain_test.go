package climate

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"testing"
	"time"
)

// Worked example, by hand, of ISO 15927-3:2009 clause 3 for one hour:
// v = 5 m/s, r = 2 mm, wind from D = 240°, wall facing Θ = 210°.
//
//	r^(8/9)      = exp(8/9 · ln 2) = exp(0.616131) = 1.851749
//	(2/9) · v    = 1.111111
//	cos(D − Θ)   = cos 30° = 0.866025
//	I            = 1.111111 · 1.851749 · 0.866025 = 1.781847 L/m²
const handExampleLPerM2 = 1.781847

func TestDrivingRainHour(t *testing.T) {
	tests := []struct {
		name                 string
		windMS, rainMM, d, w float64
		want, tol            float64
	}{
		{"worked example", 5, 2, 240, 210, handExampleLPerM2, 1e-5},              // by hand, above
		{"head-on, r = 1", 9, 1, 270, 270, 2, 1e-12},                             // (2/9)·9·1·1 by hand
		{"wind along the wall", 10, 3, 0, 90, 0, 1e-12},                          // cos 90° = 0: no contribution (clause 3)
		{"wind from behind", 10, 3, 30, 210, 0, 1e-12},                           // cos 180° < 0: no contribution (clause 3)
		{"across north", 6, 4, 350, 20, 6 * 2 / 9.0 * 3.428979 * 0.866025, 1e-5}, // 4^(8/9) = exp(1.232262) = 3.428979, cos 30°, by hand
		{"no rain", 10, 0, 270, 270, 0, 0},
		{"calm", 0, 5, 270, 270, 0, 0},
	}
	for _, tt := range tests {
		got := DrivingRainHourLPerM2(tt.windMS, tt.rainMM, tt.d, tt.w)
		if math.Abs(got-tt.want) > tt.tol {
			t.Errorf("%s: I = %.6f, want %.6f", tt.name, got, tt.want)
		}
	}
	if !math.IsNaN(DrivingRainHourLPerM2(math.NaN(), 1, 0, 0)) {
		t.Error("NaN wind should give NaN")
	}
}

// oneYear writes a record of 8766 hours (one year for ISO 15927-3's
// annualisation), dry and calm except for the given hours.
func oneYear(wet map[int]string) string {
	var b strings.Builder
	b.WriteString("time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg\n")
	t := time.Date(2001, 1, 1, 1, 0, 0, 0, time.UTC)
	for i := range 8766 {
		row, ok := wet[i]
		if !ok {
			row = "0,0,0"
		}
		fmt.Fprintf(&b, "%s,10,80,%s\n", t.Format(time.RFC3339), row)
		t = t.Add(time.Hour)
	}
	return b.String()
}

func TestAirfieldIndex(t *testing.T) {
	// One year with two wet hours: the worked example (from 240°) and
	// 1 mm at 10 m/s from 90°, which gives (2/9)·10 = 2.2222 L/m² on an
	// east wall and nothing on a wall facing 210° (cos 120° < 0).
	s := mustRead(t, oneYear(map[int]string{100: "2,5,240", 5000: "1,10,90"}))
	tests := []struct {
		wall, want float64
	}{
		{210, handExampleLPerM2},      // by hand, above
		{90, 2.0 / 9 * 10},            // by hand
		{240, 2.0 / 9 * 5 * 1.851749}, // head-on to the first hour, by hand
		{0, 0},                        // neither hour reaches a north wall
		{150, 2.0 / 9 * 10 * 0.5},     // from 90°: cos 60° = 0.5; from 240°: cos 90° = 0, by hand
	}
	for _, tt := range tests {
		got, err := AirfieldIndex(s, tt.wall)
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(got-tt.want) > 1e-5 {
			t.Errorf("I_A(%g°) = %.6f L/m²/yr, want %.6f", tt.wall, got, tt.want)
		}
	}

	// The same first hour as six 10-minute records of 1/3 mm gives the
	// same index: sub-hourly data are aggregated to hours first.
	var b strings.Builder
	b.WriteString("time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg\n")
	t0 := time.Date(2001, 1, 1, 0, 10, 0, 0, time.UTC)
	for i := range 8766 * 6 {
		row := "0,0,0"
		if i/6 == 100 {
			row = fmt.Sprintf("%.17g,5,240", 2.0/6)
		}
		fmt.Fprintf(&b, "%s,10,80,%s\n", t0.Format(time.RFC3339), row)
		t0 = t0.Add(10 * time.Minute)
	}
	sub := mustRead(t, b.String())
	got, err := AirfieldIndex(sub, 210)
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(got-handExampleLPerM2) > 1e-5 {
		t.Errorf("10-minute record: I_A = %.6f, want %.6f", got, handExampleLPerM2)
	}

	noWind := mustRead(t, "time,temp_c,rh_pct,rain_mm\n2024-01-01T01:00Z,1,80,0\n")
	if _, err := AirfieldIndex(noWind, 0); !errors.Is(err, ErrNoColumn) || !strings.Contains(err.Error(), "wind_ms, wind_dir_deg") {
		t.Errorf("missing wind columns: err = %v", err)
	}
}

func TestSpells(t *testing.T) {
	// Wet hours 95 h apart join one spell; 97 h apart they split
	// (SpellDryHours = 96). Each hour is head-on, 1 mm at 9 m/s: 2 L/m².
	s := mustRead(t, oneYear(map[int]string{10: "1,9,180", 105: "1,9,180", 202: "1,9,180", 203: "1,9,0"}))
	sp, err := Spells(s, 180)
	if err != nil {
		t.Fatal(err)
	}
	if len(sp) != 2 || math.Abs(sp[0].LPerM2-4) > 1e-12 || math.Abs(sp[1].LPerM2-2) > 1e-12 {
		t.Fatalf("spells %+v, want two of 4 and 2 L/m²", sp)
	}
	if _, err := SpellIndexOf(s, 180); !errors.Is(err, ErrTooShort) {
		t.Errorf("one year: err = %v, want ErrTooShort", err)
	}
}

func TestGumbelReturn(t *testing.T) {
	// Gumbel frequency factor by moments, x_T = m + K_T·s with
	// K_T = −(√6/π)(0.5772 + ln ln(T/(T−1))) (Chow 1951, Trans. AGU 32;
	// Chow, Maidment & Mays 1988, Applied Hydrology, eq. 11.3.6, from
	// memory): K_2 = −0.1643, K_3 = 0.2538 by hand.
	xs := []float64{10, 12, 14, 16, 18} // mean 14, sample s.d. 3.16228
	sd := math.Sqrt(10)
	tests := []struct{ T, k float64 }{{2, -0.164284}, {3, 0.253797}}
	for _, tt := range tests {
		if got, want := gumbelReturn(xs, tt.T), 14+tt.k*sd; math.Abs(got-want) > 1e-4 {
			t.Errorf("T=%g: %g, want %g", tt.T, got, want)
		}
	}
}

func TestSpellIndexTenYears(t *testing.T) {
	// Ten years, one head-on spell per year of n hours (2 L/m² each):
	// annual maxima 2, 4, ... 20 L/m².
	var b strings.Builder
	b.WriteString("time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg\n")
	t0 := time.Date(2001, 1, 1, 1, 0, 0, 0, time.UTC)
	for tt := t0; tt.Year() < 2011 || (tt.Year() == 2011 && tt.YearDay() == 1 && tt.Hour() == 0); tt = tt.Add(time.Hour) {
		row := "0,0,0"
		y := tt.Year() - 2000
		if tt.YearDay() == 100 && tt.Hour() < y {
			row = "1,9,270"
		}
		fmt.Fprintf(&b, "%s,10,80,%s\n", tt.Format(time.RFC3339), row)
	}
	s := mustRead(t, b.String())
	si, err := SpellIndexOf(s, 270)
	if err != nil {
		t.Fatal(err)
	}
	if len(si.Years) != 10 || si.AnnualMaxLPerM2[0] != 2 || si.AnnualMaxLPerM2[9] != 20 {
		t.Fatalf("annual maxima %v for years %v", si.AnnualMaxLPerM2, si.Years)
	}
	// mean 11, sample s.d. of 2..20 step 2 = 6.05530; K_3 = 0.253797 (above).
	if want := 11 + 0.253797*6.055301; math.Abs(si.ThreeYearLPerM2-want) > 1e-4 {
		t.Errorf("3-year spell %g, want %g", si.ThreeYearLPerM2, want)
	}
}
