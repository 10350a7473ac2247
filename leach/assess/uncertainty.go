package assess

import (
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"sync"

	"gonum.org/v1/gonum/stat"

	"github.com/gyprisk/gyprisk/leach"
)

// The Monte Carlo inputs. Each is drawn independently for every sample;
// the same sample index draws the same values for every element, variant
// and scenario (common random numbers), so comparisons between options are
// not blurred by sampling noise. The ranges and their sources are listed in
// the README ("Uncertainty").
type mcInput int

const (
	mcSolubility  mcInput = iota // multiplier on c_eq
	mcRateConst                  // multiplier on the surface rate constant k1
	mcFilmThick                  // multiplier on the Nusselt film thickness
	mcContact                    // multiplier on the contact time
	mcWallFactor                 // multiplier on the wall factor (and so on driving rain and runoff)
	mcDensity                    // bulk density, as a fraction of the material's range
	mcAbsorptance                // added to the solar absorptance
	numMC
)

var mcNames = [numMC]string{
	mcSolubility:  "solubility",
	mcRateConst:   "dissolution rate constant",
	mcFilmThick:   "water film thickness",
	mcContact:     "water contact time",
	mcWallFactor:  "wall factor",
	mcDensity:     "bulk density",
	mcAbsorptance: "solar absorptance",
}

// Ranges of the Monte Carlo inputs.
const (
	// ±4 % on gypsum solubility: the scatter between published
	// determinations near 25 °C (about 2.0–2.1 g/L in the handbook
	// compilations, e.g. Linke & Seidell 1965; from memory).
	mcSolubilityHalfWidth = 0.04
	// Surface rate constant: log-uniform from k1/30 to k1, the span from
	// Colombani 2008 (Geochim. Cosmochim. Acta 72, 5634: 4·10⁻⁵ mol/(m²·s))
	// to Jeschke et al. 2001 (1.3·10⁻³ mol/(m²·s)), as documented in
	// leach.Jeschke2001.
	mcRateLogRange = 30
	// Film thickness and contact time: log-uniform over a factor of 2 each
	// way. Real wall films are wavy, intermittent and channelled, not the
	// smooth laminar sheet of Nusselt's solution (Bird, Stewart & Lightfoot
	// 2002, §2.2 note the ripples above Re ≈ 20); the factor is our
	// judgement (no source).
	mcFilmFactor = 2
	// Wall factor: ±40 % triangular, about the step between neighbouring
	// rows of the ISO 15927-3 wall factor table (our reading; no source for
	// the spread itself).
	mcWallHalfWidth = 0.4
	// Solar absorptance: ±0.1 uniform, the usual spread of measured
	// absorptances within one colour class (ASHRAE Handbook —
	// Fundamentals, solar absorptance tables; from memory).
	mcAbsorptanceHalfWidth = 0.1
	// Bulk density: ±15 % uniform around the material's value, the width
	// of the typical ranges quoted in the material table's sources.
	mcDensityHalfWidth = 0.15
)

// rateRange is the sampled span of the rate-constant multiplier, [lo, 1]
// log-uniform; tests set a symmetric span through it.
var rateRange = [2]float64{1.0 / mcRateLogRange, 1}

// draw returns sample k's input values. Stream k of the seed is used, so
// a sample does not depend on how many others run or in which order.
func draw(seed uint64, k int) [numMC]float64 {
	rng := rand.New(rand.NewPCG(seed, uint64(k)))
	var v [numMC]float64
	v[mcSolubility] = 1 + mcSolubilityHalfWidth*(2*rng.Float64()-1)
	lo, hi := math.Log(rateRange[0]), math.Log(rateRange[1])
	v[mcRateConst] = math.Exp(lo + (hi-lo)*rng.Float64())
	v[mcFilmThick] = math.Exp(math.Log(mcFilmFactor) * (2*rng.Float64() - 1))
	v[mcContact] = math.Exp(math.Log(mcFilmFactor) * (2*rng.Float64() - 1))
	v[mcWallFactor] = 1 + mcWallHalfWidth*(rng.Float64()-rng.Float64()) // triangular on [−w, w]
	v[mcDensity] = 1 + mcDensityHalfWidth*(2*rng.Float64()-1)
	v[mcAbsorptance] = mcAbsorptanceHalfWidth * (2*rng.Float64() - 1)
	return v
}

