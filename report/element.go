package report

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"github.com/gyprisk/gyprisk/leach/assess"
)

func (r *reportState) elements() {
	d := r.d
	d.chapterPage(chElements)
	d.para("One section per element. Each opens with what was assumed about the element, then shows what the climate does to it in charts, then says it in plain words. Where an element has design variants or climate scenarios, a table and a chart compare them side by side.")
	for i, g := range r.groups {
		if i > 0 {
			d.pdf.AddPage()
		}
		r.element(i, g)
	}
}

func (r *reportState) element(i int, g elementGroup) {
	d := r.d
	e := g.main()
	d.heading(2, elementTitle(i, g))
	if e.Description != "" {
		d.para(e.Description)
	}
	d.para(describe(e))
	d.table(inputColumns(), inputRows(e), tableOpts{noHead: true, zebra: true})

	// Reserve the figure numbers first so the text can refer to them.
	hasRain := hasRainWater(e)
	var fWater int
	if hasRain {
		fWater = d.nextFigure()
	}
	fLoss, fMould, fSurface := d.nextFigure(), d.nextFigure(), d.nextFigure()
	var refs []string
	if hasRain {
		refs = append(refs, fmt.Sprintf("Figure %d the water that reaches the surface each month", fWater))
	}
	refs = append(refs,
		fmt.Sprintf("Figure %d the surface lost against the %s mm loss limit", fLoss, fmtMM(e.Inputs.LossLimitMM)),
		fmt.Sprintf("Figure %d the mould index", fMould),
		fmt.Sprintf("Figure %d the surface temperature and humidity against the gypsum–bassanite equilibrium", fSurface))
	text := "Charts for the element as built under the present climate: " + strings.Join(refs, "; ") + "."
	switch {
	case !hasRain && e.Water.CondensateLM2PerYear > 0:
		text += fmt.Sprintf(" No rain reaches this element; the water on its surface is condensate, %s L/m² a year.", fmtWater(e.Water.CondensateLM2PerYear))
	case !hasRain:
		text += " Neither rain nor condensate reaches its surface."
	}
	if len(e.Daily) == 0 {
		text += " The day-by-day trace was not available, so the charts use monthly values."
	}
	d.para(text)

	if hasRain {
		d.figure(fWater, 52, fmt.Sprintf("Water reaching the surface of %s each month, L/m²: driving rain deposited on it and run-off from above. Over the record, with condensate: %s L/m² a year in all.", e.ID, fmtWater(totalWaterLM2(e.Water))),
			func(y float64) { r.waterChart(e, y, 52) })
	}

	// Loss and mould side by side.
	const h = 64.0
	half := (contentW - 6) / 2
	lossCap := lossCaption(e)
	mouldCap := fmt.Sprintf("Mould index on the surface of %s (0–6, VTT model), with the rating thresholds %s and %s.", e.ID, fmtIndex(r.out.Thresholds.MouldModerateIndex), fmtIndex(r.out.Thresholds.MouldHighIndex))
	d.ensure(h + maxf(d.captionHeight(fLoss, half, lossCap), d.captionHeight(fMould, half, mouldCap)))
	y := d.y()
	r.lossChart(e, marginL, y, half, h)
	r.mouldChart(e, marginL+half+6, y, half, h)
	d.pdf.SetY(y + h)
	y2 := d.captionAt(fLoss, marginL, half, lossCap)
	d.pdf.SetY(y + h)
	y3 := d.captionAt(fMould, marginL+half+6, half, mouldCap)
	d.pdf.SetY(maxf(y2, y3))

	surfCap := fmt.Sprintf("Surface of %s: daily highest temperature (top) and daily lowest relative humidity against the RH below which gypsum turns to bassanite at that temperature (bottom). Shaded days: gypsum unstable for part of the day.", e.ID)
	if len(e.Daily) == 0 {
		surfCap = fmt.Sprintf("Surface of %s: monthly highest and mean temperature (top) and monthly mean relative humidity (bottom).", e.ID)
	}
	d.figure(fSurface, 86, surfCap, func(y float64) { r.surfaceChart(e, y, 86) })

	d.heading(3, "Findings")
	if len(e.Findings) > 0 {
		d.bullets(e.Findings)
	} else {
		// The engine gave no sentences: phrase the figures here.
		d.para(strings.Join(plainWords(e), " "))
	}

	if len(e.Leaching.Sensitivity) > 0 {
		r.sensitivity(e)
	}
	if len(g.results) > 1 {
		r.comparison(g)
	}
}

