package leach

import "math"

// KelvinOffset converts °C to K.
const KelvinOffset = 273.15

func inRange(tempC float64) bool {
	return tempC >= MinTempC && tempC <= MaxTempC // false for NaN
}

func (a *analytic) logK(tempC float64) float64 {
	t := tempC + KelvinOffset
	return a.a1 + a.a2*t + a.a3/t + a.a4*math.Log10(t) + a.a5/(t*t)
}

// LogK returns log10 of the dissolution constant of phase p at tempC,
//
//	log10 K = A1 + A2·T + A3/T + A4·log10(T) + A5/T²,   T = tempC + 273.15 K
//
// for the reactions CaSO4·νH2O = Ca+2 + SO4-2 + ν H2O with ν = 2 (gypsum),
// 0.5 (bassanite) and 0 (anhydrite), coefficients A1…A5 from the PHASES
// block of llnl.dat (DatabaseVersion). Valid for MinTempC ≤ tempC ≤
// MaxTempC; NaN outside that range or for an unknown phase.
//
// At 25 °C the expression gives −4.531 (gypsum), −3.706 (bassanite) and
// −4.350 (anhydrite), 0.04–0.05 below the file's own log_k values
// (−4.4823, −3.6615, −4.3064): the file's analytic fits do not pass exactly
// through its 25 °C points. The analytic form is the one PHREEQC evaluates
// with this file, and it is used here at all temperatures.
func LogK(p Phase, tempC float64) float64 {
	if !p.valid() || !inRange(tempC) {
		return math.NaN()
	}
	return p.coefficients().logK(tempC)
}

// LogKIonPair returns log10 of the formation constant of the neutral ion
// pair,
//
//	Ca+2 + SO4-2 = CaSO4°,   log10 K = A1 + A2·T + A3/T + A4·log10(T) + A5/T²
//
// with A1…A5 from the SOLUTION_SPECIES block of llnl.dat (DatabaseVersion).
// At 25 °C it gives 2.165 against the file's log_k of 2.1111. Valid for
// MinTempC ≤ tempC ≤ MaxTempC; NaN outside.
func LogKIonPair(tempC float64) float64 {
	if !inRange(tempC) {
		return math.NaN()
	}
	return dbIonPair.logK(tempC)
}
