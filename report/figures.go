package report

import (
	"fmt"
	"math"
	"strings"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
	"github.com/jung-kurt/gofpdf"
)

// panel builds a chart whose plot area has the given insets.
func panel(d *doc, bx, by, bw, bh float64, xr, yr [2]float64, left, bottom float64) *chart {
	const right, top = 3.0, 4.0
	return &chart{d: d, x: bx + left, y: by + top, w: bw - left - right, h: bh - top - bottom,
		xmin: xr[0], xmax: xr[1], ymin: yr[0], ymax: yr[1]}
}

// stripLabels returns ticks with the labels removed (for stacked panels
// that share the x axis of the panel below).
func stripLabels(ts []tick) []tick {
	out := make([]tick, len(ts))
	for i, t := range ts {
		out[i] = tick{v: t.v, minor: t.minor}
	}
	return out
}

// monthStart parses "YYYY-MM" to the first of the month, UTC.
func monthStart(m string) (time.Time, bool) {
	t, err := time.Parse("2006-01", m)
	return t, err == nil
}

// fullMonthHours is the number of hours in the calendar month m.
func fullMonthHours(m string) float64 {
	t, ok := monthStart(m)
	if !ok {
		return 0
	}
	return t.AddDate(0, 1, 0).Sub(t).Hours()
}

func (r *reportState) climateMonthlyChart(y, h float64) {
	d := r.d
	ms := r.out.Climate.Monthly
	n := len(ms)
	names := make([]string, n)
	xs := make([]float64, n)
	temp := make([]float64, n)
	rh := make([]float64, n)
	rain := make([]float64, n)
	for i, m := range ms {
		names[i], xs[i] = m.Month, float64(i)
		temp[i], rh[i], rain[i] = m.TempMeanC, m.RHMeanPct, m.RainMM
	}
	xr := [2]float64{-0.6, float64(n) - 0.4}
	xt := monthTicks(names)
	ph := (h - 6) / 3

	lo, hi := rangeOf(temp)
	yt, yr := niceTicks(lo, hi, 4)
	c := panel(d, marginL, y, contentW, ph, xr, yr, 16, 3)
	c.frame(stripLabels(xt), yt, "", "air, °C")
	c.line(xs, temp, seriesBrick, 0.5, nil)
	r.monthMarkers(c, ms, xs, temp, seriesBrick)
	c.legend([]legendItem{{"mean air temperature", seriesBrick, "line"}})

	yt, yr = niceTicks(math.Max(0, math.Floor(rangeMin(rh)/10)*10), 100, 4)
	c = panel(d, marginL, y+ph, contentW, ph, xr, yr, 16, 3)
	c.frame(stripLabels(xt), yt, "", "RH, %")
	c.line(xs, rh, seriesBlue, 0.5, nil)
	r.monthMarkers(c, ms, xs, rh, seriesBlue)
	c.legend([]legendItem{{"mean relative humidity", seriesBlue, "line"}})

	_, hi = rangeOf(rain)
	yt, yr = niceTicks(0, math.Max(hi, 1), 4)
	c = panel(d, marginL, y+2*ph, contentW, ph+6, xr, yr, 16, 8)
	c.frame(xt, yt, "", "rain, mm")
	for i := range ms {
		c.bar(xs[i], 0.7, 0, rain[i], seriesTeal)
	}
	c.legend([]legendItem{{"rain in the month", seriesTeal, "fill"}})
}

func rangeMin(xs []float64) float64 { lo, _ := rangeOf(xs); return lo }

// monthMarkers marks each month: filled when the month is fully covered,
// hollow when the record has fewer hours than the calendar month.
func (r *reportState) monthMarkers(c *chart, ms []assess.ClimateMonth, xs, ys []float64, col rgb) {
	p := c.d.pdf
	c.d.fill(col)
	c.d.draw(col)
	p.SetLineWidth(0.25)
	for i, m := range ms {
		style := "F"
		if full := fullMonthHours(m.Month); full > 0 && m.Hours < full-0.5 {
			p.SetFillColor(255, 255, 255)
			style = "FD"
		} else {
			c.d.fill(col)
		}
		p.Circle(c.fx(xs[i]), c.fy(ys[i]), 0.65, style)
	}
}

