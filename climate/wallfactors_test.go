package climate

import (
	"fmt"
	"math"
	"testing"
)

func TestTerrainTable(t *testing.T) {
	// ISO 15927-3:2009, clause 5, terrain table (from memory).
	tests := []struct {
		in            string
		kR, z0, zMinM float64
	}{
		{"I", 0.17, 0.01, 2},    // ISO 15927-3:2009 clause 5 (from memory)
		{"ii", 0.19, 0.05, 4},   // ISO 15927-3:2009 clause 5 (from memory)
		{" III ", 0.22, 0.3, 8}, // ISO 15927-3:2009 clause 5 (from memory)
		{"IV", 0.24, 1.0, 16},   // ISO 15927-3:2009 clause 5 (from memory)
	}
	for _, tt := range tests {
		ter, err := ParseTerrain(tt.in)
		if err != nil {
			t.Fatalf("ParseTerrain(%q): %v", tt.in, err)
		}
		if ter.KR() != tt.kR || ter.Z0M() != tt.z0 || ter.ZMinM() != tt.zMinM {
			t.Errorf("%v: K_R %g, z0 %g, zmin %g", ter, ter.KR(), ter.Z0M(), ter.ZMinM())
		}
	}
	for _, bad := range []string{"", "V", "0", "3", "IIII"} {
		if _, err := ParseTerrain(bad); err == nil {
			t.Errorf("ParseTerrain(%q): no error", bad)
		}
	}
	if !math.IsNaN(Terrain(9).KR()) || Terrain(9).String() != "Terrain(9)" {
		t.Error("invalid category not flagged")
	}
}

func TestRoughnessCoefficient(t *testing.T) {
	tests := []struct {
		ter     Terrain
		z, want float64
		tol     float64
		src     string
	}{
		// The airfield reference, 10 m in open country, has C_R ≈ 1: the
		// standard's indices are defined for it (ISO 15927-3 clause 3;
		// 0.19·ln(200) = 1.0067 by hand).
		{TerrainII, 10, 1.0067, 1e-4, "ISO 15927-3 clause 5 by hand"},
		// Below z_min the coefficient is held at C_R(z_min): 0.22·ln(8/0.3) = 0.72235.
		{TerrainIII, 3, 0.72235, 1e-5, "ISO 15927-3 clause 5 by hand"},
		{TerrainIII, 8, 0.72235, 1e-5, "ISO 15927-3 clause 5 by hand"},
		// 0.24·ln(30/1) = 0.81628.
		{TerrainIV, 30, 0.81628, 1e-5, "ISO 15927-3 clause 5 by hand"},
		// 0.17·ln(20/0.01) = 1.29215.
		{TerrainI, 20, 1.29215, 1e-5, "ISO 15927-3 clause 5 by hand"},
	}
	for _, tt := range tests {
		got, err := RoughnessCoefficient(tt.ter, tt.z)
		if err != nil || math.Abs(got-tt.want) > tt.tol {
			t.Errorf("C_R(%v, %g m) = %.5f, %v; want %.5f (%s)", tt.ter, tt.z, got, err, tt.want, tt.src)
		}
	}
	for _, z := range []float64{-1, math.NaN(), math.Inf(1)} {
		if _, err := RoughnessCoefficient(TerrainII, z); err == nil {
			t.Errorf("height %g: no error", z)
		}
	}
	if _, err := RoughnessCoefficient(Terrain(0), 10); err == nil {
		t.Error("invalid terrain: no error")
	}
	// Higher never means drier.
	prev := 0.0
	for z := 0.0; z < 100; z += 0.5 {
		c, _ := RoughnessCoefficient(TerrainIII, z)
		if c < prev {
			t.Fatalf("C_R falls with height at %g m", z)
		}
		prev = c
	}
}

