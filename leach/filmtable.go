package leach

import (
	"math"
	"sync"
)

// FilmTable is the film saturation of FilmModel as a function of its two
// dimensionless groups, tabulated once for a rate law's shape (order n and
// switch Ωs) so that Monte Carlo samples cost a table look-up per wet hour.
//
// Scaling the film equations of FilmSaturation by the reaction time of the
// film, h·c_eq/k1, leaves
//
//	du/dτ = −r(u_s),   r(u_s) = (u − u_s)/Da,   u(0) = 1
//	r = u_s                          (linear branch, u_s > 1 − Ωs)
//	r = (1 − Ωs)^(1−n)·u_s^n          (near-equilibrium branch)
//	τ  = k1·t / (h·c_eq)              contact time in reaction times
//	Da = k1·h / (3·D·c_eq)            surface reaction over diffusion across the film
//
// so the saturation Ω = 1 − u depends on τ and Da alone. The table holds
// u itself on a grid uniform in ln τ (60 nodes a decade, 10⁻⁶ to 10¹²) and
// in ln Da (20 a decade, 10⁻⁴ to 10⁶), filled with FilmModel's closed
// forms, and interpolates bilinearly, so a look-up costs no exponential;
// outside the grid it falls back to the closed forms. u is smooth in ln τ
// (on the linear branch u = exp(−τ/(1 + Da)), whose second derivative in
// ln τ stays below 0.3) and in ln Da; the tests bound the error against
// FilmModel.Saturation.
type FilmTable struct {
	m                 *FilmModel // for the closed forms (only n, Ωs and ε are used)
	lnTau0, lnDa0     float64
	invDTau, invDDa   float64
	nTau, nDa         int
	u                 []float64 // 1 − Ω at [iDa*nTau + iTau]
	lnTauMax, lnDaMax float64
}

const (
	filmTableTauDecades = 18
	filmTableTauPer     = 60
	filmTableDaDecades  = 10
	filmTableDaPer      = 20
)

var filmTables sync.Map // [2]float64{n, Ωs} → *FilmTable

// Table returns the FilmTable of the model's rate-law shape, built on first
// use and shared (it does not depend on k1, temperature or the solubility).
func (m *FilmModel) Table() *FilmTable {
	key := [2]float64{m.n, m.law.SwitchSaturation}
	if t, ok := filmTables.Load(key); ok {
		return t.(*FilmTable)
	}
	t := newFilmTable(m)
	actual, _ := filmTables.LoadOrStore(key, t)
	return actual.(*FilmTable)
}

func newFilmTable(m *FilmModel) *FilmTable {
	ln10 := math.Ln10
	t := &FilmTable{m: m,
		lnTau0: -6 * ln10, lnDa0: -4 * ln10,
		invDTau: filmTableTauPer / ln10, invDDa: filmTableDaPer / ln10,
		nTau: filmTableTauDecades*filmTableTauPer + 1, nDa: filmTableDaDecades*filmTableDaPer + 1,
	}
	t.lnTauMax = t.lnTau0 + float64(t.nTau-1)/t.invDTau
	t.lnDaMax = t.lnDa0 + float64(t.nDa-1)/t.invDDa
	t.u = make([]float64, t.nTau*t.nDa)
	for j := 0; j < t.nDa; j++ {
		da := math.Exp(t.lnDa0 + float64(j)/t.invDDa)
		for i := 0; i < t.nTau; i++ {
			tau := math.Exp(t.lnTau0 + float64(i)/t.invDTau)
			t.u[j*t.nTau+i] = 1 - t.exact(tau, da)
		}
	}
	return t
}

// exact is FilmModel's closed form in the dimensionless variables: k1 = 1,
// c_eq = 1, h = 1, so t = τ and D = 1/(3·Da).
func (t *FilmTable) exact(tau, da float64) float64 {
	return t.m.saturation(1, 1, 1/(3*da), 1, tau)
}

// Saturation returns Ω(τ, Da) for τ ≥ 0 and Da > 0 (NaN otherwise).
func (t *FilmTable) Saturation(tau, da float64) float64 {
	if !(tau >= 0) || !(da > 0) || math.IsInf(tau, 0) || math.IsInf(da, 0) {
		if math.IsInf(tau, 1) && da > 0 {
			return 1
		}
		return math.NaN()
	}
	if tau == 0 {
		return 0
	}
	return t.SaturationLn(math.Log(tau), math.Log(da))
}

// SaturationLn is Saturation for ln τ and ln Da, for callers that carry
// the groups as logarithms (sums of logs of their factors).
func (t *FilmTable) SaturationLn(lt, ld float64) float64 {
	if math.IsNaN(lt) || math.IsNaN(ld) {
		return math.NaN()
	}
	if lt < t.lnTau0 || lt > t.lnTauMax || ld < t.lnDa0 || ld > t.lnDaMax {
		if math.IsInf(lt, -1) {
			return 0
		}
		return t.exact(math.Exp(lt), math.Exp(ld))
	}
	x := (lt - t.lnTau0) * t.invDTau
	y := (ld - t.lnDa0) * t.invDDa
	i, j := int(x), int(y)
	if i >= t.nTau-1 {
		i = t.nTau - 2
	}
	if j >= t.nDa-1 {
		j = t.nDa - 2
	}
	fx, fy := x-float64(i), y-float64(j)
	r0 := t.u[j*t.nTau+i:]
	r1 := t.u[(j+1)*t.nTau+i:]
	return 1 - ((1-fy)*((1-fx)*r0[0]+fx*r0[1]) + fy*((1-fx)*r1[0]+fx*r1[1]))
}

// LnProperties returns ln k1 (mol/(m²·s)), ln c_eq (mol/m³) and ln D
// (m²/s) at tempC, from which the logarithms of τ and Da follow:
//
//	ln τ  = ln k1 + ln t − ln h − ln c_eq
//	ln Da = ln k1 + ln h − ln 3 − ln D − ln c_eq
func (m *FilmModel) LnProperties(tempC float64) (lnK1, lnCeq, lnD float64) {
	return math.Log(m.law.k1At(tempC)), math.Log(m.interp(m.ceq, tempC)), math.Log(m.interp(m.diff, tempC))
}

// Groups returns τ and Da of a film of thickness h (m) in contact for t (s)
// at tempC, for the model's rate constant: the arguments of
// FilmTable.Saturation.
func (m *FilmModel) Groups(tempC, filmThicknessM, contactTimeS float64) (tau, da float64) {
	ceq := m.interp(m.ceq, tempC)
	d := m.interp(m.diff, tempC)
	k1 := m.law.k1At(tempC)
	return k1 * contactTimeS / (filmThicknessM * ceq), k1 * filmThicknessM / (3 * d * ceq)
}
