package surface

import (
	"fmt"
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/climate"
)

func TestRadiativeCoefficientISO6946(t *testing.T) {
	// ISO 6946:2017, Annex C, table of h_r0 against mean temperature (from
	// memory), printed to 0.1 W/(m²·K): tolerance half a unit of the last digit.
	tests := []struct{ tempC, want, tol float64 }{
		{-10, 4.1, 0.05}, // ISO 6946:2017 Annex C (from memory)
		{0, 4.6, 0.05},   // ISO 6946:2017 Annex C (from memory)
		{10, 5.1, 0.05},  // ISO 6946:2017 Annex C (from memory)
		{20, 5.7, 0.05},  // ISO 6946:2017 Annex C (from memory)
		{30, 6.3, 0.05},  // ISO 6946:2017 Annex C (from memory)
	}
	for _, tt := range tests {
		if got := RadiativeCoefficient(1, tt.tempC); math.Abs(got-tt.want) > tt.tol {
			t.Errorf("h_r0(%g °C) = %.3f, want %.1f ± %g", tt.tempC, got, tt.want, tt.tol)
		}
	}
}

func TestExteriorResistanceISO6946(t *testing.T) {
	// ISO 6946:2017: R_se = 0.04 m²K/W follows from v = 4 m/s, ε = 0.9 at
	// 0 °C (Annex C; from memory). The standard rounds to two decimals.
	got := 1 / (ConvectiveCoefficient(4) + RadiativeCoefficient(0.9, 0))
	if math.Abs(got-ExteriorResistanceISO6946) > 0.002 {
		t.Errorf("R_se = %.4f, want 0.04 ± 0.002", got)
	}
	if h := ConvectiveCoefficient(4); h != 20 { // ISO 6946:2017 Annex C, h_c = 4 + 4v
		t.Errorf("h_c(4 m/s) = %g, want 20", h)
	}
	if h := ConvectiveCoefficient(math.NaN()); h != 4 {
		t.Errorf("h_c(NaN) = %g, want calm 4", h)
	}
}

func TestViewFactors(t *testing.T) {
	// (1 ± cos β)/2 for a plane facing a hemisphere (exact geometry).
	tests := []struct{ tilt, sky, tol float64 }{
		{0, 1, 1e-15}, {90, 0.5, 1e-15}, {180, 0, 1e-15}, {60, 0.75, 1e-15},
	}
	for _, tt := range tests {
		if s, g := SkyViewFactor(tt.tilt), GroundViewFactor(tt.tilt); math.Abs(s-tt.sky) > tt.tol || math.Abs(s+g-1) > tt.tol {
			t.Errorf("tilt %g: F_sky %g, F_gnd %g", tt.tilt, s, g)
		}
	}
}

// residual evaluates the heat balance independently of Solve's arrangement.
func residual(s *Surface, c *Conditions, tsC float64) float64 {
	k := climate.KelvinOffset
	ts, te, tsky := tsC+k, c.AirTempC+k, c.SkyTempC+k
	r := s.Absorptance*c.IrradianceWM2 + c.HcWPerM2K*(c.AirTempC-tsC) +
		s.Emissivity*StefanBoltzmann*(s.SkyView*(math.Pow(tsky, 4)-math.Pow(ts, 4))+s.GroundView*(math.Pow(te, 4)-math.Pow(ts, 4))) +
		s.UWPerM2K*(c.InnerTempC-tsC)
	g := CondensationRateKgPerM2S(c.HcWPerM2K, c.AirTempC, c.VapourPa, tsC)
	if g > 0 || c.Wet {
		r += LatentHeatJPerKg(tsC) * g
	}
	return r
}

// bisect solves the balance by bisection, an independent reference.
func bisect(s *Surface, c *Conditions) float64 {
	lo, hi := -80.0, 150.0
	for i := 0; i < 200; i++ {
		m := (lo + hi) / 2
		if residual(s, c, m) > 0 {
			lo = m
		} else {
			hi = m
		}
	}
	return (lo + hi) / 2
}

