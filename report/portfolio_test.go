package report

import (
	"bytes"
	"strings"
	"testing"

	"github.com/gyprisk/gyprisk/leach/assess"
)

func twoBuildings() []*assess.Output {
	a := inventedOutput(0)
	b := inventedOutput(0)
	b.Site.Name = "Corn Exchange, Wrenmoor (invented)"
	b.Project = "examples/wrenmoor/project.toml"
	for i := range b.Elements {
		b.Elements[i].ID = "wm-" + b.Elements[i].ID
		if y := b.Elements[i].Leaching.YearsToLimit; y != nil {
			v := *y * 0.5
			b.Elements[i].Leaching.YearsToLimit = &v
			rate(b.Thresholds, &b.Elements[i])
		}
	}
	return []*assess.Output{a, nil, b}
}

func TestRankByYears(t *testing.T) {
	rows := PortfolioRows(twoBuildings())
	if len(rows) != 12 {
		t.Fatalf("%d rows, want 12 (6 results × 2 buildings; nil output skipped)", len(rows))
	}
	RankByYears(rows)
	seenNil := false
	for i, r := range rows {
		if r.YearsToLimit == nil {
			seenNil = true
			continue
		}
		if seenNil {
			t.Fatalf("row %d (%s) has years after a row without recession", i, r.ID)
		}
		if i > 0 && rows[i-1].YearsToLimit != nil && *rows[i-1].YearsToLimit > *r.YearsToLimit {
			t.Fatalf("rows %d and %d out of order: %v > %v", i-1, i, *rows[i-1].YearsToLimit, *r.YearsToLimit)
		}
	}
	if rows[0].ID != "wm-cornice-top" || rows[0].Scenario != "warmer-wetter" {
		t.Errorf("first row %s/%s, want wm-cornice-top under warmer-wetter (fewest years)", rows[0].ID, rows[0].Scenario)
	}
}

func TestRankByRating(t *testing.T) {
	rows := PortfolioRows(twoBuildings())
	RankByRating(rows)
	for i := 1; i < len(rows); i++ {
		if severity(rows[i-1].Worst) < severity(rows[i].Worst) {
			t.Fatalf("row %d (%s, %s) ranks above a worse row %d (%s, %s)", i-1, rows[i-1].ID, rows[i-1].Worst, i, rows[i].ID, rows[i].Worst)
		}
	}
	if rows[0].Worst != assess.High {
		t.Errorf("first row worst rating %q, want high", rows[0].Worst)
	}
	w, of := worstRating(assess.Ratings{Leaching: "moderate", Dehydration: "high", Condensation: "low", Mould: "high"})
	if w != "high" || strings.Join(of, ",") != "dehydration,mould" {
		t.Errorf("worstRating = %q %v", w, of)
	}
}

func TestWritePortfolio(t *testing.T) {
	var buf bytes.Buffer
	opt := Options{FixedDate: fixedDate, Failures: []Failure{{Project: "broken/project.toml", Err: "broken/project.toml:3:9: terrain \"V\": want I, II, III or IV"}}}
	if err := WritePortfolio(&buf, twoBuildings(), opt); err != nil {
		t.Fatal(err)
	}
	text := pdfText(t, buf.Bytes())
	for _, w := range []string{chByYears, chByRating, chFailed, "broken/project.toml", "wm-cornice-top", "Old Ropeworks", "Corn Exchange", inventedBanner, "on-site survey"} {
		if !strings.Contains(text, w) {
			t.Errorf("portfolio lacks %q", w)
		}
	}
	// The first ranked row is the one with the fewest years.
	i := strings.Index(text, chByYears)
	j := strings.Index(text[i:], "wm-cornice-top")
	k := strings.Index(text[i:], "sw-facade")
	if j < 0 || k < 0 || j > k {
		t.Errorf("ranking by years: wm-cornice-top should come before sw-facade")
	}
	if err := WritePortfolio(&bytes.Buffer{}, nil, Options{}); err == nil {
		t.Error("empty portfolio: want an error")
	}
}