func TestObstructionFactor(t *testing.T) {
	// ISO 15927-3:2009, clause 5, obstruction factor table (from memory).
	tests := []struct{ d, want float64 }{
		{2, 0.2},    // closer than the table's 4 m: first band (our choice)
		{4, 0.2},    // ISO 15927-3 (from memory)
		{7.9, 0.2},  // ISO 15927-3 (from memory)
		{8, 0.3},    // ISO 15927-3 (from memory)
		{20, 0.4},   // ISO 15927-3 (from memory)
		{30, 0.5},   // ISO 15927-3 (from memory)
		{50, 0.6},   // ISO 15927-3 (from memory)
		{70, 0.7},   // ISO 15927-3 (from memory)
		{90, 0.8},   // ISO 15927-3 (from memory)
		{110, 0.9},  // ISO 15927-3 (from memory)
		{120, 1.0},  // ISO 15927-3 (from memory)
		{5000, 1.0}, // ISO 15927-3 (from memory)
		{math.Inf(1), 1.0},
	}
	for _, tt := range tests {
		if got, err := ObstructionFactor(tt.d); err != nil || got != tt.want {
			t.Errorf("O(%g m) = %g, %v; want %g", tt.d, got, err, tt.want)
		}
	}
	for _, d := range []float64{-0.1, math.NaN()} {
		if _, err := ObstructionFactor(d); err == nil {
			t.Errorf("distance %g: no error", d)
		}
	}
}

func TestWallFactor(t *testing.T) {
	tests := []struct {
		p    WallPosition
		want float64
	}{
		{WallGableTwoStorey, 0.4}, // ISO 15927-3:2009 clause 5 wall factor table (from memory)
		{WallTopStorey, 0.5},      // ISO 15927-3:2009 clause 5 wall factor table (from memory)
		{WallBelowTopStorey, 0.2}, // ISO 15927-3:2009 clause 5 wall factor table (from memory)
		{" Multi-Storey-Top ", 0.5},
	}
	for _, tt := range tests {
		if got, err := WallFactor(tt.p); err != nil || got != tt.want {
			t.Errorf("W(%q) = %g, %v; want %g", tt.p, got, err, tt.want)
		}
	}
	if _, err := WallFactor("penthouse"); err == nil {
		t.Error("unknown position: no error")
	}
	for _, p := range WallPositions() {
		if _, err := WallFactor(p); err != nil {
			t.Errorf("listed position %q: %v", p, err)
		}
	}
}

func TestWallIndexFactorByHand(t *testing.T) {
	// A hand calculation of ISO 15927-3:2009 clause 5, I_WA = I_A·C_R·C_T·O·W:
	// a wall 6 m up in suburban terrain (III, held at z_min = 8 m:
	// C_R = 0.22·ln(8/0.3) = 0.722351), level ground (C_T = 1), the nearest
	// obstruction 30 m upwind (O = 0.5), gable of a two-storey house
	// (W = 0.4): factor 0.144470; with I_A = 100 l/m², I_WA = 14.447 l/m².
	got, err := WallIndexFactor(TerrainIII, 6, 1, 30, 0.4)
	if err != nil || math.Abs(got*100-14.447) > 1e-3 {
		t.Errorf("I_WA = %.4f l/m², %v; want 14.447", got*100, err)
	}
	bad := []struct {
		name        string
		ter         Terrain
		z, ct, d, w float64
	}{
		{"terrain", 0, 6, 1, 30, 0.4},
		{"height", TerrainIII, -6, 1, 30, 0.4},
		{"topography", TerrainIII, 6, 0, 30, 0.4},
		{"obstruction", TerrainIII, 6, 1, -30, 0.4},
		{"wall factor", TerrainIII, 6, 1, 30, -0.4},
	}
	for _, b := range bad {
		if _, err := WallIndexFactor(b.ter, b.z, b.ct, b.d, b.w); err == nil {
			t.Errorf("bad %s: no error", b.name)
		}
	}
	// A lower wall factor never means more water.
	lo, _ := WallIndexFactor(TerrainII, 10, 1, 50, 0.2)
	hi, _ := WallIndexFactor(TerrainII, 10, 1, 50, 0.5)
	if lo > hi {
		t.Errorf("W 0.2 gives %g > W 0.5 gives %g", lo, hi)
	}
}

func ExampleWallIndexFactor() {
	// An invented wall: 6 m up, suburban terrain, a neighbour 30 m upwind,
	// the gable of a two-storey house, under an airfield index of 100 l/m².
	w, _ := WallFactor(WallGableTwoStorey)
	f, err := WallIndexFactor(TerrainIII, 6, 1, 30, w)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("I_WA = %.1f l/m² per year\n", 100*f)
	// Output:
	// I_WA = 14.4 l/m² per year
}
