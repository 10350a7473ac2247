package solar

import (
	"math"
	"testing"
)

func TestErbsDiffuseFraction(t *testing.T) {
	// Erbs, Klein & Duffie (1982), Solar Energy 28, 293–302, eq. for hourly
	// k_d; values are the paper's polynomial evaluated by hand.
	tests := []struct {
		kt, want, tol float64
	}{
		{0.10, 0.991, 1e-9},     // 1 − 0.09·0.1, Erbs et al. 1982
		{0.22, 0.9802, 1e-9},    // upper end of the linear branch, Erbs et al. 1982
		{0.50, 0.65915, 1e-9},   // quartic branch, Erbs et al. 1982
		{0.80, 0.1652696, 1e-6}, // quartic branch at its upper end, Erbs et al. 1982
		{0.90, 0.165, 0},        // constant branch, Erbs et al. 1982
		{-0.1, 1, 0},            // negative k_t treated as 0 (our guard)
	}
	for _, tt := range tests {
		if got := ErbsDiffuseFraction(tt.kt); math.Abs(got-tt.want) > tt.tol {
			t.Errorf("ErbsDiffuseFraction(%g) = %.7f, want %.7f ± %g", tt.kt, got, tt.want, tt.tol)
		}
	}
	// The published branches join within 0.001 at both break points
	// (Erbs et al. 1982 fitted them as one curve).
	for _, kt := range []float64{0.22, 0.80} {
		lo, hi := ErbsDiffuseFraction(kt-1e-9), ErbsDiffuseFraction(kt+1e-9)
		if math.Abs(lo-hi) > 1e-3 {
			t.Errorf("Erbs branches jump by %g at k_t = %g", lo-hi, kt)
		}
	}
}

func TestSplitConservesGlobal(t *testing.T) {
	const extra = 1361.0
	for _, zen := range []float64{0, 20, 45, 70, 85, 86.9, 87.5, 89.9, 95} {
		for _, ghi := range []float64{1, 50, 200, 500, 900, 1300} {
			c := Split(ghi, zen, extra)
			cz := math.Cos(zen * deg)
			if c.DNIWM2 < 0 || c.DHIWM2 < 0 || c.DNIWM2 > extra {
				t.Errorf("Split(%g, %g): DNI %g, DHI %g out of range", ghi, zen, c.DNIWM2, c.DHIWM2)
			}
			if sum := c.DHIWM2 + c.DNIWM2*cz; math.Abs(sum-ghi) > 1e-9*ghi {
				t.Errorf("Split(%g, %g): DHI + DNI·cos Z = %g, want GHI", ghi, zen, sum)
			}
			if zen > MaxBeamZenithDeg && c.DNIWM2 != 0 {
				t.Errorf("Split(%g, %g): beam %g with the sun near or below the horizon", ghi, zen, c.DNIWM2)
			}
		}
	}
}

func TestSplitGuards(t *testing.T) {
	if c := Split(-3, 30, 1361); c != (Components{}) {
		t.Errorf("negative GHI: %+v, want zero", c)
	}
	if c := Split(math.NaN(), 30, 1361); !math.IsNaN(c.DNIWM2) || !math.IsNaN(c.DHIWM2) {
		t.Errorf("NaN GHI: %+v, want NaN parts", c)
	}
	// Clearness index clipped to 1 when GHI exceeds the extraterrestrial value.
	if c := Split(1500, 10, 1361); c.ClearnessIndex != 1 {
		t.Errorf("k_t = %g, want clipped to 1", c.ClearnessIndex)
	}
}
