package report

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// Chapter titles. The contents list and the tests use the same strings.
const (
	chSummary  = "1 Summary"
	chClimate  = "2 Climate"
	chElements = "3 Elements"
	chNotes    = "4 Notes on the data"
	chMethods  = "5 Method, assumptions and sources"
	chCautions = "6 Cautions"
)

// elementTitle is the heading of element group i (0-based).
func elementTitle(i int, g elementGroup) string {
	m := g.main()
	t := fmt.Sprintf("3.%d %s", i+1, g.id)
	if m.Label != "" && m.Label != g.id {
		t += " — " + m.Label
	}
	return t
}

// plannedTOC lists the headings the document will have, for the first
// pass (which prints the contents before it knows the pages).
func (r *reportState) plannedTOC() []tocEntry {
	t := []tocEntry{{1, chSummary, 0}, {1, chClimate, 0}, {1, chElements, 0}}
	for i, g := range r.groups {
		t = append(t, tocEntry{2, elementTitle(i, g), 0})
	}
	return append(t, tocEntry{1, chNotes, 0}, tocEntry{1, chMethods, 0}, tocEntry{1, chCautions, 0})
}

// kv draws a two-column table of names and values.
func (r *reportState) kv(rows [][2]string, nameW float64) {
	cols := []column{{head: "", w: nameW, align: "L"}, {head: "", w: contentW - nameW, align: "L"}}
	cells := make([][]cell, len(rows))
	for i, kv := range rows {
		cells[i] = []cell{{text: kv[0], bold: true}, {text: kv[1]}}
	}
	r.d.table(cols, cells, tableOpts{noHead: true})
}

func (r *reportState) cover() {
	d, p, out := r.d, r.d.pdf, r.out
	d.chapter = ""
	p.AddPage()
	if out.Invented {
		d.fill(bannerFill)
		p.Rect(marginL, d.y(), contentW, 17, "F")
		p.SetTextColor(255, 255, 255)
		d.font("B", 13)
		p.SetXY(marginL, d.y()+2.5)
		p.CellFormat(contentW, 6, inventedBanner, "", 2, "C", false, 0, "")
		d.font("", smallSize)
		p.SetX(marginL)
		p.CellFormat(contentW, 5, "The site, the building and its climate record are made up to show the tool. Use none of these figures for a real decision.", "", 2, "C", false, 0, "")
		p.SetY(d.y() + 7)
		d.color(ink)
	}
	d.font("B", 22)
	d.color(ink)
	p.SetX(marginL)
	p.MultiCell(contentW, 10, d.title, "", "L", false)
	d.draw(seriesBlue)
	p.SetLineWidth(0.8)
	p.Line(marginL, d.y()+1, marginL+40, d.y()+1)
	p.SetY(d.y() + 4)
	if out.Site.Name != "" {
		d.font("", 14)
		p.SetX(marginL)
		p.MultiCell(contentW, 7, out.Site.Name, "", "L", false)
	}
	d.font("", bodySize)
	d.color(inkSoft)
	p.SetX(marginL)
	p.MultiCell(contentW, lineH, "Report dated "+fmtDate(r.date)+". A screening assessment of how the climate acts on the gypsum in this building: leaching by rain, dehydration by heat, condensation and mould.", "", "L", false)
	d.color(ink)
	p.SetY(d.y() + 4)

	d.subheading("Traceability")
	site := out.Site
	loc := fmt.Sprintf("latitude %s°, longitude %s°", fixed(site.LatitudeDeg, 4), fixed(site.LongitudeDeg, 4))
	if site.TimeZone != "" {
		loc += ", time zone " + site.TimeZone
	}
	rows := [][2]string{
		{"Project file", nonEmpty(out.Project, "–")},
		{"Site", nonEmpty(site.Name, "–") + "; " + loc},
		{"Terrain and topography", fmt.Sprintf("terrain category %s, topography factor C_T %s", nonEmpty(site.Terrain, "–"), fmtPlain(site.TopographyFactor))},
		{"Assessment run", nonEmpty(out.RunDate, "–")},
		{"Tool", strings.TrimSpace(nonEmpty(out.Tool.Name, "gyprisk") + " " + out.Tool.Version)},
		{"Thermodynamic database", nonEmpty(out.Database, "–")},
		{"Options", fmtOptions(out.Options)},
		{"Climate scenarios", fmtScenarios(out.Scenarios)},
	}
	r.kv(rows, 42)

	d.subheading("Input files")
	cols := []column{{"Role", 30, "L"}, {"File and SHA-256", 102, "L"}, {"Period", 42, "L"}}
	var cells [][]cell
	for _, in := range out.Inputs {
		cells = append(cells, []cell{{text: in.Role}, {text: in.Path, sub: in.SHA256, subMono: true}, {text: fmtPeriod(in.Start, in.End)}})
	}
	if len(cells) == 0 {
		d.para("The run recorded no input files.")
	} else {
		d.table(cols, cells, tableOpts{})
	}

	d.subheading("Contents")
	toc := r.plannedTOC()
	if d.prev != nil {
		toc = d.prev.toc
	}
	for _, e := range toc {
		d.ensure(lineH)
		indent := 0.0
		d.font("B", bodySize)
		if e.level == 2 {
			indent = 6
			d.font("", bodySize)
		}
		y := d.y()
		title := e.title
		page := fmt.Sprint(e.page)
		tw := p.GetStringWidth(title)
		pw := p.GetStringWidth(page)
		p.SetXY(marginL+indent, y)
		p.CellFormat(tw+1, lineH, title, "", 0, "L", false, 0, "")
		d.draw(rule)
		p.SetDashPattern([]float64{0.3, 1.2}, 0)
		p.Line(marginL+indent+tw+2, y+lineH*0.72, pageW-marginR-pw-2, y+lineH*0.72)
		p.SetDashPattern([]float64{}, 0)
		p.SetXY(pageW-marginR-pw-1, y)
		p.CellFormat(pw+1, lineH, page, "", 1, "R", false, 0, "")
	}
	d.font("", bodySize)
}

