package mould

import (
	"fmt"
	"math"
	"strings"
)

// Class is a mould sensitivity class of Ojanen et al. (2010). The zero value
// is not a class, so that a material table entry that forgot its class is
// caught by New instead of silently becoming one of the four.
type Class int

// The four sensitivity classes, most to least sensitive. Examples from
// Ojanen et al. (2010), from memory: very sensitive, untreated pine sapwood;
// sensitive, glued wooden boards, paper-faced products, spruce; medium
// resistant, concrete, aerated concrete, glass wool, mineral plasters;
// resistant, glass and metal, polished PUR.
const (
	VerySensitive Class = iota + 1
	Sensitive
	MediumResistant
	Resistant
)

var classNames = [...]string{
	VerySensitive:   "very-sensitive",
	Sensitive:       "sensitive",
	MediumResistant: "medium-resistant",
	Resistant:       "resistant",
}

// Valid reports whether c is one of the four classes.
func (c Class) Valid() bool { return c >= VerySensitive && c <= Resistant }

// String returns the class name as ParseClass accepts it, such as
// "medium-resistant".
func (c Class) String() string {
	if !c.Valid() {
		return fmt.Sprintf("mould.Class(%d)", int(c))
	}
	return classNames[c]
}

// ParseClass reads a class name: "very-sensitive", "sensitive",
// "medium-resistant" or "resistant". Case is ignored, and spaces or
// underscores may stand for the hyphen.
func ParseClass(s string) (Class, error) {
	norm := strings.ToLower(strings.TrimSpace(s))
	norm = strings.NewReplacer(" ", "-", "_", "-").Replace(norm)
	for c := VerySensitive; c <= Resistant; c++ {
		if classNames[c] == norm {
			return c, nil
		}
	}
	return 0, fmt.Errorf("unknown mould sensitivity class %q (known: %s, %s, %s, %s)",
		s, classNames[VerySensitive], classNames[Sensitive], classNames[MediumResistant], classNames[Resistant])
}

// Params are the material coefficients of the VTT model.
//
//	dM/dt   = k1·k2 / (7·exp(−0.68·ln T − 13.9·ln RH + 66.02))         (1/day)
//	k1      = K1Below1 while M < 1, K1From1 from M = 1 on
//	k2      = max(1 − exp(2.3·(M − M_max)), 0)
//	M_max   = A + B·x − C·x²,  x = (RH_crit − RH)/(RH_crit − 100)
//	RH_crit = max(−0.00267·T³ + 0.160·T² − 3.13·T + 100, RHMinPct)  for T ≤ 20 °C
//	        = RHMinPct                                               for T > 20 °C
//	decline = DeclineCoeff × the decline rate of pine sapwood (see Model.Step)
//
// T in °C, RH in %. k1 is the ratio of the time pine sapwood takes to reach
// the next stage to the time the material takes, so the reference material
// has k1 = 1 below M = 1.
//
// Source: Ojanen et al. 2010 (Thermal Performance of the Exterior Envelopes
// of Whole Buildings XI, ASHRAE), tables of sensitivity and decline classes,
// and Viitanen et al. 2010 (J. Building Physics 33(3), 201–224); values
// recalled and cross-checked against two open implementations of the
// published equations (see the package documentation); the papers were not
// read. The growth rate equation keeps Hukka & Viitanen's (1999)
// coefficients with the species term W = 0 (pine) and the surface quality
// term SQ = 0 (resawn surface), the reference the classes are scaled from:
// the 2010 formulation replaces W and SQ by the class coefficients.
type Params struct {
	K1Below1     float64 // growth-rate factor k1 while M < 1
	K1From1      float64 // growth-rate factor k1 from M = 1 on
	A, B, C      float64 // coefficients of the ceiling M_max
	RHMinPct     float64 // lowest relative humidity that allows growth, %
	DeclineCoeff float64 // C_mat, the decline rate relative to pine sapwood, 0–1
}

// classParams is the class table of Ojanen et al. (2010). The decline
// coefficient is a separate material property in the papers (four decline
// classes with C_mat = 1, 0.5, 0.25, 0.1); pairing the n-th decline class
// with the n-th sensitivity class is gyprisk's default (common practice, no
// source), and a material table may set its own through NewParams.
var classParams = [...]Params{
	VerySensitive:   {K1Below1: 1, K1From1: 2, A: 1, B: 7, C: 2, RHMinPct: 80, DeclineCoeff: 1},
	Sensitive:       {K1Below1: 0.578, K1From1: 0.386, A: 0.3, B: 6, C: 1, RHMinPct: 80, DeclineCoeff: 0.5},
	MediumResistant: {K1Below1: 0.072, K1From1: 0.097, A: 0, B: 5, C: 1.5, RHMinPct: 85, DeclineCoeff: 0.25},
	Resistant:       {K1Below1: 0.033, K1From1: 0.014, A: 0, B: 3, C: 1, RHMinPct: 85, DeclineCoeff: 0.1},
}