// drivingRainFigure draws the driving rain index as a rose of wedges, one
// per wall orientation, with the values in a table beside it.
func (r *reportState) drivingRainFigure(y, h float64) {
	d, p := r.d, r.d.pdf
	dr := r.out.Climate.DrivingRain
	cx, cy := marginL+44, y+h/2-1
	R := h/2 - 10
	var vals []float64
	for _, v := range dr {
		vals = append(vals, v.LPerM2PerYear)
	}
	_, hi := rangeOf(vals)
	rings, rr := niceTicks(0, math.Max(hi, 1), 4)
	rmax := rr[1]
	pt := func(az, rad float64) (float64, float64) {
		th := az * math.Pi / 180
		return cx + rad*math.Sin(th), cy - rad*math.Cos(th)
	}
	// Rings and spokes.
	p.SetLineWidth(0.15)
	d.draw(gridGrey)
	for _, t := range rings {
		if t.v <= 0 {
			continue
		}
		p.Circle(cx, cy, R*t.v/rmax, "D")
	}
	for az := 0.0; az < 360; az += 45 {
		x, yy := pt(az, R)
		p.Line(cx, cy, x, yy)
	}
	// Wedges.
	width := 360.0 / float64(len(dr)) * 0.78
	if width > 28 {
		width = 28
	}
	for _, v := range dr {
		rad := R * v.LPerM2PerYear / rmax
		pts := []gofpdf.PointType{{X: cx, Y: cy}}
		for k := 0; k <= 8; k++ {
			a := v.AzimuthDeg - width/2 + width*float64(k)/8
			x, yy := pt(a, rad)
			pts = append(pts, gofpdf.PointType{X: x, Y: yy})
		}
		d.fill(bandBlue)
		d.draw(seriesBlue)
		p.SetLineWidth(0.3)
		p.Polygon(pts, "FD")
	}
	// Ring labels along the NNE spoke.
	d.font("", tinySize)
	d.color(inkSoft)
	for _, t := range rings {
		if t.v <= 0 {
			continue
		}
		x, yy := pt(22.5, R*t.v/rmax)
		p.SetXY(x+0.5, yy-1.5)
		p.CellFormat(12, 3, t.label, "", 0, "L", false, 0, "")
	}
	// Compass points.
	d.font("B", smallSize)
	d.color(ink)
	for _, c := range []struct {
		az   float64
		name string
	}{{0, "N"}, {45, "NE"}, {90, "E"}, {135, "SE"}, {180, "S"}, {225, "SW"}, {270, "W"}, {315, "NW"}} {
		x, yy := pt(c.az, R+5.5)
		p.SetXY(x-4, yy-1.8)
		p.CellFormat(8, 3.6, c.name, "", 0, "C", false, 0, "")
	}
	// Exterior elements' orientations.
	d.font("", tinySize)
	for _, g := range r.groups {
		e := g.main()
		if e.Exposure == "interior" {
			continue
		}
		az := e.Inputs.AzimuthDeg
		x1, y1 := pt(az, R+0.4)
		xa, ya := pt(az-3.5, R+2.6)
		xb, yb := pt(az+3.5, R+2.6)
		d.fill(seriesBrick)
		p.Polygon([]gofpdf.PointType{{X: x1, Y: y1}, {X: xa, Y: ya}, {X: xb, Y: yb}}, "F")
	}
	d.font("", tinySize)
	d.color(inkSoft)
	p.SetXY(cx-R, y+h-3)
	p.CellFormat(2*R, 3, "rings: L/m² a year · ▲ exterior elements", "", 0, "C", false, 0, "")
	d.color(ink)

	// Values beside the rose, in two column pairs.
	left := marginL + 94
	pairs, faces := 2, fmtAzimuth
	cols := []column{{"Wall faces", 24, "L"}, {"L/m² a year", 16, "R"}, {"Wall faces", 24, "L"}, {"L/m² a year", 16, "R"}}
	if len(dr) > 16 {
		pairs, faces = 3, func(az float64) string { return fmtAzimuth(az)[:strings.Index(fmtAzimuth(az), " (")] }
		cols = []column{{"Faces", 12, "L"}, {"L/m² a year", 14, "R"}, {"Faces", 12, "L"}, {"L/m² a year", 14, "R"}, {"Faces", 12, "L"}, {"L/m² a year", 14, "R"}}
	}
	var rows [][]cell
	nrow := (len(dr) + pairs - 1) / pairs
	for i := 0; i < nrow; i++ {
		var row []cell
		for k := 0; k < pairs; k++ {
			if j := i + k*nrow; j < len(dr) {
				row = append(row, cell{text: faces(dr[j].AzimuthDeg)}, cell{text: fmtWater(dr[j].LPerM2PerYear)})
			}
		}
		rows = append(rows, row)
	}
	var ids []string
	for _, g := range r.groups {
		if e := g.main(); e.Exposure != "interior" {
			ids = append(ids, fmt.Sprintf("%s faces %s", g.id, fmtAzimuth(e.Inputs.AzimuthDeg)))
		}
	}
	p.SetY(y + 2)
	size := smallSize
	if len(rows) > 10 {
		size = tinySize
	}
	d.table(cols, rows, tableOpts{left: left, size: size, zebra: true})
	for _, s := range ids {
		d.font("", tinySize)
		d.color(inkSoft)
		p.SetXY(left, d.y())
		p.CellFormat(80, 3.2, "▲ "+s, "", 2, "L", false, 0, "")
	}
	d.color(ink)
	p.SetXY(marginL, y)
}

