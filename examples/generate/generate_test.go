package main

import (
	"bytes"
	"math"
	"os"
	"path/filepath"
	"strings"
	"sync"
	"testing"
	"time"
)

// The committed example files must be exactly what the default seed
// produces, so anyone can regenerate them and get the same bytes. If this
// fails after a change to the generator, run
//
//	go run ./examples/generate -out examples
//
// from the repository root and read the diff of the statistics
// ("go run ./examples/generate -out /tmp/x -v") before committing.
func TestCommittedFilesMatchDefaultSeed(t *testing.T) {
	for _, f := range defaultFiles() {
		got, err := os.ReadFile(filepath.Join("..", filepath.FromSlash(f.path)))
		if err != nil {
			t.Errorf("%s: %v", f.path, err)
			continue
		}
		if !bytes.Equal(got, f.data) {
			t.Errorf("examples/%s differs from what seed %d generates (%d bytes committed, %d generated); regenerate it",
				f.path, defaultSeed, len(got), len(f.data))
		}
	}
}

func TestDeterministic(t *testing.T) {
	a, b := generate(42), generate(42)
	c := generate(43)
	for i := range a {
		if !bytes.Equal(a[i].data, b[i].data) {
			t.Errorf("%s: two runs with seed 42 differ", a[i].path)
		}
		if bytes.Equal(a[i].data, c[i].data) {
			t.Errorf("%s: seeds 42 and 43 give the same file", a[i].path)
		}
	}
}

// Every file says, before anything else, that it is invented.
func TestFilesAreLabelledInvented(t *testing.T) {
	for _, f := range defaultFiles() {
		first, _, _ := strings.Cut(string(f.data), "\n")
		if !strings.HasPrefix(first, "# INVENTED DATA") {
			t.Errorf("%s: first line %q does not label the data as invented", f.path, first)
		}
		if !strings.Contains(string(f.data[:600]), "seed 1867") {
			t.Errorf("%s: the comment lines do not name the seed", f.path)
		}
		// Comment lines carry no delimiter characters, so a reader that
		// sniffs the delimiter from the first lines is not misled.
		for _, l := range strings.Split(string(f.data), "\n") {
			if strings.HasPrefix(l, "#") && strings.ContainsAny(l, ",;\t") {
				t.Errorf("%s: comment line holds a delimiter: %q", f.path, l)
			}
		}
	}
}

// defaultFiles is generated once for all tests.
var defaultFiles = sync.OnceValue(func() []file { return generate(defaultSeed) })

func files(t *testing.T) map[string]*table {
	t.Helper()
	m := map[string]*table{}
	for _, f := range defaultFiles() {
		tb, err := parseTable(f.data)
		if err != nil {
			t.Fatalf("%s: %v", f.path, err)
		}
		m[f.path] = tb
	}
	return m
}

// band is a claimed range of a statistic of the invented data.
type band struct {
	name     string
	got      float64
	min, max float64
}

func checkBands(t *testing.T, file string, bands []band) {
	t.Helper()
	for _, b := range bands {
		if !(b.got >= b.min && b.got <= b.max) { // also catches NaN
			t.Errorf("%s: %s = %.2f, want %g to %g", file, b.name, b.got, b.min, b.max)
		} else {
			t.Logf("%s: %s = %.2f (claimed %g to %g)", file, b.name, b.got, b.min, b.max)
		}
	}
}

