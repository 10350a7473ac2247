package solar

import (
	"fmt"
	"math"
	"testing"
	"time"
)

func TestPerezHandCalculation(t *testing.T) {
	// An independent hand calculation of Perez et al. (1990), Solar Energy
	// 44, 271–289, eqs. for ε, Δ, F1, F2 and the tilted diffuse, with the
	// Kasten & Young (1989) air mass: DHI = 150, DNI = 600 W/m², Z = 40°,
	// sun due south, I0 = 1367 W/m², vertical wall facing south, albedo 0.2:
	//   ε = 3.95375 (bin 6), m = 1.30422, Δ = 0.143112,
	//   F1 = 1.132 − 1.237·Δ − 0.412·Z = 0.667341,
	//   F2 = 0.288 − 0.823·Δ + 0.056·Z = 0.209315,
	//   cos θ = sin 40° = 0.642788,
	//   I_sky = 150·[(1 − F1)/2 + F1·0.642788/cos 40° + F2] = 140.3414,
	//   I_beam = 385.6726, I_ground = 609.6267·0.2/2 = 60.9627.
	f1, f2 := PerezBrightness(150, 600, 40, 1367)
	sky := Sky{Sun: newSun(40, 180), GHIWM2: 150 + 600*math.Cos(40*deg),
		Components: Components{DNIWM2: 600, DHIWM2: 150}, F1: f1, F2: f2}
	wall := NewPlane(90, 180)
	got := sky.OnPlane(&wall, 0.2)
	tests := []struct {
		name      string
		got, want float64
		tol       float64 // rounding of the hand calculation's last digit
	}{
		{"F1", f1, 0.667341, 1e-6},
		{"F2", f2, 0.209315, 1e-6},
		{"sky diffuse", got.SkyDiffuseWM2, 140.3414, 1e-3},
		{"beam", got.BeamWM2, 385.6726, 1e-3},
		{"ground", got.GroundWM2, 60.9627, 1e-3},
		{"total", got.TotalWM2, 586.9767, 1e-3},
	}
	for _, tt := range tests {
		if math.Abs(tt.got-tt.want) > tt.tol {
			t.Errorf("%s = %.6f, want %.6f ± %g", tt.name, tt.got, tt.want, tt.tol)
		}
	}
}

func TestPerezCoefficientTable(t *testing.T) {
	// Spot checks of the transcription against Perez et al. (1990), Table 6,
	// "all sites composite" (first and last bins).
	tests := []struct {
		bin, col int
		want     float64
	}{
		{0, 0, -0.008}, {0, 1, 0.588}, {0, 5, -0.022}, // Perez et al. 1990, Table 6, ε < 1.065
		{7, 0, 0.678}, {7, 4, -1.377}, {7, 5, 0.251}, // Perez et al. 1990, Table 6, ε ≥ 6.2
	}
	for _, tt := range tests {
		if got := perezCoefficients[tt.bin][tt.col]; got != tt.want {
			t.Errorf("coefficient [%d][%d] = %g, want %g", tt.bin, tt.col, got, tt.want)
		}
	}
}

func TestHorizontalPlaneGetsGlobal(t *testing.T) {
	// On a horizontal plane the Perez model returns DHI exactly (a = b for
	// Z < 85°, sin β = 0), so beam + diffuse = GHI: a property of the model's
	// construction (Perez et al. 1990).
	day := time.Date(2022, 6, 1, 0, 0, 0, 0, time.UTC)
	for _, zen := range []float64{5, 30, 60, 84} {
		for _, ghi := range []float64{40, 300, 800} {
			got := Tilted(ghi, zen, 150, 0, 180, day, 0.2)
			if math.Abs(got.TotalWM2-ghi) > 1e-9*ghi || got.GroundWM2 != 0 {
				t.Errorf("Z=%g, GHI=%g: horizontal total %g (ground %g), want GHI", zen, ghi, got.TotalWM2, got.GroundWM2)
			}
		}
	}
}

