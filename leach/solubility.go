package leach

import (
	"errors"
	"fmt"
	"math"
)

// MaxIonicStrengthMol is the largest background ionic strength (mol/kg)
// accepted by Solubility: the B-dot activity model is calibrated to about
// 1 mol/kg.
const MaxIonicStrengthMol = 1.0

// SaturatedSolution is the composition of water saturated with one phase.
// (Go does not allow the type to share the name of the Solubility
// function.)
type SaturatedSolution struct {
	Phase Phase
	TempC float64

	// BackgroundIonicStrengthMol is the ionic strength (mol/kg) of the
	// other salts in the water, taken as an inert 1:1 salt (for example
	// NaCl) that neither complexes calcium or sulfate nor shares an ion
	// with the phase.
	BackgroundIonicStrengthMol float64

	MolPerKg  float64 // dissolved calcium = dissolved sulfate, mol per kg of water
	MmolPerKg float64 // the same in mmol/kg

	// MolPerM3 is the dissolved CaSO4 per m³ of solution (= mmol/L),
	// GPerL the mass of the phase itself (CaSO4·νH2O) dissolved per litre
	// of solution. Both take the volume of the solution as that of its
	// water and the dissolved CaSO4 at the density of pure water at TempC:
	// V = (1 kg + m·M_CaSO4)/ρ_w(T). At gypsum saturation this
	// overestimates the volume by about 0.15 %, a bias far below the
	// spread of measured solubilities.
	MolPerM3 float64
	GPerL    float64

	IonicStrengthMol float64 // total ionic strength, background included, mol/kg
	FreeIonMolPerKg  float64 // free Ca+2 (= free SO4-2), mol/kg
	IonPairMolPerKg  float64 // CaSO4° ion pair, mol/kg
	GammaCa          float64 // activity coefficient of Ca+2
	GammaSO4         float64 // activity coefficient of SO4-2
	WaterActivity    float64
}

// waterActivityFactor is the coefficient of PHREEQC's dilute-solution water
// activity, a_w = 1 − 0.017·Σm_i (Parkhurst & Appelo 1999, USGS WRI
// 99-4259, from memory). At gypsum saturation a_w ≈ 0.9995.
const waterActivityFactor = 0.017

