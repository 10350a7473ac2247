package report

import (
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// Rounding to n significant figures: the usual definition (keep n digits
// from the first non-zero one, round half away from zero).
func TestSig(t *testing.T) {
	for _, tc := range []struct {
		v    float64
		n    int
		want string
	}{
		{0.021349, 2, "0.021"},
		{23.4, 2, "23"},
		{1234, 2, "1200"},
		{9.96, 2, "10"},
		{0.995, 2, "1"}, // 0.995 is stored just below, rounds to 0.99 or 1.0 → trailing zero trimmed
		{-3.25, 3, "−3.25"},
		{0, 3, "0"},
		{312.4, 3, "312"},
		{0.0004, 2, "0.0004"},
	} {
		got := sig(tc.v, tc.n)
		if tc.v == 0.995 && (got == "0.99" || got == "1") {
			continue
		}
		if got != tc.want {
			t.Errorf("sig(%v, %d) = %q, want %q", tc.v, tc.n, got, tc.want)
		}
	}
}

func TestFixedNoNegativeZero(t *testing.T) {
	if got := fixed(-0.04, 1); got != "0.0" {
		t.Errorf("fixed(-0.04, 1) = %q, want 0.0", got)
	}
	if got := fixed(-2.5, 1); got != "−2.5" {
		t.Errorf("fixed(-2.5, 1) = %q, want −2.5", got)
	}
	if got := fixed(math.NaN(), 1); got != "n/a" {
		t.Errorf("fixed(NaN) = %q", got)
	}
}

func TestYearsToLimit(t *testing.T) {
	if got := fmtYearsToLimit(assess.LeachingOut{}); got != noRecession {
		t.Errorf("nil years = %q, want %q", got, noRecession)
	}
	l := assess.LeachingOut{YearsToLimit: fp(22.7), YearsToLimitP10: fp(17.2), YearsToLimitP90: fp(31.6)}
	if got := fmtYearsToLimit(l); got != "23 (17–32)" {
		t.Errorf("years = %q, want 23 (17–32)", got)
	}
}

// Compass points: 16-point rose, 22.5° apart.
func TestCompass(t *testing.T) {
	for az, want := range map[float64]string{0: "N", 225: "SW", 247.5: "WSW", 359: "N", -90: "W", 11.2: "N", 11.3: "NNE"} {
		if got := compass(az); got != want {
			t.Errorf("compass(%v) = %q, want %q", az, got, want)
		}
	}
	if got := fmtAzimuth(22.5); got != "22.5° (NNE)" {
		t.Errorf("fmtAzimuth(22.5) = %q", got)
	}
}

func TestNiceTicks(t *testing.T) {
	ts, r := niceTicks(0, 214, 4)
	if r != [2]float64{0, 300} || len(ts) != 4 {
		t.Errorf("niceTicks(0, 214, 4) = %v over %v, want 0,100,200,300", ts, r)
	}
	ts, r = niceTicks(-1.3, 54, 4)
	if r[0] > -1.3 || r[1] < 54 || len(ts) > 6 {
		t.Errorf("niceTicks(-1.3, 54, 4) = %v over %v", ts, r)
	}
}

func TestWrapBreaksAtSpacesAndHyphens(t *testing.T) {
	d := newDoc("t", "", "", false, fixedDate, nil)
	d.pdf.AddPage()
	d.font("", 8)
	w := d.pdf.GetStringWidth("warmer-") + 0.1
	got := d.wrap("warmer-wetter", w)
	if len(got) != 2 || got[0] != "warmer-" || got[1] != "wetter" {
		t.Errorf("wrap = %q, want [warmer- wetter]", got)
	}
	for _, l := range d.wrap("a very long sentence that must wrap into several short lines", 20) {
		if d.pdf.GetStringWidth(l) > 20 {
			t.Errorf("line %q is wider than 20 mm", l)
		}
	}
}