func (r *reportState) waterChart(e *assess.ElementResult, y, h float64) {
	d := r.d
	ms := e.Monthly
	n := len(ms)
	names := make([]string, n)
	tot := make([]float64, n)
	for i, m := range ms {
		names[i] = m.Month
		tot[i] = m.DepositedLM2 + m.RunoffInLM2
	}
	_, hi := rangeOf(tot)
	yt, yr := niceTicks(0, math.Max(hi, 0.1), 5)
	c := panel(d, marginL, y, contentW, h, [2]float64{-0.6, float64(n) - 0.4}, yr, 16, 9)
	c.frame(monthTicks(names), yt, "", "water, L/m²")
	for i, m := range ms {
		c.bar(float64(i), 0.72, 0, m.DepositedLM2, seriesBlue)
		c.bar(float64(i), 0.72, m.DepositedLM2, m.DepositedLM2+m.RunoffInLM2, seriesOchre)
	}
	c.legend([]legendItem{{"driving rain deposited", seriesBlue, "fill"}, {"run-off from above", seriesOchre, "fill"}})
}

// lossChart draws the surface lost over the record and its continuation
// at the same rate to the loss limit, with the sampled band when present.
func (r *reportState) lossChart(e *assess.ElementResult, bx, by, bw, bh float64) {
	d := r.d
	l := e.Leaching
	limit := e.Inputs.LossLimitMM
	days := e.Daily
	var xs, ys, lo, hi []float64
	band := false
	for _, dd := range days {
		xs = append(xs, dd.Date.Sub(days[0].Date).Hours()/24/365.25)
		ys = append(ys, dd.CumLossMM)
		lo = append(lo, dd.CumLossMMP10)
		hi = append(hi, dd.CumLossMMP90)
		if dd.CumLossMMP90 > 0 {
			band = true
		}
	}
	// A limit beyond yearsCap is drawn like no recession at all.
	if l.YearsToLimit != nil && *l.YearsToLimit >= yearsCap {
		l.YearsToLimit, l.YearsToLimitP10, l.YearsToLimitP90 = nil, nil, nil
	}
	recEnd := r.out.Climate.Years
	endLoss, endLo, endHi := 0.0, 0.0, 0.0
	if len(xs) > 0 {
		recEnd = xs[len(xs)-1]
		endLoss, endLo, endHi = ys[len(ys)-1], lo[len(lo)-1], hi[len(hi)-1]
	} else if l.YearsToLimit != nil {
		endLoss = l.RecessionMMPerYear * recEnd
	}
	if !band {
		endLo, endHi = endLoss, endLoss
	}
	const capYears = 150.0
	xmax := math.Max(recEnd, 0.5)
	if l.YearsToLimit != nil {
		xmax = math.Max(xmax, *l.YearsToLimit)
		if l.YearsToLimitP90 != nil {
			xmax = math.Max(xmax, *l.YearsToLimitP90)
		}
		xmax = math.Min(xmax, capYears)
	}
	xt, xr := niceTicks(0, xmax*1.04, 5)
	ytop := limit * 1.2
	if _, m := rangeOf(ys, hi); m > ytop {
		ytop = m * 1.1
	}
	yt, yr := niceTicks(0, math.Max(ytop, 0.01), 5)
	c := panel(d, bx, by, bw, bh, xr, yr, 14, 10)
	c.frame(xt, yt, "years from the start of the record", "surface lost, mm")
	if l.YearsToLimit != nil {
		xm := xr[1]
		if l.YearsToLimitP10 != nil && l.YearsToLimitP90 != nil {
			pts := []gofpdf.PointType{{X: c.fx(recEnd), Y: c.fy(endHi)}}
			x, y := clipRay(recEnd, endHi, *l.YearsToLimitP10, limit, xm)
			pts = append(pts, gofpdf.PointType{X: c.fx(x), Y: c.fy(y)})
			if *l.YearsToLimitP10 <= xm && *l.YearsToLimitP90 > xm {
				pts = append(pts, gofpdf.PointType{X: c.fx(xm), Y: c.fy(limit)})
			}
			x, y = clipRay(recEnd, endLo, *l.YearsToLimitP90, limit, xm)
			pts = append(pts, gofpdf.PointType{X: c.fx(x), Y: c.fy(y)}, gofpdf.PointType{X: c.fx(recEnd), Y: c.fy(endLo)})
			c.polygon(pts, bandOchre)
		}
		x, y := clipRay(recEnd, endLoss, *l.YearsToLimit, limit, xm)
		c.line([]float64{recEnd, x}, []float64{endLoss, y}, seriesBrick, 0.5, []float64{1.4, 1})
	}
	if band {
		c.band(xs, lo, hi, bandBlue)
	}
	if len(xs) > 0 {
		c.line(xs, ys, seriesBlue, 0.6, nil)
	}
	c.hline(limit, "loss limit "+fmtMM(limit)+" mm", seriesBrick, nil)
	p := d.pdf
	d.font("", tinySize)
	if l.YearsToLimit != nil {
		if y := *l.YearsToLimit; y <= xr[1] {
			xx := c.fx(y)
			d.fill(seriesBrick)
			p.Circle(xx, c.fy(limit), 0.9, "F")
			d.color(seriesBrick)
			p.SetXY(xx-12, c.fy(limit)+1)
			p.CellFormat(24, 3, "≈ "+fmtYears(y)+" years", "", 0, "C", false, 0, "")
		} else {
			d.color(seriesBrick)
			p.SetXY(c.x, c.fy(limit)+1)
			p.CellFormat(c.w-1, 3, "limit after ≈ "+fmtYears(y)+" years →", "", 0, "R", false, 0, "")
		}
	} else {
		d.color(inkSoft)
		p.SetXY(c.x, c.y+c.h/2)
		msg := "the surface does not recede"
		if e.Leaching.YearsToLimit != nil {
			msg = "loss limit not reached within " + sig(yearsCap, 4) + " years"
		}
		p.CellFormat(c.w, 3, msg, "", 0, "C", false, 0, "")
	}
	d.color(ink)
	items := []legendItem{{"record", seriesBlue, "line"}}
	if l.YearsToLimit != nil {
		items = append(items, legendItem{"same rate", seriesBrick, "dash"})
	}
	if band {
		items = append(items, legendItem{"10–90 %", bandBlue, "fill"})
	}
	c.legend(items)
}

