package climate

import (
	"fmt"
	"math"
	"strings"
)

// The wall-index factors of ISO 15927-3:2009, clause 5, which turn an
// airfield driving rain index I_A into the index on a particular wall:
//
//	I_WA = I_A · C_R · C_T · O · W
//
// with the roughness coefficient C_R (terrain category and height), the
// topography coefficient C_T, the obstruction factor O and the wall factor
// W. The standard was not available to this work: the table values below
// are from memory of ISO 15927-3:2009 (they also match BS 8104:1992, on
// which it is based) and are marked so wherever they are used. Where a
// project depends on them, give the factors explicitly.

// Terrain is an ISO 15927-3 terrain roughness category, I (smoothest) to IV.
type Terrain int

// The terrain categories of ISO 15927-3:2009, clause 5, terrain table (from
// memory):
const (
	TerrainI   Terrain = iota + 1 // rough open sea; lake shore with at least 5 km of open water upwind; smooth flat country without obstacles
	TerrainII                     // farmland with boundary hedges, occasional small farm structures, houses or trees
	TerrainIII                    // suburban or industrial areas and permanent forest
	TerrainIV                     // urban areas in which at least 15 % of the surface is covered with buildings over 15 m high
)

var terrainNames = [...]string{"", "I", "II", "III", "IV"}

// terrainTable holds K_R, z_0 (m) and z_min (m) for each category:
// ISO 15927-3:2009, clause 5, terrain table (from memory).
var terrainTable = [...]struct{ kR, z0M, zMinM float64 }{
	{},
	{0.17, 0.01, 2},
	{0.19, 0.05, 4},
	{0.22, 0.3, 8},
	{0.24, 1.0, 16},
}

// ParseTerrain parses a terrain category written as a Roman numeral, "I",
// "II", "III" or "IV" (case and surrounding space ignored).
func ParseTerrain(s string) (Terrain, error) {
	u := strings.ToUpper(strings.TrimSpace(s))
	for t := TerrainI; t <= TerrainIV; t++ {
		if terrainNames[t] == u {
			return t, nil
		}
	}
	return 0, fmt.Errorf("terrain category %q: want I, II, III or IV (ISO 15927-3)", s)
}

// String returns the category's Roman numeral, or "Terrain(n)" for an
// invalid value.
func (t Terrain) String() string {
	if t.valid() {
		return terrainNames[t]
	}
	return fmt.Sprintf("Terrain(%d)", int(t))
}

func (t Terrain) valid() bool { return t >= TerrainI && t <= TerrainIV }

// KR returns the terrain factor K_R (dimensionless) of the category
// (ISO 15927-3:2009, clause 5, terrain table, from memory); NaN for an
// invalid category.
func (t Terrain) KR() float64 {
	if !t.valid() {
		return math.NaN()
	}
	return terrainTable[t].kR
}

// Z0M returns the roughness length z_0 in metres (see KR).
func (t Terrain) Z0M() float64 {
	if !t.valid() {
		return math.NaN()
	}
	return terrainTable[t].z0M
}

// ZMinM returns the minimum height z_min in metres (see KR).
func (t Terrain) ZMinM() float64 {
	if !t.valid() {
		return math.NaN()
	}
	return terrainTable[t].zMinM
}

// RoughnessCoefficient returns the roughness coefficient C_R at height
// heightM (m above ground) in terrain category t:
//
//	C_R(z) = K_R · ln(max(z, z_min)/z_0)
//
// It accounts for the mean wind speed at the wall's height and site
// relative to the 10 m airfield reference (C_R ≈ 1.0 at 10 m in category
// II). Source: ISO 15927-3:2009, clause 5, its roughness equation and terrain table
// (from memory). Errors for an invalid category and for a negative or non-finite
// height.
func RoughnessCoefficient(t Terrain, heightM float64) (float64, error) {
	if !t.valid() {
		return 0, fmt.Errorf("terrain category %v: want I to IV", t)
	}
	if !(heightM >= 0) || math.IsInf(heightM, 1) {
		return 0, fmt.Errorf("height %g m: want a finite height of 0 m or more above ground", heightM)
	}
	p := terrainTable[t]
	z := math.Max(heightM, p.zMinM)
	return p.kR * math.Log(z/p.z0M), nil
}

// TopographyCoefficient checks a user's topography coefficient C_T: 1 for
// level sites (the default), above 1 for hills and escarpments that speed
// the wind up, below 1 for sheltered valleys; ISO 15927-3:2009, clause 5,
// gives the procedure (not reproduced here). It returns c unchanged, or an
// error when c is not a positive finite number.
func TopographyCoefficient(c float64) (float64, error) {
	if !(c > 0) || math.IsInf(c, 1) {
		return 0, fmt.Errorf("topography coefficient %g: want a positive number (1 for level ground)", c)
	}
	return c, nil
}

