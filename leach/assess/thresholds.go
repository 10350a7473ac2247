package assess

import "fmt"

// Thresholds are the boundaries between the "low", "moderate" and "high"
// ratings. A value below the first bound rates low, from the first bound up
// to the second moderate, and at or above the second high. Every default
// says where it comes from; users override them in the project file's
// [thresholds] table.
type Thresholds struct {
	// Leaching, as years until the loss limit is reached: fewer years is
	// worse, so the bounds run the other way (below HighYears is high).
	// Defaults: 60 and 20 years, set against the usual maintenance cycles
	// of renders and lime/gypsum finishes (common practice, no source).
	LeachingModerateYears float64 `toml:"leaching_moderate_years" json:"leaching_moderate_years"`
	LeachingHighYears     float64 `toml:"leaching_high_years" json:"leaching_high_years"`

	// Dehydration, as hours per year with gypsum unstable against
	// bassanite at the surface. Defaults 1 and 50 h/year: any sustained
	// instability is worth noting; tens of hours a year are where
	// powdering of exposed gypsum surfaces is plausible (common practice,
	// no source).
	DehydrationModerateHours float64 `toml:"dehydration_moderate_hours" json:"dehydration_moderate_hours"`
	DehydrationHighHours     float64 `toml:"dehydration_high_hours" json:"dehydration_high_hours"`

	// Condensation, as hours per year with the surface at or below the dew
	// point. Defaults 100 and 500 h/year (common practice, no source).
	CondensationModerateHours float64 `toml:"condensation_moderate_hours" json:"condensation_moderate_hours"`
	CondensationHighHours     float64 `toml:"condensation_high_hours" json:"condensation_high_hours"`

	// Mould, as the maximum VTT mould index. Defaults 1 (microscopic growth
	// begins) and 3 (growth visible to the eye), the index's own scale
	// definitions (Hukka & Viitanen 1999, Wood Sci. Technol. 33, table 1).
	MouldModerateIndex float64 `toml:"mould_moderate_index" json:"mould_moderate_index"`
	MouldHighIndex     float64 `toml:"mould_high_index" json:"mould_high_index"`
}

// DefaultThresholds returns the documented default rating thresholds.
func DefaultThresholds() Thresholds {
	return Thresholds{
		LeachingModerateYears:     60,
		LeachingHighYears:         20,
		DehydrationModerateHours:  1,
		DehydrationHighHours:      50,
		CondensationModerateHours: 100,
		CondensationHighHours:     500,
		MouldModerateIndex:        1,
		MouldHighIndex:            3,
	}
}

// Rating words. They are printed beside every colour so a greyscale print
// still reads.
const (
	Low      = "low"
	Moderate = "moderate"
	High     = "high"
)

// check reports thresholds that are not in order.
func (t Thresholds) check() error {
	switch {
	case !(t.LeachingHighYears > 0 && t.LeachingHighYears < t.LeachingModerateYears):
		return fmt.Errorf("thresholds: need 0 < leaching_high_years (%g) < leaching_moderate_years (%g)", t.LeachingHighYears, t.LeachingModerateYears)
	case !(t.DehydrationModerateHours >= 0 && t.DehydrationModerateHours < t.DehydrationHighHours):
		return fmt.Errorf("thresholds: need 0 ≤ dehydration_moderate_hours (%g) < dehydration_high_hours (%g)", t.DehydrationModerateHours, t.DehydrationHighHours)
	case !(t.CondensationModerateHours >= 0 && t.CondensationModerateHours < t.CondensationHighHours):
		return fmt.Errorf("thresholds: need 0 ≤ condensation_moderate_hours (%g) < condensation_high_hours (%g)", t.CondensationModerateHours, t.CondensationHighHours)
	case !(t.MouldModerateIndex >= 0 && t.MouldModerateIndex < t.MouldHighIndex && t.MouldHighIndex <= 6):
		return fmt.Errorf("thresholds: need 0 ≤ mould_moderate_index (%g) < mould_high_index (%g) ≤ 6", t.MouldModerateIndex, t.MouldHighIndex)
	}
	return nil
}

// rateUp rates a quantity where more is worse.
func rateUp(v, moderate, high float64) string {
	switch {
	case v >= high:
		return High
	case v >= moderate:
		return Moderate
	}
	return Low
}

// rate fills in the ratings of r from its figures.
func (t Thresholds) rate(r *ElementResult) {
	r.Ratings.Leaching = Low
	if y := r.Leaching.YearsToLimit; y != nil {
		switch {
		case *y < t.LeachingHighYears:
			r.Ratings.Leaching = High
		case *y < t.LeachingModerateYears:
			r.Ratings.Leaching = Moderate
		}
	}
	r.Ratings.Dehydration = rateUp(r.Dehydration.UnstableHoursPerYear, t.DehydrationModerateHours, t.DehydrationHighHours)
	r.Ratings.Condensation = rateUp(r.Condensation.HoursPerYear, t.CondensationModerateHours, t.CondensationHighHours)
	r.Ratings.Mould = rateUp(r.Mould.IndexMax, t.MouldModerateIndex, t.MouldHighIndex)
}
