package leach

import "fmt"

// The pinned thermodynamic database. Every equilibrium constant and every
// activity-model parameter in this package is copied from this one file.
const (
	// DatabaseName names the database in outputs (JSON, PDF).
	DatabaseName = "llnl.dat (USGS PHREEQC distribution; LLNL thermo.com.V8.R6.230)"

	// DatabaseVersion identifies the exact file the constants were read from:
	// the file's $Id line and the git commit of the copy that was read.
	DatabaseVersion = "llnl.dat $Id 12758 2017-08-01, reformatted 2024-05-17 (md5 efbcb7244fbe9063e0020cf5d1e00458), usgs-coupled/phreeqc3 commit 9d08ff54a75b25c3e89c655a43af0509e8199935"

	// DatabaseSource is where the file can be read.
	DatabaseSource = "https://github.com/usgs-coupled/phreeqc3/blob/9d08ff54a75b25c3e89c655a43af0509e8199935/database/llnl.dat"
)

// Database returns the database name and version as one line, the form in
// which it is recorded in gyprisk's outputs.
func Database() string { return DatabaseName + ", " + DatabaseVersion }

// Temperature range over which the package answers, °C. The database's
// analytic expressions and activity table cover 0.01–300 °C (above 100 °C
// along the liquid–vapour saturation curve), but the water density and
// viscosity correlations used for concentrations and transport hold only to
// 150 °C, so the package stops there. 0 °C is treated as the database's
// 0.01 °C point.
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

// analytic holds the coefficients of the database's analytic expression
//
//	log10 K = A1 + A2·T + A3/T + A4·log10(T) + A5/T²,   T in K
//
// with the file's 25 °C log_k and delta_H kept beside them for checking.
type analytic struct {
	a1, a2, a3, a4, a5 float64
	logK25             float64 // the file's log_k
	deltaHKJPerMol     float64 // the file's -delta_H
}

// Reactions as written in llnl.dat, PHASES and SOLUTION_SPECIES blocks
// (all "-Range: 0-300"):
//
//	Gypsum     CaSO4:2H2O   = Ca+2 + SO4-2 + 2 H2O
//	Bassanite  CaSO4:0.5H2O = 0.5 H2O + Ca+2 + SO4-2
//	Anhydrite  CaSO4        = Ca+2 + SO4-2
//	CaSO4(aq)  SO4-2 + Ca+2 = CaSO4
var (
	dbGypsum    = analytic{-2.4417e+2, -8.3329e-2, 5.5958e+3, 9.9301e+1, 8.7389e+1, -4.4823, -1.66746}
	dbBassanite = analytic{-2.201e+2, -8.023e-2, 5.5092e+3, 8.9651e+1, 8.6031e+1, -3.6615, -18.711}
	dbAnhydrite = analytic{-2.0986e+2, -7.8823e-2, 5.0969e+3, 8.5642e+1, 7.9594e+1, -4.3064, -18.577}
	dbIonPair   = analytic{2.8618e+2, 8.4084e-2, -7.688e+3, -1.1449e+2, -1.2005e+2, 2.1111, 5.4392}
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
	dbTempsC = [...]float64{0.01, 25, 60, 100, 150, 200, 250, 300}
	dbDHA    = [...]float64{0.4939, 0.5114, 0.5465, 0.5995, 0.6855, 0.7994, 0.9593, 1.218}
	dbDHB    = [...]float64{0.3253, 0.3288, 0.3346, 0.3421, 0.3525, 0.3639, 0.3766, 0.3925}
	dbBdot   = [...]float64{0.0374, 0.041, 0.0438, 0.046, 0.047, 0.047, 0.034, 0}
)

// Ion-size parameters å (Å), the -llnl_gamma of each species in llnl.dat.
// CaSO4(aq) is neutral; the B-dot model gives it unit activity
// coefficient.
const (
	ionSizeCaAngstrom  = 6 // Ca+2
	ionSizeSO4Angstrom = 4 // SO4-2
)
