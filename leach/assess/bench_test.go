package assess

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
	"strings"
	"testing"
)

// benchProject has ten elements of every kind on one site: walls of four
// orientations and two heights, a cornice top, a soffit, a wall with a
// water-repellent finish and an interior surface with a temperature factor.
const benchProject = `
[site]
name = "bench"
latitude_deg = 51
longitude_deg = -2
terrain = "III"
climate = "c.csv"

[[element]]
id = "w-sw"
material = "gypsum-lime-mortar"
azimuth_deg = 225
height_m = 6
obstruction_m = 30
runoff_height_m = 3
thickness_mm = 20

[[element]]
id = "w-s"
material = "gypsum-plaster"
azimuth_deg = 180
height_m = 6
thickness_mm = 20

[[element]]
id = "w-w"
material = "gypsum-plaster"
azimuth_deg = 270
height_m = 12
thickness_mm = 20

[[element]]
id = "w-n"
material = "gypsum-stucco"
azimuth_deg = 0
height_m = 3
thickness_mm = 20

[[element]]
id = "w-e"
material = "gypsum-stucco"
azimuth_deg = 90
height_m = 9
thickness_mm = 20

[[element]]
id = "cornice"
material = "gypsum-stucco"
azimuth_deg = 225
tilt_deg = 5
height_m = 11
flow_length_m = 0.4
thickness_mm = 10

[[element]]
id = "sill"
material = "gypsum-plaster"
azimuth_deg = 180
tilt_deg = 30
height_m = 2
thickness_mm = 10

[[element]]
id = "soffit"
material = "gypsum-plaster"
azimuth_deg = 45
tilt_deg = 180
height_m = 3
thickness_mm = 10

[[element]]
id = "w-rep"
material = "gypsum-lime-mortar"
azimuth_deg = 225
height_m = 6
repellent_fraction = 0.7
thickness_mm = 20

[[element]]
id = "ceiling"
material = "gypsum-board"
exposure = "interior"
tilt_deg = 180
temperature_factor = 0.8
humidity_class = 3
thickness_mm = 12.5
`

var benchRecords = map[int]string{}

// benchRecord returns an n-hour record (generated once per size).
func benchRecord(n int) string {
	if s, ok := benchRecords[n]; ok {
		return s
	}
	s := csvRecord(testStart, synthYear(n, 11, 1.2))
	benchRecords[n] = s
	return s
}

var sinkOutput *Output
var sinkFloat float64

// BenchmarkAssess is the whole assessment (read, check, ten elements, all
// outputs in memory) on records of 1, 10 and 30 years.
func BenchmarkAssess(b *testing.B) {
	for _, years := range []int{1, 10, 30} {
		n := years * 8766
		rec := benchRecord(n)
		b.Run(fmt.Sprintf("%dy", years), func(b *testing.B) {
			p := testProject(b, benchProject, map[string]string{"c.csv": rec})
			b.SetBytes(int64(len(rec)))
			b.ReportAllocs()
			for b.Loop() {
				out, err := Run(p, Options{})
				if err != nil {
					b.Fatal(err)
				}
				sinkOutput = out
			}
		})
	}
}

// BenchmarkAssessSamples is the assessment with 1000 Monte Carlo samples.
func BenchmarkAssessSamples(b *testing.B) {
	for _, years := range []int{1, 30} {
		rec := benchRecord(years * 8766)
		b.Run(fmt.Sprintf("%dy", years), func(b *testing.B) {
			p := testProject(b, benchProject, map[string]string{"c.csv": rec})
			b.ReportAllocs()
			for b.Loop() {
				out, err := Run(p, Options{Samples: 1000, Seed: 7, SeedGiven: true})
				if err != nil {
					b.Fatal(err)
				}
				sinkOutput = out
			}
		})
	}
}

// BenchmarkBaselineCSVParse only parses the same bytes with encoding/csv
// and strconv.ParseFloat: the yardstick the assessment is measured against.
func BenchmarkBaselineCSVParse(b *testing.B) {
	for _, years := range []int{1, 10, 30} {
		rec := benchRecord(years * 8766)
		b.Run(fmt.Sprintf("%dy", years), func(b *testing.B) {
			b.SetBytes(int64(len(rec)))
			b.ReportAllocs()
			for b.Loop() {
				r := csv.NewReader(strings.NewReader(rec))
				r.ReuseRecord = true
				if _, err := r.Read(); err != nil {
					b.Fatal(err)
				}
				var s float64
				for {
					row, err := r.Read()
					if err == io.EOF {
						break
					}
					if err != nil {
						b.Fatal(err)
					}
					for _, f := range row[1:] {
						v, err := strconv.ParseFloat(f, 64)
						if err != nil {
							b.Fatal(err)
						}
						s += v
					}
				}
				sinkFloat = s
			}
		})
	}
}