// Solubility returns the composition of water saturated with phase p at
// tempC with a background ionic strength ionicStrengthMol, solving
//
//	log10 K_p(T) = log10(γCa·m) + log10(γSO4·m) + ν·log10 a_w
//	m_IP = K_IP(T)·γCa·γSO4·m²,     m_total = m + m_IP
//	I = I_bg + 4m,   log10 γ = −A z² √I/(1 + å B √I) + Ḃ I,   γ_IP = 1
//	a_w = 1 − 0.017·(2m + m_IP + 2·I_bg)
//
// for the free-ion molality m by a bracketed solve in ln m, with K_p from
// LogK, K_IP from LogKIonPair and the activity model from LogGamma (ion
// sizes 6 Å for Ca+2 and 4 Å for SO4-2, Thermoddem V1.10). ν is the
// hydrate water of the phase (2, 0.5, 0). The background salt is taken as
// inert and 1:1.
//
// Valid for MinTempC ≤ tempC ≤ MaxTempC and 0 ≤ ionicStrengthMol ≤
// MaxIonicStrengthMol; other arguments return a *RangeError. Bassanite and
// anhydrite are metastable in water over much of the range; their
// solubility is that of the phase as long as it persists.
func Solubility(p Phase, tempC, ionicStrengthMol float64) (SaturatedSolution, error) {
	if !p.valid() {
		return SaturatedSolution{}, fmt.Errorf("leach: unknown phase %d", int(p))
	}
	if err := checkTemp(tempC); err != nil {
		return SaturatedSolution{}, err
	}
	if err := checkRange("background ionic strength (mol/kg)", ionicStrengthMol, 0, MaxIonicStrengthMol); err != nil {
		return SaturatedSolution{}, err
	}
	logK := LogK(p, tempC)
	kIP := math.Pow(10, LogKIonPair(tempC))
	nu := p.WaterMoles()
	a, b, bd := DebyeHuckelA(tempC), DebyeHuckelB(tempC), Bdot(tempC)

	// state evaluates the speciation for a free-ion molality m.
	type state struct{ gCa, gSO4, mIP, aw, i float64 }
	eval := func(m float64) state {
		i := ionicStrengthMol + 4*m
		s := math.Sqrt(i)
		lgCa := -a*4*s/(1+ionSizeCaAngstrom*b*s) + bd*i
		lgSO4 := -a*4*s/(1+ionSizeSO4Angstrom*b*s) + bd*i
		gCa, gSO4 := math.Pow(10, lgCa), math.Pow(10, lgSO4)
		mIP := kIP * gCa * gSO4 * m * m
		aw := 1 - waterActivityFactor*(2*m+mIP+2*ionicStrengthMol)
		return state{gCa, gSO4, mIP, aw, i}
	}
	f := func(lnM float64) float64 {
		m := math.Exp(lnM)
		st := eval(m)
		if st.aw <= 0 {
			return math.Inf(1)
		}
		return math.Log10(st.gCa*m) + math.Log10(st.gSO4*m) + nu*math.Log10(st.aw) - logK
	}
	lnM, err := solveBracketed(f, math.Log(1e-9), math.Log(1.0), 1e-13)
	if err != nil {
		return SaturatedSolution{}, fmt.Errorf("leach: solubility of %v at %g °C, I = %g mol/kg: %w", p, tempC, ionicStrengthMol, err)
	}
	m := math.Exp(lnM)
	st := eval(m)
	total := m + st.mIP
	rho := WaterDensityKgPerM3(tempC)
	c := total * rho / (1 + total*MolarMassCaSO4/1000) // mol/m³ of solution
	return SaturatedSolution{
		Phase:                      p,
		TempC:                      tempC,
		BackgroundIonicStrengthMol: ionicStrengthMol,
		MolPerKg:                   total,
		MmolPerKg:                  total * 1000,
		MolPerM3:                   c,
		GPerL:                      c * p.MolarMassGPerMol() / 1000,
		IonicStrengthMol:           st.i,
		FreeIonMolPerKg:            m,
		IonPairMolPerKg:            st.mIP,
		GammaCa:                    st.gCa,
		GammaSO4:                   st.gSO4,
		WaterActivity:              st.aw,
	}, nil
}

var errNoBracket = errors.New("no sign change in the search interval")

// solveBracketed finds a root of f in [lo, hi], where f changes sign, by
// the Illinois variant of false position (guaranteed to stay inside the
// bracket), to an interval width tol.
func solveBracketed(f func(float64) float64, lo, hi, tol float64) (float64, error) {
	flo, fhi := f(lo), f(hi)
	if math.IsNaN(flo) || math.IsNaN(fhi) {
		return math.NaN(), errors.New("function is NaN at the bracket ends")
	}
	if flo == 0 {
		return lo, nil
	}
	if fhi == 0 {
		return hi, nil
	}
	if (flo > 0) == (fhi > 0) {
		return math.NaN(), errNoBracket
	}
	side := 0
	for iter := 0; iter < 200; iter++ {
		var x float64
		if math.IsInf(flo, 0) || math.IsInf(fhi, 0) {
			x = 0.5 * (lo + hi)
		} else {
			x = (lo*fhi - hi*flo) / (fhi - flo)
			if !(x > lo && x < hi) {
				x = 0.5 * (lo + hi)
			}
		}
		fx := f(x)
		if math.IsNaN(fx) {
			return math.NaN(), errors.New("function is NaN inside the bracket")
		}
		if fx == 0 || hi-lo < tol {
			return x, nil
		}
		if (fx > 0) == (fhi > 0) {
			hi, fhi = x, fx
			if side == 1 {
				flo /= 2
			}
			side = 1
		} else {
			lo, flo = x, fx
			if side == -1 {
				fhi /= 2
			}
			side = -1
		}
		if hi-lo < tol {
			return 0.5 * (lo + hi), nil
		}
	}
	return 0.5 * (lo + hi), nil
}

