package report

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"math"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// Options shape a report. The zero value is a usable default.
type Options struct {
	// FixedDate is the date printed on the report and stored in the PDF's
	// metadata; zero means now. Tests and reproducible builds set it.
	FixedDate time.Time

	// Title is the document title; empty means "Gypsum durability
	// assessment" ("Gypsum durability portfolio" for WritePortfolio).
	Title string

	// Failures lists projects that could not be assessed; only
	// WritePortfolio prints them.
	Failures []Failure
}

// Failure is a project of a portfolio that could not be assessed.
type Failure struct {
	Project string
	Err     string
}

func (o Options) date() time.Time {
	if o.FixedDate.IsZero() {
		return time.Now().UTC()
	}
	return o.FixedDate
}

// Write renders the assessment out as a PDF to w.
//
// The document holds, in order: a cover with the traceability of the run
// (tool, database, every input with its SHA-256 and period, options) and
// the contents; the summary table; the climate; one section per element
// with its charts, findings and, where the element has variants or
// scenarios, a side-by-side comparison; notes on the data; methods,
// assumptions and sources; and the cautions.
//
// Write returns an error, and writes nothing to w, when out is nil, has no
// elements, or holds a value that is not a finite number in a field the
// report prints or charts.
func Write(w io.Writer, out *assess.Output, opt Options) error {
	if err := validate(out); err != nil {
		return err
	}
	var buf bytes.Buffer
	if err := render(&buf, out, opt); err != nil {
		return err
	}
	_, err := buf.WriteTo(w)
	return err
}

// WriteFile writes the report to path atomically: a failed run leaves any
// earlier file at path as it was.
func WriteFile(path string, out *assess.Output, opt Options) error {
	return WriteFileAtomic(path, func(w io.Writer) error { return Write(w, out, opt) })
}

// render runs the two passes: the first learns the page count and the
// section pages, the second prints them in the footers and the contents.
func render(w io.Writer, out *assess.Output, opt Options) error {
	var lay *layout
	for pass := 0; pass < 2; pass++ {
		d := build(out, opt, lay)
		if err := d.pdf.Error(); err != nil {
			return fmt.Errorf("report: %w", err)
		}
		if pass == 1 {
			if err := d.pdf.Output(w); err != nil {
				return fmt.Errorf("report: %w", err)
			}
			return nil
		}
		lay = &layout{pages: d.pdf.PageNo(), toc: d.toc}
	}
	return nil
}

// errNoOutput is returned for a nil Output.
var errNoOutput = errors.New("report: no assessment output")

