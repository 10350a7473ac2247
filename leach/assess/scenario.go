package assess

import (
	"math"

	"github.com/gyprisk/gyprisk/climate"
)

// presentScenario is the record as it is.
var presentScenario = Scenario{ID: "present", RainFactor: 1, WindFactor: 1}

// scenarios returns "present" followed by the project's scenarios with
// their defaults filled in (shifts 0, factors 1).
func (p *Project) scenarios() []Scenario {
	out := []Scenario{presentScenario}
	for _, s := range p.Scenarios {
		sc := Scenario{ID: s.ID, RainFactor: 1, WindFactor: 1}
		if s.TempShiftC != nil {
			sc.TempShiftC = *s.TempShiftC
		}
		if s.RainFactor != nil {
			sc.RainFactor = *s.RainFactor
		}
		if s.RHShiftPct != nil {
			sc.RHShiftPct = *s.RHShiftPct
		}
		if s.WindFactor != nil {
			sc.WindFactor = *s.WindFactor
		}
		out = append(out, sc)
	}
	return out
}

// isPresent reports whether the scenario leaves the record unchanged.
func (s Scenario) isPresent() bool {
	return s.TempShiftC == 0 && s.RHShiftPct == 0 && s.RainFactor == 1 && s.WindFactor == 1
}

// Apply returns the record changed by the delta-change method: each hour
// keeps its weather pattern and is shifted by the scenario's change in the
// mean climate,
//
//	θ' = θ + Δθ
//	φ' = min(100, max(0, φ + Δφ))        (relative humidity, %)
//	p' = φ'/100 · p_sat(θ')               (vapour pressure follows)
//	r' = f_r · r                          (rain, every amount)
//	v' = f_v · v                          (wind speed; direction unchanged)
//
// Solar radiation is unchanged. Additive shifts for temperature and
// humidity, multiplicative factors for rain and wind, as in the
// delta-change (perturbation) method described by Hay, Wilby & Leavesley
// (2000, J. Am. Water Resour. Assoc. 36(2), 387–397) and reviewed by
// Räisänen & Räty (2013, Clim. Dyn. 41, 1553–1568). Keeping φ (rather
// than p) follows the finding that relative humidity changes little as the
// climate warms; φ is never above 100 %, so p' ≤ p_sat(θ') always.
// clipped counts the hours whose φ' had to be clipped to 0–100.
func (s Scenario) Apply(recs []climate.Record) (out []climate.Record, clipped int) {
	if s.isPresent() {
		return recs, 0
	}
	out = make([]climate.Record, len(recs))
	for i, r := range recs {
		r.TempC += s.TempShiftC
		if !math.IsNaN(r.RHPct) {
			rh := r.RHPct + s.RHShiftPct
			if rh > 100 || rh < 0 {
				clipped++
				rh = math.Min(100, math.Max(0, rh))
			}
			r.RHPct = rh
		}
		r.RainMM *= s.RainFactor
		r.WindMS *= s.WindFactor
		out[i] = r
	}
	return out, clipped
}