// Sanity checks of invented data, not physics checks: the outdoor record's
// statistics lie in the ranges examples/README.md claims for a temperate
// maritime climate. The ranges are the design targets of the generator
// (common practice for such a climate, no source); they are never check
// values for gyprisk's methods.
func TestOutdoorStatisticsSanity(t *testing.T) {
	tb := files(t)["demo/climate-outdoor.csv"]
	s := computeStats(tb)

	if s.rows != outdoorHours-5 {
		t.Errorf("rows = %d, want %d (3 years less the 5-hour gap)", s.rows, outdoorHours-5)
	}
	if len(s.gaps) != 1 || !strings.HasPrefix(s.gaps[0], "2022-03-15T10:00:00Z to 2022-03-15T14:00:00Z (5 h") {
		t.Errorf("gaps = %v, want the one 5-hour gap of 2022-03-15", s.gaps)
	}
	if s.empty != len(emptyCells) {
		t.Errorf("empty cells = %d, want %d", s.empty, len(emptyCells))
	}
	if first, last := tb.times[0], tb.times[len(tb.times)-1]; !first.Equal(time.Date(2021, 1, 1, 1, 0, 0, 0, time.UTC)) ||
		!last.Equal(time.Date(2024, 1, 1, 0, 0, 0, 0, time.UTC)) {
		t.Errorf("period %v to %v, want 2021-01-01T01:00Z to 2024-01-01T00:00Z", first, last)
	}
	octMar := s.monthRainMM[9] + s.monthRainMM[10] + s.monthRainMM[11] + s.monthRainMM[0] + s.monthRainMM[1] + s.monthRainMM[2]
	sector := 0
	for k := range s.sectorPct {
		if s.sectorPct[k] > s.sectorPct[sector] {
			sector = k
		}
	}
	checkBands(t, "outdoor", []band{
		{"annual mean temperature °C", s.meanTempC, 10.0, 11.0},
		{"January mean temperature °C", s.monthTempC[0], 2.5, 6.0},
		{"July mean temperature °C", s.monthTempC[6], 15.0, 18.5},
		{"maximum temperature °C", s.maxTmp, 31, 34},
		{"minimum temperature °C", s.minTempC, -9, -3},
		{"rain mm per year", s.rainMMPerYear, 780, 950},
		{"share of the year's rain in October to March", octMar / s.rainMMPerYear, 0.55, 0.75},
		{"hours with at least 0.1 mm, fraction", s.wetHourFrac, 0.06, 0.10},
		{"hours with at least 10 mm", float64(s.downpourHours), 3, 15},
		{"wettest hour mm", s.maxRainMMPerH, 12, 25},
		{"mean RH %", s.meanRHPct, 81, 85},
		{"mean RH at night (00-05 UTC) %", s.nightRHPct, 90, 97},
		{"mean RH in rain %", s.rainRHPct, 93, 99},
		{"mean daily minimum RH in spring %", s.springMinRHPct, 50, 65},
		{"lowest RH %", s.minRHPct, 30, 50},
		{"mean wind m/s", s.meanWindMS, 4.2, 4.8},
		{"winter minus summer mean wind m/s", s.winterWindMS - s.summerWindMS, 0.8, 2.5},
		{"most frequent 30° sector centre °", float64(30 * sector), 210, 240},
		{"mean global horizontal irradiance W/m²", s.meanSolarWM2, 110, 140},
		{"days with an air frost", float64(s.frostDays), 40, 130},
		{"hours at 28 °C or more", float64(s.hotHours), 30, 150},
	})

	// Solar is zero at night: every hour that ends before the sun is up
	// (cos z < 0 at both ends and the middle) has 0 W/m².
	solar := tb.col("solar_wm2")
	for i, tm := range tb.times {
		if cosZenith(tm, siteLatDeg, siteLonDeg) < -0.05 && cosZenith(tm.Add(-time.Hour), siteLatDeg, siteLonDeg) < -0.05 &&
			solar[i] != 0 && !math.IsNaN(solar[i]) {
			t.Fatalf("%v: solar %g W/m² at night", tm, solar[i])
		}
	}
}

// The hot spells must give the demo its hot, still, sunny afternoons
// (design targets, invented).
func TestOutdoorHotStillSunnyHours(t *testing.T) {
	tb := files(t)["demo/climate-outdoor.csv"]
	temp, wind, solar := tb.col("temp_c"), tb.col("wind_ms"), tb.col("solar_wm2")
	n := 0
	for i := range tb.times {
		if temp[i] >= 29 && wind[i] <= 2.5 && solar[i] >= 600 {
			n++
		}
	}
	if n < 10 {
		t.Errorf("%d hours at ≥ 29 °C, ≤ 2.5 m/s and ≥ 600 W/m², want at least 10", n)
	}
}

// Sanity checks of the invented bathroom logger record (design targets).
func TestBathroomStatisticsSanity(t *testing.T) {
	tb := files(t)["demo/climate-bathroom.csv"]
	s := computeStats(tb)
	if s.rows != outdoorHours || len(s.gaps) != 0 || s.empty != 0 {
		t.Errorf("rows %d gaps %v empty %d, want %d complete rows", s.rows, s.gaps, s.empty, outdoorHours)
	}
	rh := tb.col("rh_pct")
	dayMax := map[string]float64{}
	for i, tm := range tb.times {
		d := tm.Add(-time.Minute).Format("2006-01-02")
		dayMax[d] = math.Max(dayMax[d], rh[i])
	}
	showerDays := 0
	for _, v := range dayMax {
		if v >= 90 {
			showerDays++
		}
	}
	winterRH := (s.monthRHPct[11] + s.monthRHPct[0] + s.monthRHPct[1]) / 3
	checkBands(t, "bathroom", []band{
		{"minimum temperature °C", s.minTempC, 18, 19.5},
		{"maximum temperature °C", s.maxTmp, 23, 27},
		{"January mean temperature °C", s.monthTempC[0], 19.5, 21},
		{"July mean temperature °C", s.monthTempC[6], 21, 24},
		{"December-February mean RH %", winterRH, 55, 65},
		{"mean RH 00-05 UTC (no showers) %", s.nightRHPct, 50, 62},
		{"highest hourly RH %", s.maxRH, 95, 99},
		{"share of days with an hour at 90 % RH or more", float64(showerDays) / float64(len(dayMax)), 0.45, 0.85},
	})
}

