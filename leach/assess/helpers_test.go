package assess

import (
	"fmt"
	"math"
	"strings"
	"testing"
	"testing/fstest"

	"github.com/gyprisk/gyprisk/climate"
	"time"
)

// hourRow is one hour of a test record.
type hourRow struct {
	tempC, rhPct, rainMM, windMS, dirDeg, solarWM2 float64
}

// csvRecord writes hourly rows starting at start (the end of the first
// hour) in gyprisk's record format.
func csvRecord(start time.Time, rows []hourRow) string {
	var b strings.Builder
	b.WriteString("time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n")
	for i, r := range rows {
		fmt.Fprintf(&b, "%s,%.3f,%.3f,%.4f,%.3f,%.1f,%.2f\n", start.Add(time.Duration(i)*time.Hour).Format(time.RFC3339),
			r.tempC, r.rhPct, r.rainMM, r.windMS, r.dirDeg, r.solarWM2)
	}
	return b.String()
}

// synthYear builds a deterministic test climate of n hours: a seasonal and
// daily temperature cycle, humidity falling by day, a rain hour every
// rainEvery hours of rainMM from the south-west in a steady wind, and a
// clear-sky-like sun. It exercises the engine; it is not a check value.
func synthYear(n, rainEvery int, rainMM float64) []hourRow {
	rows := make([]hourRow, n)
	for i := range rows {
		day := float64(i) / 24
		hour := float64(i % 24)
		season := -math.Cos(2 * math.Pi * (day - 15) / 365.25)
		t := 10 + 7*season + 4*math.Sin(2*math.Pi*(hour-9)/24)
		rh := 80 - 12*math.Sin(2*math.Pi*(hour-9)/24)
		sun := math.Max(0, math.Sin(math.Pi*(hour-6)/12)) * (450 + 250*season)
		r := hourRow{tempC: t, rhPct: rh, windMS: 4 + 2*math.Sin(day), dirDeg: 225, solarWM2: sun}
		if rainEvery > 0 && i%rainEvery == 0 {
			r.rainMM = rainMM
			r.rhPct = 96
			r.solarWM2 = sun * 0.2
		}
		rows[i] = r
	}
	return rows
}

// testProject parses a project file whose records live in memory.
func testProject(t testing.TB, toml string, files map[string]string) *Project {
	t.Helper()
	fsys := fstest.MapFS{"p/project.toml": {Data: []byte(toml)}}
	for name, data := range files {
		fsys["p/"+name] = &fstest.MapFile{Data: []byte(data)}
	}
	p, err := LoadFS(fsys, "p/project.toml")
	if err != nil {
		t.Fatal(err)
	}
	return p
}

var testStart = time.Date(2021, 1, 1, 1, 0, 0, 0, time.UTC)

func within(got, want, tol float64) bool { return math.Abs(got-want) <= tol }

// hourRowRecord is a minimal record for transform tests.
type hourRowRecord struct{ tempC, rhPct, rainMM, windMS float64 }

type hourRowRecords []hourRowRecord

func (h hourRowRecords) records() []climate.Record {
	out := make([]climate.Record, len(h))
	for i, r := range h {
		out[i] = climate.Record{Time: testStart.Add(time.Duration(i) * time.Hour), TempC: r.tempC, RHPct: r.rhPct, RainMM: r.rainMM, WindMS: r.windMS}
	}
	return out
}

// outdoorHours reads a test project's outdoor record and precomputes its
// site hours and the chemistry, as Run does for the present climate.
func outdoorHours(t testing.TB, p *Project) (*siteHours, *chemistry) {
	t.Helper()
	rec, err := p.loadRecord(p.Site.Climate, roleOutdoor)
	if err != nil {
		t.Fatal(err)
	}
	st, err := p.site()
	if err != nil {
		t.Fatal(err)
	}
	sh, err := newSiteHours(st, rec.hourly, rec.hourly.Records)
	if err != nil {
		t.Fatal(err)
	}
	chem, err := newChemistry()
	if err != nil {
		t.Fatal(err)
	}
	return sh, chem
}
