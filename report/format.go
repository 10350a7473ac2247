package report

import (
	"math"
	"strconv"
	"strings"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// Every number the report prints goes through the functions in this file,
// so the tests can format an Output's values the same way and look for the
// exact strings in the extracted text.

// minus is the typographic minus sign (U+2212), used for negative numbers.
const minus = "\u2212"

// sig formats v rounded to n significant figures in plain decimal notation,
// without trailing zeros, with a typographic minus:
//
//	sig(0.021349, 2) = "0.021", sig(23.4, 2) = "23", sig(1234, 2) = "1200"
func sig(v float64, n int) string {
	if v == 0 || math.IsNaN(v) || math.IsInf(v, 0) {
		return fixed(v, 0)
	}
	e := int(math.Floor(math.Log10(math.Abs(v))))
	dec := n - 1 - e
	p := math.Pow(10, float64(dec))
	r := math.Round(v*p) / p
	// Rounding can carry into a new decade (9.96 → 10.0).
	if r != 0 && int(math.Floor(math.Log10(math.Abs(r)))) > e {
		dec--
	}
	if dec < 0 {
		dec = 0
	}
	s := strconv.FormatFloat(r, 'f', dec, 64)
	if strings.Contains(s, ".") {
		s = strings.TrimRight(strings.TrimRight(s, "0"), ".")
	}
	return signed(s)
}

// fixed formats v with d decimals and a typographic minus.
func fixed(v float64, d int) string {
	if math.IsNaN(v) {
		return "n/a"
	}
	s := strconv.FormatFloat(v, 'f', d, 64)
	if s == "-0" || strings.Trim(s, "-0.") == "" {
		s = strings.TrimPrefix(s, "-")
	}
	return signed(s)
}

func signed(s string) string {
	if strings.HasPrefix(s, "-") {
		return minus + s[1:]
	}
	return s
}

// fmtWater formats a water amount in L/m² (per year or per month): three
// significant figures.
func fmtWater(lm2 float64) string { return sig(lm2, 3) }

// fmtRecession formats a recession rate in mm/year: two significant
// figures, because the rate is uncertain to well over a few per cent;
// rates below 0.001 mm/year (a micrometre a year) print as "< 0.001".
func fmtRecession(mmPerYear float64) string {
	if mmPerYear > 0 && mmPerYear < 0.001 {
		return "< 0.001"
	}
	return sig(mmPerYear, 2)
}

// yearsCap is the longest time to a loss limit the report prints as a
// number; beyond it the figure says nothing a building owner can use.
const yearsCap = 1000.0

// fmtYears formats a number of years: two significant figures, and
// "> 1000" from yearsCap on.
func fmtYears(y float64) string {
	if y >= yearsCap {
		return "> " + sig(yearsCap, 4)
	}
	return sig(y, 2)
}

// fmtHours formats hours per year, rounded to the hour.
func fmtHours(h float64) string { return fixed(h, 0) }

// fmtIndex formats a mould index (0–6) with one decimal.
func fmtIndex(m float64) string { return fixed(m, 1) }

// fmtTempC formats a temperature in °C with one decimal, without the unit.
func fmtTempC(c float64) string { return fixed(c, 1) }

// fmtPct formats a percentage with no decimals, without the unit.
func fmtPct(p float64) string { return fixed(p, 0) }

// fmtMM formats a thickness or depth in mm: up to three significant figures.
func fmtMM(mm float64) string { return sig(mm, 3) }

// fmtPlain formats an input value (factor, coefficient, fraction): up to
// three significant figures.
func fmtPlain(v float64) string { return sig(v, 3) }

// noRecession is what the report prints where the surface does not recede.
const noRecession = "not reached"

// fmtYearsToLimit formats the years to the loss limit with its 10–90 %
// band when the run sampled the inputs:
//
//	"23"  "23 (18–31)"  "not reached"
func fmtYearsToLimit(l assess.LeachingOut) string {
	if l.YearsToLimit == nil {
		return noRecession
	}
	s := fmtYears(*l.YearsToLimit)
	if l.YearsToLimitP10 != nil && l.YearsToLimitP90 != nil {
		s += " (" + fmtYears(*l.YearsToLimitP10) + "–" + fmtYears(*l.YearsToLimitP90) + ")"
	}
	return s
}

// yearsMain formats the central years to the loss limit, or "not
// reached" when the surface does not recede.
func yearsMain(l assess.LeachingOut) string {
	if l.YearsToLimit == nil {
		return noRecession
	}
	return fmtYears(*l.YearsToLimit)
}

// fmtRecessionBand formats the recession rate with its 10–90 % band when
// present: "0.21" or "0.21 (0.16–0.28)".
func fmtRecessionBand(l assess.LeachingOut) string {
	s := fmtRecession(l.RecessionMMPerYear)
	if l.RecessionMMPerYearP10 != nil && l.RecessionMMPerYearP90 != nil {
		s += " (" + fmtRecession(*l.RecessionMMPerYearP10) + "–" + fmtRecession(*l.RecessionMMPerYearP90) + ")"
	}
	return s
}

// totalWaterLM2 is the water reaching the surface in a year: driving rain
// deposited on it, run-off from above and surface condensate, in L/m².
//
//	water = deposited + run-off in + condensate
func totalWaterLM2(w assess.WaterOut) float64 {
	return w.DepositedLM2PerYear + w.RunoffInLM2PerYear + w.CondensateLM2PerYear
}

// fmtDate formats a calendar date the way the report prints it.
func fmtDate(t time.Time) string { return t.Format("2 January 2006") }

// fmtDay formats a date compactly (tables, periods).
func fmtDay(t time.Time) string { return t.Format("2006-01-02") }

// fmtPeriod formats a period of a record; empty when both ends are zero.
func fmtPeriod(start, end time.Time) string {
	if start.IsZero() && end.IsZero() {
		return "–"
	}
	return fmtDay(start) + " to " + fmtDay(end)
}

// compass names an azimuth (degrees clockwise from north) by its
// 16-point compass direction.
func compass(azDeg float64) string {
	names := [...]string{"N", "NNE", "NE", "ENE", "E", "ESE", "SE", "SSE", "S", "SSW", "SW", "WSW", "W", "WNW", "NW", "NNW"}
	a := math.Mod(azDeg, 360)
	if a < 0 {
		a += 360
	}
	return names[int(math.Floor(a/22.5+0.5))%16]
}

// fmtAzimuth formats an azimuth with its compass name: "225° (SW)".
func fmtAzimuth(azDeg float64) string {
	d := 0
	if azDeg != math.Round(azDeg) {
		d = 1
	}
	return fixed(azDeg, d) + "° (" + compass(azDeg) + ")"
}

// fmtBand formats a 10–90 % band "lo–hi" with f, or "" when either end is
// missing.
func fmtBand(lo, hi *float64, f func(float64) string) string {
	if lo == nil || hi == nil || (*lo == 0 && *hi == 0) {
		return ""
	}
	return f(*lo) + "–" + f(*hi)
}

// plural returns "1 month" or "n months".
func plural(n int, one, many string) string {
	if n == 1 {
		return "1 " + one
	}
	return strconv.Itoa(n) + " " + many
}