// traceDates returns the x values (days since the epoch) of the daily
// trace, or of the months when there is no daily trace.
func traceDates(e *assess.ElementResult) []float64 {
	if len(e.Daily) > 0 {
		xs := make([]float64, len(e.Daily))
		for i, dd := range e.Daily {
			xs[i] = dayNum(dd.Date) + 0.5
		}
		return xs
	}
	var xs []float64
	for _, m := range e.Monthly {
		t, ok := monthStart(m.Month)
		if !ok {
			xs = append(xs, math.NaN())
			continue
		}
		xs = append(xs, dayNum(t)+15)
	}
	return xs
}

func timeRange(xs []float64) [2]float64 {
	lo, hi := rangeOf(xs)
	if hi-lo < 1 {
		hi = lo + 1
	}
	return [2]float64{lo - 0.5, hi + 0.5}
}

func (r *reportState) mouldChart(e *assess.ElementResult, bx, by, bw, bh float64) {
	d := r.d
	xs := traceDates(e)
	var ys []float64
	if len(e.Daily) > 0 {
		for _, dd := range e.Daily {
			ys = append(ys, dd.MouldIndex)
		}
	} else {
		for _, m := range e.Monthly {
			ys = append(ys, m.MouldIndexMax)
		}
	}
	xr := timeRange(xs)
	var yt []tick
	for v := 0; v <= 6; v++ {
		yt = append(yt, tick{v: float64(v), label: fmt.Sprint(v)})
	}
	c := panel(d, bx, by, bw, bh, xr, [2]float64{0, 6}, 14, 10)
	c.frame(timeTicks(xr[0], xr[1]), yt, "", "mould index")
	t := r.out.Thresholds
	c.hline(t.MouldHighIndex, "high from "+fmtIndex(t.MouldHighIndex), ratingStyles[assess.High].accent, []float64{1.2, 0.8})
	c.hline(t.MouldModerateIndex, "moderate from "+fmtIndex(t.MouldModerateIndex), ratingStyles[assess.Moderate].accent, []float64{1.2, 0.8})
	if len(xs) > 0 {
		c.line(xs, ys, seriesTeal, 0.6, nil)
	}
	c.legend([]legendItem{{"mould index", seriesTeal, "line"}})
}

