package assess

import (
	"fmt"
	"math"

	"github.com/gyprisk/gyprisk/climate"
	"github.com/gyprisk/gyprisk/climate/solar"
	"github.com/gyprisk/gyprisk/climate/surface"
	"github.com/gyprisk/gyprisk/leach"
	"github.com/gyprisk/gyprisk/leach/mould"
)

// Fixed physical choices of the hourly loop, each with its source.
const (
	// surfaceEmissivity is the long-wave emissivity of plaster and
	// masonry surfaces, 0.9 (ISO 6946:2017 Annex C uses ε = 0.9 for
	// building materials, from memory).
	surfaceEmissivity = 0.9
	// wetRHPct: a surface at or above 95 % RH counts as wet, as liquid
	// water on it does (the definition; common practice, no source).
	wetRHPct = 95
	// hotLimitC is the long-term service temperature limit commonly set
	// for gypsum products: 125 °F (52 °C). The International Mechanical
	// Code, section 603.5.1 "Gypsum ducts", limits gypsum-board air shafts
	// to air temperatures that "do not exceed 125ºF (52ºC)" (read in the
	// Washington State adoption, WAC 51-52-0603), and the International
	// Residential Code, M1601.1.1 item 5, sets the same limit for gypsum
	// return-air ducts and plenums.
	hotLimitC = 52
	// frostWetMemoryS: a surface that was wet within the previous 24 hours
	// still holds water when it freezes (common practice, no source).
	frostWetMemoryS = 24 * 3600
	// minFlowSlopeDeg is the slope given to surfaces that are nominally
	// flat (a cornice top, a sill): 2°, the usual minimum fall of a
	// weathered top (common practice, no source).
	minFlowSlopeDeg = 2
	// interiorHcWPerM2K is the interior convective coefficient for
	// horizontal heat flow, 2.5 W/(m²·K) (ISO 6946:2017 Annex C, h_ci,
	// from memory), used for the vapour exchange at interior surfaces.
	interiorHcWPerM2K = 2.5
)

// wetHour is an hour with water on the surface: the only hours in which
// gypsum dissolves, kept compactly so that the Monte Carlo samples loop over
// them alone.
type wetHour struct {
	i        int32   // hour index
	drivenL  float64 // deposited driving rain in contact (after a repellent), L/m²
	rainL    float64 // deposited vertical rain in contact (after a repellent), L/m²
	runoffL  float64 // runoff from the wall above, L/m²
	condL    float64 // condensate, L/m²
	tempC    float64 // surface temperature
	dTdAlpha float64 // ∂θ_s/∂α, K per unit absorptance (I/h linearisation)
	flowRunM float64 // the element's flow length, m
	slopeDeg float64
	dtS      float64
	weightS  float64 // trapezoid weight
}

// elementRun is one element under one scenario, computed hour by hour.
type elementRun struct {
	e     *element
	sh    *siteHours
	chem  *chemistry
	years float64

	cR, cRAbove, obstruction float64

	// totals over the record
	depositedL, runoffL, condensateKg float64
	wetS, unstableS, anhydriteS, hotS float64
	condS                             float64
	maxTempC, minDeltaG               float64
	freezeThaw                        int
	mouldMax                          float64
	dissolvedG, boundG                float64
	satWeighted, satWater             float64

	monthly       []ElementMonth
	failingMonths []string  // months failing the ISO 13788 criterion
	rhSum         []float64 // per month, time-weighted sums of surface RH,
	tSum          []float64 // surface temperature
	pSum          []float64 // and vapour pressure at the surface
	mHours        []float64
	daily         []ElementDay
	dSums         [][3]float64 // per day: Σ θ·dt, Σ φ·dt, Σ dt

	// per-hour trace (kept for --hourly and the samples)
	notes []string // what the run had to assume
	trace *trace
	wet   []wetHour
	rate  []float64 // dissolution rate, g/(m²·s), per hour
}

// trace is the hour-by-hour state of one element.
type trace struct {
	surfTempC, surfRHPct       []float64
	depositL, runoffL, condL   []float64
	dissolvedG, deltaG, mouldM []float64
}