// sensitivity lists the sampled inputs by how strongly they move the
// recession (Spearman rank correlation over the Monte Carlo samples).
func (r *reportState) sensitivity(e *assess.ElementResult) {
	d := r.d
	d.heading(3, "What moves the answer")
	ss := append([]assess.Sensitivity(nil), e.Leaching.Sensitivity...)
	sort.SliceStable(ss, func(i, j int) bool { return math.Abs(ss[i].RankCorrelation) > math.Abs(ss[j].RankCorrelation) })
	d.para(fmt.Sprintf("Over the %d Monte Carlo samples, %s moves the recession most. A rank correlation near +1 means more of that input, more loss; near −1, less loss; near 0, little effect.", r.out.Options.Samples, ss[0].Input))
	var rows [][]cell
	for _, s := range ss {
		rows = append(rows, []cell{{text: s.Input}, {text: fixed(s.RankCorrelation, 2)}})
	}
	d.table([]column{{"Sampled input", 70, "L"}, {"Rank correlation with recession", 40, "R"}}, rows, tableOpts{zebra: true})
}

// describe says in one sentence what the element is and how it sits.
func describe(e *assess.ElementResult) string {
	in := e.Inputs
	s := fmt.Sprintf("An %s element of %s", nonEmpty(e.Exposure, "unspecified"), nonEmpty(e.Material, "unspecified material"))
	if e.Exposure == "interior" {
		s += fmt.Sprintf(", %s mm thick, of which %s mm may be lost before repair.", fmtMM(in.ThicknessMM), fmtMM(in.LossLimitMM))
		if in.IndoorClimate != "" {
			s += " Indoor climate: " + in.IndoorClimate + "."
		}
		return s
	}
	s += fmt.Sprintf(", facing %s at a tilt of %s°, %s m above ground, %s mm thick, of which %s mm may be lost before repair.",
		fmtAzimuth(in.AzimuthDeg), fixed(in.TiltDeg, 0), fmtPlain(in.HeightM), fmtMM(in.ThicknessMM), fmtMM(in.LossLimitMM))
	return s
}

func inputColumns() []column {
	return []column{{"", 30, "L"}, {"", 28, "R"}, {"", 30, "L"}, {"", 28, "R"}, {"", 30, "L"}, {"", 28, "R"}}
}

// inputRows lays the element's resolved inputs out three to a row.
func inputRows(e *assess.ElementResult) [][]cell {
	in := e.Inputs
	type kv struct{ k, v string }
	var items []kv
	add := func(k, v string) { items = append(items, kv{k, v}) }
	nz := func(k string, v float64, f func(float64) string, unit string) {
		if v != 0 {
			add(k, f(v)+unit)
		}
	}
	if e.Exposure != "interior" {
		add("Azimuth", fmtAzimuth(in.AzimuthDeg))
		add("Tilt", fixed(in.TiltDeg, 0)+"°")
		nz("Height above ground", in.HeightM, fmtPlain, " m")
		nz("Obstruction distance", in.ObstructionM, fmtPlain, " m")
		nz("Wall factor W", in.WallFactor, fmtPlain, "")
		nz("Roughness C_R", in.RoughnessCoeff, fmtPlain, "")
		nz("Topography C_T", in.TopographyFactor, fmtPlain, "")
		nz("Obstruction O", in.ObstructionFactor, fmtPlain, "")
		nz("Run-off height", in.RunoffHeightM, fmtPlain, " m")
		nz("Solar absorptance", in.SolarAbsorptance, fmtPlain, "")
	}
	add("Thickness", fmtMM(in.ThicknessMM)+" mm")
	add("Loss limit", fmtMM(in.LossLimitMM)+" mm")
	nz("Bulk density", in.BulkDensityKgM3, fmtPlain, " kg/m³")
	nz("Gypsum fraction", in.GypsumFraction, fmtPlain, "")
	nz("Porosity", in.Porosity, fmtPlain, "")
	if in.MouldClass != "" {
		add("Mould class", in.MouldClass)
	}
	if in.RepellentFraction > 0 {
		add("Repellent share", fmtPlain(in.RepellentFraction))
		nz("Repellent life", in.RepellentLifeYears, fmtPlain, " years")
	}
	nz("Flow length", in.FlowLengthM, fmtPlain, " m")
	nz("Temperature factor", in.TemperatureFactor, fmtPlain, "")
	if in.HumidityClass != 0 {
		add("Humidity class", fmt.Sprint(in.HumidityClass))
	}
	var rows [][]cell
	for i := 0; i < len(items); i += 3 {
		var row []cell
		for j := i; j < i+3; j++ {
			if j < len(items) {
				row = append(row, cell{text: items[j].k, bold: true}, cell{text: items[j].v})
			} else {
				row = append(row, cell{}, cell{})
			}
		}
		rows = append(rows, row)
	}
	return rows
}