// mcPlan is everything about an element's wet hours that the samples do
// not change, computed once: "Precompute everything that does not depend
// on the sampled inputs". Hours whose film is saturated even at the least
// favourable corner of the sampled ranges dissolve water × c_eq whatever
// the sample, so they are summed once, with c_eq linearised in the
// sampled surface-temperature shift; only the remaining hours are
// re-evaluated per sample, through the dimensionless film table.
type mcPlan struct {
	// Saturated hours, by water part (driven rain, runoff, vertical rain,
	// condensate): Σ part·c_eq(θ)·w/Δt and Σ part·c_eq'(θ)·∂θ/∂α·w/Δt.
	sat, satSlope [4]float64
	hours         []mcHour
	table         *leach.FilmTable
}

// mcHour is one wet hour whose film saturation changes from sample to
// sample. The film groups are carried as logarithms at the deterministic
// surface temperature θ0, with slopes for the sampled shift δθ:
//
//	ln τ  = ln k1 + ln t_c − ln δ − ln c_eq
//	ln Da = ln k1 + ln δ − ln 3 − ln D − ln c_eq
//	δ   = δ0·ρ^(1/3)·f_δ,  t_c = min(L·δ0/q0 · ρ^(−2/3)·f_t, Δt),  ρ = water/water0
//
// (Nusselt: δ ∝ q^(1/3), so the film speed q/δ ∝ ρ^(2/3)).
// mcSaturatedWithin: an hour whose film is within this of saturation at
// the least favourable corner of the sampled ranges is summed once as
// saturated; the error this makes in any sample is below 0.01 % of the
// hour's dissolved mass, far inside the sampled spreads.
const mcSaturatedWithin = 1e-4

type mcHour struct {
	driven, runoff, rain, cond float64 // L/m² (after a repellent)
	dTdAlpha                   float64
	water0                     float64
	ceq, ceqSlope              float64 // g/L at θ0 and d/dθ
	lnK1, lnCeq, lnDiff        float64 // at θ0
	lnCeqSlope, lnDiffSlope    float64 // d/dθ
	lnDelta0, lnContact0, lnDt float64
	wdt                        float64 // trapezoid weight / Δt
	frozenAt                   float64 // δθ at or below which the surface is frozen (no dissolution)
}

// plan builds the element's mcPlan.
func (r *elementRun) plan() *mcPlan {
	pl := &mcPlan{table: r.chem.film.Table()}
	e := r.e
	unrep := 1.0
	if e.repellentFrac > 0 {
		unrep = 1 / (1 - e.repellentFrac)
	}
	slowest := r.chem.film.WithRateFactor(rateRange[0])
	for k := range r.wet {
		w := &r.wet[k]
		parts := [4]float64{w.drivenL, w.runoffL, w.rainL, w.condL}
		water := w.drivenL + w.runoffL + w.rainL + w.condL
		wdt := w.weightS / w.dtS
		// The wettest and slowest corner of the sampled ranges.
		wMax := (w.drivenL+w.runoffL)*unrep*(1+mcWallHalfWidth) + w.rainL*unrep + w.condL
		tMin := w.tempC - mcAbsorptanceHalfWidth*w.dTdAlpha
		if filmSat(slowest, wMax, tMin, w.slopeDeg, w.flowRunM, w.dtS, mcFilmFactor, 1/mcFilmFactor) >= 1-mcSaturatedWithin {
			ceq := r.chem.sol.At(clampChem(w.tempC))
			slope := (r.chem.sol.At(clampChem(w.tempC+0.05)) - r.chem.sol.At(clampChem(w.tempC-0.05))) / 0.1
			for j, p := range parts {
				pl.sat[j] += p * ceq * wdt
				pl.satSlope[j] += p * slope * w.dTdAlpha * wdt
			}
			continue
		}
		q := water * 1e-3 * w.flowRunM / w.dtS
		delta, _ := r.chem.film.Film(q, w.slopeDeg, w.tempC)
		t0 := clampChem(w.tempC)
		lk, lc, ld := r.chem.film.LnProperties(t0)
		lo, hi := clampChem(t0-0.05), clampChem(t0+0.05)
		_, lcLo, ldLo := r.chem.film.LnProperties(lo)
		_, lcHi, ldHi := r.chem.film.LnProperties(hi)
		h := mcHour{driven: w.drivenL, runoff: w.runoffL, rain: w.rainL, cond: w.condL,
			dTdAlpha: w.dTdAlpha, water0: water,
			ceq: r.chem.sol.At(t0), ceqSlope: (r.chem.sol.At(hi) - r.chem.sol.At(lo)) / (hi - lo),
			lnK1: lk, lnCeq: lc, lnDiff: ld,
			lnCeqSlope: (lcHi - lcLo) / (hi - lo), lnDiffSlope: (ldHi - ldLo) / (hi - lo),
			lnDelta0: math.Log(delta), lnContact0: math.Log(w.flowRunM * delta / q), lnDt: math.Log(w.dtS),
			wdt: wdt, frozenAt: -w.tempC}
		pl.hours = append(pl.hours, h)
	}
	return pl
}