// assessElement works through every hour for one element. keep asks for
// the per-hour trace.
func assessElement(e *element, outdoor, room *siteHours, chem *chemistry, keep bool) (*elementRun, error) {
	axis := outdoor
	if e.exposure == "interior" && room != nil {
		axis = room
	}
	if axis == nil {
		return nil, fmt.Errorf("element %q: no climate record to work on", e.id)
	}
	r := &elementRun{e: e, sh: axis, chem: chem, years: axis.years, maxTempC: math.Inf(-1)}
	n := axis.n
	r.rate = make([]float64, n)
	r.monthly = make([]ElementMonth, len(axis.months))
	for k, m := range axis.months {
		r.monthly[k].Month = m
	}
	r.rhSum = make([]float64, len(axis.months))
	r.tSum = make([]float64, len(axis.months))
	r.pSum = make([]float64, len(axis.months))
	r.mHours = make([]float64, len(axis.months))
	r.daily = make([]ElementDay, len(axis.days))
	r.dSums = make([][3]float64, len(axis.days))
	for k, d := range axis.days {
		r.daily[k] = ElementDay{Date: d, SurfaceTempMaxC: math.Inf(-1), SurfaceRHMinPct: math.Inf(1)}
	}
	if keep {
		r.trace = &trace{
			surfTempC: make([]float64, n), surfRHPct: make([]float64, n),
			depositL: make([]float64, n), runoffL: make([]float64, n), condL: make([]float64, n),
			dissolvedG: make([]float64, n), deltaG: make([]float64, n), mouldM: make([]float64, n),
		}
	}
	class, err := mould.ParseClass(e.mouldClass)
	if err != nil {
		return nil, fmt.Errorf("element %q: mould_class: %v", e.id, err)
	}
	mm, err := mould.New(class)
	if err != nil {
		return nil, err
	}

	var h hourState
	if e.exposure == "exterior" {
		if err := r.exteriorFactors(); err != nil {
			return nil, err
		}
		plane := solar.NewPlane(e.tiltDeg, e.azimuthDeg)
		surf := surface.NewSurface(e.tiltDeg, e.solarAbsorptance, surfaceEmissivity)
		wall := surfaceConductance(e.wallUValue)
		heatCap := e.heatCapacityJPerM2K()
		prevT := math.NaN()
		sinAz, cosAz := math.Sincos(e.azimuthDeg * math.Pi / 180)
		sinT, cosT := math.Sincos(e.tiltDeg * math.Pi / 180)
		// sin 180° and cos 90° are 10⁻¹⁶, not 0: snap them, so a soffit
		// gets no driving rain and a wall no vertical rain.
		if math.Abs(cosT) < 1e-12 {
			cosT = 0
		}
		if math.Abs(sinT) < 1e-12 {
			sinT = 0
		}
		exposure := r.cR * axis.site.topography * r.obstruction * e.wallFactor
		exposureAbove := r.cRAbove * axis.site.topography * r.obstruction * e.wallFactor
		for i := 0; i < n; i++ {
			// Water (ISO 15927-3:2009 clause 3 hourly spell, clause 5 factors).
			var dr float64
			if c := axis.windCos[i]*cosAz + axis.windSin[i]*sinAz; c > 0 {
				dr = axis.drBase[i] * c // cos(D − Θ)
			}
			h.depositRain = 0
			if cosT > 0 {
				h.depositRain = axis.rainMM[i] * cosT
			}
			h.deposit = dr*exposure*sinT + h.depositRain
			h.runoff = 0
			if e.runoffHeightM > 0 {
				h.runoff = dr * exposureAbove * e.runoffFrac * e.runoffHeightM / e.flowLengthM
			}
			// Surface state.
			irr := axis.sky[i].OnPlane(&plane, axis.site.groundAlbedo)
			hc := surface.ConvectiveCoefficient(axis.windMS[i])
			// The gypsum layer's heat capacity enters by a backward Euler
			// step: C/Δt·(θ_prev − θ_s) is one more linear conductance, to
			// last hour's surface temperature, beside the wall's Λ·(θ_i − θ_s).
			// After a gap (or at the start) the layer starts at air
			// temperature.
			if sh := axis; i == 0 || sh.dtS[i] != sh.endS[i]-sh.endS[i-1] {
				prevT = axis.tempC[i]
			}
			capG := heatCap / axis.dtS[i]
			surf.UWPerM2K = wall + capG
			inner := (wall*e.indoorTempC + capG*prevT) / (wall + capG)
			cond := surface.Conditions{AirTempC: axis.tempC[i], VapourPa: axis.vapPa[i], HcWPerM2K: hc,
				SkyTempC: axis.skyTempC[i], IrradianceWM2: irr.TotalWM2, InnerTempC: inner, Wet: h.deposit+h.runoff > 0}
			st := surf.Solve(&cond)
			h.tempC = st.TempC
			prevT = st.TempC
			h.dTdAlpha = irr.TotalWM2 / (hc + surface.RadiativeCoefficient(surfaceEmissivity, st.TempC) + surf.UWPerM2K)
			h.condKg = condensate(st.VapourFluxKgPerM2S, axis.dtS[i])
			h.vapPa = axis.vapPa[i]
			h.rhPct = climate.RHAtPct(h.vapPa, h.tempC)
			h.slopeDeg = flowSlope(e.tiltDeg)
			r.step(i, &h, mm)
		}
	} else {
		if err := r.interiorHours(outdoor, room, mm, &h); err != nil {
			return nil, err
		}
	}
	return r, r.finish(mm)
}