func hasRainWater(e *assess.ElementResult) bool {
	if e.Water.DepositedLM2PerYear > 0 || e.Water.RunoffInLM2PerYear > 0 {
		return true
	}
	for _, m := range e.Monthly {
		if m.DepositedLM2 > 0 || m.RunoffInLM2 > 0 {
			return true
		}
	}
	return false
}

func lossCaption(e *assess.ElementResult) string {
	l := e.Leaching
	if l.YearsToLimit == nil || *l.YearsToLimit >= yearsCap {
		return fmt.Sprintf("Surface lost from %s, mm, over the record, against its %s mm loss limit.", e.ID, fmtMM(e.Inputs.LossLimitMM))
	}
	s := fmt.Sprintf("Surface lost from %s, mm, over the record (solid) and at the same rate until the %s mm loss limit (dashed)", e.ID, fmtMM(e.Inputs.LossLimitMM))
	if l.YearsToLimitP10 != nil && l.YearsToLimitP90 != nil {
		s += "; shaded: 10–90 % range of the Monte Carlo samples"
	}
	return s + "."
}

// plainWords phrases the element's figures for a client.
func plainWords(e *assess.ElementResult) []string {
	l, in := e.Leaching, e.Inputs
	name := nameOf(e)
	var s []string
	if l.YearsToLimit != nil && *l.YearsToLimit >= yearsCap {
		s = append(s, fmt.Sprintf("At the current rate the %s would take more than %s years to lose its %s mm: in practice rain does not wear it away (%s mm a year).",
			lowerFirst(name), sig(yearsCap, 4), fmtMM(in.LossLimitMM), fmtRecession(l.RecessionMMPerYear)))
	} else if l.YearsToLimit != nil {
		t := fmt.Sprintf("At the current rate the %s loses its %s mm of sacrificial plaster in about %s years (%s mm a year)",
			lowerFirst(name), fmtMM(in.LossLimitMM), fmtYears(*l.YearsToLimit), fmtRecession(l.RecessionMMPerYear))
		if l.YearsToLimitP10 != nil && l.YearsToLimitP90 != nil {
			t += fmt.Sprintf("; the uncertain inputs put it between %s and %s years", fmtYears(*l.YearsToLimitP10), fmtYears(*l.YearsToLimitP90))
		}
		s = append(s, t+".")
	} else {
		s = append(s, "Under this record the surface does not recede: water reaching it dissolves no measurable gypsum.")
	}
	if e.Dehydration.UnstableHoursPerYear > 0 {
		t := fmt.Sprintf("The surface reaches %s °C at most, and for about %s hours a year it is hot and dry enough for gypsum to turn to bassanite", fmtTempC(e.Dehydration.MaxSurfaceTempC), fmtHours(e.Dehydration.UnstableHoursPerYear))
		if e.Dehydration.HoursAbove52CPerYear > 0 {
			t += fmt.Sprintf("; it is above 52 °C for %s hours a year", fmtHours(e.Dehydration.HoursAbove52CPerYear))
		}
		s = append(s, t+".")
	} else {
		s = append(s, fmt.Sprintf("The surface reaches %s °C at most and is never hot and dry enough for gypsum to dehydrate.", fmtTempC(e.Dehydration.MaxSurfaceTempC)))
	}
	if e.Condensation.HoursPerYear > 0 {
		s = append(s, fmt.Sprintf("Water condenses on the surface for about %s hours a year.", fmtHours(e.Condensation.HoursPerYear)))
	} else {
		s = append(s, "Water never condenses on the surface.")
	}
	m := e.Mould.IndexMax
	lvl := int(m)
	if lvl < 0 {
		lvl = 0
	}
	if lvl > 6 {
		lvl = 6
	}
	t := fmt.Sprintf("The mould index peaks at %s (%s)", fmtIndex(m), mouldScale[lvl])
	if e.Mould.MonthsOver80Pct > 0 {
		t += fmt.Sprintf("; %s a mean surface RH above 80 %%, the ISO 13788 criterion", plural(e.Mould.MonthsOver80Pct, "month has", "months have"))
	}
	s = append(s, t+".")
	return s
}

