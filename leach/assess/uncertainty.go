package assess

import (
	"math"
	"math/rand/v2"
	"runtime"
	"sort"
	"sync"

	"gonum.org/v1/gonum/stat"
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

// draw returns sample k's input values. Stream k of the seed is used, so
// a sample does not depend on how many others run or in which order.
func draw(seed uint64, k int) [numMC]float64 {
	rng := rand.New(rand.NewPCG(seed, uint64(k)))
	var v [numMC]float64
	v[mcSolubility] = 1 + mcSolubilityHalfWidth*(2*rng.Float64()-1)
	v[mcRateConst] = math.Exp(-math.Log(mcRateLogRange) * rng.Float64())
	v[mcFilmThick] = math.Exp(math.Log(mcFilmFactor) * (2*rng.Float64() - 1))
	v[mcContact] = math.Exp(math.Log(mcFilmFactor) * (2*rng.Float64() - 1))
	v[mcWallFactor] = 1 + mcWallHalfWidth*(rng.Float64()-rng.Float64()) // triangular on [−w, w]
	v[mcDensity] = 1 + mcDensityHalfWidth*(2*rng.Float64()-1)
	v[mcAbsorptance] = mcAbsorptanceHalfWidth * (2*rng.Float64() - 1)
	return v
}

// sampleRecession returns the recession (mm/year) of one sample, with the
// finish working and without it, by re-running the leaching of the wet
// hours only: everything else (the weather, the sun, the water before the
// wall factor, the surface temperature) was computed once by the
// deterministic run. The surface temperature follows the sampled
// absorptance through its linearisation ∂θ_s/∂α = I/(h_c + h_r).
func (r *elementRun) sampleRecession(v *[numMC]float64) (rec, bare float64) {
	e := r.e
	law := r.chem.film.WithRateFactor(v[mcRateConst])
	wf := v[mcWallFactor]
	dAlpha := math.Max(-e.solarAbsorptance, math.Min(1-e.solarAbsorptance, v[mcAbsorptance]))
	withFinish := e.repellentFrac > 0
	var g, gBare float64
	for k := range r.wet {
		w := &r.wet[k]
		t := w.tempC + dAlpha*w.dTdAlpha
		if t <= 0 {
			continue
		}
		ceq := r.chem.sol.At(clampChem(t)) * v[mcSolubility]
		water := (w.drivenL+w.runoffL)*wf + w.rainL + w.condL
		sat := filmSat(law, water, t, w.slopeDeg, w.flowRunM, w.dtS, v[mcFilmThick], v[mcContact])
		g += water * ceq * sat * w.weightS / w.dtS
		if withFinish {
			unrep := 1 / (1 - e.repellentFrac)
			waterBare := (w.drivenL*unrep+w.runoffL)*wf + w.rainL*unrep + w.condL
			satB := filmSat(law, waterBare, t, w.slopeDeg, w.flowRunM, w.dtS, v[mcFilmThick], v[mcContact])
			gBare += waterBare * ceq * satB * w.weightS / w.dtS
		}
	}
	mmPerG := 1 / (e.bulkDensityKgM3 * v[mcDensity] * e.gypsumFrac)
	rec = g / r.years * mmPerG
	bare = rec
	if withFinish {
		bare = gBare / r.years * mmPerG
	}
	return rec, bare
}

// uncertainty runs the samples for one result and fills its bands and
// sensitivity ranking. Samples run on every core; each writes only its
// own slot, so the result does not depend on scheduling.
func (r *elementRun) uncertainty(res *ElementResult, samples int, seed uint64, _ *chemistry) error {
	inputs := make([][numMC]float64, samples)
	recs := make([]float64, samples)
	years := make([]float64, samples)
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
				rec, bare := r.sampleRecession(&inputs[k])
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