// hourState is one hour's surface state, handed from the exterior or
// interior physics to the common accounting in step.
type hourState struct {
	deposit, runoff float64 // L/m² in the hour
	depositRain     float64 // the part of deposit that falls as rain on an upward-facing surface (no wall factor)
	condKg          float64 // condensate, kg/m² in the hour
	tempC, rhPct    float64 // surface temperature and (unclipped) surface RH
	vapPa           float64 // vapour pressure of the air at the surface
	dTdAlpha        float64
	slopeDeg        float64
	lastWetS        float64
	frozenWet       bool
	started         bool
}

// condensate is the water condensed in an interval of dtS seconds at a
// vapour flux (kg/(m²·s), positive condensing), with fluxes below
// 10⁻¹² kg/(m²·s) (a micrometre of water in thirty years) counted as none:
// they are the round-off of a surface at its dew point.
func condensate(fluxKgPerM2S, dtS float64) float64 {
	if fluxKgPerM2S < 1e-12 {
		return 0
	}
	return fluxKgPerM2S * dtS
}

// lnWaterActivity returns ln(φ/100), with φ floored at 10⁻⁴ % so that a
// bone-dry hour gives a large negative number, not −Inf.
func lnWaterActivity(rhPct float64) float64 {
	return math.Log(math.Max(rhPct, 1e-4) / 100)
}

// gypsumSpecificHeatJPerKgK is the specific heat capacity of gypsum
// plasters, 1000 J/(kg·K) (EN ISO 10456:2007 Table 3, gypsum plastering;
// from memory).
const gypsumSpecificHeatJPerKgK = 1000

// heatCapacityJPerM2K is the heat capacity of the element's gypsum layer
// per square metre, the thermal mass that damps its surface temperature
// from hour to hour:
//
//	C = ρ · c_p · d    (J/(m²·K))
//
// with the bulk density ρ, c_p = gypsumSpecificHeatJPerKgK and the layer
// thickness d (0 when no thickness is given: no mass). Whatever lies behind
// the layer acts only through the wall's U-value.
func (e *element) heatCapacityJPerM2K() float64 {
	return e.bulkDensityKgM3 * gypsumSpecificHeatJPerKgK * e.thicknessMM / 1000
}

// surfaceConductance is the conductance (W/(m²·K)) from the exterior
// surface through the wall to the room air, from the wall's thermal
// transmittance U with the exterior surface resistance taken out,
//
//	Λ = 1 / (1/U − R_se),   R_se = 0.04 m²·K/W
//
// (ISO 6946:2017: U = 1/R_T with R_T including R_se; from memory). U = 0
// gives 0 (adiabatic).
func surfaceConductance(uWPerM2K float64) float64 {
	if uWPerM2K <= 0 {
		return 0
	}
	return 1 / (1/uWPerM2K - surface.ExteriorResistanceISO6946)
}

// flowSlope is the slope (degrees from horizontal) water runs down on a
// surface of tilt tiltDeg: a wall (90) is vertical, a soffit (180) drips;
// nominally flat surfaces get minFlowSlopeDeg.
func flowSlope(tiltDeg float64) float64 {
	s := tiltDeg
	if s > 90 {
		s = 180 - s
	}
	return math.Max(s, minFlowSlopeDeg)
}

