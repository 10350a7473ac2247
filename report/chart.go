package report

import (
	"math"
	"time"

	"github.com/jung-kurt/gofpdf"
)

// Charts are drawn straight into the PDF with gofpdf's vector primitives:
// sharp at any zoom, small, and their labels stay searchable text.

// tick is one labelled axis position.
type tick struct {
	v     float64
	label string
	minor bool // a short tick mark without grid line (label optional)
}

// chart is one plot area with linear axes.
type chart struct {
	d                      *doc
	x, y, w, h             float64 // plot area, mm
	xmin, xmax, ymin, ymax float64
	logX                   bool
}

// newChart reserves a box at (bx, by) of size bw×bh mm and lays out a plot
// area inside it, leaving room for the y label and ticks on the left and
// the x ticks and label below.
func newChart(d *doc, bx, by, bw, bh float64, xr, yr [2]float64) *chart {
	const left, right, top, bottom = 15.0, 3.0, 2.5, 10.0
	return &chart{d: d, x: bx + left, y: by + top, w: bw - left - right, h: bh - top - bottom,
		xmin: xr[0], xmax: xr[1], ymin: yr[0], ymax: yr[1]}
}

// fx and fy map data to page coordinates. Points far outside the plot
// are pulled in to a page's width around it, so that no absurd number
// reaches the PDF; callers clip lines that matter to the plot first.
func (c *chart) fx(v float64) float64 {
	var x float64
	if c.logX {
		x = c.x + (math.Log10(v)-math.Log10(c.xmin))/(math.Log10(c.xmax)-math.Log10(c.xmin))*c.w
	} else {
		x = c.x + (v-c.xmin)/(c.xmax-c.xmin)*c.w
	}
	return clampf(x, c.x-pageW, c.x+c.w+pageW)
}
func (c *chart) fy(v float64) float64 {
	return clampf(c.y+c.h-(v-c.ymin)/(c.ymax-c.ymin)*c.h, c.y-pageH, c.y+c.h+pageH)
}

func clampf(v, lo, hi float64) float64 {
	if math.IsNaN(v) {
		return lo
	}
	return math.Max(lo, math.Min(hi, v))
}

// clipRay returns the point where the segment from (x0, y0) to (x1, y1)
// crosses x = xmax, or (x1, y1) when it ends before.
func clipRay(x0, y0, x1, y1, xmax float64) (float64, float64) {
	if x1 <= xmax || x1 == x0 {
		return x1, y1
	}
	t := (xmax - x0) / (x1 - x0)
	return xmax, y0 + t*(y1-y0)
}

// frame draws grid lines, ticks, tick labels and axis labels.
func (c *chart) frame(xt, yt []tick, xlabel, ylabel string) {
	p := c.d.pdf
	p.SetLineWidth(0.15)
	c.d.font("", tinySize)
	for _, t := range yt {
		yy := c.fy(t.v)
		if yy < c.y-0.01 || yy > c.y+c.h+0.01 {
			continue
		}
		c.d.draw(gridGrey)
		p.Line(c.x, yy, c.x+c.w, yy)
		c.d.color(inkSoft)
		p.SetXY(c.x-13, yy-1.5)
		p.CellFormat(12, 3, t.label, "", 0, "R", false, 0, "")
	}
	for _, t := range xt {
		xx := c.fx(t.v)
		if xx < c.x-0.01 || xx > c.x+c.w+0.01 {
			continue
		}
		c.d.draw(rule)
		if t.minor {
			p.Line(xx, c.y+c.h, xx, c.y+c.h+0.8)
		} else {
			c.d.draw(gridGrey)
			p.Line(xx, c.y, xx, c.y+c.h)
			c.d.draw(rule)
			p.Line(xx, c.y+c.h, xx, c.y+c.h+1.4)
		}
		if t.label != "" {
			c.d.color(inkSoft)
			p.SetXY(xx-10, c.y+c.h+1.4)
			p.CellFormat(20, 3, t.label, "", 0, "C", false, 0, "")
		}
	}
	c.d.draw(inkSoft)
	p.SetLineWidth(0.25)
	p.Line(c.x, c.y+c.h, c.x+c.w, c.y+c.h)
	p.Line(c.x, c.y, c.x, c.y+c.h)
	c.d.font("", smallSize*0.95)
	c.d.color(ink)
	if xlabel != "" {
		p.SetXY(c.x, c.y+c.h+5)
		p.CellFormat(c.w, 3.5, xlabel, "", 0, "C", false, 0, "")
	}
	if ylabel != "" {
		// Rotated about the label's centre; Text, unlike SetXY, takes a
		// negative x literally.
		px, py := c.x-11, c.y+c.h/2
		tw := p.GetStringWidth(ylabel)
		p.TransformBegin()
		p.TransformRotate(90, px, py)
		p.Text(px-tw/2, py, ylabel)
		p.TransformEnd()
	}
	c.d.color(ink)
}

