package main

import (
	"bytes"
	"encoding/csv"
	"encoding/json"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"runtime"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
	"github.com/gyprisk/gyprisk/report"
)

// The projects under testdata/batch/sites are invented: two good ones
// (chapel-annex with 2 results, mill-house with 6: a variant and a
// scenario) and two broken ones (toll-cottage: relative humidity 180 % on
// line 33 of its record; weigh-house: the misspelt key "thicknes_mm" on
// line 20).
const batchSites = "testdata/batch/sites"

// readPortfolio reads portfolio.csv into maps keyed by the header.
func readPortfolio(t *testing.T, path string) []map[string]string {
	t.Helper()
	f, err := os.Open(path)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	recs, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	if len(recs) == 0 || strings.Join(recs[0], ",") != strings.Join(portfolioHeader, ",") {
		t.Fatalf("%s: header %v, want %v", path, recs[0], portfolioHeader)
	}
	var rows []map[string]string
	for _, r := range recs[1:] {
		m := map[string]string{}
		for i, h := range recs[0] {
			m[h] = r[i]
		}
		rows = append(rows, m)
	}
	return rows
}

func readOutput(t *testing.T, path string) *assess.Output {
	t.Helper()
	b, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	var out assess.Output
	if err := json.Unmarshal(b, &out); err != nil {
		t.Fatalf("%s: %v", path, err)
	}
	return &out
}

// noTempFiles fails if an atomic write left its temporary file behind.
func noTempFiles(t *testing.T, dir string) {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	for _, e := range entries {
		if strings.HasSuffix(e.Name(), ".tmp") || strings.HasPrefix(e.Name(), ".") {
			t.Errorf("temporary file left in %s: %s", dir, e.Name())
		}
	}
}

