package assess

import (
	"fmt"
	"math"
	"strings"
)

// findings writes the plain sentences a client can follow, from the
// figures of one result.
func findings(r *ElementResult) []string {
	var out []string
	name := r.Label
	if name == "" {
		name = r.ID
	}
	lim := r.Inputs.LossLimitMM
	switch y := r.Leaching.YearsToLimit; {
	case r.Exposure == "interior" && r.Water.DepositedLM2PerYear == 0 && r.Leaching.RecessionMMPerYear == 0:
		out = append(out, fmt.Sprintf("The %s is not reached by rain or condensate run-off, so it does not lose gypsum by leaching.", name))
	case y == nil:
		out = append(out, fmt.Sprintf("No water runs over the %s in the record, so it does not lose gypsum by leaching.", name))
	default:
		out = append(out, fmt.Sprintf("At the current rate the %s loses about %s mm of surface a year, so its %s mm loss limit is reached in about %s years.",
			name, FormatSig(r.Leaching.RecessionMMPerYear, 2), trimNum(lim), FormatYears(*y)))
		if p10, p90 := r.Leaching.YearsToLimitP10, r.Leaching.YearsToLimitP90; p10 != nil && p90 != nil {
			out = append(out, fmt.Sprintf("Allowing for the uncertainty of the inputs, the limit is most likely reached between %s and %s years from now (10th to 90th percentile).",
				FormatYears(math.Min(*p10, *p90)), FormatYears(math.Max(*p10, *p90))))
		}
	}
	if w := r.Water; w.DepositedLM2PerYear+w.RunoffInLM2PerYear > 0 {
		s := fmt.Sprintf("About %s litres of rain per square metre reach the surface each year", FormatFixed(w.DepositedLM2PerYear, 0))
		if w.RunoffInLM2PerYear > 0 {
			s += fmt.Sprintf(", and a further %s litres run onto it from the wall above", FormatFixed(w.RunoffInLM2PerYear, 0))
		}
		out = append(out, s+".")
	}
	d := r.Dehydration
	switch {
	case d.UnstableHoursPerYear > 0:
		out = append(out, fmt.Sprintf("Heat and dry air make the surface gypsum unstable against hemihydrate for about %s hours a year (surface up to %s °C); repeated, this can powder the surface.",
			FormatFixed(d.UnstableHoursPerYear, 0), FormatFixed(d.MaxSurfaceTempC, 0)))
	default:
		out = append(out, fmt.Sprintf("The surface never gets hot and dry enough to dehydrate gypsum (highest surface temperature %s °C).", FormatFixed(d.MaxSurfaceTempC, 0)))
	}
	if d.HoursAbove52CPerYear > 0 {
		out = append(out, fmt.Sprintf("The surface exceeds 52 °C, the usual long-term limit for gypsum products, for about %s hours a year.", FormatFixed(d.HoursAbove52CPerYear, 0)))
	}
	if c := r.Condensation; c.HoursPerYear > 0 {
		out = append(out, fmt.Sprintf("Moisture condenses on the surface for about %s hours a year (%s kg/m² a year).",
			FormatFixed(c.HoursPerYear, 0), FormatFixed(c.CondensateKgM2PerYear, 2)))
	}
	m := r.Mould
	switch {
	case m.IndexMax >= 3:
		out = append(out, fmt.Sprintf("Mould growth visible to the eye is expected (mould index up to %s).", FormatFixed(m.IndexMax, 1)))
	case m.IndexMax >= 1:
		out = append(out, fmt.Sprintf("Early, microscopic mould growth is expected (mould index up to %s).", FormatFixed(m.IndexMax, 1)))
	default:
		out = append(out, fmt.Sprintf("No mould growth is expected (mould index up to %s).", FormatFixed(m.IndexMax, 1)))
	}
	if m.MonthsOver80Pct > 0 && r.Exposure == "interior" {
		s := fmt.Sprintf("%d of the record's months fail the ISO 13788 criterion (monthly mean surface humidity at most 80 %%)", m.MonthsOver80Pct)
		if m.IndexMax < 1 {
			s += ", so the mould rating is raised to moderate although no growth has started yet: the surface is damp enough for long enough that mould is a matter of time or of a more sensitive finish"
		}
		out = append(out, s+".")
	}
	if f := r.Frost.WetFreezeThawCyclesPerYear; f > 0 {
		out = append(out, fmt.Sprintf("The wet surface freezes and thaws about %s times a year; wet gypsum keeps only about %.0f %% of its dry strength.", FormatFixed(f, 0), 100*wetStrengthRatio))
	} else if r.Water.WetHoursPerYear > 0 {
		out = append(out, fmt.Sprintf("The surface is wet for about %s hours a year; while wet, gypsum keeps only about %.0f %% of its dry strength.", FormatFixed(r.Water.WetHoursPerYear, 0), 100*wetStrengthRatio))
	}
	if r.Exposure == "interior" && (r.Condensation.HoursPerYear > 0 || m.IndexMax >= 1) && strings.Contains(r.Material, "board") {
		out = append(out, "A gypsum board ceiling that gets wet can sag and fall: keep people clear of a wet or bulging ceiling and have it assessed.")
	}
	return out
}

// wetStrengthRatio is the strength of wet set gypsum as a fraction of its
// dry strength: about one half. Sources: a 1954 study in the journal
// Gypsum & Lime (J-STAGE, issue 13; abstract read: "strengths under water
// were decreased to the half"), and Coquard & Boistelle 1994, Int. J. Rock
// Mech. Min. Sci. 31, who report wet set gypsum at roughly 40–60 % of its
// dry strength (from memory). Common practice quotes the same half.
const wetStrengthRatio = 0.5

// FormatFixed formats v with the given decimals; the report prints its
// figures through the same function so text and JSON agree.
func FormatFixed(v float64, decimals int) string {
	if math.IsInf(v, 1) {
		return "∞"
	}
	s := fmt.Sprintf("%.*f", decimals, v)
	if s == "-0" || strings.Trim(s, "-0.") == "" && strings.HasPrefix(s, "-") {
		s = s[1:]
	}
	return s
}

// FormatSig formats v with n significant digits (at least the units),
// the way the findings quote small rates: 0.0012, 0.73, 12.
func FormatSig(v float64, n int) string {
	if v == 0 || math.IsInf(v, 0) || math.IsNaN(v) {
		return FormatFixed(v, 0)
	}
	d := n - 1 - int(math.Floor(math.Log10(math.Abs(v))))
	if d < 0 {
		d = 0
	}
	return FormatFixed(v, d)
}

// FormatYears formats a number of years the way a client reads it:
// whole years below 1000, "more than 1000" above.
func FormatYears(y float64) string {
	switch {
	case y >= 1000:
		return "more than 1000"
	case y >= 10:
		return FormatFixed(y, 0)
	default:
		return FormatFixed(y, 1)
	}
}

func trimNum(v float64) string {
	return strings.TrimRight(strings.TrimRight(fmt.Sprintf("%.2f", v), "0"), ".")
}