// subheading prints an unnumbered heading that does not go in the contents.
func (d *doc) subheading(title string) {
	d.ensure(22)
	p := d.pdf
	p.SetY(d.y() + 2)
	d.font("B", 10.5)
	d.color(ink)
	p.SetX(marginL)
	p.CellFormat(contentW, 5.5, title, "", 2, "L", false, 0, "")
	p.SetY(d.y() + 0.8)
	d.font("", bodySize)
}

func fmtOptions(o assess.RunOptions) string {
	if o.Samples == 0 {
		return fmt.Sprintf("deterministic run (no Monte Carlo samples); seed %d", o.Seed)
	}
	return fmt.Sprintf("%d Monte Carlo samples, seed %d", o.Samples, o.Seed)
}

func fmtScenarios(ss []assess.Scenario) string {
	if len(ss) == 0 {
		return "present (the record as measured)"
	}
	var parts []string
	for _, s := range ss {
		if s.ID == "present" && s.TempShiftC == 0 && s.RHShiftPct == 0 && s.RainFactor == 1 && s.WindFactor == 1 {
			parts = append(parts, "present (the record as measured)")
			continue
		}
		parts = append(parts, fmt.Sprintf("%s (temperature %s%s °C, rain × %s, RH %s%s %%, wind × %s)",
			s.ID, plusSign(s.TempShiftC), fixed(s.TempShiftC, 1), fmtPlain(s.RainFactor), plusSign(s.RHShiftPct), fixed(s.RHShiftPct, 0), fmtPlain(s.WindFactor)))
	}
	return strings.Join(parts, "; ")
}

func plusSign(v float64) string {
	if v >= 0 {
		return "+"
	}
	return ""
}