// Batch keeps going past a broken project.
func TestBatchKeepsGoingPastBrokenProject(t *testing.T) {
	dir := t.TempDir()
	_, stderr, code := runCmd("batch", batchSites, "--out", dir, "--fixed-date", "2025-01-01")
	if code != 1 {
		t.Fatalf("exit %d, want 1; stderr:\n%s", code, stderr)
	}

	// Good projects: a PDF and a JSON each. Broken ones: neither.
	for _, name := range []string{"chapel-annex", "mill-house"} {
		pdf, err := os.ReadFile(filepath.Join(dir, name+".pdf"))
		if err != nil || !bytes.HasPrefix(pdf, []byte("%PDF-")) {
			t.Errorf("%s.pdf: not a PDF (err %v)", name, err)
		}
		if out := readOutput(t, filepath.Join(dir, name+".json")); len(out.Elements) == 0 {
			t.Errorf("%s.json: no elements", name)
		}
	}
	for _, name := range []string{"toll-cottage", "weigh-house"} {
		for _, ext := range []string{".pdf", ".json"} {
			if _, err := os.Stat(filepath.Join(dir, name+ext)); err == nil {
				t.Errorf("%s%s written for a failed project", name, ext)
			}
		}
	}
	if pdf, err := os.ReadFile(filepath.Join(dir, "portfolio.pdf")); err != nil || !bytes.HasPrefix(pdf, []byte("%PDF-")) {
		t.Errorf("portfolio.pdf: not a PDF (err %v)", err)
	}
	noTempFiles(t, dir)

	// Standard error: one line per project, failures with their error,
	// and the summary.
	for _, want := range []string{
		"ok " + filepath.Join(batchSites, "chapel-annex.toml") + "\n",
		"ok " + filepath.Join(batchSites, "mill-house.toml") + "\n",
		"FAILED " + filepath.Join(batchSites, "toll-cottage.toml") + ": " + filepath.Join(batchSites, "climate-broken.csv") + ":33:3 (rh_pct): value \"180\"",
		"FAILED " + filepath.Join(batchSites, "weigh-house.toml") + ":20 (element.thicknes_mm): unknown key",
		"batch: 2 ok, 2 failed\n",
	} {
		if !strings.Contains(stderr, want) {
			t.Errorf("stderr lacks %q:\n%s", want, stderr)
		}
	}
	if n := strings.Count(stderr, "\n"); n != 5 {
		t.Errorf("stderr has %d lines, want 5 (4 projects and the summary):\n%s", n, stderr)
	}

	rows := readPortfolio(t, filepath.Join(dir, "portfolio.csv"))
	var ok, failed []map[string]string
	for _, r := range rows {
		switch r["status"] {
		case "ok":
			if len(failed) > 0 {
				t.Errorf("ok row after a failed row: %v", r)
			}
			ok = append(ok, r)
		case "failed":
			failed = append(failed, r)
		default:
			t.Errorf("status %q", r["status"])
		}
	}

	// Failed projects, in the order given, with their errors.
	if len(failed) != 2 || failed[0]["output"] != "toll-cottage" || failed[1]["output"] != "weigh-house" {
		t.Fatalf("failed rows %v, want toll-cottage then weigh-house", failed)
	}
	if e := failed[0]["error"]; !strings.Contains(e, "climate-broken.csv:33:3") || !strings.Contains(e, "relative humidity") {
		t.Errorf("toll-cottage error %q does not name the file, line, column and reason", e)
	}
	if e := failed[1]["error"]; !strings.Contains(e, "weigh-house.toml:20") || !strings.Contains(e, `"thicknes_mm"`) {
		t.Errorf("weigh-house error %q does not name the file, line and key", e)
	}

	// Every result of the good projects, once, with the JSON's figures.
	outs := map[string]*assess.Output{}
	want := 0
	for _, name := range []string{"chapel-annex", "mill-house"} {
		outs[name] = readOutput(t, filepath.Join(dir, name+".json"))
		want += len(outs[name].Elements)
	}
	if len(ok) != want || want != 8 {
		t.Fatalf("%d ok rows, want %d (8: 2 chapel-annex, 6 mill-house)", len(ok), want)
	}
	seen := map[string]bool{}
	for _, r := range ok {
		key := r["output"] + "/" + r["id"] + "/" + r["variant"] + "/" + r["scenario"]
		if seen[key] {
			t.Errorf("row %s twice", key)
		}
		seen[key] = true
		out := outs[r["output"]]
		var e *assess.ElementResult
		for i := range out.Elements {
			x := &out.Elements[i]
			if x.ID == r["id"] && x.Variant == r["variant"] && x.Scenario == r["scenario"] {
				e = x
			}
		}
		if e == nil {
			t.Errorf("row %s not in %s.json", key, r["output"])
			continue
		}
		checkNum(t, key+" years_to_limit", r["years_to_limit"], e.Leaching.YearsToLimit)
		checkNum(t, key+" recession_mm_per_year", r["recession_mm_per_year"], &e.Leaching.RecessionMMPerYear)
		water := e.Water.DepositedLM2PerYear + e.Water.RunoffInLM2PerYear
		checkNum(t, key+" water_l_m2_per_year", r["water_l_m2_per_year"], &water)
		checkNum(t, key+" mould_index_max", r["mould_index_max"], &e.Mould.IndexMax)
		if r["site"] != out.Site.Name || r["rating_leaching"] != e.Ratings.Leaching || r["rating_mould"] != e.Ratings.Mould || r["invented_example_data"] != "true" {
			t.Errorf("row %s: %v does not match the JSON", key, r)
		}
	}

	// Ranked: years to the loss limit ascending (empty, never, last), then
	// worst rating, high first.
	yearsOf := func(r map[string]string) float64 {
		if r["years_to_limit"] == "" {
			return math.Inf(1)
		}
		v, _ := strconv.ParseFloat(r["years_to_limit"], 64)
		return v
	}
	for i := 1; i < len(ok); i++ {
		a, b := ok[i-1], ok[i]
		ya, yb := yearsOf(a), yearsOf(b)
		if ya > yb || (ya == yb && ratingSeverity(a["worst_rating"]) < ratingSeverity(b["worst_rating"])) {
			t.Errorf("rows %d and %d out of order: %v (%s) before %v (%s)", i, i+1, ya, a["worst_rating"], yb, b["worst_rating"])
		}
	}
	if yearsOf(ok[len(ok)-1]) != math.Inf(1) {
		t.Errorf("last row %v: want the vestry ceiling, which does not recede", ok[len(ok)-1])
	}

	// The worst rating agrees with the one the portfolio PDF prints.
	pr := report.PortfolioRows([]*assess.Output{outs["chapel-annex"], outs["mill-house"]})
	worst := map[string]string{}
	for _, r := range pr {
		worst[r.Project+"/"+r.ID+"/"+r.Variant+"/"+r.Scenario] = r.Worst
	}
	for _, r := range ok {
		k := outs[r["output"]].Project + "/" + r["id"] + "/" + r["variant"] + "/" + r["scenario"]
		if w, found := worst[k]; !found || w != r["worst_rating"] {
			t.Errorf("%s: worst_rating %q, the portfolio PDF has %q", k, r["worst_rating"], w)
		}
	}
}

