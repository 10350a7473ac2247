package assess

import (
	"fmt"
	"io"
	"math"
	"path/filepath"
	"runtime"
	"sync"
	"time"

	"github.com/gyprisk/gyprisk/climate"
	"github.com/gyprisk/gyprisk/leach"
)

// Options shape a run.
type Options struct {
	// Samples is the number of Monte Carlo samples (0: deterministic only;
	// negative: take the project's [uncertainty] samples, else 0).
	Samples int
	// Seed seeds the samples; SeedGiven says the caller set it (otherwise
	// the project's [uncertainty] seed, else 1).
	Seed      uint64
	SeedGiven bool
	// Now is the run date printed in the outputs.
	Now time.Time
	// ToolVersion is recorded in the output.
	ToolVersion string
	// Hourly, when set, receives the hour-by-hour trace of every result as
	// CSV.
	Hourly io.Writer
	// Progress, when set, is called as the work goes on.
	Progress func(done, total int, what string)
}

// Run assesses every element, variant and scenario of the project.
func Run(p *Project, opt Options) (retOut *Output, retErr error) {
	out := &Output{
		Tool:     Tool{Name: "gyprisk", Version: opt.ToolVersion},
		RunDate:  opt.Now.UTC().Format(time.RFC3339),
		Project:  displayPath(p, filepath.Base(p.Path)),
		Database: leach.Database(),
		Invented: p.Invented,
	}
	if opt.Now.IsZero() {
		out.RunDate = time.Now().UTC().Format(time.RFC3339)
	}
	out.Inputs = append(out.Inputs, InputFile{Role: "project", Path: out.Project, SHA256: hashBytes(p.data)})

	th, err := p.thresholds()
	if err != nil {
		return nil, err
	}
	out.Thresholds = th
	samples, seed := opt.Samples, opt.Seed
	if samples < 0 {
		samples = 0
		if p.Uncertainty.Samples != nil {
			samples = *p.Uncertainty.Samples
		}
	}
	if !opt.SeedGiven && p.Uncertainty.Seed != nil {
		seed = *p.Uncertainty.Seed
	}
	if seed == 0 && !opt.SeedGiven {
		seed = 1
	}
	out.Options = RunOptions{Samples: samples, Seed: seed}

	// Resolve every element and variant before reading any record, so a
	// mistake in the project file shows at once.
	var cases []*element
	for i := range p.Elements {
		base := &p.Elements[i]
		e, err := resolve(base, nil)
		if err != nil {
			line, _ := keyPos(p.data, "element.id", []int{i})
			return nil, &ProjectError{File: p.Path, Line: line, Key: "element", Err: err}
		}
		cases = append(cases, e)
		for j := range base.Variants {
			v, err := resolve(base, &base.Variants[j])
			if err != nil {
				line, _ := keyPos(p.data, "element.variant.id", []int{i, j})
				return nil, &ProjectError{File: p.Path, Line: line, Key: "element.variant", Err: fmt.Errorf("variant %q: %w", base.Variants[j].ID, err)}
			}
			cases = append(cases, v)
		}
	}

	site, err := p.site()
	if err != nil {
		return nil, err
	}
	out.Site = site.out

	// Records: the outdoor one (if any element needs it) and each room record.
	var outdoor *record
	if p.needsOutdoor(cases) {
		if p.Site.Climate == "" {
			return nil, &ProjectError{File: p.Path, Key: "site.climate", Err: fmt.Errorf("missing: the outdoor climate record is needed by the exterior elements and by temperature_factor")}
		}
		outdoor, err = p.loadRecord(p.Site.Climate, roleOutdoor)
		if err != nil {
			return nil, err
		}
		out.Inputs = append(out.Inputs, outdoor.input)
		out.Notes = append(out.Notes, recordNotes(outdoor)...)
		// The climate summary is needed only for the output: make it beside
		// the assessment.
		climateDone := make(chan error, 1)
		go func() { climateDone <- climateOut(&out.Climate, outdoor) }()
		defer func() {
			if err := <-climateDone; err != nil && retErr == nil {
				retOut, retErr = nil, err
			}
		}()
	}
	rooms := map[string]*record{}
	for _, e := range cases {
		if e.indoorClimate == "" || rooms[e.indoorClimate] != nil {
			continue
		}
		r, err := p.loadRecord(e.indoorClimate, "indoor climate ("+e.id+")")
		if err != nil {
			return nil, err
		}
		rooms[e.indoorClimate] = r
		out.Inputs = append(out.Inputs, r.input)
		out.Notes = append(out.Notes, recordNotes(r)...)
		if outdoor == nil {
			if err := climateOut(&out.Climate, r); err != nil {
				return nil, err
			}
		}
	}
	for _, e := range cases {
		if err := e.checkColumns(outdoor, rooms); err != nil {
			return nil, err
		}
		for _, n := range e.notes {
			out.Notes = append(out.Notes, fmt.Sprintf("%s (%s): %s", e.id, e.variant, n))
		}
	}

	chem, err := newChemistry()
	if err != nil {
		return nil, err
	}
	scen := p.scenarios()
	out.Scenarios = scen
	total := len(scen) * len(cases)
	done := 0
	var hw *hourlyWriter
	if opt.Hourly != nil {
		hw = newHourlyWriter(opt.Hourly)
	}
	for _, sc := range scen {
		var sh *siteHours
		if outdoor != nil {
			recs, clipped := sc.Apply(outdoor.hourly.Records)
			if clipped > 0 {
				out.Notes = append(out.Notes, fmt.Sprintf("scenario %s: relative humidity clipped to 0–100 %% in %d hours", sc.ID, clipped))
			}
			sh, err = newSiteHours(site, outdoor.hourly, recs)
			if err != nil {
				return nil, err
			}
		}
		roomHours := map[string]*siteHours{}
		for path, r := range rooms {
			recs, _ := sc.Apply(r.hourly.Records)
			rh, err := newHours(r.hourly, recs) // a room record: no sun, rain or wind
			if err != nil {
				return nil, err
			}
			roomHours[path] = rh
		}
		results, runs, err := assessCases(cases, sh, roomHours, chem, sc.ID, samples, seed, th, hw != nil, func(what string) {
			done++
			if opt.Progress != nil {
				opt.Progress(done, total, what)
			}
		})
		if err != nil {
			return nil, err
		}
		out.Elements = append(out.Elements, results...)
		for _, run := range runs {
			out.Notes = append(out.Notes, run.notes...)
			if hw != nil {
				if err := hw.write(run, sc.ID); err != nil {
					return nil, err
				}
			}
		}
	}
	if hw != nil {
		if err := hw.flush(); err != nil {
			return nil, err
		}
	}
	if opt.Progress != nil {
		opt.Progress(total, total, "")
	}
	return out, nil
}