// exteriorFactors works out the ISO 15927-3 clause 5 factors of the
// element: C_R at its height and at the middle of the wall above it, and
// the obstruction factor O.
func (r *elementRun) exteriorFactors() error {
	e := r.e
	var err error
	terrain := r.sh.site.terrain
	if r.cR, err = climate.RoughnessCoefficient(terrain, e.heightM); err != nil {
		return fmt.Errorf("element %q: %v", e.id, err)
	}
	if r.cRAbove, err = climate.RoughnessCoefficient(terrain, e.heightM+e.runoffHeightM/2); err != nil {
		return fmt.Errorf("element %q: %v", e.id, err)
	}
	r.obstruction = 1
	if e.obstructionM >= 0 {
		if r.obstruction, err = climate.ObstructionFactor(e.obstructionM); err != nil {
			return fmt.Errorf("element %q: %v", e.id, err)
		}
	}
	return nil
}

// step does the accounting common to exterior and interior surfaces for
// hour i: leaching, dehydration, condensation, wetness, frost and mould.
func (r *elementRun) step(i int, h *hourState, mm *mould.Model) {
	sh, e, chem := r.sh, r.e, r.chem
	dt := sh.dtS[i]
	hours := dt / 3600
	t := h.tempC
	rh := h.rhPct
	rhc := math.Min(rh, 100)

	keep := 1 - e.repellentFrac // a water-repellent finish sheds the rest without dissolving contact
	contact := (h.deposit + h.runoff) * keep
	condL := h.condKg // 1 kg of water is 1 L
	water := contact + condL
	var dissolved float64
	if water > 0 && t > 0 {
		// Frozen water (surface below 0 °C) dissolves nothing.
		sat := filmSat(chem.film, water, t, h.slopeDeg, e.flowLengthM, dt, 1, 1)
		ceq := chem.sol.At(clampChem(t))
		dissolved = water * ceq * sat
		r.boundG += water * ceq * sh.wTrap[i] / dt
		r.satWeighted += sat * water
		r.satWater += water
		r.wet = append(r.wet, wetHour{i: int32(i), drivenL: (h.deposit - h.depositRain) * keep, rainL: h.depositRain * keep,
			runoffL: h.runoff * keep, condL: condL,
			tempC: t, dTdAlpha: h.dTdAlpha, flowRunM: e.flowLengthM, slopeDeg: h.slopeDeg, dtS: dt, weightS: sh.wTrap[i]})
	}
	r.rate[i] = dissolved / dt
	r.depositedL += h.deposit
	r.runoffL += h.runoff
	r.condensateKg += h.condKg

	// Dehydration (bassanite route; anhydrite reported as kinetically
	// hindered): ΔG = ν·R·T·(ln a_w − ln a_w,eq), so the sign needs no
	// more than the one logarithm.
	lnAw := lnWaterActivity(rhc)
	dgB := deltaG(chem.lnAwEqBas, 1.5, t, lnAw)
	if dgB < 0 {
		r.unstableS += dt
	}
	if lnAw < lnAwEq(chem.lnAwEqAnh, t) {
		r.anhydriteS += dt
	}
	if t > hotLimitC {
		r.hotS += dt
	}
	if t > r.maxTempC {
		r.maxTempC = t
	}
	if !h.started || dgB < r.minDeltaG {
		r.minDeltaG = dgB
	}
	// Condensation: the surface below the dew point of the air, so that
	// water condenses on it (a surface merely at the dew point of
	// saturated air, in fog, is not counted).
	if h.condKg > 0 || rh > 100.01 {
		r.condS += dt
	}
	// Wetness and wet freeze–thaw.
	wet := water > 0 || rhc >= wetRHPct
	if wet {
		r.wetS += dt
		h.lastWetS = sh.endS[i]
	}
	recentlyWet := h.started && sh.endS[i]-h.lastWetS <= frostWetMemoryS || wet
	switch {
	case t < 0 && recentlyWet:
		h.frozenWet = true
	case t > 0 && h.frozenWet:
		r.freezeThaw++
		h.frozenWet = false
	}
	h.started = true
	// Mould.
	mm.Step(t, rhc, hours)
	mi := mm.Index()
	if mi > r.mouldMax {
		r.mouldMax = mi
	}
	// Calendar.
	r.pSum[sh.month[i]] += h.vapPa * hours
	m := &r.monthly[sh.month[i]]
	m.DepositedLM2 += h.deposit
	m.RunoffInLM2 += h.runoff
	if t > m.SurfaceTempMaxC || r.mHours[sh.month[i]] == 0 {
		m.SurfaceTempMaxC = t
	}
	m.MouldIndexMax = math.Max(m.MouldIndexMax, mi)
	r.tSum[sh.month[i]] += t * hours
	r.rhSum[sh.month[i]] += rhc * hours
	r.mHours[sh.month[i]] += hours
	d := &r.daily[sh.day[i]]
	d.SurfaceTempMaxC = math.Max(d.SurfaceTempMaxC, t)
	d.SurfaceRHMinPct = math.Min(d.SurfaceRHMinPct, rhc)
	d.MouldIndex = mi
	d.WaterLM2 += h.deposit + h.runoff
	ds := &r.dSums[sh.day[i]]
	ds[0] += t * hours
	ds[1] += rhc * hours
	ds[2] += hours
	if tr := r.trace; tr != nil {
		tr.surfTempC[i], tr.surfRHPct[i] = t, rh
		tr.depositL[i], tr.runoffL[i], tr.condL[i] = h.deposit, h.runoff, condL
		tr.dissolvedG[i], tr.deltaG[i], tr.mouldM[i] = dissolved, dgB, mi
	}
}