// surfaceChart draws the surface temperature (top) and the surface RH
// against the gypsum–bassanite equilibrium RH (bottom).
func (r *reportState) surfaceChart(e *assess.ElementResult, y, h float64) {
	d := r.d
	xs := traceDates(e)
	n := len(xs)
	tmax := make([]float64, n)
	tmean := make([]float64, n)
	rh := make([]float64, n)
	eq := make([]float64, n)
	daily := len(e.Daily) > 0
	for i := 0; i < n; i++ {
		if daily {
			dd := e.Daily[i]
			tmax[i], tmean[i], rh[i], eq[i] = dd.SurfaceTempMaxC, dd.SurfaceTempMeanC, dd.SurfaceRHMinPct, dd.EquilibriumRHPct
		} else {
			m := e.Monthly[i]
			tmax[i], tmean[i], rh[i], eq[i] = m.SurfaceTempMaxC, m.SurfaceTempMeanC, m.SurfaceRHMeanPct, math.NaN()
		}
	}
	xr := timeRange(xs)
	xt := timeTicks(xr[0], xr[1])
	top := h * 0.45

	lo, hi := rangeOf(tmax, tmean)
	show52 := hi >= 40
	if show52 {
		hi = math.Max(hi, 54)
	}
	yt, yr := niceTicks(lo, hi, 4)
	c := panel(d, marginL, y, contentW, top, xr, yr, 16, 3)
	c.frame(stripLabels(xt), yt, "", "surface, °C")
	if show52 {
		c.hline(52, "52 °C, long-term limit for gypsum board", seriesBrick, []float64{1.2, 0.8})
	}
	c.line(xs, tmean, bandBlue, 0.35, nil)
	c.line(xs, tmax, seriesBrick, 0.45, nil)
	label := "daily highest"
	meanLabel := "daily mean"
	if !daily {
		label, meanLabel = "monthly highest", "monthly mean"
	}
	c.legend([]legendItem{{label, seriesBrick, "line"}, {meanLabel, bandBlue, "line"}})

	c = panel(d, marginL, y+top, contentW, h-top, xr, [2]float64{0, 100}, 16, 9)
	// Shade the runs of days with gypsum unstable.
	if daily {
		start := -1
		for i := 0; i <= n; i++ {
			unstable := i < n && rh[i] < eq[i]
			if unstable && start < 0 {
				start = i
			}
			if !unstable && start >= 0 {
				c.bar((xs[start]+xs[i-1])/2, xs[i-1]-xs[start]+1, 0, 100, ratingStyles[assess.High].fill)
				start = -1
			}
		}
	}
	var rt []tick
	for v := 0; v <= 100; v += 20 {
		rt = append(rt, tick{v: float64(v), label: fmt.Sprint(v)})
	}
	c.frame(xt, rt, "", "surface RH, %")
	rhLabel := "daily lowest RH"
	if !daily {
		rhLabel = "monthly mean RH"
	}
	c.line(xs, rh, seriesBlue, 0.45, nil)
	items := []legendItem{{rhLabel, seriesBlue, "line"}}
	if daily {
		c.line(xs, eq, seriesOchre, 0.6, []float64{1.4, 0.9})
		items = append(items, legendItem{"gypsum–bassanite equilibrium RH", seriesOchre, "dash"}, legendItem{"gypsum unstable", ratingStyles[assess.High].fill, "fill"})
	}
	c.legend(items)
}

