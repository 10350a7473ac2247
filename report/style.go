package report

import "github.com/gyprisk/gyprisk/leach/assess"

// rgb is a colour in 0–255 components.
type rgb struct{ r, g, b int }

// The report's palette: muted, print-friendly, and readable in greyscale
// because every rating also carries its word and a count of pips.
var (
	ink      = rgb{33, 37, 41}
	inkSoft  = rgb{92, 98, 104}
	rule     = rgb{178, 182, 186}
	gridGrey = rgb{226, 228, 230}
	headFill = rgb{232, 235, 237}
	zebra    = rgb{246, 247, 248}

	// Series colours for charts.
	seriesBlue  = rgb{31, 78, 107}
	seriesOchre = rgb{184, 128, 30}
	seriesBrick = rgb{158, 60, 42}
	seriesTeal  = rgb{54, 122, 110}
	bandBlue    = rgb{196, 212, 224}
	bandOchre   = rgb{240, 222, 180}

	bannerFill = rgb{158, 60, 42}
)

// ratingStyle is how one rating word is drawn: a light fill for the cell,
// a darker accent for its pips, and the number of pips (1–3).
type ratingStyle struct {
	fill, accent rgb
	pips         int
	word         string
}

var ratingStyles = map[string]ratingStyle{
	assess.Low:      {fill: rgb{214, 233, 227}, accent: rgb{54, 122, 110}, pips: 1, word: assess.Low},
	assess.Moderate: {fill: rgb{243, 226, 182}, accent: rgb{166, 116, 24}, pips: 2, word: assess.Moderate},
	assess.High:     {fill: rgb{226, 178, 164}, accent: rgb{128, 40, 26}, pips: 3, word: assess.High},
}

// severity orders rating words: 0 low, 1 moderate, 2 high, −1 unknown.
func severity(rating string) int {
	switch rating {
	case assess.Low:
		return 0
	case assess.Moderate:
		return 1
	case assess.High:
		return 2
	}
	return -1
}

// Page geometry in mm (A4 portrait).
const (
	pageW      = 210.0
	pageH      = 297.0
	marginL    = 18.0
	marginR    = 18.0
	marginT    = 22.0
	marginB    = 18.0
	contentW   = pageW - marginL - marginR
	pageBottom = pageH - marginB

	bodySize  = 9.5 // pt
	smallSize = 8.0
	tinySize  = 6.8
	lineH     = 4.6 // mm per body line
)

// Font family names registered in every document.
const (
	fontSans = "gosans"
	fontMono = "gomono"
)