// Params returns the class's coefficients (see the Params type for the
// table's source), or an error for a value that is not one of the four
// classes.
func (c Class) Params() (Params, error) {
	if !c.Valid() {
		return Params{}, fmt.Errorf("mould: %v is not a sensitivity class", c)
	}
	return classParams[c], nil
}

// Check reports the first coefficient that is out of range: the k1 factors
// must be positive, A, B and C finite, RHMinPct within (0, 100) and
// DeclineCoeff within [0, 1].
func (p Params) Check() error {
	switch {
	case !(p.K1Below1 > 0) || math.IsInf(p.K1Below1, 0):
		return fmt.Errorf("mould: k1 below M = 1 is %v, want a positive number", p.K1Below1)
	case !(p.K1From1 > 0) || math.IsInf(p.K1From1, 0):
		return fmt.Errorf("mould: k1 from M = 1 is %v, want a positive number", p.K1From1)
	case !finite(p.A) || !finite(p.B) || !finite(p.C):
		return fmt.Errorf("mould: ceiling coefficients A, B, C = %v, %v, %v, want finite numbers", p.A, p.B, p.C)
	case !(p.RHMinPct > 0 && p.RHMinPct < 100):
		return fmt.Errorf("mould: RH_min is %v %%, want 0 < RH_min < 100", p.RHMinPct)
	case !(p.DeclineCoeff >= 0 && p.DeclineCoeff <= 1):
		return fmt.Errorf("mould: decline coefficient C_mat is %v, want 0–1", p.DeclineCoeff)
	}
	return nil
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// RHCritPct returns the lowest surface relative humidity (%) at which the
// material can grow mould at temperature T (°C):
//
//	RH_crit = max(−0.00267·T³ + 0.160·T² − 3.13·T + 100, RH_min)   0 < T ≤ 20 °C
//	RH_crit = RH_min                                                T > 20 °C
//	RH_crit = 100                                                   T ≤ 0 °C (no growth)
//
// Source: Hukka & Viitanen 1999 (Wood Sci. Technol. 33, 475–485) for the
// polynomial; the floor at the class's RH_min from Ojanen et al. 2010 (from
// memory, as in the cross-check implementation by Laukkarinen).
func (p Params) RHCritPct(tempC float64) float64 {
	if !(tempC > 0) {
		return 100
	}
	if tempC > 20 {
		return p.RHMinPct
	}
	return max(rhCritPolyPct(tempC), p.RHMinPct)
}

// rhCritPolyPct is the critical-humidity polynomial of Hukka & Viitanen
// (1999) in Horner form.
func rhCritPolyPct(t float64) float64 {
	return ((-0.00267*t+0.160)*t-3.13)*t + 100
}

// maxIndex is M_max for a humidity at or above rhCrit.
func (p Params) maxIndex(rhCrit, rhPct float64) float64 {
	x := (rhCrit - rhPct) / (rhCrit - 100)
	return max(p.A+p.B*x-p.C*x*x, 0)
}

// MaxIndex returns the ceiling M_max (dimensionless, 0–6) that the mould
// index approaches under constant conditions:
//
//	M_max = A + B·x − C·x²,  x = (RH_crit − RH)/(RH_crit − 100)
//
// with A, B, C and RH_crit of the class (see Params). Where the conditions
// do not allow growth (T ≤ 0 °C, T ≥ 50 °C or RH < RH_crit) it is 0.
// Relative humidities above 100 % (a surface below the dew point) count as
// 100 %. An invalid class gives NaN. Source: Hukka & Viitanen 1999 with the
// class coefficients of Ojanen et al. 2010.
func MaxIndex(c Class, tempC, rhPct float64) float64 {
	p, err := c.Params()
	if err != nil || math.IsNaN(tempC) || math.IsNaN(rhPct) {
		return math.NaN()
	}
	rhPct = math.Min(rhPct, 100)
	crit := p.RHCritPct(tempC)
	if !growthTemp(tempC) || rhPct < crit {
		return 0
	}
	return p.maxIndex(crit, rhPct)
}

// RHCritPct returns the critical relative humidity (%) of Hukka & Viitanen
// (1999) for pine sapwood, the reference material:
//
//	RH_crit = −0.00267·T³ + 0.160·T² − 3.13·T + 100    0 < T ≤ 20 °C
//	RH_crit = 80                                        T > 20 °C
//
// T in °C. Below 0 °C no growth is possible and the result is 100. The
// polynomial gives 100 % at 0 °C and 80.04 % at 20 °C. Source: Hukka &
// Viitanen 1999, Wood Sci. Technol. 33, 475–485 (polynomial recalled and
// cross-checked against two open implementations; the paper was not read).
// For a material class use Params.RHCritPct, which also applies RH_min.
func RHCritPct(tempC float64) float64 {
	if !(tempC > 0) {
		return 100
	}
	if tempC > 20 {
		return 80
	}
	return rhCritPolyPct(tempC)
}