var balanceCases = []struct {
	name string
	s    Surface
	c    Conditions
}{
	{"dark wall, summer sun", NewSurface(90, 0.9, 0.9), Conditions{AirTempC: 30, VapourPa: climate.VapourPressurePa(30, 40), HcWPerM2K: ConvectiveCoefficient(1), SkyTempC: 10, IrradianceWM2: 800}},
	{"light roof, clear night", NewSurface(0, 0.3, 0.9), Conditions{AirTempC: 5, VapourPa: climate.VapourPressurePa(5, 80), HcWPerM2K: ConvectiveCoefficient(0.5), SkyTempC: -17.7}},
	{"wall, frosty night", NewSurface(90, 0.5, 0.9), Conditions{AirTempC: -5, VapourPa: climate.VapourPressurePa(-5, 90), HcWPerM2K: ConvectiveCoefficient(2), SkyTempC: -30}},
	{"wet wall in sun", Surface{Absorptance: 0.6, Emissivity: 0.9, SkyView: 0.5, GroundView: 0.5}, Conditions{AirTempC: 20, VapourPa: climate.VapourPressurePa(20, 50), HcWPerM2K: ConvectiveCoefficient(3), SkyTempC: 0, IrradianceWM2: 500, Wet: true}},
	{"heated wall behind, winter", Surface{Absorptance: 0.5, Emissivity: 0.9, SkyView: 0.5, GroundView: 0.5, UWPerM2K: 1.5}, Conditions{AirTempC: 0, VapourPa: climate.VapourPressurePa(0, 85), HcWPerM2K: ConvectiveCoefficient(3), SkyTempC: -12, InnerTempC: 20}},
	{"hot calm roof", NewSurface(0, 0.95, 0.9), Conditions{AirTempC: 38, VapourPa: climate.VapourPressurePa(38, 20), HcWPerM2K: ConvectiveCoefficient(0), SkyTempC: 15, IrradianceWM2: 1000}},
}

func TestSolveAgainstBisection(t *testing.T) {
	for _, tt := range balanceCases {
		got := tt.s.Solve(&tt.c)
		want := bisect(&tt.s, &tt.c)
		// Solve's documented accuracy: step below 1e-4 K.
		if math.Abs(got.TempC-want) > 1e-3 {
			t.Errorf("%s: θ_s = %.5f °C, bisection %.5f °C", tt.name, got.TempC, want)
		}
		if r := residual(&tt.s, &tt.c, got.TempC); math.Abs(r) > 1e-2 {
			t.Errorf("%s: residual %.3g W/m² at the solution", tt.name, r)
		}
	}
}

func TestSolveLinearLimit(t *testing.T) {
	// Without long-wave exchange (ε = 0), conduction or condensation, the
	// balance is linear and the surface sits at the sol-air temperature
	// θ_e + α·I/h_c (ASHRAE Fundamentals, sol-air temperature; from memory).
	s := Surface{Absorptance: 0.7, SkyView: 0.5, GroundView: 0.5}
	c := Conditions{AirTempC: 15, VapourPa: 500, HcWPerM2K: 12, SkyTempC: -20, IrradianceWM2: 600}
	want := SolAirC(15, 600, 0.7, 0, 0, 12) // 50 °C
	if got := s.Solve(&c); math.Abs(got.TempC-want) > 1e-3 || math.Abs(want-50) > 1e-12 {
		t.Errorf("θ_s = %.5f, sol-air %.5f, want 50", got.TempC, want)
	}
}

func TestClearNightChillsBelowDewPoint(t *testing.T) {
	// A clear, calm night: air 5 °C at 80 % (dew point 1.8 °C). The sky
	// temperature comes from Berdahl & Martin (1984) with no cloud.
	air, rh := 5.0, 80.0
	pv := climate.VapourPressurePa(air, rh)
	dew := climate.DewPointC(pv)
	roof := NewSurface(0, 0.3, 0.9)
	c := Conditions{AirTempC: air, VapourPa: pv, HcWPerM2K: ConvectiveCoefficient(0.5), SkyTempC: SkyTemperatureFromAirC(air, pv, 0)}
	st := roof.Solve(&c)
	if !(st.TempC < dew) || !(st.VapourFluxKgPerM2S > 0) || !(st.LatentWM2 > 0) {
		t.Errorf("clear night: θ_s = %.2f °C, dew point %.2f °C, flux %g: want condensation", st.TempC, dew, st.VapourFluxKgPerM2S)
	}
	// Under an overcast sky the same roof stays above the dew point.
	c.SkyTempC = SkyTemperatureFromAirC(air, pv, 1)
	if st := roof.Solve(&c); !(st.TempC > dew) || st.LatentWM2 != 0 {
		t.Errorf("overcast night: θ_s = %.2f °C, dew point %.2f °C: want no condensation", st.TempC, dew)
	}
}