// summaryColumns are the columns of the summary and comparison tables.
func summaryColumns(withElement bool) []column {
	cols := []column{
		{"Variant", 17, "L"},
		{"Scenario", 17, "L"},
		{"Water, L/m² a year", 15, "R"},
		{"Recession, mm a year", 17, "R"},
		{"Years to loss limit", 20, "R"},
		{"Dehydration, h a year", 19, "R"},
		{"Condensation, h a year", 20, "R"},
		{"Mould index, max", 19, "R"},
	}
	if withElement {
		return append([]column{{"Element", 30, "L"}}, cols...)
	}
	// Without the element column the table runs the full width.
	cols[0].w, cols[1].w = 32, 32
	return cols
}

// summaryCells are one result's cells in the summary and comparison
// tables; the rated figures carry their rating.
func summaryCells(e *assess.ElementResult, withElement bool) []cell {
	c := []cell{
		{text: e.Variant},
		{text: e.Scenario},
		{text: fmtWater(totalWaterLM2(e.Water))},
		{text: fmtRecession(e.Leaching.RecessionMMPerYear), sub: fmtBand(e.Leaching.RecessionMMPerYearP10, e.Leaching.RecessionMMPerYearP90, fmtRecession)},
		{text: yearsMain(e.Leaching), sub: fmtBand(e.Leaching.YearsToLimitP10, e.Leaching.YearsToLimitP90, fmtYears), rating: e.Ratings.Leaching},
		{text: fmtHours(e.Dehydration.UnstableHoursPerYear), rating: e.Ratings.Dehydration},
		{text: fmtHours(e.Condensation.HoursPerYear), rating: e.Ratings.Condensation},
		{text: fmtIndex(e.Mould.IndexMax), rating: e.Ratings.Mould},
	}
	if withElement {
		return append([]cell{{text: e.ID, bold: true, sub: e.Label}}, c...)
	}
	return c
}

func (r *reportState) summary() {
	d, out := r.d, r.out
	d.chapterPage(chSummary)
	d.para(fmt.Sprintf("Each row is one element, design variant and climate scenario: %d results for %d elements. Ratings sit with the figure they rate; each rating cell shows its word and one to three pips, so the table reads the same in black and white. Section 3 gives each element's inputs, charts and findings.", len(out.Elements), len(r.groups)))
	var rows [][]cell
	for i := range out.Elements {
		rows = append(rows, summaryCells(&out.Elements[i], true))
	}
	d.table(summaryColumns(true), rows, tableOpts{zebra: true})
	d.small(thresholdLegend(out.Thresholds))
	d.ratingKey()

	if at := r.atAGlance(); len(at) > 0 {
		d.subheading("At a glance")
		d.bullets(at)
	}
	d.box("Caution.", summaryCaution, rgb{250, 240, 236}, seriesBrick)
}

// ratingKey draws the three rating marks in a row, as a key.
func (d *doc) ratingKey() {
	d.ensure(6)
	y := d.y()
	d.font("", smallSize)
	d.color(inkSoft)
	d.pdf.SetXY(marginL, y)
	d.pdf.CellFormat(22, 3.6, "Rating key:", "", 0, "L", false, 0, "")
	x := marginL + 22
	for _, w := range []string{assess.Low, assess.Moderate, assess.High} {
		st := ratingStyles[w]
		d.fill(st.fill)
		d.pdf.Rect(x, y-0.6, 26, 4.8, "F")
		d.ratingMark(w, x+1.5, y, 24, 3.6, smallSize, "L")
		x += 29
	}
	d.pdf.SetY(y + 7)
}

// thresholdLegend says what the ratings mean with the run's thresholds.
func thresholdLegend(t assess.Thresholds) string {
	return fmt.Sprintf("Years to loss limit rate high below %s years, moderate below %s years, low from %s years or when the surface does not recede (%q). Dehydration (hours a year with gypsum unstable at the surface) rates moderate from %s h and high from %s h; condensation moderate from %s h and high from %s h; the mould index moderate from %s and high from %s. The lighter figures under a value are its 10–90 %% range over the Monte Carlo samples. Section 5 gives the source of each threshold.",
		fmtYears(t.LeachingHighYears), fmtYears(t.LeachingModerateYears), fmtYears(t.LeachingModerateYears), noRecession,
		fmtHours(t.DehydrationModerateHours), fmtHours(t.DehydrationHighHours),
		fmtHours(t.CondensationModerateHours), fmtHours(t.CondensationHighHours),
		fmtIndex(t.MouldModerateIndex), fmtIndex(t.MouldHighIndex))
}

