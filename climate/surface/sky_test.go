package surface

import (
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/climate"
)

func TestClearSkyEmissivity(t *testing.T) {
	// Berdahl & Martin (1984), Solar Energy 32, 663–664, eq. (1), evaluated by hand.
	tests := []struct{ dew, want, tol float64 }{
		{0, 0.711, 1e-12},    // Berdahl & Martin 1984
		{10, 0.7743, 1e-12},  // Berdahl & Martin 1984
		{20, 0.8522, 1e-12},  // Berdahl & Martin 1984
		{-10, 0.6623, 1e-12}, // Berdahl & Martin 1984
	}
	for _, tt := range tests {
		if got := ClearSkyEmissivity(tt.dew); math.Abs(got-tt.want) > tt.tol {
			t.Errorf("ε_0(θ_dp = %g) = %.5f, want %.4f", tt.dew, got, tt.want)
		}
	}
}

func TestClearSkyAgainstSwinbank(t *testing.T) {
	// An independent clear-sky model: Swinbank (1963), Q. J. R. Meteorol.
	// Soc. 89, 339–348, L↓ = 5.31·10⁻¹³·T⁶ W/m², i.e. ε = 9.365·10⁻⁶·T²
	// (from memory). Both fit mid-latitude clear skies; at typical humidity
	// (RH 60–80 %) they agree to within 0.04 in emissivity, about 3 K in sky
	// temperature (tolerance from the scatter such models show against
	// measurements, common practice, no source).
	for _, air := range []float64{0, 10, 20} {
		for _, rh := range []float64{60, 80} {
			dew := climate.DewPointC(climate.VapourPressurePa(air, rh))
			tk := air + climate.KelvinOffset
			swin := 5.31e-13 * math.Pow(tk, 6) / (StefanBoltzmann * math.Pow(tk, 4))
			if got := ClearSkyEmissivity(dew); math.Abs(got-swin) > 0.04 {
				t.Errorf("air %g °C, RH %g %%: Berdahl–Martin %.3f, Swinbank %.3f", air, rh, got, swin)
			}
		}
	}
}

func TestCloudySky(t *testing.T) {
	// Campbell & Norman (1998): ε = (1 − 0.84c)·ε_0 + 0.84c.
	if got := CloudySkyEmissivity(0.75, 0); got != 0.75 {
		t.Errorf("clear: %g", got)
	}
	if got := CloudySkyEmissivity(0.75, 1); math.Abs(got-0.96) > 1e-12 {
		t.Errorf("overcast: %g, want 0.96", got)
	}
	// Sky temperature: T_sky = ε^¼·T_a; ε = 0.75 at 10 °C gives 263.5008 K (by hand).
	if got := SkyTemperatureC(10, 0.75); math.Abs(got-(263.5008-273.15)) > 1e-3 {
		t.Errorf("T_sky = %.4f °C", got)
	}
}

func TestCloudFractionFromGlobal(t *testing.T) {
	// Kasten & Czeplak (1980), Solar Energy 24, 177–189:
	// G/G_clear = 1 − 0.75·c^3.4 with G_clear = 910·sin h − 30 (from memory).
	h := 40.0
	clear := 910*math.Sin(h*math.Pi/180) - 30
	tests := []struct{ ghi, want, tol float64 }{
		{clear, 0, 1e-12},
		{clear * 1.1, 0, 0},
		{clear * (1 - 0.75*math.Pow(0.5, 3.4)), 0.5, 1e-12},
		{clear * 0.25, 1, 1e-12},
		{clear * 0.1, 1, 0},
	}
	for _, tt := range tests {
		got, ok := CloudFractionFromGlobal(tt.ghi, 90-h)
		if !ok || math.Abs(got-tt.want) > tt.tol {
			t.Errorf("GHI %.1f: c = %g (ok %v), want %g", tt.ghi, got, ok, tt.want)
		}
	}
	if _, ok := CloudFractionFromGlobal(20, 85); ok {
		t.Error("cloud estimated with the sun 5° high")
	}
}

func TestCloudEstimatorCarriesIntoNight(t *testing.T) {
	var c CloudEstimator
	if got := c.Update(0, 120, 0); got != 0 {
		t.Errorf("first night: %g, want clear start", got)
	}
	h := 50.0
	clear := 910*math.Sin(h*math.Pi/180) - 30
	day := c.Update(clear*(1-0.75*math.Pow(0.6, 3.4)), 90-h, 0)
	if math.Abs(day-0.6) > 1e-9 {
		t.Errorf("day: %g, want 0.6", day)
	}
	if got := c.Update(0, 110, 0); got != day {
		t.Errorf("night after: %g, want the last daylight %g", got, day)
	}
	if got := c.Update(0, 110, 0.4); got != 1 {
		t.Errorf("rain: %g, want overcast", got)
	}
	if got := c.Update(math.NaN(), 110, math.NaN()); got != 1 {
		t.Errorf("missing values after rain: %g, want overcast carried", got)
	}
}
