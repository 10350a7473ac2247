package report

import (
	"bytes"
	"errors"
	"flag"
	"math"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
)

var update = flag.Bool("update", false, "rewrite the golden files in testdata")

var fixedDate = time.Date(2024, 3, 5, 0, 0, 0, 0, time.UTC)

// pdfText extracts the text of a PDF with poppler's pdftotext, keeping
// the layout so that a table row stays on one line. It skips the test
// when pdftotext is missing, unless GYPRISK_REQUIRE_PDFTOTEXT is set
// (CI sets it and installs the Debian package poppler-utils).
func pdfText(t *testing.T, pdf []byte) string {
	t.Helper()
	bin, err := exec.LookPath("pdftotext")
	if err != nil {
		if os.Getenv("GYPRISK_REQUIRE_PDFTOTEXT") != "" {
			t.Fatalf("pdftotext not found (install poppler-utils): %v", err)
		}
		t.Skip("pdftotext not found; install poppler-utils or set GYPRISK_REQUIRE_PDFTOTEXT to make this a failure")
	}
	path := filepath.Join(t.TempDir(), "r.pdf")
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(bin, "-layout", "-enc", "UTF-8", path, "-").Output()
	if err != nil {
		t.Fatalf("pdftotext: %v", err)
	}
	return string(out)
}

func renderPDF(t *testing.T, out *assess.Output) []byte {
	t.Helper()
	var buf bytes.Buffer
	if err := Write(&buf, out, Options{FixedDate: fixedDate}); err != nil {
		t.Fatal(err)
	}
	return buf.Bytes()
}

// containsInOrder reports whether some line of text holds every part, in
// order, separated by at least one space.
func containsInOrder(text string, parts ...string) bool {
	for _, line := range strings.Split(text, "\n") {
		rest, ok := line, true
		for _, p := range parts {
			i := strings.Index(rest, p)
			if i < 0 {
				ok = false
				break
			}
			rest = rest[i+len(p):]
		}
		if ok {
			return true
		}
	}
	return false
}

func TestReportHoldsEveryElementSectionAndCaution(t *testing.T) {
	out := inventedOutput(500)
	pdf := renderPDF(t, out)
	text := pdfText(t, pdf)
	for _, e := range out.Elements {
		if !strings.Contains(text, e.ID) {
			t.Errorf("element id %q missing from the report", e.ID)
		}
	}
	want := []string{
		chSummary, chClimate, chElements, chNotes, chMethods, chCautions,
		"Traceability", "Input files", "Contents", "Findings", "Variants and scenarios compared",
		"What this assessment does not cover", "Rating thresholds and where they come from",
		"What moves the answer", "wall factor 0.71",
		inventedBanner,
		out.Database, out.Tool.Version, "500 Monte Carlo samples, seed 42",
		"ISO 15927-3:2009", "ISO 13788:2012", "ISO 6946:2017", "Jeschke", "Nusselt", "Hukka", "Ojanen", "52 °C",
		"on-site survey by a competent professional", "licensed engineers, architects or accredited conservators",
		"can sag and fall", "asbestos or lead", "edge protection",
		"Structural capacity", "Fire performance", "Salts other than gypsum", "Moisture transport inside the wall",
	}
	for _, h := range out.Inputs {
		want = append(want, h.SHA256, h.Path)
	}
	want = append(want, out.Notes...)
	flat := strings.Join(strings.Fields(text), " ") // phrases may wrap
	for _, w := range want {
		if !strings.Contains(flat, w) {
			t.Errorf("report text lacks %q", w)
		}
	}
	for i, g := range groupElements(out.Elements) {
		if h := elementTitle(i, g); !strings.Contains(text, h) {
			t.Errorf("element heading %q missing", h)
		}
	}
	// Every figure is numbered and referred to in the text.
	n := strings.Count(text, "Figure ")
	for k := 1; k <= 17; k++ {
		re := regexp.MustCompile(`Figure ` + itoa(k) + `\b`)
		if got := len(re.FindAllString(text, -1)); got < 2 {
			t.Errorf("Figure %d appears %d times, want a caption and a reference (%d Figure mentions)", k, got, n)
		}
	}
	if len(pdf) > 2<<20 {
		t.Errorf("report is %d bytes for 4 elements, want under 2 MB", len(pdf))
	}
}

