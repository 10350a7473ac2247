package report

import (
	"math"
	"strings"
)

// column is one column of a table: its heading, width in mm and alignment
// ("L", "C" or "R").
type column struct {
	head  string
	w     float64
	align string
}

// cell is one table cell. A cell with a rating is filled with the
// rating's colour and carries the rating word and pips under its text, so
// it reads in greyscale too.
type cell struct {
	text   string
	rating string
	bold   bool
	mono   bool
	// sub is a second, lighter text under text (a label under an id, a
	// hash under a file name); subMono sets it in the monospaced face.
	sub     string
	subMono bool
}

// tableOpts tunes a table.
type tableOpts struct {
	size   float64 // font size, pt; 0 = smallSize
	zebra  bool
	noHead bool    // no heading row
	left   float64 // x of the table's left edge; 0 = the left margin
}

const (
	cellPadX = 1.4
	cellPadY = 1.2
)

// table draws a table that breaks cleanly across pages: a row is never
// split, and the heading row is repeated at the top of every page the
// table continues on.
func (d *doc) table(cols []column, rows [][]cell, o tableOpts) {
	p := d.pdf
	size := o.size
	if size == 0 {
		size = smallSize
	}
	lh := size * 0.42 // line height in mm
	x0 := marginL
	if o.left != 0 {
		x0 = o.left
	}
	// Autopagebreak would split rows; rows are placed by hand instead.
	p.SetAutoPageBreak(false, marginB)
	defer p.SetAutoPageBreak(true, marginB)

	drawHead := func() {
		if o.noHead {
			return
		}
		d.font("B", size*0.86)
		h := 0.0
		for _, c := range cols {
			n := len(d.wrap(c.head, c.w-2*cellPadX))
			h = math.Max(h, float64(n)*lh)
		}
		h += 2 * cellPadY
		x, y := x0, d.y()
		d.fill(headFill)
		p.Rect(x0, y, sumW(cols), h, "F")
		d.color(ink)
		for _, c := range cols {
			d.lines(x+cellPadX, y+cellPadY, c.w-2*cellPadX, lh, d.wrap(c.head, c.w-2*cellPadX), c.align)
			x += c.w
		}
		d.draw(inkSoft)
		p.SetLineWidth(0.3)
		p.Line(x0, y+h, x0+sumW(cols), y+h)
		p.SetXY(x0, y+h)
	}

	rowHeight := func(r []cell) float64 {
		h := 0.0
		for i, c := range r {
			if i >= len(cols) {
				break
			}
			d.cellFont(c, size)
			n := 0
			if c.text != "" {
				n = len(d.wrap(c.text, cols[i].w-2*cellPadX))
			}
			if c.rating != "" {
				n++
			}
			if c.sub != "" {
				d.subFont(c, size)
				n += len(d.wrap(c.sub, cols[i].w-2*cellPadX))
			}
			h = math.Max(h, float64(n)*lh)
		}
		return h + 2*cellPadY
	}

	if !d.room(rowHeight(firstRow(rows)) + 12) {
		p.AddPage()
	}
	drawHead()
	for ri, r := range rows {
		h := rowHeight(r)
		if !d.room(h) {
			p.AddPage()
			drawHead()
		}
		x, y := x0, d.y()
		if o.zebra && ri%2 == 1 {
			d.fill(zebra)
			p.Rect(x0, y, sumW(cols), h, "F")
		}
		for i, c := range r {
			if i >= len(cols) {
				break
			}
			w := cols[i].w
			ty := y + cellPadY
			if st, ok := ratingStyles[c.rating]; ok {
				d.fill(st.fill)
				p.Rect(x+0.25, y+0.25, w-0.5, h-0.5, "F")
			}
			if c.text != "" {
				d.cellFont(c, size)
				d.color(ink)
				ty = d.lines(x+cellPadX, ty, w-2*cellPadX, lh, d.wrap(c.text, w-2*cellPadX), cols[i].align)
			}
			if c.sub != "" {
				d.subFont(c, size)
				d.color(inkSoft)
				ty = d.lines(x+cellPadX, ty, w-2*cellPadX, lh, d.wrap(c.sub, w-2*cellPadX), cols[i].align)
				d.color(ink)
			}
			if c.rating != "" {
				d.ratingMark(c.rating, x+cellPadX, ty, w-2*cellPadX, lh, size, cols[i].align)
			}
			x += w
		}
		d.draw(gridGrey)
		p.SetLineWidth(0.2)
		p.Line(x0, y+h, x0+sumW(cols), y+h)
		p.SetXY(x0, y+h)
	}
	p.SetY(d.y() + 3)
	d.font("", bodySize)
}