// clip limits drawing to the plot area until unclip.
func (c *chart) clip()   { c.d.pdf.ClipRect(c.x, c.y, c.w, c.h, false) }
func (c *chart) unclip() { c.d.pdf.ClipEnd() }

// line draws a polyline through the points, skipping NaN values.
func (c *chart) line(xs, ys []float64, col rgb, width float64, dash []float64) {
	p := c.d.pdf
	c.d.draw(col)
	p.SetLineWidth(width)
	if dash != nil {
		p.SetDashPattern(dash, 0)
	}
	p.SetLineJoinStyle("round")
	c.clip()
	open := false
	for i := range xs {
		if math.IsNaN(ys[i]) || math.IsNaN(xs[i]) {
			if open {
				p.DrawPath("D")
				open = false
			}
			continue
		}
		if !open {
			p.MoveTo(c.fx(xs[i]), c.fy(ys[i]))
			open = true
			continue
		}
		p.LineTo(c.fx(xs[i]), c.fy(ys[i]))
	}
	if open {
		p.DrawPath("D")
	}
	c.unclip()
	if dash != nil {
		p.SetDashPattern([]float64{}, 0)
	}
}

// band fills the area between lo and hi.
func (c *chart) band(xs, lo, hi []float64, col rgb) {
	if len(xs) < 2 {
		return
	}
	pts := make([]gofpdf.PointType, 0, 2*len(xs))
	for i := range xs {
		pts = append(pts, gofpdf.PointType{X: c.fx(xs[i]), Y: c.fy(hi[i])})
	}
	for i := len(xs) - 1; i >= 0; i-- {
		pts = append(pts, gofpdf.PointType{X: c.fx(xs[i]), Y: c.fy(lo[i])})
	}
	c.polygon(pts, col)
}

// polygon fills a polygon given in page coordinates, clipped to the plot.
func (c *chart) polygon(pts []gofpdf.PointType, col rgb) {
	c.d.fill(col)
	c.clip()
	c.d.pdf.Polygon(pts, "F")
	c.unclip()
}

// bar draws one filled bar from y0 to y1 centred on x with width w (data
// units of x).
func (c *chart) bar(x, w, y0, y1 float64, col rgb) {
	if y1 == y0 {
		return
	}
	x0, x1 := c.fx(x-w/2), c.fx(x+w/2)
	ya, yb := c.fy(y0), c.fy(y1)
	c.d.fill(col)
	c.clip()
	c.d.pdf.Rect(x0, math.Min(ya, yb), x1-x0, math.Abs(ya-yb), "F")
	c.unclip()
}

// hline draws a horizontal reference line with a label at its right end.
func (c *chart) hline(v float64, label string, col rgb, dash []float64) {
	if v < c.ymin || v > c.ymax {
		return
	}
	p := c.d.pdf
	c.d.draw(col)
	p.SetLineWidth(0.35)
	if dash != nil {
		p.SetDashPattern(dash, 0)
	}
	yy := c.fy(v)
	p.Line(c.x, yy, c.x+c.w, yy)
	p.SetDashPattern([]float64{}, 0)
	if label != "" {
		c.d.font("", tinySize)
		c.d.color(col)
		tw := p.GetStringWidth(label) + 1.5
		ly := yy - 3.3
		if ly < c.y {
			ly = yy + 0.3
		}
		p.SetXY(c.x+1, ly)
		p.CellFormat(tw, 3, label, "", 0, "L", false, 0, "")
		c.d.color(ink)
	}
}

// legendItem is one entry of a chart legend.
type legendItem struct {
	label string
	col   rgb
	kind  string // "line", "dash", "fill"
}

