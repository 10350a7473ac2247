// Package leach is gyprisk's gypsum chemistry: equilibrium constants of
// gypsum (CaSO4·2H2O), bassanite (hemihydrate, CaSO4·0.5H2O), anhydrite
// (CaSO4) and the CaSO4° ion pair from one pinned thermodynamic database,
// the activity model of that database, the solubility of each phase, the
// stability of gypsum against dehydration, the dissolution rate of gypsum
// and the saturation a water film reaches on a gypsum surface, and the molar
// volumes that give the swelling of rehydration and the shrinkage of
// dehydration.
//
// # One database
//
// Every constant comes from one file, Thermoddem V1.10 of BRGM in the
// PHREEQC format shipped with the USGS PHREEQC distribution (see
// DatabaseName, DatabaseVersion and DatabaseSource), so solubility and
// dehydration can never disagree with each other: the dehydration free
// energy is formed from the same log K that fix the solubilities. The
// file's analytic log K(T) expressions are used, as PHREEQC uses them (an
// analytic expression takes precedence over log_k and delta_h). They pass
// through the file's own 25 °C log_k to 0.001 log units for all four
// reactions; their slope at 25 °C gives reaction enthalpies 0.6–0.7 kJ/mol
// below the file's delta_h (see the tests). The activity model is the
// database's B-dot (extended Debye–Hückel) model with its tabulated A(T),
// B(T) and Ḃ(T) from 0 °C and its ion sizes. The file gives no molar
// volumes; those come from the sources named at MolarVolumeCm3.
//
// # Known limits of the database
//
// Thermoddem V1.10 reproduces the handbook solubility of gypsum within 3 %
// from 0 to 25 °C and within 5 % up to 60 °C, the range of the water on
// building surfaces where leaching happens. From 70 to 100 °C it is low by
// 6 to 11 %. It puts the gypsum–bassanite equilibrium in liquid water at
// about 107.5 °C, inside the 100–120 °C the trade gives (common practice,
// no source) but some 8.5 K above the 99 °C that Power, Fabuss & Satterfield
// measured for α-hemihydrate (J. Chem. Eng. Data, 1964, from memory):
// bassanite is predicted to form at a slightly higher temperature than it
// really does, so for dehydration in liquid water the database is still a
// little on the unsafe side. It puts the gypsum–anhydrite equilibrium in
// liquid water at about 42 °C, inside the published spread (38–42 °C from
// solubility measurements, 58 ± 2 °C from Hardie 1967, Am. Mineral. 52,
// 171), and at 23 °C at a water activity of 0.805: above Hardie's measured
// 0.770, below 0.845, where his line would pass if shifted to the
// solubility-based transition; the published determinations disagree by
// that much. The tests check the band, and record the 70–100 °C solubility
// gap and fail if it grows.
//
// # Kinetics
//
// The anhydrite route is kinetically hindered at ordinary temperatures:
// gypsum persists for centuries where anhydrite is the stable phase (below
// about 80 % RH at 25 °C), and anhydrite in contact with water hydrates only
// slowly. In-service dehydration risk is therefore judged on the bassanite
// route. No rate law for the dehydration of gypsum could be verified against
// its source, so none is implemented: the package reports the
// thermodynamic driving force only.
//
// Dissolution follows the rate law of Jeschke, Vosbeck & Dreybrodt 2001
// (Geochim. Cosmochim. Acta 65, 27–34), linear up to 0.94 of saturation and
// of order n above it, in series with diffusion through the water film
// (FilmSaturation).
//
// # Units
//
// Temperatures in °C, molalities in mol/kg of water, concentrations in
// mol/m³ (= mmol/L) or g/L of solution, free energies in J/mol, lengths in
// m, times in s. The package never prints, exits or logs; bad input becomes
// an error or, where the signature has no error, NaN.
package leach
