package main

import (
	"encoding/csv"
	"io"
	"math"
	"sort"
	"strconv"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// portfolioRow is one line of portfolio.csv: one element × variant ×
// scenario of one project that was assessed, or one project that failed.
type portfolioRow struct {
	project  string // project file as given on the command line
	output   string // base name of the project's outputs (<output>.pdf, <output>.json)
	failed   error  // non-nil for a project that could not be assessed
	invented bool
	site     string
	e        *assess.ElementResult // nil for a failed project
	worst    string
}

// portfolioHeader is the header of portfolio.csv. The column names are a
// contract with users' scripts: add columns at the end, never rename them.
var portfolioHeader = []string{
	"project", "status", "output", "site", "id", "label", "variant", "scenario", "material", "exposure",
	"years_to_limit", "years_to_limit_p10", "years_to_limit_p90",
	"recession_mm_per_year", "water_l_m2_per_year",
	"dehydration_unstable_hours_per_year", "condensation_hours_per_year", "mould_index_max",
	"rating_leaching", "rating_dehydration", "rating_condensation", "rating_mould", "worst_rating",
	"invented_example_data", "error",
}

// ratingSeverity orders the ratings: low 0, moderate 1, high 2; anything else -1.
func ratingSeverity(rating string) int {
	switch rating {
	case "low":
		return 0
	case "moderate":
		return 1
	case "high":
		return 2
	}
	return -1
}

// worstRatingOf is the worst of an element's four ratings.
func worstRatingOf(r assess.Ratings) string {
	worst := ""
	for _, s := range []string{r.Leaching, r.Dehydration, r.Condensation, r.Mould} {
		if ratingSeverity(s) > ratingSeverity(worst) {
			worst = s
		}
	}
	return worst
}

// portfolioRows flattens the results of a batch into rows: every result
// of every assessed project, ranked by years to the loss limit (fewest
// first; surfaces that do not recede last), then by worst rating (high
// first), then in the order of the projects and their elements; then one
// row per failed project, in the order the projects were given.
func portfolioRows(results []batchResult) []portfolioRow {
	var ok, failed []portfolioRow
	for _, r := range results {
		if r.err != nil {
			failed = append(failed, portfolioRow{project: r.job.path, output: r.job.name, failed: r.err})
			continue
		}
		for i := range r.out.Elements {
			e := &r.out.Elements[i]
			ok = append(ok, portfolioRow{
				project: r.job.path, output: r.job.name, invented: r.out.Invented,
				site: r.out.Site.Name, e: e, worst: worstRatingOf(e.Ratings),
			})
		}
	}
	sort.SliceStable(ok, func(i, j int) bool {
		a, b := ok[i].e.Leaching.YearsToLimit, ok[j].e.Leaching.YearsToLimit
		switch {
		case a != nil && b == nil:
			return true
		case a == nil && b != nil:
			return false
		case a != nil && b != nil && *a != *b:
			return *a < *b
		}
		return ratingSeverity(ok[i].worst) > ratingSeverity(ok[j].worst)
	})
	return append(ok, failed...)
}

// writePortfolioCSV writes the rows as CSV with a header line. Numbers are
// written in full precision; an empty years_to_limit means the surface
// does not recede, an empty band means no Monte Carlo samples were run.
func writePortfolioCSV(w io.Writer, rows []portfolioRow) error {
	cw := csv.NewWriter(w)
	if err := cw.Write(portfolioHeader); err != nil {
		return err
	}
	for _, r := range rows {
		if err := cw.Write(r.record()); err != nil {
			return err
		}
	}
	cw.Flush()
	return cw.Error()
}

// record is the row's CSV fields, in the order of portfolioHeader.
func (r portfolioRow) record() []string {
	if r.failed != nil {
		rec := make([]string, len(portfolioHeader))
		rec[0], rec[1], rec[2] = r.project, "failed", r.output
		rec[len(rec)-1] = r.failed.Error()
		return rec
	}
	e := r.e
	return []string{
		r.project, "ok", r.output, r.site, e.ID, e.Label, e.Variant, e.Scenario, e.Material, e.Exposure,
		csvOptFloat(e.Leaching.YearsToLimit), csvOptFloat(e.Leaching.YearsToLimitP10), csvOptFloat(e.Leaching.YearsToLimitP90),
		csvFloat(e.Leaching.RecessionMMPerYear), csvFloat(e.Water.DepositedLM2PerYear + e.Water.RunoffInLM2PerYear),
		csvFloat(e.Dehydration.UnstableHoursPerYear), csvFloat(e.Condensation.HoursPerYear), csvFloat(e.Mould.IndexMax),
		e.Ratings.Leaching, e.Ratings.Dehydration, e.Ratings.Condensation, e.Ratings.Mould, r.worst,
		strconv.FormatBool(r.invented), "",
	}
}

// csvFloat writes v in the shortest form that reads back exactly, in plain
// decimals unless the value is very small or very large (the rule
// encoding/json follows), so spreadsheets and data frames read it as a
// number.
func csvFloat(v float64) string {
	if a := math.Abs(v); a != 0 && (a < 1e-6 || a >= 1e21) {
		return strconv.FormatFloat(v, 'e', -1, 64)
	}
	return strconv.FormatFloat(v, 'f', -1, 64)
}

// csvOptFloat is csvFloat for an optional value; nil is an empty cell.
func csvOptFloat(v *float64) string {
	if v == nil {
		return ""
	}
	return csvFloat(*v)
}