// atAGlance phrases the headline figures of the whole run.
func (r *reportState) atAGlance() []string {
	var out []string
	var short *assess.ElementResult
	for i := range r.out.Elements {
		e := &r.out.Elements[i]
		if e.Leaching.YearsToLimit == nil {
			continue
		}
		if short == nil || *e.Leaching.YearsToLimit < *short.Leaching.YearsToLimit {
			short = e
		}
	}
	if short != nil {
		out = append(out, fmt.Sprintf("The shortest time to a loss limit is about %s years: %s (%s, %s), which loses its %s mm at %s mm a year.",
			fmtYears(*short.Leaching.YearsToLimit), nameOf(short), short.Variant, short.Scenario, fmtMM(short.Inputs.LossLimitMM), fmtRecession(short.Leaching.RecessionMMPerYear)))
	} else {
		out = append(out, "No element's surface recedes under this record: none reaches its loss limit.")
	}
	count := map[string][]string{}
	for _, g := range r.groups {
		m := g.main()
		for _, k := range []struct{ what, rating string }{
			{"leaching", m.Ratings.Leaching}, {"dehydration", m.Ratings.Dehydration},
			{"condensation", m.Ratings.Condensation}, {"mould", m.Ratings.Mould},
		} {
			if k.rating == assess.High {
				count[k.what] = append(count[k.what], g.id)
			}
		}
	}
	var highs []string
	for _, what := range []string{"leaching", "dehydration", "condensation", "mould"} {
		if ids := count[what]; len(ids) > 0 {
			highs = append(highs, what+" ("+strings.Join(ids, ", ")+")")
		}
	}
	if len(highs) > 0 {
		out = append(out, "Rated high as built and under the present climate: "+strings.Join(highs, "; ")+".")
	} else {
		out = append(out, "No element rates high as built under the present climate.")
	}
	return out
}

// nameOf is an element's label, or its id when it has none.
func nameOf(e *assess.ElementResult) string {
	if e.Label != "" {
		return e.Label
	}
	return e.ID
}

func (r *reportState) climate() {
	d, c := r.d, r.out.Climate
	d.chapterPage(chClimate)
	text := fmt.Sprintf("The outdoor record runs from %s to %s: %s years of hourly data in %d records, %s %% coverage. ",
		fmtDay(c.Start), fmtDay(c.End), sig(c.Years, 3), c.Records, fixed(c.CoveragePct, 1))
	switch {
	case c.Gaps == 0 && c.MissingValues == 0:
		text += "It has no gaps and no missing values."
	default:
		text += fmt.Sprintf("It has %s and %s; section 4 lists how each was handled.", plural(c.Gaps, "gap", "gaps"), plural(c.MissingValues, "missing value", "missing values"))
	}
	if c.ClippedRHCount > 0 {
		text += fmt.Sprintf(" %d relative humidity readings above 100 %% were set to 100 %%.", c.ClippedRHCount)
	}
	d.para(text)
	r.kv([][2]string{
		{"Period", fmtPeriod(c.Start, c.End)},
		{"Years covered", sig(c.Years, 3)},
		{"Hourly records", fmt.Sprint(c.Records)},
		{"Coverage", fixed(c.CoveragePct, 1) + " %"},
		{"Gaps; missing values", fmt.Sprintf("%d; %d", c.Gaps, c.MissingValues)},
		{"RH readings set to 100 %", fmt.Sprint(c.ClippedRHCount)},
		{"Mean air temperature", fmtTempC(c.TempMeanC) + " °C"},
		{"Mean relative humidity", fmtPct(c.RHMeanPct) + " %"},
		{"Rain", fmtWater(c.RainMMPerYear) + " mm a year"},
	}, 52)

	if len(c.Monthly) > 0 {
		n := d.nextFigure()
		d.para(fmt.Sprintf("Figure %d shows the record month by month.", n))
		d.figure(n, 104, "Outdoor climate by month: mean air temperature, mean relative humidity and rain. Months with fewer hours than the calendar month are drawn hollow.",
			func(y float64) { r.climateMonthlyChart(y, 104) })
	}
	if len(c.DrivingRain) > 0 {
		n := d.nextFigure()
		max := c.DrivingRain[0]
		for _, dr := range c.DrivingRain {
			if dr.LPerM2PerYear > max.LPerM2PerYear {
				max = dr
			}
		}
		d.para(fmt.Sprintf("Figure %d shows the ISO 15927-3 airfield driving rain index by wall orientation: the rain an unsheltered wall facing each way would catch at 10 m in open country. Walls facing %s catch the most, %s L/m² a year. The markers on the outer ring show the orientation of each exterior element.",
			n, fmtAzimuth(max.AzimuthDeg), fmtWater(max.LPerM2PerYear)))
		d.figure(n, 88, "Annual airfield driving rain index by the direction a wall faces, L/m² a year (ISO 15927-3:2009, clause 3). Wedge length is the index; the table gives the values.",
			func(y float64) { r.drivingRainFigure(y, 88) })
	}
}