func TestTiltedProperties(t *testing.T) {
	day := time.Date(2022, 6, 1, 0, 0, 0, 0, time.UTC)
	// A wall facing away from the sun gets no beam.
	if got := Tilted(700, 40, 180, 90, 0, day, 0.2); got.BeamWM2 != 0 {
		t.Errorf("north wall with the sun in the south: beam %g", got.BeamWM2)
	}
	// Ground reflection on a vertical wall is albedo·GHI/2 (Liu & Jordan 1963).
	if got := Tilted(500, 40, 180, 90, 90, day, 0.3); math.Abs(got.GroundWM2-75) > 1e-9 {
		t.Errorf("vertical ground-reflected = %g, want 75", got.GroundWM2)
	}
	// Night: nothing.
	if got := Tilted(0, 110, 0, 90, 180, day, 0.2); got != (Irradiance{}) {
		t.Errorf("night: %+v", got)
	}
	// Twilight mean GHI with the sun below the horizon: isotropic diffuse only.
	got := Tilted(10, 91, 270, 90, 270, day, 0.2)
	if got.BeamWM2 != 0 || math.Abs(got.SkyDiffuseWM2-5) > 1e-9 {
		t.Errorf("twilight on a wall: %+v, want 5 W/m² isotropic diffuse", got)
	}
}

func Example() {
	// An invented site at 47.4°N, 8.5°E; the record hour ending 13:00 UTC
	// on 21 June 2022 with a mean global horizontal irradiance of 750 W/m².
	end := time.Date(2022, 6, 21, 13, 0, 0, 0, time.UTC)
	mid := IntervalMidpoint(end, time.Hour)
	sun := At(mid, 47.4, 8.5)
	sky := NewSky(sun, 750, ExtraterrestrialNormalWM2(mid))
	south := NewPlane(90, 180)
	irr := sky.OnPlane(&south, DefaultAlbedo)
	fmt.Printf("zenith %.1f°, azimuth %.1f°\n", sun.ZenithDeg, sun.AzimuthDeg)
	fmt.Printf("DNI %.0f W/m², DHI %.0f W/m²\n", sky.DNIWM2, sky.DHIWM2)
	fmt.Printf("south wall: %.0f W/m²\n", irr.TotalWM2)
	// Output:
	// zenith 27.0°, azimuth 212.8°
	// DNI 542 W/m², DHI 267 W/m²
	// south wall: 436 W/m²
}

var sinkIrr Irradiance

func BenchmarkOnPlane(b *testing.B) {
	day := time.Date(2022, 6, 21, 12, 0, 0, 0, time.UTC)
	sky := NewSky(At(day, 47.4, 8.5), 700, ExtraterrestrialNormalWM2(day))
	planes := [4]Plane{NewPlane(90, 0), NewPlane(90, 90), NewPlane(90, 180), NewPlane(30, 200)}
	var s Irradiance
	for i := 0; i < b.N; i++ {
		r := sky.OnPlane(&planes[i&3], 0.2)
		s.TotalWM2 += r.TotalWM2
	}
	sinkIrr = s
}

var sinkSky Sky

func BenchmarkNewSky(b *testing.B) {
	day := time.Date(2022, 6, 21, 12, 0, 0, 0, time.UTC)
	sun := At(day, 47.4, 8.5)
	var s Sky
	for i := 0; i < b.N; i++ {
		s = NewSky(sun, float64(100+i%700), 1320)
	}
	sinkSky = s
}

func BenchmarkTilted(b *testing.B) {
	day := time.Date(2022, 6, 21, 12, 0, 0, 0, time.UTC)
	var s Irradiance
	for i := 0; i < b.N; i++ {
		r := Tilted(float64(100+i%700), 35, 190, 90, 180, day, 0.2)
		s.TotalWM2 += r.TotalWM2
	}
	sinkIrr = s
}