func TestWetSurfaceStaysCooler(t *testing.T) {
	s := Surface{Absorptance: 0.6, Emissivity: 0.9, SkyView: 0.5, GroundView: 0.5}
	c := Conditions{AirTempC: 20, VapourPa: climate.VapourPressurePa(20, 50), HcWPerM2K: 16, SkyTempC: 0, IrradianceWM2: 500}
	dry := s.Solve(&c)
	c.Wet = true
	wet := s.Solve(&c)
	if !(wet.TempC < dry.TempC-1) || !(wet.VapourFluxKgPerM2S < 0) || !(wet.LatentWM2 < 0) || dry.LatentWM2 != 0 {
		t.Errorf("dry %.2f °C, wet %.2f °C (flux %g): want evaporative cooling", dry.TempC, wet.TempC, wet.VapourFluxKgPerM2S)
	}
}

func TestSolveNaN(t *testing.T) {
	s := NewSurface(90, 0.5, 0.9)
	c := Conditions{AirTempC: math.NaN(), VapourPa: 800, HcWPerM2K: 10, SkyTempC: 0}
	if st := s.Solve(&c); !math.IsNaN(st.TempC) {
		t.Errorf("NaN air temperature gave θ_s = %g", st.TempC)
	}
	// A NaN inner temperature is ignored when the surface is adiabatic.
	c = Conditions{AirTempC: 10, VapourPa: 800, HcWPerM2K: 10, SkyTempC: 0, InnerTempC: math.NaN()}
	if st := s.Solve(&c); math.IsNaN(st.TempC) {
		t.Error("NaN inner temperature leaked into an adiabatic surface")
	}
}

func TestSolAir(t *testing.T) {
	// By hand: 20 + (0.6·500 − 0.9·63)/25 = 29.732 °C.
	if got := SolAirC(20, 500, 0.6, 0.9, 63, 25); math.Abs(got-29.732) > 1e-9 {
		t.Errorf("SolAirC = %.6f, want 29.732", got)
	}
	// ΔR for a horizontal roof under a sky 20 K below air at 10 °C:
	// σ·(283.15⁴ − 263.15⁴) = 92.574 W/m² (by hand).
	if got := LongWaveDeficitWM2(10, -10, 1); math.Abs(got-92.574) > 0.001 {
		t.Errorf("ΔR = %.3f, want 92.574", got)
	}
}

func ExampleSurface_Solve() {
	// An invented case: a south-facing lime-gypsum render (α = 0.5) on a
	// clear, calm March night, air 4 °C at 85 %.
	pv := climate.VapourPressurePa(4, 85)
	wall := NewSurface(90, 0.5, 0.9)
	c := Conditions{
		AirTempC:  4,
		VapourPa:  pv,
		HcWPerM2K: ConvectiveCoefficient(0.5),
		SkyTempC:  SkyTemperatureFromAirC(4, pv, 0),
	}
	st := wall.Solve(&c)
	fmt.Printf("sky %.1f °C, surface %.1f °C, dew point %.1f °C\n", c.SkyTempC, st.TempC, climate.DewPointC(pv))
	fmt.Printf("surface RH %.0f %%, condensing %.1f g/(m²·h)\n", SurfaceRHPct(pv, st.TempC), st.VapourFluxKgPerM2S*3.6e6)
	// Output:
	// sky -17.8 °C, surface 0.4 °C, dew point 1.7 °C
	// surface RH 110 %, condensing 8.0 g/(m²·h)
}

var sinkState State

func benchSolve(b *testing.B, k int) {
	tc := balanceCases[k]
	var s State
	for i := 0; i < b.N; i++ {
		c := tc.c
		c.AirTempC += float64(i&7) * 0.1
		s = tc.s.Solve(&c)
	}
	sinkState = s
}

func BenchmarkSolveDrySun(b *testing.B)          { benchSolve(b, 0) }
func BenchmarkSolveCondensingNight(b *testing.B) { benchSolve(b, 1) }
func BenchmarkSolveWet(b *testing.B)             { benchSolve(b, 3) }

var sinkF float64

// BenchmarkBaselineSatVapour is one ISO 13788 saturation pressure, the unit
// each Newton step evaluates, measured in the same run.
func BenchmarkBaselineSatVapour(b *testing.B) {
	var s float64
	for i := 0; i < b.N; i++ {
		s += climate.SatVapourPressurePa(float64(i&31) - 5)
	}
	sinkF = s
}