// comparison prints the side-by-side table and chart of an element's
// variants and scenarios.
func (r *reportState) comparison(g elementGroup) {
	d := r.d
	d.heading(3, "Variants and scenarios compared")
	n := d.nextFigure()
	base := g.main()
	var lines []string
	for _, e := range g.results {
		if e == base {
			continue
		}
		lines = append(lines, compareSentence(base, e))
	}
	d.para(fmt.Sprintf("The table and Figure %d set the %d results for %s side by side. ", n, len(g.results), g.id) + strings.Join(lines, " "))
	var rows [][]cell
	for _, e := range g.results {
		rows = append(rows, summaryCells(e, false))
	}
	d.table(summaryColumns(false), rows, tableOpts{zebra: true})
	// The headline finding of each variant and scenario; the rest differ
	// from the base case's only in their figures, which the table gives.
	var heads []string
	for _, e := range g.results {
		if e == base || len(e.Findings) == 0 {
			continue
		}
		heads = append(heads, fmt.Sprintf("%s · %s: %s", e.Variant, e.Scenario, e.Findings[0]))
	}
	if len(heads) > 0 {
		d.bullets(heads)
	}
	h := 20 + 8*float64(len(g.results))
	d.figure(n, h, fmt.Sprintf("Years until %s reaches its loss limit, by variant and scenario (logarithmic scale); whiskers: 10–90 %% range where sampled. Background: the rating bands (high below %s years, moderate below %s).", g.id, fmtYears(r.out.Thresholds.LeachingHighYears), fmtYears(r.out.Thresholds.LeachingModerateYears)),
		func(y float64) { r.compareChart(g, y, h) })
}

// compareSentence says how one variant or scenario differs from the base.
func compareSentence(base, e *assess.ElementResult) string {
	what := fmt.Sprintf("With variant %q", e.Variant)
	switch {
	case e.Variant == base.Variant:
		what = fmt.Sprintf("Under scenario %q", e.Scenario)
	case e.Scenario != base.Scenario:
		what = fmt.Sprintf("With variant %q under scenario %q", e.Variant, e.Scenario)
	}
	by, ey := base.Leaching.YearsToLimit, e.Leaching.YearsToLimit
	switch {
	case ey == nil && by == nil:
		return what + " the surface still does not recede."
	case ey == nil:
		return what + " the surface no longer recedes."
	case by == nil:
		return fmt.Sprintf("%s the surface reaches its loss limit in about %s years, where as built it does not recede.", what, fmtYears(*ey))
	}
	return fmt.Sprintf("%s the loss limit is reached in about %s years instead of %s.", what, fmtYears(*ey), fmtYears(*by))
}

func maxf(a, b float64) float64 {
	if a > b {
		return a
	}
	return b
}

// captionAt prints a caption in a column of width w at x and returns the
// y below it.
func (d *doc) captionAt(n int, x, w float64, text string) float64 {
	p := d.pdf
	y := d.y()
	d.font("B", smallSize)
	lead := fmt.Sprintf("Figure %d. ", n)
	lw := p.GetStringWidth(lead)
	p.SetXY(x, y)
	p.CellFormat(lw+0.5, 3.8, lead, "", 0, "L", false, 0, "")
	d.font("", smallSize)
	d.color(inkSoft)
	p.SetLeftMargin(x)
	p.SetRightMargin(pageW - x - w)
	p.SetXY(x+lw+0.5, y)
	p.Write(3.8, text)
	p.SetLeftMargin(marginL)
	p.SetRightMargin(marginR)
	d.color(ink)
	return d.y() + 3.8 + 3
}

// lowerFirst lowers the first letter of a label for use inside a sentence,
// unless the label starts with an abbreviation ("SW facade").
func lowerFirst(s string) string {
	r := []rune(s)
	if len(r) == 0 || (len(r) > 1 && strings.ToUpper(string(r[1])) == string(r[1]) && strings.ToLower(string(r[1])) != string(r[1])) {
		return s
	}
	return strings.ToLower(string(r[0])) + string(r[1:])
}