// sampleRecession returns the recession (mm/year) of one sample, with the
// finish working and without it. The surface temperature follows the
// sampled absorptance through its linearisation ∂θ_s/∂α = I/(h_c + h_r);
// the film's Nusselt thickness scales with the sampled water as q^(1/3) at
// the deterministic temperature.
func (r *elementRun) sampleRecession(pl *mcPlan, v *[numMC]float64) (rec, bare float64) {
	e := r.e
	wf, sol := v[mcWallFactor], v[mcSolubility]
	dAlpha := math.Max(-e.solarAbsorptance, math.Min(1-e.solarAbsorptance, v[mcAbsorptance]))
	unrep := 1.0
	if e.repellentFrac > 0 {
		unrep = 1 / (1 - e.repellentFrac)
	}
	// Saturated hours: linear in the sampled factors.
	part := func(j int) float64 { return pl.sat[j] + dAlpha*pl.satSlope[j] }
	g := sol * ((part(0)+part(1))*wf + part(2) + part(3))
	gBare := sol * ((part(0)+part(1))*unrep*wf + part(2)*unrep + part(3))
	s := sampleLogs{lnRate: math.Log(v[mcRateConst]), lnThick: math.Log(v[mcFilmThick]), lnContact: math.Log(v[mcContact])}
	lnWf := math.Log(wf)
	// lnRatio is ln(water/water0) for the water a·f + b of this sample,
	// without a logarithm where the hour's water is all of one kind.
	lnRatio := func(h *mcHour, a, b, lnF float64) float64 {
		switch {
		case h.rain+h.cond == 0:
			return lnF
		case h.driven+h.runoff == 0 && b == h.water0:
			return 0
		}
		return math.Log((a + b) / h.water0)
	}
	lnUnrepWf := math.Log(unrep * wf)
	for k := range pl.hours {
		h := &pl.hours[k]
		dT := dAlpha * h.dTdAlpha
		if dT <= h.frozenAt {
			continue
		}
		ceq := (h.ceq + h.ceqSlope*dT) * sol
		a := (h.driven + h.runoff) * wf
		water := a + h.rain + h.cond
		g += water * ceq * pl.sampleSat(h, &s, lnRatio(h, a, h.rain+h.cond, lnWf), dT) * h.wdt
		if unrep != 1 {
			ab := (h.driven + h.runoff) * unrep * wf
			bb := h.rain*unrep + h.cond
			gBare += (ab + bb) * ceq * pl.sampleSat(h, &s, lnRatio(h, ab, bb, lnUnrepWf), dT) * h.wdt
		}
	}
	mmPerG := 1 / (e.bulkDensityKgM3 * v[mcDensity] * e.gypsumFrac)
	rec = g / r.years * mmPerG
	bare = rec
	if unrep != 1 {
		bare = gBare / r.years * mmPerG
	}
	return rec, bare
}

// sampleLogs are a sample's film multipliers as logarithms.
type sampleLogs struct{ lnRate, lnThick, lnContact float64 }

// sampleSat is the film saturation of one hour in one sample, for the
// sample's water (as lnRho = ln(water/water0)) and surface temperature
// shift dT (K).
func (pl *mcPlan) sampleSat(h *mcHour, s *sampleLogs, lnRho, dT float64) float64 {
	lnDelta := h.lnDelta0 + lnRho/3 + s.lnThick
	lnContact := math.Min(h.lnContact0-2*lnRho/3+s.lnContact, h.lnDt)
	lnK1 := h.lnK1 + s.lnRate
	lnCeq := h.lnCeq + h.lnCeqSlope*dT
	lnDiff := h.lnDiff + h.lnDiffSlope*dT
	return pl.table.SaturationLn(lnK1+lnContact-lnDelta-lnCeq, lnK1+lnDelta-ln3-lnDiff-lnCeq)
}

