package report

import (
	"bytes"
	"errors"
	"fmt"
	"io"
	"sort"
	"strings"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// PortfolioRow is one element × variant × scenario of one project, as the
// portfolio ranks it.
type PortfolioRow struct {
	Building string // the project's site name, or its file when unnamed
	Project  string // project file as given
	Invented bool   // the project's data are invented
	ID       string
	Label    string
	Variant  string
	Scenario string

	YearsToLimit    *float64 // nil: the surface does not recede
	YearsToLimitP10 *float64
	YearsToLimitP90 *float64
	LossLimitMM     float64

	// Worst is the worst of the four ratings and WorstOf names the risks
	// that have it ("leaching", "dehydration", "condensation", "mould").
	Worst   string
	WorstOf []string
	Ratings assess.Ratings
}

// PortfolioRows flattens the outputs into rows, in the order of the
// outputs and their elements. Nil outputs are skipped.
func PortfolioRows(outs []*assess.Output) []PortfolioRow {
	var rows []PortfolioRow
	for _, o := range outs {
		if o == nil {
			continue
		}
		b := nonEmpty(o.Site.Name, o.Project)
		for i := range o.Elements {
			e := &o.Elements[i]
			row := PortfolioRow{
				Building: b, Project: o.Project, Invented: o.Invented,
				ID: e.ID, Label: e.Label, Variant: e.Variant, Scenario: e.Scenario,
				YearsToLimit: e.Leaching.YearsToLimit, YearsToLimitP10: e.Leaching.YearsToLimitP10, YearsToLimitP90: e.Leaching.YearsToLimitP90,
				LossLimitMM: e.Inputs.LossLimitMM, Ratings: e.Ratings,
			}
			row.Worst, row.WorstOf = worstRating(e.Ratings)
			rows = append(rows, row)
		}
	}
	return rows
}

// worstRating returns the worst of the four ratings and the risks that
// have it.
func worstRating(r assess.Ratings) (string, []string) {
	worst, of := "", []string(nil)
	sev := -1
	for _, k := range []struct{ what, rating string }{
		{"leaching", r.Leaching}, {"dehydration", r.Dehydration}, {"condensation", r.Condensation}, {"mould", r.Mould},
	} {
		s := severity(k.rating)
		switch {
		case s > sev:
			sev, worst, of = s, k.rating, []string{k.what}
		case s == sev && s >= 0:
			of = append(of, k.what)
		}
	}
	return worst, of
}

// RankByYears sorts rows by years to the loss limit, fewest first; rows
// whose surface does not recede come last. Ties keep their order.
func RankByYears(rows []PortfolioRow) {
	sort.SliceStable(rows, func(i, j int) bool {
		a, b := rows[i].YearsToLimit, rows[j].YearsToLimit
		switch {
		case a == nil:
			return false
		case b == nil:
			return true
		}
		return *a < *b
	})
}

// RankByRating sorts rows by their worst rating (high first), then by how
// many risks share it (more first), then by years to the loss limit.
func RankByRating(rows []PortfolioRow) {
	RankByYears(rows)
	sort.SliceStable(rows, func(i, j int) bool {
		si, sj := severity(rows[i].Worst), severity(rows[j].Worst)
		if si != sj {
			return si > sj
		}
		return len(rows[i].WorstOf) > len(rows[j].WorstOf)
	})
}

// defaultPortfolioTitle is the portfolio title when Options.Title is empty.
const defaultPortfolioTitle = "Gypsum durability portfolio"

// Portfolio section titles.
const (
	chByYears  = "1 Ranked by years to the loss limit"
	chByRating = "2 Ranked by worst rating"
	chFailed   = "3 Projects that could not be assessed"
)

// WritePortfolio renders a short PDF that ranks every element of every
// building: once by years to its loss limit, once by its worst rating.
// Projects listed in opt.Failures are reported with their errors. It
// returns an error when there is nothing to rank and nothing failed.
func WritePortfolio(w io.Writer, outs []*assess.Output, opt Options) error {
	for _, o := range outs {
		if o == nil {
			continue
		}
		if err := validate(o); err != nil {
			return fmt.Errorf("%s: %w", nonEmpty(o.Project, o.Site.Name), err)
		}
	}
	rows := PortfolioRows(outs)
	if len(rows) == 0 && len(opt.Failures) == 0 {
		return errors.New("report: the portfolio has no elements and no failed projects")
	}
	var lay *layout
	var buf bytes.Buffer
	for pass := 0; pass < 2; pass++ {
		d := buildPortfolio(rows, outs, opt, lay)
		if err := d.pdf.Error(); err != nil {
			return fmt.Errorf("report: %w", err)
		}
		if pass == 1 {
			if err := d.pdf.Output(&buf); err != nil {
				return fmt.Errorf("report: %w", err)
			}
			break
		}
		lay = &layout{pages: d.pdf.PageNo(), toc: d.toc}
	}
	_, err := buf.WriteTo(w)
	return err
}

// WritePortfolioFile writes the portfolio PDF to path atomically.
func WritePortfolioFile(path string, outs []*assess.Output, opt Options) error {
	return WriteFileAtomic(path, func(w io.Writer) error { return WritePortfolio(w, outs, opt) })
}

func buildPortfolio(rows []PortfolioRow, outs []*assess.Output, opt Options, prev *layout) *doc {
	title := nonEmpty(opt.Title, defaultPortfolioTitle)
	date := opt.date()
	invented := false
	buildings := map[string]bool{}
	version := ""
	for _, r := range rows {
		invented = invented || r.Invented
		buildings[r.Building] = true
	}
	for _, o := range outs {
		if o != nil && version == "" {
			version = o.Tool.Version
		}
	}
	footer := fmt.Sprintf("gyprisk %s · %s", version, fmtDate(date))
	d := newDoc(title, "", footer, invented, date, prev)
	p := d.pdf
	d.chapter = title
	p.AddPage()
	if invented {
		d.fill(bannerFill)
		p.Rect(marginL, d.y(), contentW, 9, "F")
		p.SetTextColor(255, 255, 255)
		d.font("B", 11)
		p.SetXY(marginL, d.y()+1.5)
		p.CellFormat(contentW, 6, inventedBanner+" (some or all projects)", "", 2, "C", false, 0, "")
		p.SetY(d.y() + 5)
		d.color(ink)
	}
	d.font("B", 20)
	p.SetX(marginL)
	p.MultiCell(contentW, 9, title, "", "L", false)
	p.SetY(d.y() + 2)
	d.para(fmt.Sprintf("Dated %s. %d results for the elements of %d buildings (%d projects assessed, %d could not be assessed). Each building's own report gives the inputs, charts and findings behind these figures.",
		fmtDate(date), len(rows), len(buildings), countNonNil(outs), len(opt.Failures)))
	d.box("Caution.", cautionLine+" Each building's own report lists the cautions in full.", rgb{250, 240, 236}, seriesBrick)

	byYears := append([]PortfolioRow(nil), rows...)
	RankByYears(byYears)
	d.chapter = chByYears
	d.heading(1, chByYears)
	d.table(portfolioColumns(), portfolioCells(byYears), tableOpts{zebra: true})

	byRating := append([]PortfolioRow(nil), rows...)
	RankByRating(byRating)
	d.chapter = chByRating
	p.AddPage()
	d.heading(1, chByRating)
	d.table(portfolioColumns(), portfolioCells(byRating), tableOpts{zebra: true})

	if len(opt.Failures) > 0 {
		d.chapter = chFailed
		d.heading(1, chFailed)
		var fr [][]cell
		for _, f := range opt.Failures {
			fr = append(fr, []cell{{text: f.Project}, {text: f.Err}})
		}
		d.table([]column{{"Project", 60, "L"}, {"Error", contentW - 60, "L"}}, fr, tableOpts{})
	}
	return d
}

func countNonNil(outs []*assess.Output) int {
	n := 0
	for _, o := range outs {
		if o != nil {
			n++
		}
	}
	return n
}

func portfolioColumns() []column {
	return []column{
		{"#", 8, "R"}, {"Building", 36, "L"}, {"Element", 34, "L"}, {"Variant · scenario", 28, "L"},
		{"Years to loss limit", 24, "R"}, {"Worst rating", 22, "L"}, {"Risks rated so", 22, "L"},
	}
}

func portfolioCells(rows []PortfolioRow) [][]cell {
	var out [][]cell
	for i, r := range rows {
		l := assess.LeachingOut{YearsToLimit: r.YearsToLimit, YearsToLimitP10: r.YearsToLimitP10, YearsToLimitP90: r.YearsToLimitP90}
		of := strings.Join(r.WorstOf, ", ")
		if len(r.WorstOf) == 4 {
			of = "all four"
		}
		out = append(out, []cell{
			{text: fmt.Sprint(i + 1)},
			{text: r.Building},
			{text: r.ID, bold: true, sub: r.Label},
			{text: r.Variant + " · " + r.Scenario},
			{text: fmtYearsToLimit(l), rating: r.Ratings.Leaching},
			{rating: r.Worst},
			{text: of},
		})
	}
	return out
}