func itoa(k int) string { return strings.TrimSpace(fixed(float64(k), 0)) }

// TestSummaryFiguresMatchOutput checks each summary row against the
// Output's values, formatted by the report's own functions.
func TestSummaryFiguresMatchOutput(t *testing.T) {
	for _, samples := range []int{0, 500} {
		out := inventedOutput(samples)
		text := pdfText(t, renderPDF(t, out))
		for _, e := range out.Elements {
			row := []string{e.ID, firstLine(e.Variant), firstLine(e.Scenario),
				fmtWater(totalWaterLM2(e.Water)),
				fmtRecession(e.Leaching.RecessionMMPerYear),
				yearsMain(e.Leaching),
				fmtHours(e.Dehydration.UnstableHoursPerYear),
				fmtHours(e.Condensation.HoursPerYear),
				fmtIndex(e.Mould.IndexMax)}
			if !containsInOrder(text, row...) {
				t.Errorf("samples=%d: no summary line with %q", samples, row)
			}
			if b := fmtBand(e.Leaching.YearsToLimitP10, e.Leaching.YearsToLimitP90, fmtYears); b != "" && !strings.Contains(text, b) {
				t.Errorf("samples=%d: %s/%s/%s: band %q of years to limit missing", samples, e.ID, e.Variant, e.Scenario, b)
			}
			// Every finding of the base case, the headline of the others.
			fs := e.Findings
			if e.Variant != "base" || e.Scenario != "present" {
				fs = fs[:1]
			}
			for _, f := range fs {
				if !strings.Contains(strings.Join(strings.Fields(text), " "), f) {
					t.Errorf("finding %q missing", f)
				}
			}
		}
	}
}

// firstLine is what the first line of a narrow table cell holds: the
// report wraps ids after a hyphen.
func firstLine(id string) string {
	if i := strings.IndexByte(id, '-'); i >= 0 {
		return id[:i+1]
	}
	return id
}

// TestPlainWordsUseTheFigures checks the sentence a client reads.
func TestPlainWordsUseTheFigures(t *testing.T) {
	out := inventedOutput(0)
	for i := range out.Elements {
		out.Elements[i].Findings = nil // the report phrases them itself
	}
	e := &out.Elements[1] // cornice-top, base, present: 0.22 mm a year, 5 mm limit
	got := plainWords(e)[0]
	want := "At the current rate the cornice top loses its 5 mm of sacrificial plaster in about 23 years (0.22 mm a year)."
	if got != want {
		t.Errorf("plainWords = %q\nwant        %q", got, want)
	}
	text := strings.Join(strings.Fields(pdfText(t, renderPDF(t, out))), " ")
	if !strings.Contains(text, want) {
		t.Errorf("report lacks %q", want)
	}
}

func TestWriteFileKeepsOldFileOnFailure(t *testing.T) {
	dir := t.TempDir()
	path := filepath.Join(dir, "report.pdf")
	if err := os.WriteFile(path, []byte("old report"), 0o644); err != nil {
		t.Fatal(err)
	}
	bad := inventedOutput(0)
	bad.Elements[2].Leaching.RecessionMMPerYear = math.NaN()
	err := WriteFile(path, bad, Options{FixedDate: fixedDate})
	if err == nil || !strings.Contains(err.Error(), "cornice-top") || !strings.Contains(err.Error(), "recession_mm_per_year") {
		t.Fatalf("err = %v, want an error naming the element and the field", err)
	}
	if got, _ := os.ReadFile(path); string(got) != "old report" {
		t.Errorf("file = %q after a failed run, want the old content", got)
	}
	if ents, _ := os.ReadDir(dir); len(ents) != 1 {
		t.Errorf("folder holds %d entries after a failed run, want 1", len(ents))
	}

	// An unwritable place fails with an error, not a panic.
	if err := WriteFile(filepath.Join(dir, "no", "such", "dir", "r.pdf"), inventedOutput(0), Options{}); err == nil {
		t.Error("WriteFile into a missing folder: want an error")
	}

	// And a good run replaces the file with a PDF.
	if err := WriteFile(path, inventedOutput(0), Options{FixedDate: fixedDate}); err != nil {
		t.Fatal(err)
	}
	if got, _ := os.ReadFile(path); !bytes.HasPrefix(got, []byte("%PDF-")) {
		t.Errorf("file does not start with %%PDF- after a good run")
	}
}