// assessCases assesses every case under one scenario, the cases in
// parallel on all cores (each is independent; results keep the cases'
// order). done is called, serialised, as each case finishes.
func assessCases(cases []*element, sh *siteHours, rooms map[string]*siteHours, chem *chemistry, scenario string,
	samples int, seed uint64, th Thresholds, keepTrace bool, done func(what string)) ([]ElementResult, []*elementRun, error) {
	results := make([]ElementResult, len(cases))
	runs := make([]*elementRun, len(cases))
	errs := make([]error, len(cases))
	var mu sync.Mutex
	var wg sync.WaitGroup
	sem := make(chan struct{}, runtime.GOMAXPROCS(0))
	for k, e := range cases {
		wg.Add(1)
		go func() {
			defer wg.Done()
			sem <- struct{}{}
			defer func() { <-sem }()
			run, err := assessElement(e, sh, rooms[e.indoorClimate], chem, keepTrace || samples > 0)
			if err == nil {
				res := run.result(scenario)
				if samples > 0 {
					err = run.uncertainty(&res, samples, seed, chem)
				}
				th.rate(&res)
				res.Findings = findings(&res)
				results[k] = res
				run.rate, run.wet = nil, nil // no longer needed; free them early
				if !keepTrace {
					run.trace = nil
				}
				runs[k] = run
			}
			errs[k] = err
			mu.Lock()
			done(fmt.Sprintf("%s / %s / %s", e.id, e.variant, scenario))
			mu.Unlock()
		}()
	}
	wg.Wait()
	for _, err := range errs {
		if err != nil {
			return nil, nil, err
		}
	}
	return results, runs, nil
}