// legend draws the items in a row above the plot area, right-aligned.
func (c *chart) legend(items []legendItem) {
	p := c.d.pdf
	c.d.font("", tinySize)
	total := 0.0
	for _, it := range items {
		total += 7 + p.GetStringWidth(it.label) + 3
	}
	x := c.x + c.w - total
	y := c.y - 3.2
	for _, it := range items {
		switch it.kind {
		case "fill":
			c.d.fill(it.col)
			p.Rect(x, y+0.5, 5.5, 2, "F")
		case "dash":
			c.d.draw(it.col)
			p.SetLineWidth(0.4)
			p.SetDashPattern([]float64{1.2, 0.8}, 0)
			p.Line(x, y+1.5, x+5.5, y+1.5)
			p.SetDashPattern([]float64{}, 0)
		default:
			c.d.draw(it.col)
			p.SetLineWidth(0.55)
			p.Line(x, y+1.5, x+5.5, y+1.5)
		}
		c.d.color(inkSoft)
		p.SetXY(x+6.5, y)
		w := p.GetStringWidth(it.label)
		p.CellFormat(w+0.5, 3, it.label, "", 0, "L", false, 0, "")
		x += 7 + w + 3
	}
	c.d.color(ink)
}

// niceTicks returns about n round tick values (1, 2 or 5 × 10^k apart)
// covering [lo, hi], and the range they span.
func niceTicks(lo, hi float64, n int) (ticks []tick, r [2]float64) {
	if !(hi > lo) {
		hi = lo + 1
	}
	step := niceNum((hi-lo)/float64(n-1), true)
	start := math.Floor(lo/step) * step
	end := math.Ceil(hi/step) * step
	for v := start; v <= end+step*0.5; v += step {
		vv := math.Round(v/step) * step
		ticks = append(ticks, tick{v: vv, label: sig(vv, 6)})
	}
	return ticks, [2]float64{start, end}
}

// niceNum is Heckbert's "nice number" (Graphics Gems, 1990): a value of
// the form 1, 2, 5 × 10^k near x, rounded or taken as the ceiling.
func niceNum(x float64, round bool) float64 {
	e := math.Floor(math.Log10(x))
	f := x / math.Pow(10, e)
	var nf float64
	if round {
		switch {
		case f < 1.5:
			nf = 1
		case f < 3:
			nf = 2
		case f < 7:
			nf = 5
		default:
			nf = 10
		}
	} else {
		switch {
		case f <= 1:
			nf = 1
		case f <= 2:
			nf = 2
		case f <= 5:
			nf = 5
		default:
			nf = 10
		}
	}
	return nf * math.Pow(10, e)
}

// dayNum converts a time to days since 1970-01-01 UTC, the x unit of the
// time-series charts.
func dayNum(t time.Time) float64 { return float64(t.Unix()) / 86400 }

// timeTicks returns ticks for a time axis from a to b (days since the
// epoch): months for a span up to 14 months, otherwise years with
// quarter-year minor ticks.
func timeTicks(a, b float64) []tick {
	t0 := time.Unix(int64(a*86400), 0).UTC()
	t1 := time.Unix(int64(b*86400), 0).UTC()
	var ts []tick
	m := time.Date(t0.Year(), t0.Month(), 1, 0, 0, 0, 0, time.UTC)
	spanDays := b - a
	for !m.After(t1) {
		v := dayNum(m)
		if v >= a {
			switch {
			case spanDays <= 430:
				lab := m.Format("Jan")
				if m.Month() == time.January || len(ts) == 0 {
					lab = m.Format("Jan 2006")
				}
				ts = append(ts, tick{v: v, label: lab})
			case m.Month() == time.January && (spanDays < 365.25*12 || m.Year()%5 == 0):
				ts = append(ts, tick{v: v, label: m.Format("2006")})
			case spanDays < 365.25*6 && (m.Month()-1)%3 == 0:
				ts = append(ts, tick{v: v, minor: true})
			}
		}
		m = m.AddDate(0, 1, 0)
	}
	return ts
}

// monthTicks labels a categorical month axis (index i for month i of the
// list "YYYY-MM"): the year under January (and the first month), and the
// month's initial under every other month when there is room.
func monthTicks(months []string) []tick {
	var ts []tick
	initials := "JFMAMJJASOND"
	for i, m := range months {
		if len(m) < 7 {
			continue
		}
		mon := int(m[5]-'0')*10 + int(m[6]-'0')
		if mon < 1 || mon > 12 {
			continue
		}
		switch {
		case mon == 1 || i == 0:
			ts = append(ts, tick{v: float64(i), label: m[:4]})
		case len(months) <= 48:
			ts = append(ts, tick{v: float64(i), label: initials[mon-1 : mon], minor: true})
		default:
			ts = append(ts, tick{v: float64(i), minor: true})
		}
	}
	return ts
}