// SolubilityTable holds the saturation concentration of gypsum over a
// temperature range for fast lookup by linear interpolation. Build it once
// with NewSolubilityTable; At and CeqMolPerM3 do not allocate.
type SolubilityTable struct {
	minC, maxC, stepC, invStep float64
	ionicStrengthMol           float64
	gPerL                      []float64
	molPerM3                   []float64
}

// NewSolubilityTable computes the gypsum solubility (Solubility) at every
// node from minC to maxC in steps of stepC (°C) at background ionic
// strength ionicStrengthMol. The step is shortened, if needed, so that it
// divides the range into whole intervals; at most 100000 intervals. The
// range must lie within MinTempC…MaxTempC.
func NewSolubilityTable(minC, maxC, stepC, ionicStrengthMol float64) (*SolubilityTable, error) {
	if err := checkTemp(minC); err != nil {
		return nil, err
	}
	if err := checkTemp(maxC); err != nil {
		return nil, err
	}
	if !(maxC > minC) {
		return nil, fmt.Errorf("leach: solubility table range %g to %g °C is empty", minC, maxC)
	}
	if !(stepC > 0) || math.IsInf(stepC, 0) {
		return nil, fmt.Errorf("leach: solubility table step %g °C must be positive", stepC)
	}
	n := int(math.Ceil((maxC-minC)/stepC - 1e-9))
	if n < 1 {
		n = 1
	}
	if n > 100000 {
		return nil, fmt.Errorf("leach: solubility table step %g °C gives %d intervals (at most 100000)", stepC, n)
	}
	t := &SolubilityTable{
		minC: minC, maxC: maxC, stepC: (maxC - minC) / float64(n),
		ionicStrengthMol: ionicStrengthMol,
		gPerL:            make([]float64, n+1),
		molPerM3:         make([]float64, n+1),
	}
	t.invStep = 1 / t.stepC
	for i := 0; i <= n; i++ {
		tc := minC + float64(i)*t.stepC
		if i == n {
			tc = maxC
		}
		s, err := Solubility(Gypsum, tc, ionicStrengthMol)
		if err != nil {
			return nil, err
		}
		t.gPerL[i] = s.GPerL
		t.molPerM3[i] = s.MolPerM3
	}
	return t, nil
}

// Range returns the temperature range (°C) covered by the table.
func (t *SolubilityTable) Range() (minC, maxC float64) { return t.minC, t.maxC }

// StepC returns the node spacing (°C).
func (t *SolubilityTable) StepC() float64 { return t.stepC }

func (t *SolubilityTable) interp(v []float64, tempC float64) float64 {
	if !(tempC >= t.minC && tempC <= t.maxC) {
		return math.NaN()
	}
	x := (tempC - t.minC) * t.invStep
	i := int(x)
	if i >= len(v)-1 {
		i = len(v) - 2
	}
	f := x - float64(i)
	return v[i] + f*(v[i+1]-v[i])
}

// At returns the mass of gypsum (CaSO4·2H2O, g) that saturates one litre of
// solution at tempC, interpolated linearly between the table's nodes (with
// a 1 °C step the interpolation error is below 0.01 %). NaN outside the
// table's range.
func (t *SolubilityTable) At(tempC float64) float64 { return t.interp(t.gPerL, tempC) }

// CeqMolPerM3 returns the saturation concentration of CaSO4 at tempC in
// mol per m³ of solution (= mmol/L), interpolated as At. NaN outside the
// table's range.
func (t *SolubilityTable) CeqMolPerM3(tempC float64) float64 { return t.interp(t.molPerM3, tempC) }