// Sanity checks of the invented cellar logger record (design targets).
func TestBasementStatisticsSanity(t *testing.T) {
	tb := files(t)["basement/climate-basement.csv"]
	s := computeStats(tb)
	if s.interval != 15*time.Minute || s.rows != basementSteps || len(s.gaps) != 0 {
		t.Errorf("interval %v rows %d gaps %v, want 15 min, %d rows, no gaps", s.interval, s.rows, s.gaps, basementSteps)
	}
	lo, hi := 100.0, 0.0
	for _, v := range s.monthRHPct {
		lo, hi = math.Min(lo, v), math.Max(hi, v)
	}
	lateSummer := (s.monthRHPct[6] + s.monthRHPct[7] + s.monthRHPct[8]) / 3
	winter := (s.monthRHPct[11] + s.monthRHPct[0] + s.monthRHPct[1]) / 3
	coldest, warmest := 0, 0
	for m := range s.monthTempC {
		if s.monthTempC[m] < s.monthTempC[coldest] {
			coldest = m
		}
		if s.monthTempC[m] > s.monthTempC[warmest] {
			warmest = m
		}
	}
	checkBands(t, "basement", []band{
		{"minimum temperature °C", s.minTempC, 9, 11},
		{"maximum temperature °C", s.maxTmp, 16, 18},
		{"coldest month (1-12), lagging the air", float64(coldest + 1), 3, 4},
		{"warmest month (1-12), lagging the air", float64(warmest + 1), 8, 10},
		{"lowest monthly mean RH %", lo, 70, 80},
		{"highest monthly mean RH %", hi, 88, 95},
		{"July-September minus December-February RH %", lateSummer - winter, 8, 25},
		{"lowest RH %", s.minRHPct, 60, 75},
		{"highest RH %", s.maxRH, 94, 98.5},
	})
}

// The foreign-layout sample holds the same readings as the cellar record,
// one hour ahead on the wall clock (British Summer Time).
func TestSampleMatchesBasementRecord(t *testing.T) {
	m := files(t)
	sample, cellar := m["basement/logger-export-sample.csv"], m["basement/climate-basement.csv"]
	if got := strings.Join(sample.header, ";"); got != "Datum;Temperatur;rF" {
		t.Fatalf("sample header %q", got)
	}
	if len(sample.times) != sampleSteps {
		t.Fatalf("sample has %d rows, want %d", len(sample.times), sampleSteps)
	}
	idx := map[time.Time]int{}
	for i, tm := range cellar.times {
		idx[tm] = i
	}
	for k, local := range sample.times {
		utc := local.Add(-time.Hour)
		i, ok := idx[utc]
		if !ok {
			t.Fatalf("sample row %d: %v local has no reading at %v in the cellar record", k, local, utc)
		}
		if sample.cols[0][k] != cellar.cols[0][i] || sample.cols[1][k] != cellar.cols[1][i] {
			t.Fatalf("sample row %d (%v): %g;%g, cellar record %g,%g", k, local,
				sample.cols[0][k], sample.cols[1][k], cellar.cols[0][i], cellar.cols[1][i])
		}
	}
}

// Check of the generator's own sun routine against geometry: at solar noon
// on the June solstice the sun stands 90° − φ + ε above the horizon, with
// ε = 23.44° the obliquity of the ecliptic (IAU 2006 value 23°26′21″, from
// memory). Spencer's series is good to about 0.03° in declination
// (Spencer 1971, Search 2(5)), and the hour angle is a few arc-minutes off
// at 12:00 UTC on the Greenwich meridian, so 0.3° is allowed.
func TestSunNoonHeightAtSolstice(t *testing.T) {
	noon := time.Date(2022, 6, 21, 12, 2, 0, 0, time.UTC) // equation of time ≈ −1.7 min
	got := 90 - math.Acos(cosZenith(noon, 51, 0))*180/math.Pi
	want := 90 - 51 + 23.44
	if math.Abs(got-want) > 0.3 {
		t.Errorf("solstice noon sun height at 51° N = %.2f°, want %.2f° ± 0.3", got, want)
	}
}
