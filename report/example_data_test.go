package report

import (
	"fmt"
	"math"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// This file builds an assess.Output for the report tests. Everything in it
// is INVENTED test scaffolding: the town, the building, the climate and
// every figure are made up so that the report has realistic shapes to
// draw. None of it is a check value for the physics.

func fp(v float64) *float64 { return &v }

// inventedOutput returns an Output with four elements: three exterior
// (one with a variant and a climate scenario) and one interior, three
// years of monthly and daily traces, and Monte Carlo bands when samples
// is positive.
func inventedOutput(samples int) *assess.Output {
	start := time.Date(2021, 1, 1, 0, 0, 0, 0, time.UTC)
	end := time.Date(2023, 12, 31, 23, 0, 0, 0, time.UTC)
	out := &assess.Output{
		Tool:     assess.Tool{Name: "gyprisk", Version: "0.9.0-test"},
		RunDate:  "2024-03-05T10:00:00Z",
		Project:  "examples/kestrel-ford/project.toml",
		Database: "phreeqc.dat (test pin 2024-01)",
		Invented: true,
		Site: assess.SiteOut{
			Name: "Old Ropeworks, Kestrel Ford (invented)", LatitudeDeg: 51.2345, LongitudeDeg: -2.3456,
			TimeZone: "Europe/London", Terrain: "III", TopographyFactor: 1, Climate: "examples/kestrel-ford/outdoor.csv",
		},
		Climate: assess.ClimateOut{
			Start: start, End: end, CoveragePct: 99.2, Records: 26280, Years: 2.98,
			RainMMPerYear: 812, TempMeanC: 10.4, RHMeanPct: 81, MissingValues: 17, ClippedRHCount: 4, Gaps: 2,
		},
		Inputs: []assess.InputFile{
			{Role: "project", Path: "examples/kestrel-ford/project.toml", SHA256: "3f1c9a5e0b7d2c4e6a8f0e1d2c3b4a5968778695a4b3c2d1e0f9a8b7c6d5e4f3"},
			{Role: "outdoor climate", Path: "examples/kestrel-ford/outdoor.csv", SHA256: "a0b1c2d3e4f5061728394a5b6c7d8e9fa0b1c2d3e4f5061728394a5b6c7d8e9f", Start: start, End: end},
			{Role: "indoor climate (element bath-ceiling)", Path: "examples/kestrel-ford/bathroom-logger.csv", SHA256: "0123456789abcdef0123456789abcdef0123456789abcdef0123456789abcdef", Start: start, End: end},
		},
		Options:    assess.RunOptions{Samples: samples, Seed: 42},
		Thresholds: assess.DefaultThresholds(),
		Scenarios: []assess.Scenario{
			{ID: "present", RainFactor: 1, WindFactor: 1},
			{ID: "warmer-wetter", TempShiftC: 2, RainFactor: 1.2, RHShiftPct: 0, WindFactor: 1},
		},
		Notes: []string{
			"outdoor.csv: 17 missing values filled by linear interpolation (gaps up to 6 h).",
			"outdoor.csv: 4 relative humidity readings above 100 % set to 100 %.",
			"Invented example data: the site and its climate record are made up.",
		},
	}
	for m := 0; m < 36; m++ {
		t := start.AddDate(0, m, 0)
		ph := 2 * math.Pi * float64(t.Month()-1) / 12
		hours := t.AddDate(0, 1, 0).Sub(t).Hours()
		if m == 7 {
			hours -= 30 // a gap
		}
		out.Climate.Monthly = append(out.Climate.Monthly, assess.ClimateMonth{
			Month: t.Format("2006-01"), TempMeanC: 10.4 - 6.5*math.Cos(ph-0.35), RHMeanPct: 81 + 7*math.Cos(ph-0.2),
			RainMM: 68 + 22*math.Cos(ph-0.4) + 9*math.Sin(3.1*float64(m)), Hours: hours,
		})
	}
	for i := 0; i < 16; i++ {
		az := 22.5 * float64(i)
		v := 95 + 110*math.Max(0, math.Cos((az-235)*math.Pi/180)) + 12*math.Cos((az-60)*math.Pi/90)
		out.Climate.DrivingRain = append(out.Climate.DrivingRain, assess.DrivingRainDir{AzimuthDeg: az, LPerM2PerYear: v})
	}

	type spec struct {
		id, label, variant, scenario, material, exposure string
		az, tilt, water, runoff, cond, recession, tmax   float64
		unstable, above52, condH, mould                  float64
	}
	specs := []spec{
		{"sw-facade", "South-west facade", "base", "present", "gypsum-lime mortar", "exterior", 225, 90, 96, 0, 0.4, 0.031, 47.5, 6, 0, 38, 0.6},
		{"cornice-top", "Cornice top", "base", "present", "gypsum stucco", "exterior", 225, 0, 240, 35, 0.6, 0.22, 56.1, 64, 12, 85, 1.4},
		{"cornice-top", "Cornice top", "drip-moulding", "present", "gypsum stucco", "exterior", 225, 0, 150, 8, 0.6, 0.12, 56.1, 64, 12, 85, 1.3},
		{"cornice-top", "Cornice top", "base", "warmer-wetter", "gypsum stucco", "exterior", 225, 0, 288, 42, 0.5, 0.27, 58.0, 95, 20, 70, 1.7},
		{"entrance-soffit", "Entrance soffit", "base", "present", "gypsum plaster", "exterior", 45, 180, 0, 0, 2.1, 0, 21.3, 0, 0, 310, 3.2},
		{"bath-ceiling", "Bathroom ceiling", "base", "present", "gypsum board", "interior", 0, 0, 0, 0, 1.8, 0, 27.4, 0, 0, 640, 2.4},
	}
	for k, s := range specs {
		e := assess.ElementResult{
			ID: s.id, Label: s.label, Variant: s.variant, Scenario: s.scenario, Material: s.material, Exposure: s.exposure,
			Inputs: assess.ElementInputs{
				AzimuthDeg: s.az, TiltDeg: s.tilt, HeightM: 9.5, ObstructionM: 18, WallFactor: 0.4, RoughnessCoeff: 0.83,
				TopographyFactor: 1, ObstructionFactor: 0.4, RunoffHeightM: 1.2, SolarAbsorptance: 0.55,
				ThicknessMM: 20, LossLimitMM: 5, BulkDensityKgM3: 1250, GypsumFraction: 0.8, Porosity: 0.38, MouldClass: "medium resistant",
			},
			Water:        assess.WaterOut{DepositedLM2PerYear: s.water, RunoffInLM2PerYear: s.runoff, CondensateLM2PerYear: s.cond, WetHoursPerYear: 400},
			Leaching:     assess.LeachingOut{RecessionMMPerYear: s.recession, DissolvedGM2PerYear: s.recession * 1000, SaturationBoundGM2PerYear: s.water * 2.4, MeanSaturationFraction: 0.3},
			Dehydration:  assess.DehydrationOut{UnstableHoursPerYear: s.unstable, MaxSurfaceTempC: s.tmax, HoursAbove52CPerYear: s.above52, MinDeltaGJPerMol: -120},
			Condensation: assess.CondensationOut{HoursPerYear: s.condH, CondensateKgM2PerYear: s.cond},
			Mould:        assess.MouldOut{IndexMax: s.mould, MonthsOver80Pct: int(s.mould * 2), Class: "medium resistant"},
		}
		if s.variant == "drip-moulding" {
			e.Inputs.RunoffHeightM = 0.2
		}
		if s.exposure == "interior" {
			e.Inputs = assess.ElementInputs{ThicknessMM: 12.5, LossLimitMM: 1, BulkDensityKgM3: 700, GypsumFraction: 0.9, MouldClass: "sensitive",
				TemperatureFactor: 0.72, HumidityClass: 4, IndoorClimate: "room logger bathroom-logger.csv"}
			e.Description = "Suspended board ceiling over the first-floor bathroom; the extract fan has been broken for some time (invented)."
		}
		if s.recession > 0 {
			e.Leaching.YearsToLimit = fp(e.Inputs.LossLimitMM / s.recession)
			if samples > 0 {
				e.Leaching.RecessionMMPerYearP10 = fp(s.recession * 0.72)
				e.Leaching.RecessionMMPerYearP50 = fp(s.recession * 0.98)
				e.Leaching.RecessionMMPerYearP90 = fp(s.recession * 1.35)
				e.Leaching.YearsToLimitP10 = fp(e.Inputs.LossLimitMM / (s.recession * 1.35))
				e.Leaching.YearsToLimitP50 = fp(e.Inputs.LossLimitMM / (s.recession * 0.98))
				e.Leaching.YearsToLimitP90 = fp(e.Inputs.LossLimitMM / (s.recession * 0.72))
				e.Leaching.Sensitivity = []assess.Sensitivity{{Input: "wall factor", RankCorrelation: 0.71}, {Input: "rate constant", RankCorrelation: 0.42}}
			}
		}
		rate(out.Thresholds, &e)
		e.Findings = []string{fmt.Sprintf("Finding from the engine for %s (%s, %s): invented test sentence.", s.id, s.variant, s.scenario)}
		// Traces.
		cum := 0.0
		mouldIdx := 0.0
		for day := start; !day.After(end); day = day.AddDate(0, 0, 1) {
			doy := float64(day.YearDay())
			ph := 2 * math.Pi * (doy - 200) / 365.25
			tmax := (s.tmax-8)/2 + (s.tmax-8)/2*math.Cos(ph) + 8 + 3*math.Sin(doy*1.7+float64(k))
			tmean := tmax - 6
			rhMin := 70 - 40*math.Cos(ph) + 8*math.Sin(doy*0.9)
			if s.exposure == "interior" {
				rhMin = 62 + 12*math.Cos(ph+2.5)
			}
			eq := 100 * math.Exp(-(62-tmax)/11)
			cum += s.recession / 365.25 * (1 + 0.8*math.Cos(ph+math.Pi))
			mouldIdx = math.Min(s.mould, math.Max(0, mouldIdx+0.004*math.Cos(ph+math.Pi)+0.0015))
			d := assess.ElementDay{Date: day, SurfaceTempMaxC: tmax, SurfaceTempMeanC: tmean, SurfaceRHMinPct: rhMin,
				SurfaceRHMeanPct: rhMin + 15, EquilibriumRHPct: eq, CumLossMM: cum, MouldIndex: mouldIdx,
				WaterLM2: (s.water + s.runoff) / 365.25}
			if samples > 0 && s.recession > 0 {
				d.CumLossMMP10, d.CumLossMMP90 = cum*0.72, cum*1.35
			}
			e.Daily = append(e.Daily, d)
		}
		for m := 0; m < 36; m++ {
			t := start.AddDate(0, m, 0)
			ph := 2 * math.Pi * float64(t.Month()-1) / 12
			dep := s.water / 12 * (1 + 0.45*math.Cos(ph-0.4))
			run := s.runoff / 12 * (1 + 0.45*math.Cos(ph-0.4))
			e.Monthly = append(e.Monthly, assess.ElementMonth{Month: t.Format("2006-01"), DepositedLM2: dep, RunoffInLM2: run,
				DissolvedGM2: s.recession * 100, SurfaceTempMeanC: 10 + 7*math.Cos(ph-3.5), SurfaceTempMaxC: s.tmax - 10*(1-math.Cos(ph-3.5)),
				SurfaceRHMeanPct: 80 + 6*math.Cos(ph), MouldIndexMax: s.mould * float64(m) / 36})
		}
		out.Elements = append(out.Elements, e)
	}
	return out
}

// rate fills in the ratings with the thresholds (the same rules as the
// engine's, repeated here because the engine's are unexported).
func rate(t assess.Thresholds, r *assess.ElementResult) {
	up := func(v, mod, high float64) string {
		switch {
		case v >= high:
			return assess.High
		case v >= mod:
			return assess.Moderate
		}
		return assess.Low
	}
	r.Ratings.Leaching = assess.Low
	if y := r.Leaching.YearsToLimit; y != nil {
		switch {
		case *y < t.LeachingHighYears:
			r.Ratings.Leaching = assess.High
		case *y < t.LeachingModerateYears:
			r.Ratings.Leaching = assess.Moderate
		}
	}
	r.Ratings.Dehydration = up(r.Dehydration.UnstableHoursPerYear, t.DehydrationModerateHours, t.DehydrationHighHours)
	r.Ratings.Condensation = up(r.Condensation.HoursPerYear, t.CondensationModerateHours, t.CondensationHighHours)
	r.Ratings.Mould = up(r.Mould.IndexMax, t.MouldModerateIndex, t.MouldHighIndex)
}
