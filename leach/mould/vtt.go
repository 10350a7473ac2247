package mould

import (
	"fmt"
	"math"
)

// maxGrowthTempC is the upper temperature limit of growth. Viitanen's tests
// behind the regressions spanned roughly 5–40 °C (from memory); the limit of
// 50 °C is the one the cross-check implementation (Laukkarinen) uses, not a
// value read in the papers.
const maxGrowthTempC = 50

// Decline rates of pine sapwood in unfavourable conditions, per hour, by the
// time since favourable conditions ended (Hukka & Viitanen 1999; values as
// in both cross-check implementations):
//
//	dM/dt = −0.00133 /h   (−0.032 per day)   t − t1 ≤ 6 h
//	dM/dt =  0                               6 h < t − t1 ≤ 24 h
//	dM/dt = −0.000667 /h  (−0.016 per day)   t − t1 > 24 h
const (
	declineEarlyPerH = 0.032 / 24
	declineLatePerH  = 0.016 / 24
	declineEarlyEndH = 6
	declineLateFromH = 24
)

func growthTemp(tempC float64) bool { return tempC > 0 && tempC < maxGrowthTempC }

// Model is the state of the VTT mould model for one surface: the mould index
// and the time since conditions last allowed growth. It is a small value
// (about 80 bytes) that Step updates in place without allocating; copy it to
// keep a snapshot.
type Model struct {
	p       Params
	index   float64
	dryH    float64 // hours since favourable conditions ended
	ignored int
}

// New returns a model at M = 0 for a sensitivity class, with the class's
// default decline coefficient. It fails for a value that is not a class.
func New(c Class) (*Model, error) {
	p, err := c.Params()
	if err != nil {
		return nil, err
	}
	return &Model{p: p}, nil
}

// NewParams returns a model at M = 0 for explicit coefficients, for a
// material whose decline class differs from its sensitivity class or whose
// coefficients were fitted to its own tests.
func NewParams(p Params) (*Model, error) {
	if err := p.Check(); err != nil {
		return nil, err
	}
	return &Model{p: p}, nil
}

// Params returns the model's coefficients.
func (m *Model) Params() Params { return m.p }

// Index returns the mould index M, 0–6.
func (m *Model) Index() float64 { return m.index }

// IgnoredSteps counts the calls to Step that were refused because an input
// was NaN or the step was not a positive finite number of hours. Those steps
// leave the state unchanged; a caller that feeds gaps should report them.
func (m *Model) IgnoredSteps() int { return m.ignored }

// Reset returns the model to M = 0 with no dry period under way.
func (m *Model) Reset() { *m = Model{p: m.p} }

// Step advances the model by dtHours of constant surface temperature tempC
// (°C) and relative humidity rhPct (%).
//
// Growth, when 0 < T < 50 °C and RH ≥ RH_crit(T) (see Params):
//
//	dM/dt = k1·k2 / (7·exp(−0.68·ln T − 13.9·ln RH + 66.02))     per day
//
// integrated by one explicit Euler step, and never carried past M_max (k2
// reaches 0 there). Otherwise the index declines at C_mat times the pine
// sapwood rate of Hukka & Viitanen, which depends on the time t − t1 since
// favourable conditions ended:
//
//	−0.032 per day   for t − t1 ≤ 6 h
//	 0               for 6 h < t − t1 ≤ 24 h
//	−0.016 per day   for t − t1 > 24 h
//
// This piecewise rate is integrated exactly over the step, so one 48-hour
// step declines as much as 48 one-hour steps. The index never falls below 0.
//
// Relative humidities above 100 % (the surface below the dew point, where
// water stands on it) count as 100 %. A NaN input or a step that is not a
// positive finite number of hours leaves the state unchanged and is counted
// by IgnoredSteps. The model is fitted to steps of up to a few hours; long
// growth steps lose accuracy as with any Euler scheme.
//
// Sources: Hukka & Viitanen 1999 (Wood Sci. Technol. 33, 475–485) for the
// growth rate, M_max, k2 and the decline; Ojanen et al. 2010 for k1, the
// class ceiling, RH_min and C_mat. See the package documentation for how the
// values were checked.
func (m *Model) Step(tempC, rhPct, dtHours float64) {
	if math.IsNaN(tempC) || math.IsNaN(rhPct) || !(dtHours > 0) || math.IsInf(dtHours, 1) {
		m.ignored++
		return
	}
	if rhPct > 100 {
		rhPct = 100
	}
	crit := m.p.RHCritPct(tempC)
	if growthTemp(tempC) && rhPct >= crit {
		m.dryH = 0
		mMax := m.p.maxIndex(crit, rhPct)
		if m.index >= mMax {
			return // k2 = 0: at or above the ceiling nothing grows
		}
		k1 := m.p.K1Below1
		if m.index >= 1 {
			k1 = m.p.K1From1
		}
		k2 := 1 - math.Exp(2.3*(m.index-mMax))
		// 1/(7·exp(−0.68 ln T − 13.9 ln RH + 66.02)) = exp(0.68 ln T + 13.9 ln RH − 66.02)/7
		ratePerDay := k1 * k2 * math.Exp(0.68*math.Log(tempC)+13.9*math.Log(rhPct)-66.02) / 7
		m.index = min(m.index+ratePerDay*dtHours/24, mMax)
		return
	}
	if m.index > 0 {
		// Integrate the piecewise rate over the dry time [a, b] of this step.
		a, b := m.dryH, m.dryH+dtHours
		drop := 0.0
		if a < declineEarlyEndH {
			drop += declineEarlyPerH * (min(b, declineEarlyEndH) - a)
		}
		if b > declineLateFromH {
			drop += declineLatePerH * (b - max(a, declineLateFromH))
		}
		m.index = max(m.index-m.p.DeclineCoeff*drop, 0)
	}
	m.dryH += dtHours
}

// ResponseTimesWeeks returns the regression times of Viitanen's tests on
// pine sapwood that Hukka & Viitanen (1999) built the model from: the time
// to the onset of growth (M = 1) and to growth visible to the eye (M = 3),
// in weeks, under constant conditions:
//
//	t_m = exp(−0.68·ln T − 13.9·ln RH + 0.14·W − 0.33·SQ + 66.02)
//	t_v = exp(−0.74·ln T − 12.72·ln RH + 0.06·W + 61.50)
//
// with W = 0 (pine) and SQ = 0 (resawn surface). T in °C, RH in %. Outside
// the growth conditions of the very-sensitive class (T ≤ 0 °C, T ≥ 50 °C or
// RH < RH_crit) both are +Inf. Source: Hukka & Viitanen 1999, from Viitanen
// 1997 (recalled; t_v cross-checked against an open implementation, and the
// paper was not read).
func ResponseTimesWeeks(tempC, rhPct float64) (onsetWeeks, visibleWeeks float64) {
	if !growthTemp(tempC) || math.IsNaN(rhPct) || rhPct < classParams[VerySensitive].RHCritPct(tempC) {
		return math.Inf(1), math.Inf(1)
	}
	rhPct = math.Min(rhPct, 100)
	lt, lrh := math.Log(tempC), math.Log(rhPct)
	return math.Exp(-0.68*lt - 13.9*lrh + 66.02), math.Exp(-0.74*lt - 12.72*lrh + 61.50)
}

// String describes the state, for debugging.
func (m *Model) String() string {
	return fmt.Sprintf("mould index %.3f (dry for %.0f h)", m.index, m.dryH)
}