// needsOutdoor reports whether any element needs the outdoor record.
func (p *Project) needsOutdoor(cases []*element) bool {
	if p.Site.Climate != "" {
		return true
	}
	for _, e := range cases {
		if e.exposure == "exterior" || e.temperatureFactor > 0 {
			return true
		}
	}
	return false
}

// checkColumns says clearly which column an element needs and its record
// lacks, instead of guessing.
func (e *element) checkColumns(outdoor *record, rooms map[string]*record) error {
	need := func(r *record, c climate.Column, why string) error {
		if !r.raw.Has(c) {
			return fmt.Errorf("element %q: the record %s has no %s column, which %s needs", e.id, r.raw.Name, c, why)
		}
		return nil
	}
	if e.exposure == "exterior" {
		for _, c := range []struct {
			col climate.Column
			why string
		}{
			{climate.ColRain, "the water reaching an exterior surface"},
			{climate.ColWind, "driving rain and the surface heat transfer"},
			{climate.ColWindDir, "driving rain on a wall"},
			{climate.ColSolar, "the surface temperature in the sun"},
		} {
			if c.col == climate.ColWindDir && e.tiltDeg == 0 {
				continue
			}
			if err := need(outdoor, c.col, c.why); err != nil {
				return err
			}
		}
	}
	return nil
}

// thresholds applies the project's overrides to the defaults.
func (p *Project) thresholds() (Thresholds, error) {
	t := DefaultThresholds()
	s := p.Thresholds
	for _, o := range []struct {
		dst *float64
		src *float64
	}{
		{&t.LeachingModerateYears, s.LeachingModerateYears}, {&t.LeachingHighYears, s.LeachingHighYears},
		{&t.DehydrationModerateHours, s.DehydrationModerateHours}, {&t.DehydrationHighHours, s.DehydrationHighHours},
		{&t.HotModerateHours, s.HotModerateHours}, {&t.HotHighHours, s.HotHighHours},
		{&t.CondensationModerateHours, s.CondensationModerateHours}, {&t.CondensationHighHours, s.CondensationHighHours},
		{&t.MouldModerateIndex, s.MouldModerateIndex}, {&t.MouldHighIndex, s.MouldHighIndex},
	} {
		if o.src != nil {
			*o.dst = *o.src
		}
	}
	if err := t.check(); err != nil {
		return t, &ProjectError{File: p.Path, Key: "thresholds", Err: err}
	}
	return t, nil
}

// climateOut fills the climate block from a record's summary.
func climateOut(c *ClimateOut, r *record) error {
	sum, err := climate.SummariseWith(r.raw, climate.SummaryOptions{})
	if err != nil {
		return err
	}
	c.Start, c.End = r.raw.Start(), r.raw.End()
	c.CoveragePct = float64(sum.CoveragePct)
	c.Records = sum.Records
	c.Years = r.raw.Years()
	c.RainMMPerYear = zeroNaN(float64(sum.RainMMPerYear))
	c.TempMeanC = float64(sum.Means.TempC)
	c.RHMeanPct = float64(sum.Means.RHPct)
	c.Gaps = len(sum.Gaps)
	for _, m := range r.raw.Stats.Missing {
		c.MissingValues += m
	}
	c.ClippedRHCount = r.raw.Stats.Clipped[climate.ColRH]
	for _, m := range sum.Monthly {
		c.Monthly = append(c.Monthly, ClimateMonth{Month: m.Month, TempMeanC: float64(m.TempMeanC), RHMeanPct: float64(m.RHMeanPct),
			RainMM: zeroNaN(float64(m.RainMM)), Hours: m.Hours})
	}
	for _, d := range sum.DrivingRain {
		if v := float64(d.LPerM2PerYear); !math.IsNaN(v) {
			c.DrivingRain = append(c.DrivingRain, DrivingRainDir{AzimuthDeg: float64(d.AzimuthDeg), LPerM2PerYear: v})
		}
	}
	return nil
}