var ln3 = math.Log(3)

// uncertainty runs the samples for one result and fills its bands and
// sensitivity ranking. Samples run on every core; each writes only its
// own slot, so the result does not depend on scheduling.
func (r *elementRun) uncertainty(res *ElementResult, samples int, seed uint64, _ *chemistry) error {
	inputs := make([][numMC]float64, samples)
	recs := make([]float64, samples)
	years := make([]float64, samples)
	pl := r.plan()
	workers := min(runtime.GOMAXPROCS(0), samples)
	var wg sync.WaitGroup
	next := make(chan int, samples)
	for k := range samples {
		next <- k
	}
	close(next)
	for range workers {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for k := range next {
				inputs[k] = draw(seed, k)
				rec, bare := r.sampleRecession(pl, &inputs[k])
				recs[k] = rec
				if y := yearsToLimit(r.e, rec, bare); y != nil {
					years[k] = *y
				} else {
					years[k] = math.Inf(1)
				}
			}
		}()
	}
	wg.Wait()

	l := &res.Leaching
	q := quantiles(recs)
	l.RecessionMMPerYearP10, l.RecessionMMPerYearP50, l.RecessionMMPerYearP90 = ptr(q[0]), ptr(q[1]), ptr(q[2])
	qy := quantiles(years)
	if !math.IsInf(qy[0], 0) {
		l.YearsToLimitP10 = ptr(qy[0])
	}
	if !math.IsInf(qy[1], 0) {
		l.YearsToLimitP50 = ptr(qy[1])
	}
	if !math.IsInf(qy[2], 0) {
		l.YearsToLimitP90 = ptr(qy[2])
	}
	l.Sensitivity = sensitivity(inputs, recs)
	// Bands on the cumulative loss: the deterministic curve scaled by the
	// ratio of the recession percentiles to the deterministic recession.
	if det := l.RecessionMMPerYear; det > 0 {
		for i := range res.Daily {
			d := &res.Daily[i]
			d.CumLossMMP10 = d.CumLossMM * q[0] / det
			d.CumLossMMP90 = d.CumLossMM * q[2] / det
		}
	}
	return nil
}

func ptr(v float64) *float64 { return &v }

// quantiles returns the 10th, 50th and 90th percentiles of x (sorted
// copy; empirical quantile function of gonum/stat).
func quantiles(x []float64) [3]float64 {
	s := append([]float64(nil), x...)
	sort.Float64s(s)
	return [3]float64{
		stat.Quantile(0.1, stat.Empirical, s, nil),
		stat.Quantile(0.5, stat.Empirical, s, nil),
		stat.Quantile(0.9, stat.Empirical, s, nil),
	}
}

// sensitivity ranks the inputs by the magnitude of Spearman's rank
// correlation between each input and the recession.
func sensitivity(inputs [][numMC]float64, out []float64) []Sensitivity {
	n := len(out)
	if n < 3 {
		return nil
	}
	ro := ranks(out)
	col := make([]float64, n)
	var res []Sensitivity
	for j := mcInput(0); j < numMC; j++ {
		for k := range inputs {
			col[k] = inputs[k][j]
		}
		rho := stat.Correlation(ranks(col), ro, nil)
		if math.IsNaN(rho) {
			rho = 0
		}
		res = append(res, Sensitivity{Input: mcNames[j], RankCorrelation: rho})
	}
	sort.SliceStable(res, func(a, b int) bool {
		return math.Abs(res[a].RankCorrelation) > math.Abs(res[b].RankCorrelation)
	})
	return res
}

// ranks returns the ranks of x (1…n), ties sharing their mean rank.
func ranks(x []float64) []float64 {
	idx := make([]int, len(x))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(a, b int) bool { return x[idx[a]] < x[idx[b]] })
	r := make([]float64, len(x))
	for i := 0; i < len(idx); {
		j := i
		for j+1 < len(idx) && x[idx[j+1]] == x[idx[i]] {
			j++
		}
		mean := float64(i+j)/2 + 1
		for k := i; k <= j; k++ {
			r[idx[k]] = mean
		}
		i = j + 1
	}
	return r
}
