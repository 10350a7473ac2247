package leach

import (
	"fmt"
	"math"
)

// GasConstantJPerMolK is the molar gas constant (CODATA 2018).
const GasConstantJPerMolK = 8.314462618

// DeltaGJPerMol returns the Gibbs energy of dehydrating one mole of gypsum
// to phase p at tempC and water activity waterActivity (= RH/100 for water
// vapour in air, 1 for liquid water),
//
//	CaSO4·2H2O = CaSO4·νH2O + (2 − ν) H2O
//	ΔG = −R·T·ln10·(log10 K_gypsum − log10 K_p) + (2 − ν)·R·T·ln a_w
//
// in J/mol, with both log K from LogK, so that solubility and dehydration
// come from the same constants. (2 − ν) is 1.5 for bassanite and 2 for
// anhydrite. Negative ΔG: gypsum is unstable against p and would dehydrate
// if kinetics allowed; positive: gypsum is stable. DeltaGJPerMol(Gypsum, …)
// is 0. Valid for MinTempC ≤ tempC ≤ MaxTempC and 0 < waterActivity ≤ 1;
// NaN outside.
func DeltaGJPerMol(p Phase, tempC, waterActivity float64) float64 {
	if !p.valid() || !inRange(tempC) || !(waterActivity > 0 && waterActivity <= 1) {
		return math.NaN()
	}
	if p == Gypsum {
		return 0
	}
	rt := GasConstantJPerMolK * (tempC + KelvinOffset)
	dnu := Gypsum.WaterMoles() - p.WaterMoles()
	return -rt*math.Ln10*(LogK(Gypsum, tempC)-LogK(p, tempC)) + dnu*rt*math.Log(waterActivity)
}

// EquilibriumRHPct returns the relative humidity (%) at which gypsum and
// phase p are in equilibrium at tempC, the root of DeltaGJPerMol:
//
//	RH_eq = 100 · 10^((log10 K_gypsum − log10 K_p)/(2 − ν))
//
// Below RH_eq gypsum is unstable against p. A value above 100 means that p
// is the stable phase at every humidity at this temperature, even in liquid
// water. Valid for MinTempC ≤ tempC ≤ MaxTempC; NaN outside and for
// p = Gypsum.
func EquilibriumRHPct(p Phase, tempC float64) float64 {
	if p == Gypsum || !p.valid() || !inRange(tempC) {
		return math.NaN()
	}
	dnu := Gypsum.WaterMoles() - p.WaterMoles()
	return 100 * math.Pow(10, (LogK(Gypsum, tempC)-LogK(p, tempC))/dnu)
}

// ErrNoTransition is wrapped by TransitionC when gypsum and the phase do
// not reach equilibrium anywhere in MinTempC…MaxTempC at the given RH.
var ErrNoTransition = fmt.Errorf("no gypsum transition in %g–%g °C", MinTempC, MaxTempC)

// TransitionC returns the temperature (°C) at which gypsum and phase p are
// in equilibrium at relative humidity rhPct, the root in T of
//
//	DeltaGJPerMol(p, T, rhPct/100) = 0
//
// Above it gypsum is unstable against p. rhPct = 100 gives the transition
// in liquid water. The root is bracketed on a 5 °C grid over MinTempC…
// MaxTempC and refined to 1e-6 °C. Errors: a *RangeError for rhPct outside
// 0 < rhPct ≤ 100 or p = Gypsum, and an error wrapping ErrNoTransition when
// there is no root in the range.
func TransitionC(p Phase, rhPct float64) (float64, error) {
	if p == Gypsum || !p.valid() {
		return math.NaN(), fmt.Errorf("leach: transition of gypsum to %v is not defined", p)
	}
	if !(rhPct > 0 && rhPct <= 100) {
		return math.NaN(), &RangeError{Quantity: "relative humidity (%)", Value: rhPct, Min: 0, Max: 100}
	}
	aw := rhPct / 100
	f := func(tc float64) float64 { return DeltaGJPerMol(p, tc, aw) }
	const step = 5.0
	lo, flo := MinTempC, f(MinTempC)
	if flo == 0 {
		return lo, nil
	}
	for lo < MaxTempC {
		hi := math.Min(lo+step, MaxTempC)
		fhi := f(hi)
		if (flo > 0) != (fhi > 0) || fhi == 0 {
			return solveBracketed(f, lo, hi, 1e-6)
		}
		lo, flo = hi, fhi
	}
	return math.NaN(), fmt.Errorf("leach: %v at %g %% RH: %w", p, rhPct, ErrNoTransition)
}

// InvalidPhase is returned by StablePhase for arguments outside its
// range.
const InvalidPhase Phase = -1

// StablePhase returns the thermodynamically stable phase at tempC and
// relative humidity rhPct: the one of gypsum (ΔG = 0), bassanite and
// anhydrite with the lowest DeltaGJPerMol. It says nothing about kinetics:
// at ordinary temperatures gypsum persists for centuries where anhydrite is
// "stable", so in-service dehydration risk is judged on the bassanite route
// (see the package documentation). Arguments outside MinTempC ≤ tempC ≤
// MaxTempC, 0 < rhPct ≤ 100 return InvalidPhase.
func StablePhase(tempC, rhPct float64) Phase {
	aw := rhPct / 100
	if !inRange(tempC) || !(aw > 0 && aw <= 1) {
		return InvalidPhase
	}
	best, g := Gypsum, 0.0
	for _, q := range [...]Phase{Bassanite, Anhydrite} {
		if dg := DeltaGJPerMol(q, tempC, aw); dg < g {
			best, g = q, dg
		}
	}
	return best
}