func (r *reportState) notes() {
	d := r.d
	d.chapterPage(chNotes)
	if len(r.out.Notes) == 0 {
		d.para("The run repaired or dropped no values and made no assumptions beyond the documented defaults.")
		return
	}
	d.para("What the run had to repair, drop or assume. Each note comes from the assessment itself.")
	d.bullets(r.out.Notes)
}

func (r *reportState) methods() {
	d := r.d
	d.chapterPage(chMethods)
	d.para("Every figure in this report comes from a published method. The table names each method, what it feeds and its source. The assessment runs hour by hour through the climate record; yearly figures are totals over the record divided by its length in years.")
	cols := []column{{"Method", 62, "L"}, {"Used for", 38, "L"}, {"Source", 74, "L"}}
	var rows [][]cell
	for _, m := range methodSources {
		src := m.source
		if src == databaseSource {
			src = "Thermodynamic database of the run: " + nonEmpty(r.out.Database, "not recorded") + ". Equilibrium constants from the database's own temperature expressions."
		}
		rows = append(rows, []cell{{text: m.method}, {text: m.usedFor}, {text: src}})
	}
	d.table(cols, rows, tableOpts{zebra: true})

	d.heading(2, "Rating thresholds and where they come from")
	tc := []column{{"Rating of", 40, "L"}, {"Moderate", 26, "R"}, {"High", 26, "R"}, {"Where the default comes from", 82, "L"}}
	var trows [][]cell
	for _, row := range r.out.Thresholds.Rows() {
		word, f := "from ", fmtPlain
		if row.Below {
			word, f = "below ", fmtYears
		}
		trows = append(trows, []cell{{text: row.Quantity}, {text: word + f(row.Moderate)}, {text: word + f(row.High)}, {text: row.Source}})
	}
	d.table(tc, trows, tableOpts{})
	d.small("Thresholds that differ from the defaults were set in the project file; the figures above are the ones this run used.")

	d.heading(2, "What this assessment does not cover")
	d.bullets(notCovered)
}

func (r *reportState) cautions() {
	d := r.d
	d.chapterPage(chCautions)
	d.para("Read these before anyone acts on this report or goes near the elements it describes.")
	for _, c := range cautions {
		d.box(c.lead, c.text, rgb{250, 240, 236}, seriesBrick)
	}
}

// sortedCopy returns xs sorted ascending (for ranges of chart data).
func sortedCopy(xs []float64) []float64 {
	s := append([]float64(nil), xs...)
	sort.Float64s(s)
	return s
}

// rangeOf returns the smallest and largest finite value of xs.
func rangeOf(xs ...[]float64) (lo, hi float64) {
	lo, hi = math.Inf(1), math.Inf(-1)
	for _, x := range xs {
		for _, v := range x {
			if finite(v) {
				lo, hi = math.Min(lo, v), math.Max(hi, v)
			}
		}
	}
	if lo > hi {
		return 0, 1
	}
	return lo, hi
}