// checkNum compares a CSV cell with the JSON value exactly: the CSV holds
// the shortest decimal that reads back to the same float64.
func checkNum(t *testing.T, what, cell string, v *float64) {
	t.Helper()
	if v == nil {
		if cell != "" {
			t.Errorf("%s: %q, want empty", what, cell)
		}
		return
	}
	got, err := strconv.ParseFloat(cell, 64)
	if err != nil || got != *v {
		t.Errorf("%s: %q, want %v", what, cell, *v)
	}
}

// The same inputs give the same outputs byte for byte, whatever the
// number of workers and the order the projects finish in.
func TestBatchDeterministic(t *testing.T) {
	run := func(procs int) string {
		defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
		dir := t.TempDir()
		_, stderr, code := runCmd("batch", batchSites, "--out", dir, "--fixed-date", "2025-01-01", "--samples", "10", "--seed", "3", "--quiet")
		if code != 1 {
			t.Fatalf("GOMAXPROCS %d: exit %d, want 1:\n%s", procs, code, stderr)
		}
		return dir
	}
	a, b := run(1), run(4)
	for _, f := range []string{"portfolio.csv", "chapel-annex.json", "mill-house.json"} {
		x, err1 := os.ReadFile(filepath.Join(a, f))
		y, err2 := os.ReadFile(filepath.Join(b, f))
		if err1 != nil || err2 != nil {
			t.Fatal(err1, err2)
		}
		if !bytes.Equal(x, y) {
			t.Errorf("%s differs between 1 and 4 workers", f)
		}
	}
	// With samples the band is filled in.
	for _, r := range readPortfolio(t, filepath.Join(a, "portfolio.csv")) {
		if r["status"] == "ok" && r["years_to_limit"] != "" && (r["years_to_limit_p10"] == "" || r["years_to_limit_p90"] == "") {
			t.Errorf("%s %s: no band with --samples 10", r["output"], r["id"])
		}
	}
}

func TestBatchQuiet(t *testing.T) {
	dir := t.TempDir()
	_, stderr, code := runCmd("batch", batchSites, "--out", dir, "--fixed-date", "2025-01-01", "--quiet")
	if code != 1 {
		t.Fatalf("exit %d, want 1", code)
	}
	if strings.Contains(stderr, " ok "+batchSites) || strings.Count(stderr, "FAILED") != 2 || !strings.HasSuffix(stderr, "batch: 2 ok, 2 failed\n") {
		t.Errorf("--quiet: want only the failures and the summary:\n%s", stderr)
	}
}

func TestBatchAllGood(t *testing.T) {
	dir := t.TempDir()
	good := []string{filepath.Join(batchSites, "mill-house.toml"), filepath.Join(batchSites, "chapel-annex.toml")}
	_, stderr, code := runCmd(append([]string{"batch", "--out", dir, "--fixed-date", "2025-01-01"}, good...)...)
	if code != 0 {
		t.Fatalf("exit %d, want 0:\n%s", code, stderr)
	}
	if !strings.HasSuffix(stderr, "batch: 2 ok, 0 failed\n") {
		t.Errorf("stderr:\n%s", stderr)
	}
	for _, r := range readPortfolio(t, filepath.Join(dir, "portfolio.csv")) {
		if r["status"] != "ok" {
			t.Errorf("row %v", r)
		}
	}
	noTempFiles(t, dir)
}