// compareChart draws years to the loss limit for each variant and
// scenario of an element as dots with 10–90 % whiskers on a log scale
// over the rating bands.
func (r *reportState) compareChart(g elementGroup, y, h float64) {
	d, p := r.d, r.d.pdf
	t := r.out.Thresholds
	vals := []float64{t.LeachingHighYears, t.LeachingModerateYears}
	for _, e := range g.results {
		l := e.Leaching
		for _, v := range []*float64{l.YearsToLimit, l.YearsToLimitP10, l.YearsToLimitP90} {
			if v != nil && *v > 0 {
				vals = append(vals, math.Min(*v, yearsCap))
			}
		}
	}
	lo, hi := rangeOf(vals)
	xmin := math.Pow(10, math.Floor(math.Log10(math.Max(lo, 0.1))))
	xmax := math.Pow(10, math.Ceil(math.Log10(hi*1.05)))
	if xmax < xmin*10 {
		xmax = xmin * 10
	}
	const labelW = 44.0
	c := &chart{d: d, x: marginL + labelW, y: y + 5, w: contentW - labelW - 20, h: h - 15,
		xmin: xmin, xmax: xmax, ymin: 0, ymax: float64(len(g.results)), logX: true}
	// Rating bands.
	zone := func(a, b float64, st ratingStyle) {
		a, b = math.Max(a, xmin), math.Min(b, xmax)
		if b <= a {
			return
		}
		d.fill(st.fill)
		p.Rect(c.fx(a), c.y, c.fx(b)-c.fx(a), c.h, "F")
		d.font("", tinySize)
		d.color(st.accent)
		if w := c.fx(b) - c.fx(a); w > p.GetStringWidth(st.word)+2 {
			p.SetXY(c.fx(a), c.y-3.4)
			p.CellFormat(w, 3, st.word, "", 0, "C", false, 0, "")
		}
	}
	zone(xmin, t.LeachingHighYears, ratingStyles[assess.High])
	zone(t.LeachingHighYears, t.LeachingModerateYears, ratingStyles[assess.Moderate])
	zone(t.LeachingModerateYears, xmax, ratingStyles[assess.Low])
	var xt []tick
	for dec := xmin; dec <= xmax*1.0001; dec *= 10 {
		for _, m := range []float64{1, 2, 5} {
			if v := dec * m; v <= xmax*1.0001 {
				xt = append(xt, tick{v: v, label: sig(v, 3)})
			}
		}
	}
	c.frame(xt, nil, "years to the loss limit", "")
	rowH := c.h / float64(len(g.results))
	for i, e := range g.results {
		yy := c.y + rowH*(float64(i)+0.5)
		d.font("", smallSize)
		d.color(ink)
		p.SetXY(marginL, yy-1.8)
		p.CellFormat(labelW-2, 3.6, e.Variant+" · "+e.Scenario, "", 0, "R", false, 0, "")
		l := e.Leaching
		if l.YearsToLimit == nil {
			d.font("", tinySize)
			d.color(inkSoft)
			p.SetXY(c.x+c.w+1, yy-1.5)
			p.CellFormat(19, 3, noRecession+" →", "", 0, "L", false, 0, "")
			continue
		}
		capped := func(v float64) float64 { return c.fx(math.Min(v, yearsCap)) }
		if l.YearsToLimitP10 != nil && l.YearsToLimitP90 != nil {
			d.draw(ink)
			p.SetLineWidth(0.35)
			x1, x2 := capped(*l.YearsToLimitP10), capped(*l.YearsToLimitP90)
			p.Line(x1, yy, x2, yy)
			p.Line(x1, yy-1.2, x1, yy+1.2)
			p.Line(x2, yy-1.2, x2, yy+1.2)
		}
		d.fill(seriesBlue)
		xx := capped(*l.YearsToLimit)
		p.Circle(xx, yy, 1.2, "F")
		d.font("", tinySize)
		d.color(ink)
		p.SetXY(xx+1.4, yy-3.6)
		p.CellFormat(12, 3, fmtYears(*l.YearsToLimit), "", 0, "L", false, 0, "")
	}
	d.color(ink)
}
