package leach

import "fmt"

// The pinned thermodynamic database. Every equilibrium constant and every
// activity-model parameter in this package is copied from this one file.
const (
	// DatabaseName names the database in outputs (JSON, PDF).
	DatabaseName = "Thermoddem V1.10 (BRGM), PHREEQC format, USGS PHREEQC distribution"

	// DatabaseVersion identifies the exact file the constants were read from:
	// its name, the BDD date and converter of its header, and the git commit
	// of the copy that was read.
	DatabaseVersion = "PHREEQC_ThermoddemV1.10_15Dec2020.dat (BDD date 12/15/2020, converted by ThermoBridge 1.0.3.4), usgs-coupled/phreeqc3 commit 1685c9d775fd51828eb4da7d1e1278188894ee68"

	// DatabaseSource is where the file can be read.
	DatabaseSource = "https://github.com/usgs-coupled/phreeqc3/blob/1685c9d775fd51828eb4da7d1e1278188894ee68/database/PHREEQC_ThermoddemV1.10_15Dec2020.dat"
)

// Database returns the database name and version as one line, the form in
// which it is recorded in gyprisk's outputs.
func Database() string { return DatabaseName + ", " + DatabaseVersion }

// Temperature range over which the package answers, °C. The database's
// activity table is tabulated from 0 to 300 °C, but the water density and
// viscosity correlations used for concentrations and transport hold only to
// 150 °C, so the package stops there.
const (
	MinTempC = 0.0
	MaxTempC = 150.0
)

// Phase is a solid calcium sulfate phase.
type Phase int

// The three phases of the CaSO4–H2O system that matter in buildings.
const (
	Gypsum    Phase = iota // CaSO4·2H2O
	Bassanite              // CaSO4·0.5H2O, hemihydrate
	Anhydrite              // CaSO4, anhydrite II
)

// Phases lists the phases in a fixed order, for tables.
var Phases = [...]Phase{Gypsum, Bassanite, Anhydrite}

// String returns the lower-case phase name used in gyprisk's outputs.
func (p Phase) String() string {
	switch p {
	case Gypsum:
		return "gypsum"
	case Bassanite:
		return "bassanite"
	case Anhydrite:
		return "anhydrite"
	}
	return fmt.Sprintf("Phase(%d)", int(p))
}

// Formula returns the chemical formula of the phase.
func (p Phase) Formula() string {
	switch p {
	case Gypsum:
		return "CaSO4·2H2O"
	case Bassanite:
		return "CaSO4·0.5H2O"
	case Anhydrite:
		return "CaSO4"
	}
	return "?"
}

func (p Phase) valid() bool { return p >= Gypsum && p <= Anhydrite }

// WaterMoles returns the moles of water of hydration per mole of CaSO4.
func (p Phase) WaterMoles() float64 {
	switch p {
	case Gypsum:
		return 2
	case Bassanite:
		return 0.5
	}
	return 0
}

// Molar masses, g/mol, from the IUPAC 2013 standard atomic weights
// (Ca 40.078, S 32.06, O 15.999, H 1.008).
const (
	MolarMassCaSO4 = 40.078 + 32.06 + 4*15.999 // 136.134
	MolarMassH2O   = 2*1.008 + 15.999          // 18.015
)

// MolarMassGPerMol returns the molar mass of the phase, g/mol.
func (p Phase) MolarMassGPerMol() float64 {
	return MolarMassCaSO4 + p.WaterMoles()*MolarMassH2O
}

// analytic holds the coefficients of the database's -analytic expression
//
//	log10 K = A1 + A2·T + A3/T + A4·log10(T) + A5/T²,   T in K
//
// with the file's 25 °C log_k and delta_h (kJ/mol) kept beside them for
// checking.
type analytic struct {
	a1, a2, a3, a4, a5 float64
	logK25             float64 // the file's log_k
	deltaHKJPerMol     float64 // the file's delta_h
}

// Reactions as written in the Thermoddem V1.10 file, PHASES and
// SOLUTION_SPECIES blocks:
//
//	Gypsum     CaSO4:2H2O   = Ca+2 + SO4-2 + 2 H2O
//	Bassanite  CaSO4:0.5H2O = Ca+2 + SO4-2 + 0.5 H2O
//	Anhydrite  CaSO4        = Ca+2 + SO4-2
//	CaSO4(aq)  Ca+2 + SO4-2 = CaSO4
var (
	dbGypsum    = analytic{-1.620207e+3, -2.5723367e-1, 8.9150211e+4, 5.8738246e+2, -5.3473276e+6, -4.605, -1.054}
	dbBassanite = analytic{-1.5834316e+3, -2.5347761e-1, 8.8114917e+4, 5.7346485e+2, -5.2850565e+6, -3.919, -17.357}
	dbAnhydrite = analytic{-1.6180709e+3, -2.6204311e-1, 8.9584938e+4, 5.866302e+2, -5.3589079e+6, -4.436, -17.940}
	dbIonPair   = analytic{1.720334e+3, 2.6573378e-1, -9.4254922e+4, -6.2356103e+2, 5.4972745e+6, 2.310, 4.291}
)

func (p Phase) coefficients() *analytic {
	switch p {
	case Gypsum:
		return &dbGypsum
	case Bassanite:
		return &dbBassanite
	case Anhydrite:
		return &dbAnhydrite
	}
	return nil
}

// The database's LLNL_AQUEOUS_MODEL_PARAMETERS block: the Debye–Hückel A
// (kg^½/mol^½) and B (kg^½/(mol^½·Å)) and the B-dot parameter (kg/mol),
// tabulated at these temperatures (°C).
var (
	dbTempsC = [...]float64{0, 25, 60, 100, 150, 200, 250, 300}
	dbDHA    = [...]float64{0.4901, 0.5095, 0.5450, 0.5986, 0.6867, 0.8046, 0.9710, 1.2414}
	dbDHB    = [...]float64{0.3245, 0.3284, 0.3343, 0.3420, 0.3528, 0.3647, 0.3782, 0.3950}
	dbBdot   = [...]float64{0.0374, 0.0410, 0.0438, 0.0460, 0.0470, 0.0470, 0.0340, 0}
)

// Ion-size parameters å (Å), the -llnl_gamma of each species in the
// Thermoddem V1.10 file. CaSO4(aq) is neutral (its -llnl_gamma of 3.4 does
// not enter): the B-dot model gives it unit activity coefficient.
const (
	ionSizeCaAngstrom  = 6 // Ca+2
	ionSizeSO4Angstrom = 4 // SO4-2
)
