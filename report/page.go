package report

import (
	"bytes"
	"fmt"
	"strings"
	"time"

	"github.com/jung-kurt/gofpdf"
	"golang.org/x/image/font/gofont/gobold"
	"golang.org/x/image/font/gofont/goitalic"
	"golang.org/x/image/font/gofont/gomono"
	"golang.org/x/image/font/gofont/goregular"
)

// tocEntry is one line of the contents list.
type tocEntry struct {
	level int
	title string
	page  int
}

// layout is what the first rendering pass learns and the second prints:
// the page count and the page of every section.
type layout struct {
	pages int
	toc   []tocEntry
}

// doc wraps a gofpdf document with the report's typography: running
// header and footer, headings that feed the contents, numbered figures,
// paragraphs and lists.
type doc struct {
	pdf *gofpdf.Fpdf

	title    string // running header, left
	site     string
	footer   string // running footer, left
	invented bool
	chapter  string // running header, right

	prev    *layout // from the first pass; nil in the first pass
	toc     []tocEntry
	figures int
}

// newDoc sets up an A4 document with the Go fonts embedded.
func newDoc(title, site, footer string, invented bool, date time.Time, prev *layout) *doc {
	pdf := gofpdf.New("P", "mm", "A4", "")
	pdf.SetCompression(true)
	pdf.SetCreationDate(date)
	pdf.SetModificationDate(date)
	pdf.SetTitle(title, true)
	pdf.SetCreator("gyprisk", true)
	pdf.SetMargins(marginL, marginT, marginR)
	pdf.SetAutoPageBreak(true, marginB)
	// Each document gets its own copy of the font bytes: gofpdf v1.16.2
	// pads font tables with append (utf8FontFile.generateChecksum), which
	// would otherwise write into the shared embedded fonts, so two reports
	// rendered at once (gyprisk batch) would race.
	pdf.AddUTF8FontFromBytes(fontSans, "", bytes.Clone(goregular.TTF))
	pdf.AddUTF8FontFromBytes(fontSans, "B", bytes.Clone(gobold.TTF))
	pdf.AddUTF8FontFromBytes(fontSans, "I", bytes.Clone(goitalic.TTF))
	pdf.AddUTF8FontFromBytes(fontMono, "", bytes.Clone(gomono.TTF))
	d := &doc{pdf: pdf, title: title, site: site, footer: footer, invented: invented, prev: prev}
	pdf.SetHeaderFuncMode(d.header, true)
	pdf.SetFooterFunc(d.footerFunc)
	return d
}

func (d *doc) color(c rgb) { d.pdf.SetTextColor(c.r, c.g, c.b) }
func (d *doc) fill(c rgb)  { d.pdf.SetFillColor(c.r, c.g, c.b) }
func (d *doc) draw(c rgb)  { d.pdf.SetDrawColor(c.r, c.g, c.b) }
func (d *doc) font(style string, size float64) {
	d.pdf.SetFont(fontSans, style, size)
}
func (d *doc) mono(size float64) { d.pdf.SetFont(fontMono, "", size) }

// inventedBanner is printed on the cover and in every running header when
// the Output says its data are invented.
const inventedBanner = "Invented example data — not a real building"

func (d *doc) header() {
	if d.pdf.PageNo() == 1 {
		return
	}
	p := d.pdf
	y := 9.0
	if d.invented {
		d.fill(bannerFill)
		p.Rect(0, 0, pageW, 6, "F")
		d.font("B", tinySize)
		p.SetTextColor(255, 255, 255)
		p.SetXY(0, 0.6)
		p.CellFormat(pageW, 5, strings.ToUpper(inventedBanner[:1])+inventedBanner[1:], "", 0, "C", false, 0, "")
		y = 10
	}
	d.font("", smallSize)
	d.color(inkSoft)
	p.SetXY(marginL, y)
	left := d.title
	if d.site != "" {
		left += " · " + d.site
	}
	p.CellFormat(contentW*0.65, 4, left, "", 0, "L", false, 0, "")
	p.SetXY(marginL+contentW*0.65, y)
	p.CellFormat(contentW*0.35, 4, d.chapter, "", 0, "R", false, 0, "")
	d.draw(rule)
	p.SetLineWidth(0.2)
	p.Line(marginL, y+5, pageW-marginR, y+5)
	p.SetXY(marginL, marginT)
	d.color(ink)
}

func (d *doc) footerFunc() {
	p := d.pdf
	y := pageH - 11
	d.draw(rule)
	p.SetLineWidth(0.2)
	p.Line(marginL, y-1.5, pageW-marginR, y-1.5)
	d.font("", smallSize)
	d.color(inkSoft)
	p.SetXY(marginL, y)
	p.CellFormat(contentW*0.7, 4, d.footer, "", 0, "L", false, 0, "")
	total := "?"
	if d.prev != nil {
		total = fmt.Sprint(d.prev.pages)
	}
	p.SetXY(marginL+contentW*0.7, y)
	p.CellFormat(contentW*0.3, 4, fmt.Sprintf("page %d of %s", p.PageNo(), total), "", 0, "R", false, 0, "")
	d.color(ink)
}

// y is the current vertical position; room reports whether h mm fit on the
// page below it.
func (d *doc) y() float64          { return d.pdf.GetY() }
func (d *doc) room(h float64) bool { return d.y()+h <= pageBottom }
func (d *doc) ensure(h float64) bool {
	if !d.room(h) {
		d.pdf.AddPage()
		return true
	}
	return false
}

