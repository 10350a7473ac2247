package main

import (
	"encoding/json"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strings"
	"testing"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// pdfText extracts a PDF's text with pdftotext (poppler-utils), skipping
// the test where it is absent unless GYPRISK_REQUIRE_PDFTOTEXT is set (CI
// sets it and installs poppler-utils).
func pdfText(t *testing.T, path string) string {
	t.Helper()
	if _, err := exec.LookPath("pdftotext"); err != nil {
		if os.Getenv("GYPRISK_REQUIRE_PDFTOTEXT") != "" {
			t.Fatal("pdftotext not found (install poppler-utils)")
		}
		t.Skip("pdftotext not found")
	}
	out, err := exec.Command("pdftotext", "-enc", "UTF-8", path, "-").Output()
	if err != nil {
		t.Fatal(err)
	}
	return string(out)
}

var spaces = regexp.MustCompile(`\s+`)

// TestDemoReportMatchesJSON runs the quick-start demo and checks that the
// PDF names every element and prints the same findings, with the same
// figures, as the JSON of the same run.
func TestDemoReportMatchesJSON(t *testing.T) {
	dir := t.TempDir()
	pdf, js := filepath.Join(dir, "demo-report.pdf"), filepath.Join(dir, "demo.json")
	_, errOut, code := runCmd("demo", "-o", pdf, "--json", js, "--samples", "0", "--fixed-date", "2026-01-15", "--quiet")
	if code != 0 {
		t.Fatalf("demo: exit %d: %s", code, errOut)
	}
	var out assess.Output
	b, err := os.ReadFile(js)
	if err != nil {
		t.Fatal(err)
	}
	if err := json.Unmarshal(b, &out); err != nil {
		t.Fatal(err)
	}
	if !out.Invented {
		t.Error("the demo output is not marked as invented example data")
	}
	text := spaces.ReplaceAllString(pdfText(t, pdf), " ")
	for _, want := range []string{"Invented example data", "Summary", "Climate", "Method", "Cautions", "asbestos", "lead", "work at height"} {
		if !strings.Contains(strings.ToLower(text), strings.ToLower(want)) {
			t.Errorf("report lacks %q", want)
		}
	}
	ids := map[string]bool{}
	for _, e := range out.Elements {
		ids[e.ID] = true
		if e.Scenario != "present" || e.Variant != "base" {
			continue
		}
		for _, f := range e.Findings {
			if !strings.Contains(text, spaces.ReplaceAllString(f, " ")) {
				t.Errorf("%s: finding missing from the report: %q", e.ID, f)
			}
		}
	}
	for id := range ids {
		if !strings.Contains(text, id) {
			t.Errorf("report lacks element %q", id)
		}
	}
	if len(ids) != 4 {
		t.Errorf("%d elements in the demo, want 4", len(ids))
	}
}

// TestAssessFailureKeepsOldOutputs: a run that fails on bad data exits 1,
// names the file and line, and leaves earlier outputs as they were.
func TestAssessFailureKeepsOldOutputs(t *testing.T) {
	dir := t.TempDir()
	rec := "time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n" +
		"2021-01-01T01:00:00Z,5,80,0,3,200,0\n" +
		"2021-01-01T02:00:00Z,5,80,x,3,200,0\n"
	proj := `[site]
name = "broken (test)"
latitude_deg = 50
longitude_deg = 0
climate = "c.csv"

[[element]]
id = "w"
material = "gypsum-plaster"
azimuth_deg = 180
height_m = 3
thickness_mm = 10
`
	must(t, os.WriteFile(filepath.Join(dir, "c.csv"), []byte(rec), 0o644))
	must(t, os.WriteFile(filepath.Join(dir, "p.toml"), []byte(proj), 0o644))
	pdf, js := filepath.Join(dir, "r.pdf"), filepath.Join(dir, "r.json")
	must(t, os.WriteFile(pdf, []byte("old pdf"), 0o644))
	must(t, os.WriteFile(js, []byte("old json"), 0o644))
	_, errOut, code := runCmd("assess", filepath.Join(dir, "p.toml"), "-o", pdf, "--json", js)
	if code != 1 || !strings.Contains(errOut, "c.csv:3:4") || !strings.Contains(errOut, `"x"`) {
		t.Errorf("exit %d, stderr %q; want 1 naming c.csv:3:4 and the value", code, errOut)
	}
	for path, want := range map[string]string{pdf: "old pdf", js: "old json"} {
		if b, _ := os.ReadFile(path); string(b) != want {
			t.Errorf("%s changed after a failed run", filepath.Base(path))
		}
	}
	ents, _ := os.ReadDir(dir)
	if len(ents) != 4 {
		t.Errorf("%d files in the folder after a failed run, want 4 (no temporaries)", len(ents))
	}
}

func TestAssessUsage(t *testing.T) {
	for _, args := range [][]string{
		{"assess"},
		{"assess", "a.toml", "b.toml"},
		{"assess", "a.toml", "--samples", "-3"},
		{"assess", "a.toml", "--fixed-date", "tomorrow"},
		{"assess", "--no-such-flag", "a.toml"},
	} {
		if _, _, code := runCmd(args...); code != 2 {
			t.Errorf("%v: exit %d, want 2", args, code)
		}
	}
	if _, errOut, code := runCmd("assess", "/no/such/project.toml"); code != 1 || !strings.Contains(errOut, "no/such/project.toml") {
		t.Errorf("missing project: exit %d, %q", code, errOut)
	}
}

func must(t *testing.T, err error) {
	t.Helper()
	if err != nil {
		t.Fatal(err)
	}
}