// obstructionBands are the upper distance limits (m) and factors of the
// obstruction factor table; beyond the last band O = 1.
// ISO 15927-3:2009, clause 5, obstruction factor table (from memory).
var obstructionBands = [...]struct{ upToM, o float64 }{
	{8, 0.2}, {15, 0.3}, {25, 0.4}, {40, 0.5}, {60, 0.6}, {80, 0.7}, {100, 0.8}, {120, 0.9},
}

// ObstructionFactor returns the obstruction factor O for the distance
// distanceM (m) from the wall to the nearest obstruction upwind that is at
// least as high as the wall (another building, a dense tree belt):
//
//	d (m)   4–8  8–15  15–25  25–40  40–60  60–80  80–100  100–120  > 120
//	O       0.2  0.3   0.4    0.5    0.6    0.7    0.8     0.9      1.0
//
// Each band includes its lower limit (8 m gives 0.3). The table starts at
// 4 m; a closer obstruction is given the first band's 0.2 (our choice; the
// standard gives no value). +Inf means no obstruction (O = 1). Source:
// ISO 15927-3:2009, clause 5, obstruction factor table (from memory). Errors for a negative
// or NaN distance.
func ObstructionFactor(distanceM float64) (float64, error) {
	if !(distanceM >= 0) {
		return 0, fmt.Errorf("obstruction distance %g m: want 0 m or more", distanceM)
	}
	for _, b := range obstructionBands {
		if distanceM < b.upToM {
			return b.o, nil
		}
	}
	return 1, nil
}

// WallPosition names a position on a building for the wall factor W.
type WallPosition string

// The wall positions of the ISO 15927-3 wall factor table (clause 5,
// wall factor table; values from memory, see WallFactor).
const (
	WallGableTwoStorey WallPosition = "two-storey-gable"       // gable wall of a two-storey house, pitched roof
	WallTopStorey      WallPosition = "multi-storey-top"       // top storey of a multi-storey building
	WallBelowTopStorey WallPosition = "multi-storey-remainder" // the storeys below the top storey of a multi-storey building
)

var wallFactors = map[WallPosition]float64{
	WallGableTwoStorey: 0.4, // ISO 15927-3:2009, clause 5, wall factor table (from memory)
	WallTopStorey:      0.5, // ISO 15927-3:2009, clause 5, wall factor table (from memory)
	WallBelowTopStorey: 0.2, // ISO 15927-3:2009, clause 5, wall factor table (from memory)
}

// WallPositions returns the named positions WallFactor knows, in a fixed
// order.
func WallPositions() []WallPosition {
	return []WallPosition{WallGableTwoStorey, WallTopStorey, WallBelowTopStorey}
}

// WallFactor returns the wall factor W for a named position: the share of
// the free driving rain that a wall at that position catches, which is
// highest near the top and the edges of a building:
//
//	two-storey-gable         0.4
//	multi-storey-top         0.5
//	multi-storey-remainder   0.2
//
// Source: ISO 15927-3:2009, clause 5, wall factor table (values from memory, not
// checked against the standard: give wall_factor explicitly where it
// matters). An unknown position is an error that lists the known ones.
func WallFactor(p WallPosition) (float64, error) {
	if w, ok := wallFactors[WallPosition(strings.ToLower(strings.TrimSpace(string(p))))]; ok {
		return w, nil
	}
	names := make([]string, 0, len(wallFactors))
	for _, q := range WallPositions() {
		names = append(names, string(q))
	}
	return 0, fmt.Errorf("wall position %q: want one of %s", string(p), strings.Join(names, ", "))
}

// WallIndexFactor returns the product C_R·C_T·O·W by which ISO 15927-3:2009
// clause 5 scales an airfield index to a wall index (I_WA = I_A·C_R·C_T·O·W),
// for terrain t, a height heightM (m), a topography coefficient
// topography, the distance obstructionM (m) to the nearest obstruction
// (+Inf for none) and a wall factor wall (0–1, or above 1 for exceptional
// exposure). Errors name the offending input.
func WallIndexFactor(t Terrain, heightM, topography, obstructionM, wall float64) (float64, error) {
	cr, err := RoughnessCoefficient(t, heightM)
	if err != nil {
		return 0, err
	}
	ct, err := TopographyCoefficient(topography)
	if err != nil {
		return 0, err
	}
	o, err := ObstructionFactor(obstructionM)
	if err != nil {
		return 0, err
	}
	if !(wall >= 0) || math.IsInf(wall, 1) {
		return 0, fmt.Errorf("wall factor %g: want a finite number of 0 or more", wall)
	}
	return cr * ct * o * wall, nil
}
