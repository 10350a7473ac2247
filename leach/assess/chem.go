package assess

import (
	"math"

	"github.com/gyprisk/gyprisk/leach"
)

// chemistry holds the gypsum chemistry in the form the hourly loop needs:
// tables over the surface temperature range, built once per run from the
// leach package's thermodynamics.
type chemistry struct {
	sol *leach.SolubilityTable
	// lnAwEq[p] is ln of the water activity at which gypsum and phase p
	// are in equilibrium, tabulated over the same range, so that
	//
	//	ΔG = ν·R·T·(ln a_w − ln a_w,eq(T))
	//
	// the same ΔG as leach.DeltaGJPerMol, which states it as
	// −R·T·ln10·(log K_gypsum − log K_phase) + ν·R·T·ln a_w
	// (at equilibrium ΔG = 0 gives ν·ln a_w,eq = ln10·(log K_gypsum − log K_phase)).
	lnAwEqBas, lnAwEqAnh []float64
	film                 *leach.FilmModel // the Jeschke et al. 2001 rate law with diffusion across the film
}

const (
	chemMinC  = leach.MinTempC
	chemMaxC  = 100.0
	chemStepC = 0.1
)

func newChemistry() (*chemistry, error) {
	sol, err := leach.NewSolubilityTable(chemMinC, chemMaxC, chemStepC, 0)
	if err != nil {
		return nil, err
	}
	film, err := leach.NewFilmModel(leach.Jeschke2001(sol), chemMinC, chemMaxC, chemStepC)
	if err != nil {
		return nil, err
	}
	c := &chemistry{sol: sol, film: film}
	n := int(math.Round((chemMaxC-chemMinC)/chemStepC)) + 1
	c.lnAwEqBas = make([]float64, n)
	c.lnAwEqAnh = make([]float64, n)
	for i := range n {
		t := chemMinC + float64(i)*chemStepC
		c.lnAwEqBas[i] = math.Log(leach.EquilibriumRHPct(leach.Bassanite, t) / 100)
		c.lnAwEqAnh[i] = math.Log(leach.EquilibriumRHPct(leach.Anhydrite, t) / 100)
	}
	return c, nil
}

// clampChem keeps a temperature inside the tables.
func clampChem(t float64) float64 {
	return math.Min(chemMaxC, math.Max(chemMinC, t))
}

// lnAwEq interpolates a ln a_w,eq table at tempC (clamped to the range).
func lnAwEq(tab []float64, tempC float64) float64 {
	x := (clampChem(tempC) - chemMinC) / chemStepC
	i := int(x)
	if i >= len(tab)-1 {
		i = len(tab) - 2
	}
	f := x - float64(i)
	return tab[i] + f*(tab[i+1]-tab[i])
}

// deltaG returns ΔG (J/mol) of gypsum → phase at tempC for ln a_w, from
// the tabulated equilibrium water activity; nu is the water released:
//
//	ΔG = ν·R·T·(ln a_w − ln a_w,eq(T))
func deltaG(tab []float64, nu, tempC, lnAw float64) float64 {
	return nu * leach.GasConstantJPerMolK * (tempC + leach.KelvinOffset) * (lnAw - lnAwEq(tab, tempC))
}

// equilibriumRHPct is the gypsum–bassanite equilibrium RH at tempC.
func (c *chemistry) equilibriumRHPct(tempC float64) float64 {
	return 100 * math.Exp(lnAwEq(c.lnAwEqBas, tempC))
}
