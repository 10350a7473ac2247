package main

import (
	"encoding/json"
	"fmt"
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

// TestAssessHourlyTrace: --hourly writes one row per hour × element ×
// variant × scenario, with the documented header, and agrees with the JSON
// totals.
func TestAssessHourlyTrace(t *testing.T) {
	dir := t.TempDir()
	csvPath, js := filepath.Join(dir, "h.csv"), filepath.Join(dir, "r.json")
	_, errOut, code := runCmd("demo", "--example", "basement", "-o", "", "--hourly", csvPath, "--json", js, "--samples", "0", "-q")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	b, err := os.ReadFile(csvPath)
	if err != nil {
		t.Fatal(err)
	}
	lines := strings.Split(strings.TrimSpace(string(b)), "\n")
	if want := "time,id,variant,scenario,surface_temp_c,surface_rh_pct,deposited_l_m2,runoff_in_l_m2,condensate_l_m2,dissolved_g_m2,delta_g_bassanite_j_per_mol,mould_index"; lines[0] != want {
		t.Errorf("header %q, want %q", lines[0], want)
	}
	// The cellar record: two years of 15-minute readings, 17 520 hours, two elements.
	if got, want := len(lines)-1, 2*17520; got != want {
		t.Errorf("%d rows, want %d", got, want)
	}
	var out struct {
		Elements []struct {
			ID    string `json:"id"`
			Mould struct {
				IndexMax float64 `json:"index_max"`
			} `json:"mould"`
		} `json:"elements"`
	}
	jb, _ := os.ReadFile(js)
	if err := json.Unmarshal(jb, &out); err != nil {
		t.Fatal(err)
	}
	maxIdx := map[string]float64{}
	for _, l := range lines[1:] {
		f := strings.Split(l, ",")
		var m float64
		if _, err := fmt.Sscan(f[11], &m); err != nil {
			t.Fatal(err)
		}
		maxIdx[f[1]] = max(maxIdx[f[1]], m)
	}
	for _, e := range out.Elements {
		if d := maxIdx[e.ID] - e.Mould.IndexMax; d > 1e-4 || d < -1e-4 {
			t.Errorf("%s: trace mould index max %.5f, JSON %.5f", e.ID, maxIdx[e.ID], e.Mould.IndexMax)
		}
	}
}

// TestAssessSummaryGolden pins the summary table of the demo project
// (invented data) so that a change to any figure is seen and reviewed:
// regenerate with go test ./cmd/gyprisk -run AssessSummaryGolden -update.
func TestAssessSummaryGolden(t *testing.T) {
	out, errOut, code := runCmd("assess", "../../examples/demo/project.toml", "--samples", "0", "-q")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	path := filepath.Join("testdata", "assess", "demo-summary.golden")
	if updating() {
		must(t, os.MkdirAll(filepath.Dir(path), 0o755))
		must(t, os.WriteFile(path, []byte(out), 0o644))
	}
	want, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	if out != string(want) {
		t.Errorf("summary differs from %s; run with -update and read the diff\n--- got\n%s", path, out)
	}
}

// TestHelpOnEverySubcommand: --help exits 0 and prints the usage once,
// with an example.
func TestHelpOnEverySubcommand(t *testing.T) {
	for name := range commands {
		_, errOut, code := runCmd(name, "--help")
		if code != 0 || strings.Count(errOut, "Usage: gyprisk "+name) != 1 || !strings.Contains(errOut, "Example") {
			t.Errorf("%s --help: exit %d, output %q", name, code, errOut)
		}
	}
}

// TestAssessJSONContract: every key the assessment and options issues
// promise is present in the JSON (users' scripts rely on them).
func TestAssessJSONContract(t *testing.T) {
	out, errOut, code := runCmd("demo", "-o", "", "--json", "-", "--samples", "20", "--seed", "3", "-q")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	var doc map[string]any
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatal(err)
	}
	has := func(m map[string]any, path string, keys ...string) {
		for _, k := range keys {
			if _, ok := m[k]; !ok {
				t.Errorf("JSON lacks %s%s", path, k)
			}
		}
	}
	has(doc, "", "tool", "site", "climate", "elements")
	has(doc["tool"].(map[string]any), "tool.", "name", "version")
	has(doc["climate"].(map[string]any), "climate.", "start", "end", "coverage_pct")
	elems := doc["elements"].([]any)
	if len(elems) == 0 {
		t.Fatal("no elements")
	}
	for _, x := range elems {
		e := x.(map[string]any)
		has(e, "elements[].", "id", "variant", "scenario", "material", "exposure",
			"water", "leaching", "dehydration", "condensation", "mould", "frost", "ratings")
		has(e["water"].(map[string]any), "water.", "deposited_l_m2_per_year", "runoff_in_l_m2_per_year", "wet_hours_per_year")
		has(e["leaching"].(map[string]any), "leaching.", "dissolved_g_m2_per_year", "recession_mm_per_year", "years_to_limit",
			"recession_mm_per_year_p10", "recession_mm_per_year_p50", "recession_mm_per_year_p90")
		has(e["dehydration"].(map[string]any), "dehydration.", "unstable_hours_per_year", "anhydrite_favoured_hours_per_year", "max_surface_temp_c", "hours_above_52c_per_year")
		has(e["condensation"].(map[string]any), "condensation.", "hours_per_year", "condensate_kg_m2_per_year")
		has(e["mould"].(map[string]any), "mould.", "index_max", "months_over_80pct")
		has(e["frost"].(map[string]any), "frost.", "wet_freeze_thaw_cycles_per_year")
		has(e["ratings"].(map[string]any), "ratings.", "leaching", "dehydration", "condensation", "mould")
		if l := e["leaching"].(map[string]any); l["years_to_limit"] != nil {
			has(l, "leaching.", "years_to_limit_p10", "years_to_limit_p50", "years_to_limit_p90")
		}
	}
}
