package climate

import (
	"encoding/json"
	"math"
	"testing"
)

func TestSummarise(t *testing.T) {
	// Hand-checkable: five hourly records across a month boundary with one
	// missing hour (02:00Z), RH 101 clipped, one empty rain cell.
	s := mustRead(t, `time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg
2024-01-31T23:00Z,2,80,1,9,270
2024-02-01T00:00Z,4,101,1,0,0
2024-02-01T01:00Z,6,90,,0,0
2024-02-01T03:00Z,8,70,0,0,0
`)
	sum, err := Summarise(s)
	if err != nil {
		t.Fatal(err)
	}
	checks := []struct {
		name      string
		got, want float64
	}{
		{"records", float64(sum.Records), 4},
		{"median interval", sum.MedianIntervalMin, 60},
		{"coverage: 4 of 5 hours", float64(sum.CoveragePct), 80},
		{"mean temp (2+4+6+8)/4", float64(sum.Means.TempC), 5},
		{"mean RH (80+100+90+70)/4", float64(sum.Means.RHPct), 85},
		{"rain per year: 2 mm in 3 h", float64(sum.RainMMPerYear), 2 / (3 / 8766.0)},
		{"january temp", float64(sum.Monthly[0].TempMeanC), 3},
		{"february hours", sum.Monthly[1].Hours, 2},
		{"february rain", float64(sum.Monthly[1].RainMM), 0},
		{"gap hours", sum.Gaps[0].Hours, 1},
		{"clipped rh", float64(sum.Clipped["rh_pct"]), 1},
		{"missing rain", float64(sum.Missing["rain_mm"]), 1},
		// one wet head-on hour, 1 mm at 9 m/s: (2/9)·9 = 2 L/m² in 3 valid hours
		{"driving rain 270°", float64(sum.DrivingRain[9].LPerM2PerYear), 2 / (3 / 8766.0)},
	}
	for _, c := range checks {
		if math.Abs(c.got-c.want) > 1e-9*math.Max(1, math.Abs(c.want)) {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	if sum.Monthly[0].Month != "2024-01" || sum.Monthly[1].Month != "2024-02" || len(sum.Monthly) != 2 {
		t.Errorf("months %+v", sum.Monthly)
	}
	if len(sum.DrivingRain) != 12 || sum.SpellIndex != nil || sum.SpellIndexNote == "" {
		t.Errorf("driving rain rows %d, spell %v note %q", len(sum.DrivingRain), sum.SpellIndex, sum.SpellIndexNote)
	}

	// The JSON keys are a contract (issue 2): check every one.
	b, err := json.Marshal(sum)
	if err != nil {
		t.Fatal(err)
	}
	var m map[string]any
	if err := json.Unmarshal(b, &m); err != nil {
		t.Fatal(err)
	}
	for _, k := range []string{"records", "start", "end", "coverage_pct", "gaps", "means", "rain_mm_per_year", "monthly", "driving_rain_index", "median_interval_min", "missing", "clipped", "columns"} {
		if _, ok := m[k]; !ok {
			t.Errorf("JSON lacks key %q", k)
		}
	}
	if m["start"] != "2024-01-31T22:00:00Z" || m["end"] != "2024-02-01T03:00:00Z" {
		t.Errorf("start %v end %v", m["start"], m["end"])
	}
	sub := func(v any, keys ...string) {
		o, ok := v.(map[string]any)
		if !ok {
			t.Fatalf("%v is not an object", v)
		}
		for _, k := range keys {
			if _, ok := o[k]; !ok {
				t.Errorf("JSON object lacks %q: %v", k, o)
			}
		}
	}
	sub(m["means"], "temp_c", "rh_pct")
	sub(m["gaps"].([]any)[0], "from", "to", "hours")
	sub(m["monthly"].([]any)[0], "month", "temp_mean_c", "rh_mean_pct", "rain_mm", "hours")
	sub(m["driving_rain_index"].([]any)[0], "azimuth_deg", "l_per_m2_per_year")
}

func TestSummariseWithoutRain(t *testing.T) {
	s := mustRead(t, "time,temp_c,rh_pct\n2024-06-01T12:00Z,21,55\n2024-06-01T13:00Z,22,50\n")
	sum, err := Summarise(s)
	if err != nil {
		t.Fatal(err)
	}
	b, _ := json.Marshal(sum)
	var m map[string]any
	_ = json.Unmarshal(b, &m)
	if m["driving_rain_index"] != nil || m["rain_mm_per_year"] != nil || sum.DrivingRainNote == "" {
		t.Errorf("without rain: index %v rain %v note %q", m["driving_rain_index"], m["rain_mm_per_year"], sum.DrivingRainNote)
	}
	if m["monthly"].([]any)[0].(map[string]any)["rain_mm"] != nil {
		t.Error("monthly rain should be null without a rain column")
	}
}
