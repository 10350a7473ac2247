package leach

import "math"

// interpDB interpolates a row of the database's activity table linearly in
// temperature, as between the tabulated points of
// LLNL_AQUEOUS_MODEL_PARAMETERS. The table starts at 0 °C (MinTempC), so
// no extrapolation is needed inside the package's range.
func interpDB(row *[8]float64, tempC float64) float64 {
	i := 0
	for i < len(dbTempsC)-2 && tempC > dbTempsC[i+1] {
		i++
	}
	t0, t1 := dbTempsC[i], dbTempsC[i+1]
	f := (tempC - t0) / (t1 - t0)
	return row[i] + f*(row[i+1]-row[i])
}

// DebyeHuckelA returns the Debye–Hückel limiting-law parameter A
// (kg^½·mol^-½) of the pinned database at tempC, interpolated linearly
// between its tabulated temperatures (0, 25, 60, 100, 150, … °C; 0.5095
// at 25 °C). Valid for MinTempC ≤ tempC ≤ MaxTempC; NaN outside.
// Source: Thermoddem V1.10, LLNL_AQUEOUS_MODEL_PARAMETERS -dh_a.
func DebyeHuckelA(tempC float64) float64 {
	if !inRange(tempC) {
		return math.NaN()
	}
	return interpDB(&dbDHA, tempC)
}

// DebyeHuckelB returns the Debye–Hückel parameter B (kg^½·mol^-½·Å^-1) of
// the pinned database at tempC (0.3284 at 25 °C), interpolated as
// DebyeHuckelA. Source: Thermoddem V1.10, -dh_b.
func DebyeHuckelB(tempC float64) float64 {
	if !inRange(tempC) {
		return math.NaN()
	}
	return interpDB(&dbDHB, tempC)
}

// Bdot returns the B-dot parameter Ḃ (kg/mol) of the pinned database at
// tempC (0.041 at 25 °C), interpolated as DebyeHuckelA. Source:
// Thermoddem V1.10, -bdot.
func Bdot(tempC float64) float64 {
	if !inRange(tempC) {
		return math.NaN()
	}
	return interpDB(&dbBdot, tempC)
}

// LogGamma returns log10 of the activity coefficient of an ion of charge z
// and ion size åAngstrom at ionic strength ionicStrengthMol (mol/kg) and
// tempC, by the B-dot equation of the pinned database,
//
//	log10 γ = −A·z²·√I / (1 + å·B·√I) + Ḃ·I
//
// with A, B, Ḃ from DebyeHuckelA, DebyeHuckelB and Bdot. Neutral species
// (z = 0) get log10 γ = 0. The equation is used to I ≈ 1 mol/kg; beyond
// that it is outside its calibration. Source: the activity model of
// Thermoddem V1.10 in PHREEQC format (LLNL_AQUEOUS_MODEL_PARAMETERS with
// per-species -llnl_gamma), after Helgeson 1969, Am. J. Sci. 267, 729
// (citation from memory).
func LogGamma(z, ionSizeAngstrom, ionicStrengthMol, tempC float64) float64 {
	if z == 0 {
		return 0
	}
	i := math.Max(ionicStrengthMol, 0)
	s := math.Sqrt(i)
	return -DebyeHuckelA(tempC)*z*z*s/(1+ionSizeAngstrom*DebyeHuckelB(tempC)*s) + Bdot(tempC)*i
}
