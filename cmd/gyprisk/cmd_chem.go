package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"math"
	"text/tabwriter"

	"github.com/spf13/pflag"

	"github.com/gyprisk/gyprisk/leach"
)

// chemOptions are the options of "gyprisk chem".
type chemOptions struct {
	tempC            float64
	rhPct            float64
	ionicStrengthMol float64
	json             bool
}

func (o *chemOptions) AddFlags(fs *pflag.FlagSet) {
	fs.Float64Var(&o.tempC, "temp", math.NaN(), fmt.Sprintf("temperature `C` (required; %g to %g)", leach.MinTempC, leach.MaxTempC))
	fs.Float64Var(&o.rhPct, "rh", 100, "relative humidity `PCT` of the air around the gypsum (above 0, at most 100; 100 = in liquid water)")
	fs.Float64Var(&o.ionicStrengthMol, "ionic-strength", 0, fmt.Sprintf("background ionic strength `MOL`/kg of other salts in the water (0 to %g)", leach.MaxIonicStrengthMol))
	fs.BoolVar(&o.json, "json", false, "write JSON to standard output instead of the table")
}

func init() {
	register(command{
		name:    "chem",
		summary: "gypsum chemistry at one temperature: solubility, phase stability, volumes",
		run:     runChem,
	})
}

// chemPhases holds one number per phase, keyed as in the JSON contract.
type chemPhases struct {
	Gypsum    float64 `json:"gypsum"`
	Bassanite float64 `json:"bassanite"`
	Anhydrite float64 `json:"anhydrite"`
}

// chemRoutes holds one number per dehydration route of gypsum.
type chemRoutes struct {
	Bassanite float64 `json:"bassanite"`
	Anhydrite float64 `json:"anhydrite"`
}

// chemTransitions may lack a value when there is no transition in range.
type chemTransitions struct {
	Bassanite *float64 `json:"bassanite"`
	Anhydrite *float64 `json:"anhydrite"`
}

type chemVolumes struct {
	AnhydriteToGypsum float64 `json:"anhydrite_to_gypsum"`
	BassaniteToGypsum float64 `json:"bassanite_to_gypsum"`
}

// chemResult is the JSON contract of "gyprisk chem" (issue 3).
type chemResult struct {
	TemperatureC         float64         `json:"temperature_c"`
	RHPct                float64         `json:"rh_pct"`
	IonicStrengthMol     float64         `json:"ionic_strength_mol"`
	SolubilityMmolPerKg  chemPhases      `json:"solubility_mmol_per_kg"`
	SolubilityGPerL      chemPhases      `json:"solubility_g_per_l"`
	EquilibriumRHPct     chemRoutes      `json:"equilibrium_rh_pct"`
	TransitionC          chemTransitions `json:"transition_c"`
	DGJPerMol            chemRoutes      `json:"dg_j_per_mol"`
	StablePhase          string          `json:"stable_phase"`
	SolidVolumeChangePct chemVolumes     `json:"solid_volume_change_pct"`
	Database             string          `json:"database"`
	DatabaseSource       string          `json:"database_source"`
	ToolVersion          string          `json:"tool_version"`
	Notes                []string        `json:"notes"`
}

var chemNotes = []string{
	"The anhydrite route is kinetically hindered at ordinary temperatures: gypsum persists for centuries where anhydrite is the stable phase, so in-service dehydration risk is judged on the bassanite route.",
	"Solubility in g/L is the mass of the phase itself (CaSO4·2H2O, CaSO4·0.5H2O or CaSO4) dissolved per litre of saturated solution; bassanite and anhydrite values hold only while the phase persists.",
	"Known limits of the database: it places the gypsum–bassanite transition in liquid water near 107.5 °C, inside the 100–120 °C of trade practice but about 8.5 K above the measured 99 °C, so it slightly understates dehydration risk in hot water.",
	"Known limits of the database: gypsum solubility is within 5 % of handbook values from 0 to 60 °C, the range of water on building surfaces, but 6–11 % low from 70 to 100 °C; it puts the gypsum–anhydrite equilibrium at 23 °C at 80.5 % RH, against 77 % measured (Hardie 1967), inside the spread of the published determinations.",
	"No published rate law for gypsum dehydration could be verified, so only the thermodynamic driving force is given.",
}

