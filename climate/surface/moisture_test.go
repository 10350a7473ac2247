package surface

import (
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/climate"
)

func TestMassTransferCoefficient(t *testing.T) {
	// Lewis relation by hand: R_a/(p·c_p·R_v) = 287.05/(101325·1006·461.52)
	// = 6.1017·10⁻⁹ s/m.
	if got := MassTransferCoefficient(1); math.Abs(got-6.1017e-9) > 1e-12 {
		t.Errorf("β_p/h_c = %.5g, want 6.1017e-9", got)
	}
	// Hens' rule β ≈ 7.7·10⁻⁹·h_c s/m (Hens 2012, Building Physics – Heat,
	// Air and Moisture; from memory). His value includes a Lewis number
	// below 1; the Le = 1 form must lie within 25 % of it.
	if got := MassTransferCoefficient(20); math.Abs(got/(7.7e-9*20)-1) > 0.25 {
		t.Errorf("β_p(20) = %.3g, more than 25 %% from Hens' 1.54e-7", got)
	}
}

func TestCondensationRate(t *testing.T) {
	pv := climate.VapourPressurePa(10, 80)
	dew := climate.DewPointC(pv)
	tests := []struct {
		name    string
		surface float64
		sign    float64
	}{
		{"below dew point", dew - 2, 1},
		{"above dew point", dew + 2, -1},
	}
	for _, tt := range tests {
		g := CondensationRateKgPerM2S(16, 10, pv, tt.surface)
		if g*tt.sign <= 0 {
			t.Errorf("%s: g = %g, want sign %g", tt.name, g, tt.sign)
		}
	}
	if g := CondensationRateKgPerM2S(16, 10, pv, dew); math.Abs(g) > 1e-12 {
		t.Errorf("at the dew point: g = %g, want 0", g)
	}
	// By hand: h_c = 16, surface 2 °C (p_sat 705.4 Pa, ISO 13788 E.7), air
	// vapour 982.3 Pa: g = 16·6.1017e-9·(982.3 − 705.4) = 2.703e-5 kg/(m²s).
	want := 16 * 6.1017e-9 * (pv - climate.SatVapourPressurePa(2))
	if g := CondensationRateKgPerM2S(16, 10, pv, 2); math.Abs(g-want) > 1e-9 {
		t.Errorf("g = %g, want %g", g, want)
	}
}

func TestSurfaceRH(t *testing.T) {
	pv := climate.VapourPressurePa(20, 50)
	if got := SurfaceRHPct(pv, 20); math.Abs(got-50) > 1e-9 {
		t.Errorf("RH at air temperature = %g, want 50", got)
	}
}

func TestLatentHeat(t *testing.T) {
	tests := []struct{ tempC, want, tol float64 }{
		{0, 2.501e6, 1e3},   // latent heat of vaporisation at 0 °C, 2.501 MJ/kg (Rogers & Yau 1989, from memory)
		{20, 2.4536e6, 2e3}, // 2.454 MJ/kg at 20 °C (Rogers & Yau 1989, from memory)
		{-10, 2.834e6, 2e3}, // sublimation, 2.834 MJ/kg (Rogers & Yau 1989, from memory)
	}
	for _, tt := range tests {
		if got := LatentHeatJPerKg(tt.tempC); math.Abs(got-tt.want) > tt.tol {
			t.Errorf("L(%g) = %g, want %g", tt.tempC, got, tt.want)
		}
	}
}