// filmSat is the fraction of saturation the water reaches in its contact
// with the surface in one interval of dtS seconds: the water runs as a
// laminar film (Nusselt) over the element's flow length, carrying the flow
// of the hour, and dissolves gypsum by the rate law with diffusion across
// the film (leach.FilmModel). Water that stays (condensate, or a film
// slower than the interval) is in contact for the whole interval.
// thickMul and contactMul scale the film thickness and the contact time
// (1 in the deterministic run).
func filmSat(film *leach.FilmModel, waterL, tempC, slopeDeg, flowLengthM, dtS, thickMul, contactMul float64) float64 {
	// Flow per metre of width at the foot of the element, m²/s.
	q := waterL * 1e-3 * flowLengthM / dtS
	delta, v := film.Film(q, slopeDeg, tempC)
	if math.IsNaN(delta) || !(v > 0) {
		return 1
	}
	contact := math.Min(flowLengthM/v*contactMul, dtS)
	s := film.Saturation(tempC, delta*thickMul, contact)
	if math.IsNaN(s) {
		return 1
	}
	return s
}

// finish turns the totals into the per-year and calendar figures.
func (r *elementRun) finish(mm *mould.Model) error {
	total, err := integrateRate(r.sh.endS, r.sh.dtS, r.rate, r.sh.segs)
	if err != nil {
		return fmt.Errorf("element %q: %v", r.e.id, err)
	}
	r.dissolvedG = total
	// Monthly and daily figures; the cumulative loss runs on the same
	// trapezoid weights, so it ends at the integrated total.
	var cum float64
	mmPerG := r.mmPerGram()
	for i := 0; i < r.sh.n; i++ {
		g := r.rate[i] * r.sh.wTrap[i]
		cum += g
		r.monthly[r.sh.month[i]].DissolvedGM2 += g
		r.daily[r.sh.day[i]].CumLossMM = cum * mmPerG
	}
	r.failingMonths = []string{}
	for k := range r.monthly {
		if h := r.mHours[k]; h > 0 {
			m := &r.monthly[k]
			m.SurfaceTempMeanC = r.tSum[k] / h
			m.SurfaceRHMeanPct = r.rhSum[k] / h
			// ISO 13788:2012 criterion: the monthly surface RH formed from
			// the monthly means, 100·p̄/p_sat(θ̄_si), at most 80 %.
			m.SurfaceRHISO13788Pct = climate.RHAtPct(r.pSum[k]/h, m.SurfaceTempMeanC)
			if m.SurfaceRHISO13788Pct > climate.MouldCriterionRHPct {
				r.failingMonths = append(r.failingMonths, m.Month)
			}
		}
	}
	for k := range r.daily {
		d, s := &r.daily[k], r.dSums[k]
		if s[2] > 0 {
			d.SurfaceTempMeanC = s[0] / s[2]
			d.SurfaceRHMeanPct = s[1] / s[2]
		}
		d.EquilibriumRHPct = r.chem.equilibriumRHPct(d.SurfaceTempMaxC)
	}
	_ = mm
	return nil
}

// mmPerGram converts dissolved gypsum (g/m²) to surface recession (mm):
// the mass lost over the mass of gypsum per unit volume of the material,
//
//	Δx = m / (ρ_bulk · w_gypsum)   (g/m² ÷ kg/m³ = mm)
func (r *elementRun) mmPerGram() float64 {
	return 1 / (r.e.bulkDensityKgM3 * r.e.gypsumFrac)
}
