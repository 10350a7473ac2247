package climate

import (
	"bytes"
	"encoding/csv"
	"io"
	"math"
	"strconv"
	"sync"
	"testing"
	"time"
)

// benchRecord generates an hourly record of n rows in the gyprisk format
// (invented values with daily and yearly cycles; a benchmark input only).
func benchRecord(n int) []byte {
	var b bytes.Buffer
	b.WriteString("time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n")
	t := time.Date(1991, 1, 1, 1, 0, 0, 0, time.UTC)
	buf := make([]byte, 0, 128)
	for i := range n {
		day := 2 * math.Pi * float64(i%24) / 24
		year := 2 * math.Pi * float64(i%8766) / 8766
		temp := 10 - 8*math.Cos(year) - 4*math.Cos(day)
		rh := 75 + 15*math.Cos(day)
		rain := 0.0
		if i%7 == 0 {
			rain = float64(i%13) / 10
		}
		wind := 1 + float64(i%90)/10
		dir := float64((i * 37) % 360)
		solar := math.Max(0, 600*math.Sin(day-math.Pi/2))
		buf = buf[:0]
		buf = t.AppendFormat(buf, time.RFC3339)
		for _, v := range []struct {
			x    float64
			prec int
		}{{temp, 1}, {rh, 1}, {rain, 1}, {wind, 1}, {dir, 0}, {solar, 0}} {
			buf = append(buf, ',')
			buf = strconv.AppendFloat(buf, v.x, 'f', v.prec, 64)
		}
		buf = append(buf, '\n')
		b.Write(buf)
		t = t.Add(time.Hour)
	}
	return b.Bytes()
}

var (
	benchOnce sync.Once
	benchData map[string][]byte
	sinkF     float64
	sinkN     int
)

// benchSizes are the tiers: one year and thirty years of hourly data.
var benchSizes = []struct {
	name string
	rows int
}{{"1y", 8766}, {"30y", 263000}}

func benchInput(name string) []byte {
	benchOnce.Do(func() {
		benchData = map[string][]byte{}
		for _, s := range benchSizes {
			benchData[s.name] = benchRecord(s.rows)
		}
	})
	return benchData[name]
}

// BenchmarkReadAll reads and checks the whole record into a Series.
func BenchmarkReadAll(b *testing.B) {
	for _, sz := range benchSizes {
		b.Run(sz.name, func(b *testing.B) {
			data := benchInput(sz.name)
			b.SetBytes(int64(len(data)))
			b.ReportAllocs()
			for b.Loop() {
				s, err := NewReader(bytes.NewReader(data)).ReadAll()
				if err != nil {
					b.Fatal(err)
				}
				sinkN = len(s.Records)
			}
		})
	}
}

// BenchmarkRead streams the record without keeping it (memory per row).
func BenchmarkRead(b *testing.B) {
	for _, sz := range benchSizes {
		b.Run(sz.name, func(b *testing.B) {
			data := benchInput(sz.name)
			b.SetBytes(int64(len(data)))
			b.ReportAllocs()
			for b.Loop() {
				r := NewReader(bytes.NewReader(data))
				for {
					rec, err := r.Read()
					if err == io.EOF {
						break
					}
					if err != nil {
						b.Fatal(err)
					}
					sinkF += rec.TempC
				}
			}
		})
	}
}

// BenchmarkBaselineCSVParse only splits the same bytes with encoding/csv
// and parses the numbers with strconv.ParseFloat: no time stamps, no
// checks, nothing kept.
func BenchmarkBaselineCSVParse(b *testing.B) {
	for _, sz := range benchSizes {
		b.Run(sz.name, func(b *testing.B) {
			data := benchInput(sz.name)
			b.SetBytes(int64(len(data)))
			b.ReportAllocs()
			for b.Loop() {
				r := csv.NewReader(bytes.NewReader(data))
				r.ReuseRecord = true
				if _, err := r.Read(); err != nil { // header
					b.Fatal(err)
				}
				for {
					rec, err := r.Read()
					if err == io.EOF {
						break
					}
					if err != nil {
						b.Fatal(err)
					}
					for _, f := range rec[1:] {
						v, err := strconv.ParseFloat(f, 64)
						if err != nil {
							b.Fatal(err)
						}
						sinkF += v
					}
				}
			}
		})
	}
}
