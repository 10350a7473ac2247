package assess

import (
	"math"
)

// result turns a finished run into its ElementResult.
func (r *elementRun) result(scenario string) ElementResult {
	e := r.e
	y := r.years
	perYear := func(v float64) float64 { return v / y }
	hoursPerYear := func(s float64) float64 { return s / 3600 / y }
	res := ElementResult{
		ID: e.id, Label: e.label, Variant: e.variant, Scenario: scenario,
		Material: e.material, Exposure: e.exposure, Description: e.description,
		Inputs: ElementInputs{
			AzimuthDeg: e.azimuthDeg, TiltDeg: e.tiltDeg, HeightM: e.heightM, ObstructionM: math.Max(e.obstructionM, 0),
			WallFactor: e.wallFactor, RoughnessCoeff: r.cR, TopographyFactor: r.topography(), ObstructionFactor: r.obstruction,
			RunoffHeightM: e.runoffHeightM, FlowLengthM: e.flowLengthM, RunoffFraction: e.runoffFrac, SolarAbsorptance: e.solarAbsorptance,
			ThicknessMM: e.thicknessMM, LossLimitMM: e.lossLimitMM,
			BulkDensityKgM3: e.bulkDensityKgM3, GypsumFraction: e.gypsumFrac, Porosity: e.porosity,
			MouldClass: e.mouldClass, RepellentFraction: e.repellentFrac, RepellentLifeYears: e.repellentLife,
			WallUValueWPerM2K: e.wallUValue, HeatCapacityJPerM2K: e.heatCapacityJPerM2K(),
			TemperatureFactor: e.temperatureFactor, HumidityClass: e.humidityClass, IndoorClimate: e.indoorClimate,
		},
		Water: WaterOut{
			DepositedLM2PerYear:  perYear(r.depositedL),
			RunoffInLM2PerYear:   perYear(r.runoffL),
			CondensateLM2PerYear: perYear(r.condensateKg),
			WetHoursPerYear:      hoursPerYear(r.wetS),
		},
		Dehydration: DehydrationOut{
			UnstableHoursPerYear:          hoursPerYear(r.unstableS),
			AnhydriteFavouredHoursPerYear: hoursPerYear(r.anhydriteS),
			MaxSurfaceTempC:               r.maxTempC,
			HoursAbove52CPerYear:          hoursPerYear(r.hotS),
			MinDeltaGJPerMol:              r.minDeltaG,
		},
		Condensation: CondensationOut{
			HoursPerYear:          hoursPerYear(r.condS),
			CondensateKgM2PerYear: perYear(r.condensateKg),
		},
		Mould: MouldOut{IndexMax: r.mouldMax, Class: e.mouldClass},
		Frost: FrostOut{WetFreezeThawCyclesPerYear: float64(r.freezeThaw) / y},
	}
	res.Mould.MonthsOver80PctList = r.failingMonths
	res.Mould.MonthsOver80Pct = len(res.Mould.MonthsOver80PctList)

	rec := perYear(r.dissolvedG) * r.mmPerGram()
	res.Leaching = LeachingOut{
		DissolvedGM2PerYear:       perYear(r.dissolvedG),
		RecessionMMPerYear:        rec,
		SaturationBoundGM2PerYear: perYear(r.boundG),
	}
	if r.satWater > 0 {
		res.Leaching.MeanSaturationFraction = r.satWeighted / r.satWater
	}
	res.Leaching.YearsToLimit = yearsToLimit(e, rec, r.bareRecession(rec))
	res.Monthly = r.monthly
	res.Daily = r.daily
	return res
}

// topography returns the topography factor C_T the element used.
func (r *elementRun) topography() float64 {
	if r.sh.site == nil {
		return 1
	}
	return r.sh.site.topography
}

// bareRecession is the recession rate once a water-repellent finish has
// stopped working: the rain water (deposited and run-off) then dissolves
// in full. It scales the rain water's share of the dissolved mass back up
// by 1/(1 − f).
func (r *elementRun) bareRecession(rec float64) float64 {
	f := r.e.repellentFrac
	if f <= 0 || r.dissolvedG == 0 {
		return rec
	}
	var dep, all float64
	for _, w := range r.wet {
		all += w.drivenL + w.rainL + w.runoffL + w.condL
		dep += w.drivenL + w.rainL + w.runoffL
	}
	if all == 0 {
		return rec
	}
	// The dissolved mass splits in proportion to the water (the film
	// saturation is shared by all water of an hour).
	share := dep / all
	return rec * (1 - share + share/(1-f))
}

// yearsToLimit is the time until the recession reaches the loss limit,
//
//	t = limit / rate                                   (no finish, or limit reached while it works)
//	t = L + (limit − L·rate_f) / rate_bare             (finish of life L wears out first)
//
// nil when the surface does not recede.
func yearsToLimit(e *element, rate, bare float64) *float64 {
	// Below a micrometre in a thousand years the surface does not recede
	// in any sense that matters; the quotient would only print round-off.
	const negligibleMMPerYear = 1e-6
	if !(rate > negligibleMMPerYear) && !(bare > negligibleMMPerYear) {
		return nil
	}
	lim := e.lossLimitMM
	var t float64
	switch {
	case e.repellentFrac <= 0 || rate*e.repellentLife >= lim:
		t = lim / rate
	default:
		t = e.repellentLife + (lim-e.repellentLife*rate)/bare
	}
	if math.IsInf(t, 0) || math.IsNaN(t) {
		return nil
	}
	return &t
}
