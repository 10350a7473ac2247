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
// 0.5 (bassanite) and 0 (anhydrite), coefficients A1…A5 from the -analytic
// lines of the PHASES block of Thermoddem V1.10 (DatabaseVersion). Valid
// for MinTempC ≤ tempC ≤ MaxTempC; NaN outside that range or for an
// unknown phase.
//
// The fits pass through the file's 25 °C log_k: the expression gives
// −4.6047 (gypsum), −3.9195 (bassanite) and −4.4362 (anhydrite) against
// the file's −4.605, −3.919 and −4.436. Their slope at 25 °C gives a
// reaction enthalpy 0.6–0.7 kJ/mol below the file's delta_h (see the
// tests). The analytic form is the one PHREEQC evaluates with this file,
// and it is used here at all temperatures.
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
// with A1…A5 from the SOLUTION_SPECIES block of Thermoddem V1.10
// (DatabaseVersion). At 25 °C it gives 2.3100, the file's log_k of 2.310.
// Valid for MinTempC ≤ tempC ≤ MaxTempC; NaN outside.
func LogKIonPair(tempC float64) float64 {
	if !inRange(tempC) {
		return math.NaN()
	}
	return dbIonPair.logK(tempC)
}
