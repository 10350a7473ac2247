package assess

import (
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/leach"
)

// TestTabulatedDeltaGMatchesLeach: the engine's tabulated ΔG (equilibrium
// water activity on a 0.1 °C grid) agrees with leach.DeltaGJPerMol, which
// evaluates the database's log K directly, to within 2 J/mol: solubility
// and dehydration come from the same constants.
func TestTabulatedDeltaGMatchesLeach(t *testing.T) {
	c, err := newChemistry()
	if err != nil {
		t.Fatal(err)
	}
	for _, tc := range []float64{0.3, 12.34, 25, 41.7, 60, 87.05} {
		for _, rh := range []float64{5, 30, 55, 80, 100} {
			aw := rh / 100
			for _, p := range []struct {
				phase leach.Phase
				tab   []float64
				nu    float64
			}{{leach.Bassanite, c.lnAwEqBas, 1.5}, {leach.Anhydrite, c.lnAwEqAnh, 2}} {
				got := deltaG(p.tab, p.nu, tc, math.Log(aw))
				want := leach.DeltaGJPerMol(p.phase, tc, aw)
				if math.Abs(got-want) > 2 {
					t.Errorf("%v θ=%g RH=%g: tabulated %.2f J/mol, leach %.2f", p.phase, tc, rh, got, want)
				}
			}
		}
	}
}
