package leach

import "math"

// RateLaw is a surface rate law for gypsum dissolution,
//
//	R = k1·(1 − Ω)            for Ω < Ωs
//	R = kn·(1 − Ω)^n          for Ωs ≤ Ω < 1,   kn = k1·(1 − Ωs)^(1−n)
//	R = 0                     for Ω ≥ 1 (precipitation is not modelled)
//
// with Ω = c/c_eq the saturation at the mineral surface and R in
// mol/(m²·s) of CaSO4 leaving the surface. kn is fixed by continuity of R
// at Ωs. Ceq supplies c_eq(T); FilmSaturation needs it.
type RateLaw struct {
	Name string

	K1MolPerM2S      float64 // linear rate constant k1, mol/(m²·s)
	Order            float64 // n of the near-equilibrium branch
	SwitchSaturation float64 // Ωs, where the non-linear branch begins

	// ActivationEnergyJPerMol would scale k1 with temperature by an
	// Arrhenius factor exp(−Ea/R·(1/T − 1/T_ref)). It is 0 in Jeschke2001:
	// no activation energy for gypsum dissolution could be verified, so the
	// surface constant is held at its 20–25 °C value and temperature acts
	// only through c_eq(T) and D(T).
	ActivationEnergyJPerMol float64
	RefTempC                float64 // temperature of K1 and Diffusion, °C

	// DiffusionM2PerS is the diffusion coefficient of dissolved CaSO4 in
	// water at RefTempC; DiffusionCoefficient scales it with temperature.
	DiffusionM2PerS float64

	Ceq *SolubilityTable // gypsum saturation concentration c_eq(T)
}

// Jeschke2001 returns the gypsum dissolution rate law of Jeschke, Vosbeck
// & Dreybrodt 2001, Geochim. Cosmochim. Acta 65, 27–34: linear up to
// Ωs = 0.94 of saturation with k1 = 1.3·10⁻⁴ mmol/(cm²·s) =
// 1.3·10⁻³ mol/(m²·s), and of order n = 4.5 above. The switch point and
// the order are those of the paper's abstract; the value of k1 and n = 4.5
// are from memory and could not be checked against the paper. kn follows
// from continuity. k1 is of the order of the Palandri & Kharaka 2004 (USGS
// OFR 2004-1068) compilation for gypsum (log k = −2.79, from memory).
//
// The diffusion coefficient of dissolved CaSO4 is 1.0·10⁻⁹ m²/s, measured
// by holographic interferometry by Colombani & Bert 2007, Geochim.
// Cosmochim. Acta 71, 1913 (value read from the abstract; the temperature
// of 25 °C is from memory). Colombani 2008 (Geochim. Cosmochim. Acta 72,
// 5634) finds a pure surface constant as low as 4·10⁻⁵ mol/(m²·s); with
// that value set in K1MolPerM2S the film saturates more slowly.
func Jeschke2001(ceq *SolubilityTable) RateLaw {
	return RateLaw{
		Name:             "Jeschke, Vosbeck & Dreybrodt 2001",
		K1MolPerM2S:      1.3e-3,
		Order:            4.5,
		SwitchSaturation: 0.94,
		RefTempC:         25,
		DiffusionM2PerS:  1.0e-9,
		Ceq:              ceq,
	}
}

// knMolPerM2S returns the near-equilibrium constant kn = k1·(1 − Ωs)^(1−n).
func (l *RateLaw) knMolPerM2S(k1 float64) float64 {
	return k1 * math.Pow(1-l.SwitchSaturation, 1-l.Order)
}

// k1At returns k1 at tempC, with the Arrhenius factor when an activation
// energy is set.
func (l *RateLaw) k1At(tempC float64) float64 {
	if l.ActivationEnergyJPerMol == 0 {
		return l.K1MolPerM2S
	}
	t, tr := tempC+KelvinOffset, l.RefTempC+KelvinOffset
	return l.K1MolPerM2S * math.Exp(-l.ActivationEnergyJPerMol/GasConstantJPerMolK*(1/t-1/tr))
}

// SurfaceRateMolPerM2S returns the dissolution rate R (mol/(m²·s)) at
// surface saturation Ω = c/c_eq and tempC by the law's formula (see
// RateLaw). Ω < 0 is treated as an error: NaN.
func (l RateLaw) SurfaceRateMolPerM2S(saturation, tempC float64) float64 {
	if !(saturation >= 0) || !inRange(tempC) {
		return math.NaN()
	}
	k1 := l.k1At(tempC)
	switch {
	case saturation >= 1:
		return 0
	case saturation < l.SwitchSaturation:
		return k1 * (1 - saturation)
	}
	return l.knMolPerM2S(k1) * math.Pow(1-saturation, l.Order)
}

// DiffusionCoefficient returns the diffusion coefficient (m²/s) of
// dissolved CaSO4 at tempC, scaled from the law's reference value by the
// Stokes–Einstein relation,
//
//	D(T) = D_ref · (T/T_ref) · (μ(T_ref)/μ(T))
//
// with μ from WaterViscosityPaS. Source: Stokes–Einstein, e.g. Bird,
// Stewart & Lightfoot, Transport Phenomena, 2nd ed. 2002, §17.4 (section
// from memory). NaN
// outside 0–150 °C.
func (l RateLaw) DiffusionCoefficient(tempC float64) float64 {
	t, tr := tempC+KelvinOffset, l.RefTempC+KelvinOffset
	return l.DiffusionM2PerS * t / tr * WaterViscosityPaS(l.RefTempC) / WaterViscosityPaS(tempC)
}