func TestBatchUsage(t *testing.T) {
	empty := t.TempDir()
	out := t.TempDir()
	tests := []struct {
		name string
		args []string
		code int
		want string
	}{
		{"no projects", []string{"batch"}, 2, "want one or more project files"},
		{"empty folder", []string{"batch", empty, "--out", out}, 2, "no project files (*.toml) in " + empty},
		{"unknown flag", []string{"batch", batchSites, "--bogus"}, 2, "unknown flag: --bogus"},
		{"bad samples", []string{"batch", batchSites, "--out", out, "--samples", "-3"}, 2, "--samples -3"},
		{"bad date", []string{"batch", batchSites, "--out", out, "--fixed-date", "1 May"}, 2, "--fixed-date"},
		{"empty out", []string{"batch", batchSites, "--out", ""}, 2, "--out"},
		{"help", []string{"batch", "--help"}, 0, "Example:\n  gyprisk batch sites/ --out results/"},
		{"out is a file", []string{"batch", batchSites, "--out", filepath.Join(batchSites, "chapel-annex.toml")}, 1, "chapel-annex.toml"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, stderr, code := runCmd(tt.args...)
			if code != tt.code || !strings.Contains(stderr, tt.want) {
				t.Errorf("exit %d, want %d; stderr should contain %q:\n%s", code, tt.code, tt.want, stderr)
			}
		})
	}
	if entries, _ := os.ReadDir(out); len(entries) != 0 {
		t.Errorf("a usage error wrote %d files into --out", len(entries))
	}
}

// A missing project file fails as a project, not the batch.
func TestBatchMissingFile(t *testing.T) {
	dir := t.TempDir()
	_, stderr, code := runCmd("batch", "--out", dir, "--fixed-date", "2025-01-01",
		filepath.Join(batchSites, "chapel-annex.toml"), filepath.Join(batchSites, "no-such-site.toml"))
	if code != 1 || !strings.Contains(stderr, "FAILED "+filepath.Join(batchSites, "no-such-site.toml")) || !strings.Contains(stderr, "batch: 1 ok, 1 failed") {
		t.Fatalf("exit %d:\n%s", code, stderr)
	}
	if _, err := os.Stat(filepath.Join(dir, "chapel-annex.pdf")); err != nil {
		t.Error(err)
	}
}

func TestBatchPaths(t *testing.T) {
	paths, dups, err := batchPaths([]string{batchSites, filepath.Join(batchSites, "mill-house.toml"), "missing.toml"})
	if err != nil {
		t.Fatal(err)
	}
	want := []string{"chapel-annex.toml", "mill-house.toml", "toll-cottage.toml", "weigh-house.toml"}
	for i := range want {
		want[i] = filepath.Join(batchSites, want[i])
	}
	want = append(want, "missing.toml")
	if strings.Join(paths, " ") != strings.Join(want, " ") {
		t.Errorf("paths %q, want %q", paths, want)
	}
	if len(dups) != 1 || dups[0] != filepath.Join(batchSites, "mill-house.toml") {
		t.Errorf("dups %q", dups)
	}
}

func TestBatchNames(t *testing.T) {
	tests := []struct {
		paths []string
		want  []string
	}{
		{[]string{"a.toml", "b.toml"}, []string{"a", "b"}},
		{[]string{"north/project.toml", "south/project.toml", "project.toml"}, []string{"project", "south-project", "project-2"}},
		{[]string{"x/Site.toml", "y/site.toml"}, []string{"Site", "y-site"}}, // case-insensitive file systems
		{[]string{"portfolio.toml", "q/portfolio.toml"}, []string{"portfolio-2", "q-portfolio"}},
		{[]string{"a/b.toml", "c/b.toml", "a-b.toml", "c/b.x.toml"}, []string{"b", "c-b", "a-b", "b.x"}},
		{[]string{"a/b.toml", "a-b.toml", "c/a-b.toml"}, []string{"b", "a-b", "c-a-b"}},
		{[]string{"a/b.toml", "a/b.TOML"}, []string{"b", "a-b"}},
	}
	for _, tt := range tests {
		jobs := batchJobs(tt.paths)
		var got []string
		for _, j := range jobs {
			got = append(got, j.name)
		}
		if strings.Join(got, " ") != strings.Join(tt.want, " ") {
			t.Errorf("batchJobs(%q) names %q, want %q", tt.paths, got, tt.want)
		}
	}
}

