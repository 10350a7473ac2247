package assess_test

import (
	"fmt"
	"testing/fstest"
	"time"

	"github.com/gyprisk/gyprisk/leach/assess"
)

// Example assesses a wall under a four-hour (invented) record: two hours
// of rain driven onto it, one from behind, one dry. The water deposited
// is the ISO 15927-3 wall index of those hours.
func Example() {
	record := `time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2
2021-01-01T01:00:00Z,8,95,2,5,225,0
2021-01-01T02:00:00Z,8,95,1,4,270,0
2021-01-01T03:00:00Z,8,95,3,6,45,0
2021-01-01T04:00:00Z,8,90,0,3,225,0
`
	project := `
[site]
name = "example (invented)"
latitude_deg = 50
longitude_deg = 0
terrain = "II"
climate = "record.csv"

[[element]]
id = "wall"
material = "gypsum-plaster"
azimuth_deg = 225
height_m = 10
wall_factor = 0.5
thickness_mm = 10
`
	fsys := fstest.MapFS{
		"site/project.toml": {Data: []byte(project)},
		"site/record.csv":   {Data: []byte(record)},
	}
	p, err := assess.LoadFS(fsys, "site/project.toml")
	if err != nil {
		fmt.Println(err)
		return
	}
	out, err := assess.Run(p, assess.Options{Now: time.Date(2026, 1, 1, 0, 0, 0, 0, time.UTC)})
	if err != nil {
		fmt.Println(err)
		return
	}
	e := out.Elements[0]
	years := out.Climate.Years
	fmt.Printf("%s: %.3f L/m² of driving rain in %.0f hours (C_R %.4f)\n",
		e.ID, e.Water.DepositedLM2PerYear*years, years*8766, e.Inputs.RoughnessCoeff)
	fmt.Printf("dissolved %.2f g/m², ratings %s/%s/%s/%s\n", e.Leaching.DissolvedGM2PerYear*years,
		e.Ratings.Leaching, e.Ratings.Dehydration, e.Ratings.Condensation, e.Ratings.Mould)
	// Output:
	// wall: 1.352 L/m² of driving rain in 4 hours (C_R 1.0067)
	// dissolved 3.26 g/m², ratings high/low/low/low
}
