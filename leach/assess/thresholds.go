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
	// bassanite at the surface (ΔG < 0). The conversion is slow at
	// ordinary service temperatures, so only long exposure counts:
	// defaults 100 and 1000 h/year (common practice, no source).
	DehydrationModerateHours float64 `toml:"dehydration_moderate_hours" json:"dehydration_moderate_hours"`
	DehydrationHighHours     float64 `toml:"dehydration_high_hours" json:"dehydration_high_hours"`
	// Heat, as hours per year with the surface above the 52 °C long-term
	// limit for gypsum products; the dehydration rating is the worse of
	// the two. Defaults 1 and 50 h/year (common practice, no source).
	HotModerateHours float64 `toml:"hot_moderate_hours" json:"hot_moderate_hours"`
	HotHighHours     float64 `toml:"hot_high_hours" json:"hot_high_hours"`

	// Condensation, as hours per year with the surface at or below the dew
	// point. Defaults 200 and 1000 h/year (common practice, no source).
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
		DehydrationModerateHours:  100,
		DehydrationHighHours:      1000,
		HotModerateHours:          1,
		HotHighHours:              50,
		CondensationModerateHours: 200,
		CondensationHighHours:     1000,
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
	case !(t.HotModerateHours >= 0 && t.HotModerateHours < t.HotHighHours):
		return fmt.Errorf("thresholds: need 0 ≤ hot_moderate_hours (%g) < hot_high_hours (%g)", t.HotModerateHours, t.HotHighHours)
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
	r.Ratings.Dehydration = worse(
		rateUp(r.Dehydration.UnstableHoursPerYear, t.DehydrationModerateHours, t.DehydrationHighHours),
		rateUp(r.Dehydration.HoursAbove52CPerYear, t.HotModerateHours, t.HotHighHours))
	r.Ratings.Condensation = rateUp(r.Condensation.HoursPerYear, t.CondensationModerateHours, t.CondensationHighHours)
	// On an interior surface, a month failing the ISO 13788 criterion
	// (monthly mean surface RH above 80 %) makes the mould rating at least
	// moderate, whatever the VTT index says. The criterion is the
	// standard's for interior surfaces; outdoors the air itself exceeds
	// 80 % for months in a maritime winter, so there it is reported only.
	r.Ratings.Mould = rateUp(r.Mould.IndexMax, t.MouldModerateIndex, t.MouldHighIndex)
	if r.Mould.MonthsOver80Pct > 0 && r.Exposure == "interior" {
		r.Ratings.Mould = worse(r.Ratings.Mould, Moderate)
	}
}

var ratingOrder = map[string]int{Low: 0, Moderate: 1, High: 2}

// worse returns the worse of two ratings.
func worse(a, b string) string {
	if ratingOrder[b] > ratingOrder[a] {
		return b
	}
	return a
}

// Worst returns the worst of a result's four ratings.
func (r Ratings) Worst() string {
	return worse(worse(r.Leaching, r.Dehydration), worse(r.Condensation, r.Mould))
}

// ThresholdRow describes one rating threshold pair for people: what is
// rated, the bounds in use, and where the defaults come from. The report
// prints these rows, so the words live beside the numbers they explain.
type ThresholdRow struct {
	Quantity       string  // what is rated, with its unit
	Moderate, High float64 // the bounds in use
	Below          bool    // true when a smaller value is worse (years to limit)
	Source         string  // where the default comes from
}

// Rows returns the thresholds in use, one row per rated quantity, in the
// order of the summary table.
func (t Thresholds) Rows() []ThresholdRow {
	d := DefaultThresholds()
	return []ThresholdRow{
		{"Leaching: years to the loss limit", t.LeachingModerateYears, t.LeachingHighYears, true,
			fmt.Sprintf("Defaults %g and %g years, set against the usual maintenance cycles of renders and lime or gypsum finishes (common practice, no source).", d.LeachingModerateYears, d.LeachingHighYears)},
		{"Dehydration: hours a year with gypsum unstable against bassanite", t.DehydrationModerateHours, t.DehydrationHighHours, false,
			fmt.Sprintf("Defaults %g and %g h a year: the conversion is slow at service temperatures, so only long exposure counts (common practice, no source).", d.DehydrationModerateHours, d.DehydrationHighHours)},
		{"Dehydration: hours a year above 52 °C (the worse of the two rows rates)", t.HotModerateHours, t.HotHighHours, false,
			fmt.Sprintf("Defaults %g and %g h a year above the 52 °C long-term limit for gypsum products (International Mechanical Code §603.5.1); the hour counts are common practice, no source.", d.HotModerateHours, d.HotHighHours)},
		{"Condensation: hours a year below the dew point", t.CondensationModerateHours, t.CondensationHighHours, false,
			fmt.Sprintf("Defaults %g and %g h a year (common practice, no source).", d.CondensationModerateHours, d.CondensationHighHours)},
		{"Mould: highest VTT mould index", t.MouldModerateIndex, t.MouldHighIndex, false,
			fmt.Sprintf("Defaults %g (growth begins, seen under the microscope) and %g (growth visible to the eye), the index's own scale (Hukka & Viitanen 1999, Wood Sci. Technol. 33). On interior surfaces a month failing the ISO 13788 criterion makes the rating at least moderate.", d.MouldModerateIndex, d.MouldHighIndex)},
	}
}