func TestPortfolioRecordWidth(t *testing.T) {
	years := 3.0
	e := &assess.ElementResult{ID: "x", Leaching: assess.LeachingOut{YearsToLimit: &years}}
	for _, r := range []portfolioRow{{e: e}, {failed: fmt.Errorf("bad")}} {
		if n := len(r.record()); n != len(portfolioHeader) {
			t.Errorf("record has %d fields, header %d", n, len(portfolioHeader))
		}
	}
}

func TestCSVFloat(t *testing.T) {
	for _, tt := range []struct {
		v    float64
		want string
	}{
		{0, "0"}, {2.5, "2.5"}, {1e-6, "0.000001"}, {1.5e-7, "1.5e-07"}, {-3, "-3"}, {1e21, "1e+21"}, {582319.6208041053, "582319.6208041053"},
	} {
		if got := csvFloat(tt.v); got != tt.want {
			t.Errorf("csvFloat(%v) = %q, want %q", tt.v, got, tt.want)
		}
	}
}

// writeBenchProjects writes n small invented projects (one or two
// elements each, the 30-day invented record of testdata/batch) into dir.
func writeBenchProjects(b *testing.B, dir string, n int) []string {
	b.Helper()
	rec, err := os.ReadFile(filepath.Join(batchSites, "climate-30d.csv"))
	if err != nil {
		b.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(dir, "climate-30d.csv"), rec, 0o644); err != nil {
		b.Fatal(err)
	}
	materials := []string{"gypsum-lime-mortar", "gypsum-stucco", "gypsum-plaster"}
	paths := make([]string, n)
	for i := range n {
		var s strings.Builder
		fmt.Fprintf(&s, "# INVENTED benchmark project %d: no real building.\ninvented = true\n\n[site]\nname = \"Bench house %d (invented)\"\nlatitude_deg = 51.0\nlongitude_deg = -5.0\nclimate = \"climate-30d.csv\"\n\n", i, i)
		fmt.Fprintf(&s, "[[element]]\nid = \"wall\"\nlabel = \"wall render\"\nmaterial = %q\nexposure = \"exterior\"\nazimuth_deg = %d\ntilt_deg = 90\nheight_m = %d\nthickness_mm = 20\nloss_limit_mm = 5\n\n",
			materials[i%len(materials)], (i*37)%360, 2+i%8)
		if i%2 == 1 {
			s.WriteString("[[element]]\nid = \"ceiling\"\nlabel = \"ceiling\"\nmaterial = \"gypsum-board\"\nexposure = \"interior\"\ntilt_deg = 180\ntemperature_factor = 0.7\nhumidity_class = 3\nthickness_mm = 12.5\nloss_limit_mm = 2\n")
		}
		paths[i] = filepath.Join(dir, fmt.Sprintf("bench-%03d.toml", i))
		if err := os.WriteFile(paths[i], []byte(s.String()), 0o644); err != nil {
			b.Fatal(err)
		}
	}
	return paths
}

var batchSink error

// BenchmarkBatch assesses small invented projects (30 days hourly, one or
// two elements; PDFs off, JSON and portfolio.csv on) with 1 and 2
// workers. procs=1 is the baseline: the same work one project after
// another.
func BenchmarkBatch(b *testing.B) {
	for _, n := range []int{20, 200} {
		dir := b.TempDir()
		paths := writeBenchProjects(b, dir, n)
		for _, procs := range []int{1, 2} {
			b.Run(fmt.Sprintf("projects=%d/procs=%d", n, procs), func(b *testing.B) {
				defer runtime.GOMAXPROCS(runtime.GOMAXPROCS(procs))
				o := &batchOptions{outDir: filepath.Join(dir, "out"), noPDF: true}
				o.quiet = true
				if err := os.MkdirAll(o.outDir, 0o755); err != nil {
					b.Fatal(err)
				}
				opt := assess.Options{Samples: 0, Now: time.Date(2025, 1, 1, 0, 0, 0, 0, time.UTC), ToolVersion: version}
				b.ReportAllocs()
				b.ResetTimer()
				for b.Loop() {
					batchSink = o.run(paths, opt, io.Discard)
					if batchSink != nil {
						b.Fatal(batchSink)
					}
				}
				b.ReportMetric(float64(b.Elapsed().Nanoseconds())/float64(b.N*n)/1e6, "ms/project")
			})
		}
	}
}
