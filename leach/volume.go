package leach

import "math"

// MolarVolumeCm3 returns the molar volume of phase p at 25 °C and 1 bar,
// cm³/mol:
//
//	gypsum     74.69   Robie & Hemingway 1995, USGS Bulletin 2131 (from memory)
//	anhydrite  45.94   Robie & Hemingway 1995, USGS Bulletin 2131 (from memory)
//	bassanite  53.00   = N_A·V_cell/Z from the cell a = 12.0317 Å,
//	                   b = 6.9269 Å, c = 12.6712 Å, β = 90.27°, Z = 12
//	                   (Handbook of Mineralogy, Anthony et al., Mineral Data
//	                   Publishing, "Bassanite", 2001–2005; calculated
//	                   density 2.731 g/cm³ there)
//
// The pinned database, Thermoddem V1.10 in PHREEQC format, carries no
// molar volumes (no -Vm). NaN for an unknown phase.
func MolarVolumeCm3(p Phase) float64 {
	switch p {
	case Gypsum:
		return 74.69
	case Anhydrite:
		return 45.94
	case Bassanite:
		return bassaniteMolarVolumeCm3
	}
	return math.NaN()
}

// avogadro is the Avogadro constant (SI 2019, exact), 1/mol.
const avogadro = 6.02214076e23

// bassaniteMolarVolumeCm3 is computed from the monoclinic cell of
// bassanite (see MolarVolumeCm3): V = a·b·c·sin β, 1 Å³ = 1e-24 cm³.
var bassaniteMolarVolumeCm3 = func() float64 {
	const a, b, c, betaDeg, z = 12.0317, 6.9269, 12.6712, 90.27, 12.0
	v := a * b * c * math.Sin(betaDeg*math.Pi/180) // Å³ per cell
	return v * 1e-24 * avogadro / z
}()

// SolidVolumeChangePct returns the change in solid volume (%) when one mole
// of phase from turns into one mole of phase to (per mole of CaSO4; the
// water taken up or given off is not counted),
//
//	ΔV = 100 · (V_to − V_from) / V_from
//
// with V from MolarVolumeCm3. Rehydration of anhydrite to gypsum gives
// about +63 % and of bassanite to gypsum about +41 % (the swelling that
// sets plaster and lifts anhydrite screeds); dehydration of gypsum gives
// −29 % to bassanite and −38.5 % to anhydrite (shrinkage, powdering). NaN
// for an unknown phase.
func SolidVolumeChangePct(from, to Phase) float64 {
	return 100 * (MolarVolumeCm3(to) - MolarVolumeCm3(from)) / MolarVolumeCm3(from)
}