func TestWriteRejectsBadOutput(t *testing.T) {
	for _, tc := range []struct {
		name string
		out  *assess.Output
		want string
	}{
		{"nil", nil, "no assessment output"},
		{"no elements", &assess.Output{}, "no elements"},
		{"infinite daily", func() *assess.Output {
			o := inventedOutput(0)
			o.Elements[0].Daily[40].CumLossMM = math.Inf(1)
			return o
		}(), "day 41 (2021-02-10)"},
		{"negative driving rain", func() *assess.Output {
			o := inventedOutput(0)
			o.Climate.DrivingRain[3].LPerM2PerYear = -1
			return o
		}(), "driving rain"},
	} {
		var buf bytes.Buffer
		err := Write(&buf, tc.out, Options{})
		if err == nil || !strings.Contains(err.Error(), tc.want) {
			t.Errorf("%s: err = %v, want it to mention %q", tc.name, err, tc.want)
		}
		if buf.Len() != 0 {
			t.Errorf("%s: %d bytes written on error, want none", tc.name, buf.Len())
		}
		if errors.Is(err, errNoOutput) != (tc.out == nil) {
			t.Errorf("%s: errors.Is(err, errNoOutput) = %v", tc.name, errors.Is(err, errNoOutput))
		}
	}
}

// TestMonthlyOnlyOutput renders an Output read back from JSON, which has
// no daily traces: the report must fall back to the monthly values.
func TestMonthlyOnlyOutput(t *testing.T) {
	out := inventedOutput(0)
	out.Invented = false
	for i := range out.Elements {
		out.Elements[i].Daily = nil
	}
	text := pdfText(t, renderPDF(t, out))
	if !strings.Contains(text, "charts use monthly values") {
		t.Error("report does not say the charts fall back to monthly values")
	}
	if strings.Contains(text, inventedBanner) {
		t.Error("invented banner printed for an Output not marked invented")
	}
}

// normalise collapses runs of blanks so that the golden comparison is
// about content, not column positions.
func normalise(s string) string {
	var b strings.Builder
	for _, line := range strings.Split(s, "\n") {
		if f := strings.Fields(line); len(f) > 0 {
			b.WriteString(strings.Join(f, " "))
			b.WriteByte('\n')
		}
	}
	return b.String()
}

// TestGoldenText compares the extracted text of the report with
// testdata/report.golden.txt (regenerate with go test ./report -update and
// read the diff before committing).
func TestGoldenText(t *testing.T) {
	got := normalise(pdfText(t, renderPDF(t, inventedOutput(500))))
	path := filepath.Join("testdata", "report.golden.txt")
	if *update {
		if err := os.WriteFile(path, []byte(got), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if got != string(want) {
		gl, wl := strings.Split(got, "\n"), strings.Split(string(want), "\n")
		for i := 0; i < len(gl) || i < len(wl); i++ {
			var g, w string
			if i < len(gl) {
				g = gl[i]
			}
			if i < len(wl) {
				w = wl[i]
			}
			if g != w {
				t.Fatalf("extracted text differs from %s at line %d:\n got  %q\n want %q", path, i+1, g, w)
			}
		}
	}
}
