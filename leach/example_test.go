package leach_test

import (
	"fmt"

	"github.com/gyprisk/gyprisk/leach"
)

func Example() {
	s, err := leach.Solubility(leach.Gypsum, 25, 0)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("gypsum at 25 °C: %.1f mmol/kg, %.2f g/L\n", s.MmolPerKg, s.GPerL)
	fmt.Printf("gypsum–bassanite equilibrium at 25 °C: %.0f %% RH\n", leach.EquilibriumRHPct(leach.Bassanite, 25))
	t, _ := leach.TransitionC(leach.Anhydrite, 100)
	fmt.Printf("gypsum–anhydrite in liquid water: %.0f °C\n", t)
	fmt.Printf("anhydrite → gypsum: %+.0f %% solid volume\n", leach.SolidVolumeChangePct(leach.Anhydrite, leach.Gypsum))

	tab, _ := leach.NewSolubilityTable(0, 40, 1, 0)
	law := leach.Jeschke2001(tab)
	f := leach.FilmSaturation(law, 10, 0.1e-3, 60) // 0.1 mm film, one minute
	fmt.Printf("0.1 mm film after 60 s at 10 °C: %.0f %% saturated, %.2f g/L\n", 100*f, f*tab.At(10))
	// Output:
	// gypsum at 25 °C: 15.2 mmol/kg, 2.60 g/L
	// gypsum–bassanite equilibrium at 25 °C: 35 % RH
	// gypsum–anhydrite in liquid water: 42 °C
	// anhydrite → gypsum: +63 % solid volume
	// 0.1 mm film after 60 s at 10 °C: 98 % saturated, 2.42 g/L
}