// chapterPage starts a numbered top-level section on a new page.
func (d *doc) chapterPage(title string) {
	d.chapter = title
	d.pdf.AddPage()
	d.heading(1, title)
}

// heading prints a section heading and records it for the contents list
// and the PDF outline. Level 1 is a chapter, level 2 a section in it.
func (d *doc) heading(level int, title string) {
	p := d.pdf
	size, before, after := 15.0, 0.0, 3.0
	if level == 2 {
		size, before, after = 11.5, 3.0, 1.5
		d.ensure(30)
	}
	if level == 3 {
		size, before, after = 10, 2.0, 1.0
		d.ensure(20)
	}
	p.SetY(d.y() + before)
	d.font("B", size)
	d.color(ink)
	p.SetX(marginL)
	p.MultiCell(contentW, size*0.45, title, "", "L", false)
	if level == 1 {
		d.draw(seriesBlue)
		p.SetLineWidth(0.5)
		p.Line(marginL, d.y()+0.8, marginL+24, d.y()+0.8)
		after += 1.5
	}
	p.SetY(d.y() + after)
	if level <= 2 {
		d.toc = append(d.toc, tocEntry{level: level, title: title, page: p.PageNo()})
		p.Bookmark(title, level-1, -1)
	}
	d.font("", bodySize)
}

// para prints a paragraph of body text.
func (d *doc) para(text string) {
	d.font("", bodySize)
	d.color(ink)
	d.pdf.SetX(marginL)
	d.pdf.MultiCell(contentW, lineH, text, "", "L", false)
	d.pdf.SetY(d.y() + 1.6)
}

// small prints a paragraph in the small size, in the soft ink.
func (d *doc) small(text string) {
	d.font("", smallSize)
	d.color(inkSoft)
	d.pdf.SetX(marginL)
	d.pdf.MultiCell(contentW, 3.8, text, "", "L", false)
	d.color(ink)
	d.pdf.SetY(d.y() + 1.2)
}

// bullets prints a list, each item with a hanging indent.
func (d *doc) bullets(items []string) {
	p := d.pdf
	d.font("", bodySize)
	d.color(ink)
	for _, it := range items {
		lines := p.SplitText(it, contentW-6)
		d.ensure(float64(len(lines)) * lineH)
		y := d.y()
		d.fill(seriesBlue)
		p.Rect(marginL+1.2, y+1.7, 1.3, 1.3, "F")
		p.SetXY(marginL+5, y)
		p.MultiCell(contentW-5, lineH, it, "", "L", false)
		p.SetY(d.y() + 0.8)
	}
	p.SetY(d.y() + 1)
}

// nextFigure reserves the next figure number.
func (d *doc) nextFigure() int {
	d.figures++
	return d.figures
}

// figure draws a figure of height h mm with its caption, keeping the two
// together on one page.
func (d *doc) figure(n int, h float64, caption string, draw func(y float64)) {
	d.ensure(h + d.captionHeight(n, contentW, caption))
	y := d.y()
	draw(y)
	d.pdf.SetY(y + h)
	d.caption(n, caption)
}

// captionHeight is the height of a caption set in a column w mm wide.
func (d *doc) captionHeight(n int, w float64, text string) float64 {
	d.font("", smallSize)
	return float64(len(d.wrap(fmt.Sprintf("Figure %d. ", n)+text, w)))*3.8 + 4
}

// caption prints "Figure n. text" below a figure.
func (d *doc) caption(n int, text string) {
	p := d.pdf
	p.SetX(marginL)
	d.font("B", smallSize)
	d.color(ink)
	lead := fmt.Sprintf("Figure %d. ", n)
	w := p.GetStringWidth(lead)
	y := d.y()
	p.SetXY(marginL, y)
	p.CellFormat(w+0.5, 3.8, lead, "", 0, "L", false, 0, "")
	d.font("", smallSize)
	d.color(inkSoft)
	p.SetXY(marginL+w+0.5, y)
	p.MultiCell(contentW-w-0.5, 3.8, text, "", "L", false)
	d.color(ink)
	p.SetY(d.y() + 3)
}

// box prints text in a framed, tinted box with a bold lead-in.
func (d *doc) box(lead, text string, fill, edge rgb) {
	p := d.pdf
	// Measure in the bold face: an upper bound for the mixed line.
	d.font("B", bodySize)
	full := text
	if lead != "" {
		full = lead + " " + text
	}
	lines := p.SplitText(full, contentW-8)
	h := float64(len(lines))*lineH + 5
	d.ensure(h + 2)
	y := d.y()
	d.fill(fill)
	d.draw(edge)
	p.SetLineWidth(0.35)
	p.Rect(marginL, y, contentW, h, "F")
	p.Line(marginL, y, marginL, y+h)
	p.SetLineWidth(1.2)
	p.Line(marginL+0.6, y, marginL+0.6, y+h)
	p.SetXY(marginL+4, y+2.5)
	if lead != "" {
		d.font("B", bodySize)
		p.Write(lineH, lead+" ")
	}
	d.font("", bodySize)
	p.SetLeftMargin(marginL + 4)
	p.SetRightMargin(marginR + 4)
	p.Write(lineH, text)
	p.SetLeftMargin(marginL)
	p.SetRightMargin(marginR)
	p.SetY(y + h + 3)
}