// validate rejects an Output the report cannot print honestly.
func validate(out *assess.Output) error {
	if out == nil {
		return errNoOutput
	}
	if len(out.Elements) == 0 {
		return errors.New("report: the assessment has no elements")
	}
	bad := func(where, field string, v float64) error {
		return fmt.Errorf("report: %s: %s is %v, not a finite number", where, field, v)
	}
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"climate coverage_pct", out.Climate.CoveragePct},
		{"climate rain_mm_per_year", out.Climate.RainMMPerYear},
		{"climate temp_mean_c", out.Climate.TempMeanC},
		{"climate rh_mean_pct", out.Climate.RHMeanPct},
	} {
		if !finite(f.v) {
			return bad("output", f.name, f.v)
		}
	}
	for i, m := range out.Climate.Monthly {
		for _, v := range []float64{m.TempMeanC, m.RHMeanPct, m.RainMM} {
			if !finite(v) {
				return bad(fmt.Sprintf("climate month %d (%s)", i+1, m.Month), "a monthly value", v)
			}
		}
	}
	for _, dr := range out.Climate.DrivingRain {
		if !finite(dr.AzimuthDeg) || !finite(dr.LPerM2PerYear) || dr.LPerM2PerYear < 0 {
			return fmt.Errorf("report: driving rain index at %v°: %v L/m² per year is not a finite, non-negative number", dr.AzimuthDeg, dr.LPerM2PerYear)
		}
	}
	for i := range out.Elements {
		r := &out.Elements[i]
		where := fmt.Sprintf("element %q (variant %q, scenario %q)", r.ID, r.Variant, r.Scenario)
		if r.ID == "" {
			return fmt.Errorf("report: element %d has no id", i+1)
		}
		checks := []struct {
			name string
			v    float64
		}{
			{"deposited_l_m2_per_year", r.Water.DepositedLM2PerYear},
			{"runoff_in_l_m2_per_year", r.Water.RunoffInLM2PerYear},
			{"condensate_l_m2_per_year", r.Water.CondensateLM2PerYear},
			{"recession_mm_per_year", r.Leaching.RecessionMMPerYear},
			{"unstable_hours_per_year", r.Dehydration.UnstableHoursPerYear},
			{"max_surface_temp_c", r.Dehydration.MaxSurfaceTempC},
			{"condensation hours_per_year", r.Condensation.HoursPerYear},
			{"mould index_max", r.Mould.IndexMax},
			{"loss_limit_mm", r.Inputs.LossLimitMM},
		}
		for _, p := range []struct {
			name string
			v    *float64
		}{
			{"years_to_limit", r.Leaching.YearsToLimit},
			{"years_to_limit_p10", r.Leaching.YearsToLimitP10},
			{"years_to_limit_p90", r.Leaching.YearsToLimitP90},
			{"recession_mm_per_year_p10", r.Leaching.RecessionMMPerYearP10},
			{"recession_mm_per_year_p90", r.Leaching.RecessionMMPerYearP90},
		} {
			if p.v != nil {
				checks = append(checks, struct {
					name string
					v    float64
				}{p.name, *p.v})
			}
		}
		for _, c := range checks {
			if !finite(c.v) {
				return bad(where, c.name, c.v)
			}
		}
		for j, m := range r.Monthly {
			for _, v := range []float64{m.DepositedLM2, m.RunoffInLM2, m.SurfaceTempMaxC, m.SurfaceRHMeanPct, m.MouldIndexMax} {
				if !finite(v) {
					return bad(where, fmt.Sprintf("month %d (%s)", j+1, m.Month), v)
				}
			}
		}
		for j, dd := range r.Daily {
			for _, v := range []float64{dd.SurfaceTempMaxC, dd.SurfaceRHMinPct, dd.EquilibriumRHPct, dd.CumLossMM, dd.CumLossMMP10, dd.CumLossMMP90, dd.MouldIndex} {
				if !finite(v) {
					return bad(where, fmt.Sprintf("day %d (%s)", j+1, fmtDay(dd.Date)), v)
				}
			}
		}
	}
	return nil
}

func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// defaultTitle is the document title when Options.Title is empty.
const defaultTitle = "Gypsum durability assessment"

// build lays out the whole document once.
func build(out *assess.Output, opt Options, prev *layout) *doc {
	title := opt.Title
	if title == "" {
		title = defaultTitle
	}
	date := opt.date()
	footer := fmt.Sprintf("%s %s · %s", nonEmpty(out.Tool.Name, "gyprisk"), out.Tool.Version, fmtDate(date))
	d := newDoc(title, out.Site.Name, footer, out.Invented, date, prev)
	r := &reportState{d: d, out: out, date: date, groups: groupElements(out.Elements)}
	r.cover()
	r.summary()
	r.climate()
	r.elements()
	r.notes()
	r.methods()
	r.cautions()
	return d
}

func nonEmpty(s, def string) string {
	if s == "" {
		return def
	}
	return s
}

// reportState carries what the sections share.
type reportState struct {
	d      *doc
	out    *assess.Output
	date   time.Time
	groups []elementGroup
}

// elementGroup is every result of one element id: its base case under the
// present climate first, then the variants and scenarios in the order the
// engine gave them.
type elementGroup struct {
	id      string
	results []*assess.ElementResult
}

// main is the result the element's charts show: base under the present
// climate when the run has it, else the first result.
func (g elementGroup) main() *assess.ElementResult {
	for _, r := range g.results {
		if r.Variant == "base" && r.Scenario == "present" {
			return r
		}
	}
	return g.results[0]
}

func groupElements(es []assess.ElementResult) []elementGroup {
	var gs []elementGroup
	idx := map[string]int{}
	for i := range es {
		e := &es[i]
		j, ok := idx[e.ID]
		if !ok {
			j = len(gs)
			idx[e.ID] = j
			gs = append(gs, elementGroup{id: e.ID})
		}
		gs[j].results = append(gs[j].results, e)
	}
	return gs
}
