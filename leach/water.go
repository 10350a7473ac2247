package leach

import "math"

// WaterDensityKgPerM3 returns the density of air-free liquid
// water at 101.325 kPa,
//
//	ρ = (999.83952 + 16.945176·t − 7.9870401e-3·t² − 46.170461e-6·t³
//	     + 105.56302e-9·t⁴ − 280.54253e-12·t⁵) / (1 + 16.879850e-3·t)
//
// t in °C, ρ in kg/m³. Valid for 0 ≤ t ≤ 150 °C (above 100 °C for water kept
// liquid under its vapour pressure); NaN outside. Source: Kell 1975,
// J. Chem. Eng. Data 20, 97–105, equation 16 (coefficients from memory,
// checked in the tests against tabulated densities).
func WaterDensityKgPerM3(tempC float64) float64 {
	if !(tempC >= 0 && tempC <= 150) {
		return math.NaN()
	}
	t := tempC
	num := 999.83952 + t*(16.945176+t*(-7.9870401e-3+t*(-46.170461e-6+t*(105.56302e-9+t*(-280.54253e-12)))))
	return num / (1 + 16.879850e-3*t)
}

// WaterViscosityPaS returns the dynamic viscosity of liquid water at
// 0.1 MPa,
//
//	log10(μ/μ20) = (20 − t)/(t + 96) · (1.2378 − 1.303e-3·(20 − t)
//	               + 3.06e-6·(20 − t)² + 2.55e-8·(20 − t)³),   μ20 = 1.002e-3 Pa·s
//
// t in °C, μ in Pa·s. Valid for 0 ≤ t ≤ 150 °C; NaN outside. Source: Kestin,
// Sokolov & Wakeham 1978, J. Phys. Chem. Ref. Data 7, 941–948, as given in
// the CRC Handbook of Chemistry and Physics, "Viscosity of liquid water"
// (formula from memory, checked in the tests against IAPWS 2008 values).
func WaterViscosityPaS(tempC float64) float64 {
	if !(tempC >= 0 && tempC <= 150) {
		return math.NaN()
	}
	d := 20 - tempC
	e := d / (tempC + 96) * (1.2378 + d*(-1.303e-3+d*(3.06e-6+d*2.55e-8)))
	return 1.002e-3 * math.Pow(10, e)
}