func (d *doc) subFont(c cell, size float64) {
	if c.subMono {
		d.mono(size * 0.9)
		return
	}
	d.font("", size*0.94)
}

func firstRow(rows [][]cell) []cell {
	if len(rows) == 0 {
		return nil
	}
	return rows[0]
}

func (d *doc) cellFont(c cell, size float64) {
	switch {
	case c.mono:
		d.mono(size * 0.92)
	case c.bold:
		d.font("B", size)
	default:
		d.font("", size)
	}
}

// ratingMark draws the rating's pips (one for low, two for moderate,
// three for high) followed by its word, in the rating's accent colour.
func (d *doc) ratingMark(rating string, x, y, w, lh, size float64, align string) {
	p := d.pdf
	st, ok := ratingStyles[rating]
	if !ok {
		d.font("", size)
		d.color(inkSoft)
		p.SetXY(x, y)
		p.CellFormat(w, lh, rating, "", 0, align, false, 0, "")
		return
	}
	pip := lh * 0.4
	gap := pip * 0.4
	pipsW := 3*pip + 2*gap
	d.font("", size*0.86)
	tw := p.GetStringWidth(st.word)
	total := pipsW + 1.2 + tw + 0.2
	x0 := x
	switch align {
	case "R":
		x0 = x + w - total
	case "C":
		x0 = x + (w-total)/2
	}
	py := y + (lh-pip)/2
	for i := 0; i < 3; i++ {
		px := x0 + float64(i)*(pip+gap)
		if i < st.pips {
			d.fill(st.accent)
			p.Rect(px, py, pip, pip, "F")
		} else {
			d.draw(st.accent)
			p.SetLineWidth(0.15)
			p.Rect(px, py, pip, pip, "D")
		}
	}
	d.color(st.accent)
	p.SetXY(x0+pipsW+1.2, y)
	p.CellFormat(tw, lh, st.word, "", 0, "L", false, 0, "")
	d.color(ink)
}

// wrap breaks text into lines no wider than w mm in the current font,
// at spaces and after hyphens and dashes; a word wider than w is
// broken between letters. Newlines force a break.
func (d *doc) wrap(text string, w float64) []string {
	p := d.pdf
	var out []string
	for _, para := range strings.Split(text, "\n") {
		var toks []string
		cur := []rune{}
		for _, r := range para {
			cur = append(cur, r)
			if r == ' ' || r == '-' || r == '–' {
				toks = append(toks, string(cur))
				cur = cur[:0]
			}
		}
		if len(cur) > 0 {
			toks = append(toks, string(cur))
		}
		line := ""
		for _, t := range toks {
			if p.GetStringWidth(strings.TrimRight(line+t, " ")) <= w || line == "" {
				line += t
				for p.GetStringWidth(strings.TrimRight(line, " ")) > w && len([]rune(line)) > 1 {
					// A single token too wide: break it between letters.
					rs := []rune(line)
					k := len(rs) - 1
					for k > 1 && p.GetStringWidth(string(rs[:k])) > w {
						k--
					}
					out = append(out, string(rs[:k]))
					line = string(rs[k:])
				}
				continue
			}
			out = append(out, strings.TrimRight(line, " "))
			line = t
		}
		out = append(out, strings.TrimRight(line, " "))
	}
	return out
}

// lines draws pre-wrapped lines from (x, y) in a column of width w and
// returns the y below them.
func (d *doc) lines(x, y, w, lh float64, ls []string, align string) float64 {
	for _, l := range ls {
		d.pdf.SetXY(x, y)
		d.pdf.CellFormat(w, lh, l, "", 0, align, false, 0, "")
		y += lh
	}
	return y
}

func sumW(cols []column) float64 {
	s := 0.0
	for _, c := range cols {
		s += c.w
	}
	return s
}