func runChem(args []string, stdout, stderr io.Writer) error {
	var o chemOptions
	fs := newFlagSet("chem", "chem --temp C [--rh PCT] [--ionic-strength MOL] [--json]",
		`Shows the chemistry of gypsum and its dehydration products at one temperature:
the solubility of gypsum, bassanite (hemihydrate) and anhydrite, the humidity
below which gypsum is unstable against each, the temperature at which it turns
at the given humidity, the free energy of dehydration, the stable phase and the
solid volume changes of rehydration. All constants come from one pinned
database, named in the output.`,
		"  gyprisk chem --temp 35 --rh 40\n  gyprisk chem --temp 20 --ionic-strength 0.05 --json", stderr)
	o.AddFlags(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if fs.NArg() > 0 {
		return usagef("chem: unexpected argument %q", fs.Arg(0))
	}
	if !fs.Changed("temp") {
		return usagef("chem: --temp is required")
	}
	if !(o.tempC >= leach.MinTempC && o.tempC <= leach.MaxTempC) {
		return usagef("chem: --temp %g: the database is used from %g to %g °C", o.tempC, leach.MinTempC, leach.MaxTempC)
	}
	if !(o.rhPct > 0 && o.rhPct <= 100) {
		return usagef("chem: --rh %g: want a relative humidity above 0 and at most 100 %%", o.rhPct)
	}
	if !(o.ionicStrengthMol >= 0 && o.ionicStrengthMol <= leach.MaxIonicStrengthMol) {
		return usagef("chem: --ionic-strength %g: want 0 to %g mol/kg", o.ionicStrengthMol, leach.MaxIonicStrengthMol)
	}
	res, err := chemCompute(o)
	if err != nil {
		return err
	}
	if o.json {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(res)
	}
	return writeChemTable(stdout, res)
}

func chemCompute(o chemOptions) (*chemResult, error) {
	r := &chemResult{
		TemperatureC:     o.tempC,
		RHPct:            o.rhPct,
		IonicStrengthMol: o.ionicStrengthMol,
		Database:         leach.Database(),
		DatabaseSource:   leach.DatabaseSource,
		ToolVersion:      version,
		Notes:            chemNotes,
	}
	var mmol, gpl [3]float64
	for i, p := range leach.Phases {
		s, err := leach.Solubility(p, o.tempC, o.ionicStrengthMol)
		if err != nil {
			return nil, err
		}
		mmol[i], gpl[i] = s.MmolPerKg, s.GPerL
	}
	r.SolubilityMmolPerKg = chemPhases{mmol[0], mmol[1], mmol[2]}
	r.SolubilityGPerL = chemPhases{gpl[0], gpl[1], gpl[2]}
	aw := o.rhPct / 100
	r.EquilibriumRHPct = chemRoutes{leach.EquilibriumRHPct(leach.Bassanite, o.tempC), leach.EquilibriumRHPct(leach.Anhydrite, o.tempC)}
	r.DGJPerMol = chemRoutes{leach.DeltaGJPerMol(leach.Bassanite, o.tempC, aw), leach.DeltaGJPerMol(leach.Anhydrite, o.tempC, aw)}
	for _, p := range []leach.Phase{leach.Bassanite, leach.Anhydrite} {
		t, err := leach.TransitionC(p, o.rhPct)
		var tp *float64
		switch {
		case err == nil:
			tp = &t
		case errors.Is(err, leach.ErrNoTransition):
		default:
			return nil, err
		}
		if p == leach.Bassanite {
			r.TransitionC.Bassanite = tp
		} else {
			r.TransitionC.Anhydrite = tp
		}
	}
	r.StablePhase = leach.StablePhase(o.tempC, o.rhPct).String()
	r.SolidVolumeChangePct = chemVolumes{
		AnhydriteToGypsum: leach.SolidVolumeChangePct(leach.Anhydrite, leach.Gypsum),
		BassaniteToGypsum: leach.SolidVolumeChangePct(leach.Bassanite, leach.Gypsum),
	}
	return r, nil
}

func writeChemTable(w io.Writer, r *chemResult) error {
	bw := &errWriter{w: w}
	bw.printf("Gypsum chemistry at %g °C, %g %% RH, background ionic strength %g mol/kg\n\n", r.TemperatureC, r.RHPct, r.IonicStrengthMol)
	tw := tabwriter.NewWriter(bw, 0, 0, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintf(tw, "phase\tformula\tsolubility mmol/kg\tg/L\tsolid volume cm³/mol\t\n")
	mm := [3]float64{r.SolubilityMmolPerKg.Gypsum, r.SolubilityMmolPerKg.Bassanite, r.SolubilityMmolPerKg.Anhydrite}
	gl := [3]float64{r.SolubilityGPerL.Gypsum, r.SolubilityGPerL.Bassanite, r.SolubilityGPerL.Anhydrite}
	for i, p := range leach.Phases {
		fmt.Fprintf(tw, "%s\t%s\t%.2f\t%.3f\t%.2f\t\n", p, p.Formula(), mm[i], gl[i], leach.MolarVolumeCm3(p))
	}
	tw.Flush()
	bw.printf("\nDehydration of gypsum\n")
	tw = tabwriter.NewWriter(bw, 0, 0, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintf(tw, "route\tequilibrium RH here\ttransition at this RH\tΔG J/mol\t\n")
	row := func(phase leach.Phase, rh float64, tc *float64, dg float64) {
		rhs := fmt.Sprintf("%.1f %%", rh)
		if rh > 100 {
			rhs = "above 100 % (any RH)"
		}
		tcs := fmt.Sprintf("above %g °C", leach.MaxTempC)
		if dg0 := leach.DeltaGJPerMol(phase, leach.MinTempC, r.RHPct/100); dg0 < 0 {
			tcs = fmt.Sprintf("below %g °C", leach.MinTempC)
		}
		if tc != nil {
			tcs = fmt.Sprintf("%.1f °C", *tc)
		}
		fmt.Fprintf(tw, "gypsum → %s\t%s\t%s\t%+.0f\t\n", phase, rhs, tcs, dg)
	}
	row(leach.Bassanite, r.EquilibriumRHPct.Bassanite, r.TransitionC.Bassanite, r.DGJPerMol.Bassanite)
	row(leach.Anhydrite, r.EquilibriumRHPct.Anhydrite, r.TransitionC.Anhydrite, r.DGJPerMol.Anhydrite)
	tw.Flush()
	bw.printf("ΔG < 0: gypsum is unstable against that phase; the equilibrium RH is the humidity below which it is.\n")
	bw.printf("\nThermodynamically stable phase: %s\n", r.StablePhase)
	bw.printf("Solid volume change of rehydration: anhydrite → gypsum %+.1f %%, bassanite → gypsum %+.1f %% (per mole of CaSO4)\n",
		r.SolidVolumeChangePct.AnhydriteToGypsum, r.SolidVolumeChangePct.BassaniteToGypsum)
	bw.printf("\nNotes\n")
	for _, n := range r.Notes {
		bw.printf("  - %s\n", n)
	}
	bw.printf("\nDatabase: %s\n", r.Database)
	return bw.err
}

// errWriter keeps the first write error so a table can be written without
// checking every line.
type errWriter struct {
	w   io.Writer
	err error
}

func (e *errWriter) Write(p []byte) (int, error) {
	if e.err != nil {
		return 0, e.err
	}
	n, err := e.w.Write(p)
	e.err = err
	return n, err
}

func (e *errWriter) printf(format string, a ...any) { fmt.Fprintf(e, format, a...) }
