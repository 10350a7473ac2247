package assess

import (
	"math"
	"testing"
)

// TestFieldSurfaceLowering checks the leaching model against measured
// lowering of a bare gypsum rock surface in a real climate.
//
// Source: Sanna, De Waele, Calaforra & Forti 2015, Geomorphology 228,
// 213–225: micro-erosion meter stations on the external gypsum surface of
// the Sorbas karst (Almería, SE Spain) lowered regularly at 0.170 mm/yr
// over about 18 years (value read from the abstract).
//
// The site's climate enters as published totals: about 270 mm of rain a
// year (Sorbas lies in the 150–300 mm semi-arid zone of SE Spain; the
// figure is from memory) falling in few, intense events, and a mean
// temperature near 17 °C (from memory). The hourly sequence within those
// totals is synthetic (it is not a check value). The rock is selenitic
// gypsum: bulk density 2300 kg/m³, near the crystal density of gypsum
// (2.31 g/cm³; Robie & Hemingway 1995, USGS Bull. 2131, from memory) and
// a gypsum fraction of 0.95.
//
// The model treats all rain as running off the surface; on rock some of it
// soaks in and evaporates, redepositing gypsum, so the model sits on the
// high side. The check is of the order of magnitude: within a factor of
// 2.5 either way of the measured rate.
func TestFieldSurfaceLowering(t *testing.T) {
	const hours = 3 * 8766
	rows := make([]hourRow, hours)
	const eventMM, eventHours = 3.0, 2 // 45 events a year of 2 h at 3 mm/h
	every := 8766 / 45
	var rain float64
	for i := range rows {
		day := float64(i) / 24
		hour := float64(i % 24)
		season := -math.Cos(2 * math.Pi * (day - 15) / 365.25)
		sun := math.Max(0, math.Sin(math.Pi*(hour-6)/12)) * (650 + 250*season)
		r := hourRow{tempC: 17 + 7*season + 6*math.Sin(2*math.Pi*(hour-9)/24),
			rhPct: 60 - 15*math.Sin(2*math.Pi*(hour-9)/24), windMS: 3, dirDeg: 90, solarWM2: sun}
		if i%every < eventHours {
			r.rainMM, r.rhPct, r.solarWM2 = eventMM, 95, sun*0.2
			rain += eventMM
		}
		rows[i] = r
	}
	proj := `
[site]
name = "gypsum karst surface (published totals, synthetic hours)"
latitude_deg = 37.1
longitude_deg = -2.1
terrain = "II"
climate = "c.csv"

[[element]]
id = "rock"
material = "gypsum-stucco"
bulk_density_kg_m3 = 2300
gypsum_fraction = 0.95
solar_absorptance = 0.4
azimuth_deg = 180
tilt_deg = 10
height_m = 1
flow_length_m = 2
thickness_mm = 100
`
	p := testProject(t, proj, map[string]string{"c.csv": csvRecord(testStart, rows)})
	e := find(t, runOne(t, p, Options{}), "rock", "base", "present")
	const measured = 0.170 // mm/yr, Sanna et al. 2015
	got := e.Leaching.RecessionMMPerYear
	t.Logf("rain %.0f mm/yr, model %.3f mm/yr, measured %.3f mm/yr (ratio %.2f)", rain/3, got, measured, got/measured)
	if got < measured/2.5 || got > measured*2.5 {
		t.Errorf("model recession %.3f mm/yr, measured %.3f mm/yr (Sanna et al. 2015): outside a factor of 2.5", got, measured)
	}
}
