package main

import (
	"bufio"
	"bytes"
	"fmt"
	"math"
	"strconv"
	"strings"
	"text/tabwriter"
	"time"
)

// table is a generated file read back: the values as written (NaN where a
// cell is empty), for the statistics and the tests. It reads only the
// layouts this generator writes; the real reader lives in package climate.
type table struct {
	header []string
	times  []time.Time
	cols   [][]float64 // cols[j][i]: column j+1 of row i
}

// parseTable reads a file written by this generator.
func parseTable(data []byte) (*table, error) {
	t := &table{}
	sc := bufio.NewScanner(bytes.NewReader(data))
	sep := ","
	line := 0
	for sc.Scan() {
		line++
		s := sc.Text()
		if strings.HasPrefix(s, "#") {
			continue
		}
		if t.header == nil {
			if strings.Contains(s, ";") {
				sep = ";"
			}
			t.header = strings.Split(s, sep)
			t.cols = make([][]float64, len(t.header)-1)
			continue
		}
		f := strings.Split(s, sep)
		if len(f) != len(t.header) {
			return nil, fmt.Errorf("line %d: %d fields, want %d", line, len(f), len(t.header))
		}
		tm, err := time.Parse(time.RFC3339, f[0])
		if err != nil {
			tm, err = time.Parse("2006-01-02T15:04:05", f[0])
		}
		if err != nil {
			return nil, fmt.Errorf("line %d: %v", line, err)
		}
		t.times = append(t.times, tm)
		for j, c := range f[1:] {
			v := math.NaN()
			if c != "" {
				if sep == ";" {
					c = strings.Replace(c, ",", ".", 1)
				}
				v, err = strconv.ParseFloat(c, 64)
				if err != nil {
					return nil, fmt.Errorf("line %d, column %d: %v", line, j+2, err)
				}
			}
			t.cols[j] = append(t.cols[j], v)
		}
	}
	if t.header == nil {
		return nil, fmt.Errorf("no header row")
	}
	return t, sc.Err()
}

// col returns the values of the named column, or nil.
func (t *table) col(name string) []float64 {
	for j, h := range t.header[1:] {
		if h == name {
			return t.cols[j]
		}
	}
	return nil
}

// recordStats are the sanity statistics of a generated record: checks that
// the invented data look like a temperate maritime climate, not physics.
type recordStats struct {
	rows, empty      int
	gaps             []string // "from/to (n h)"
	years            float64  // covered length: rows × interval / 8766 h
	meanTempC        float64
	minTempC, maxTmp float64
	meanRHPct        float64
	minRHPct, maxRH  float64
	monthTempC       [12]float64 // mean by calendar month
	monthRHPct       [12]float64
	// outdoor only
	rainMMPerYear  float64
	monthRainMM    [12]float64 // mean total per calendar month
	wetHourFrac    float64     // hours with ≥ 0.1 mm
	maxRainMMPerH  float64
	downpourHours  int // hours with ≥ 10 mm
	meanWindMS     float64
	winterWindMS   float64 // Dec–Feb
	summerWindMS   float64 // Jun–Aug
	sectorPct      [12]float64
	meanSolarWM2   float64
	frostDays      int     // days with a minimum below 0 °C
	hotHours       int     // hours at 28 °C or more
	springMinRHPct float64 // mean daily minimum RH, March–May
	nightRHPct     float64 // mean RH 00–05 UTC
	rainRHPct      float64 // mean RH in hours with rain
	dailyPeakRHPct float64 // mean of the daily maximum RH
	interval       time.Duration
}

func computeStats(t *table) recordStats {
	var s recordStats
	s.rows = len(t.times)
	if s.rows < 2 {
		return s
	}
	s.interval = t.times[1].Sub(t.times[0])
	for i := 1; i < s.rows; i++ {
		if d := t.times[i].Sub(t.times[i-1]); d > s.interval {
			s.gaps = append(s.gaps, fmt.Sprintf("%s to %s (%g h missing)",
				t.times[i-1].Add(s.interval).Format(time.RFC3339), t.times[i].Add(-s.interval).Format(time.RFC3339),
				d.Hours()-s.interval.Hours()))
		}
	}
	for _, c := range t.cols {
		for _, v := range c {
			if math.IsNaN(v) {
				s.empty++
			}
		}
	}
	s.years = float64(s.rows) * s.interval.Hours() / 8766
	temp, rh := t.col("temp_c"), t.col("rh_pct")
	if temp == nil || rh == nil { // a foreign layout: time, temperature, RH
		temp, rh = t.cols[0], t.cols[1]
	}
	rain, wind, dir, solar := t.col("rain_mm"), t.col("wind_ms"), t.col("wind_dir_deg"), t.col("solar_wm2")

	var monthN, monthRHN [12]float64
	var sumT, nT, sumRH, nRH float64
	s.minTempC, s.maxTmp, s.minRHPct, s.maxRH = math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1)
	dayMin := map[string]float64{}
	dayMinRH := map[string]float64{}
	dayMaxRH := map[string]float64{}
	var nightRH, nNight, rainRH, nRainRH float64
	for i, tm := range t.times {
		mid := tm.Add(-s.interval / 2)
		m := mid.Month() - 1
		day := mid.Format("2006-01-02")
		if v := temp[i]; !math.IsNaN(v) {
			sumT += v
			nT++
			s.monthTempC[m] += v
			monthN[m]++
			s.minTempC = math.Min(s.minTempC, v)
			s.maxTmp = math.Max(s.maxTmp, v)
			if old, ok := dayMin[day]; !ok || v < old {
				dayMin[day] = v
			}
			if v >= 28 {
				s.hotHours++
			}
		}
		if v := rh[i]; !math.IsNaN(v) {
			sumRH += v
			nRH++
			s.monthRHPct[m] += v
			monthRHN[m]++
			s.minRHPct = math.Min(s.minRHPct, v)
			s.maxRH = math.Max(s.maxRH, v)
			if m >= 2 && m <= 4 {
				if old, ok := dayMinRH[day]; !ok || v < old {
					dayMinRH[day] = v
				}
			}
			if old, ok := dayMaxRH[day]; !ok || v > old {
				dayMaxRH[day] = v
			}
			if mid.Hour() < 5 {
				nightRH += v
				nNight++
			}
			if rain != nil && rain[i] > 0 {
				rainRH += v
				nRainRH++
			}
		}
	}
	s.meanTempC, s.meanRHPct = sumT/nT, sumRH/nRH
	for m := range 12 {
		s.monthTempC[m] /= monthN[m]
		s.monthRHPct[m] /= monthRHN[m]
	}
	for _, v := range dayMin {
		if v < 0 {
			s.frostDays++
		}
	}
	s.springMinRHPct = meanOf(dayMinRH)
	s.dailyPeakRHPct = meanOf(dayMaxRH)
	s.nightRHPct = nightRH / nNight
	if nRainRH > 0 {
		s.rainRHPct = rainRH / nRainRH
	}
	if rain == nil {
		return s
	}

	var sumRain, nRain, wetHours float64
	s.meanWindMS = meanNaN(wind)
	var wW, nWW, wS, nWS, nDir float64
	for i, tm := range t.times {
		mid := tm.Add(-s.interval / 2)
		m := mid.Month() - 1
		if v := rain[i]; !math.IsNaN(v) {
			sumRain += v
			nRain++
			s.monthRainMM[m] += v
			if v >= 0.1 {
				wetHours++
			}
			s.maxRainMMPerH = math.Max(s.maxRainMMPerH, v)
			if v >= 10 {
				s.downpourHours++
			}
		}
		if v := wind[i]; !math.IsNaN(v) {
			switch m {
			case 11, 0, 1:
				wW += v
				nWW++
			case 5, 6, 7:
				wS += v
				nWS++
			}
		}
		if v := dir[i]; !math.IsNaN(v) {
			s.sectorPct[int(math.Mod(v+15, 360)/30)]++
			nDir++
		}
	}
	s.rainMMPerYear = sumRain / (nRain * s.interval.Hours() / 8766)
	for m := range 12 {
		s.monthRainMM[m] /= s.years
	}
	s.wetHourFrac = wetHours / nRain
	s.winterWindMS, s.summerWindMS = wW/nWW, wS/nWS
	for k := range s.sectorPct {
		s.sectorPct[k] *= 100 / nDir
	}
	s.meanSolarWM2 = meanNaN(solar)
	return s
}

func meanNaN(x []float64) float64 {
	var sum, n float64
	for _, v := range x {
		if !math.IsNaN(v) {
			sum += v
			n++
		}
	}
	return sum / n
}

func meanOf(m map[string]float64) float64 {
	var sum float64
	for _, v := range m {
		sum += v
	}
	return sum / float64(len(m))
}

// summarise returns a readable summary of a generated file.
func summarise(data []byte, name string) (string, error) {
	t, err := parseTable(data)
	if err != nil {
		return "", fmt.Errorf("%s: %w", name, err)
	}
	s := computeStats(t)
	var b strings.Builder
	w := tabwriter.NewWriter(&b, 0, 4, 2, ' ', 0)
	fmt.Fprintf(w, "rows\t%d (interval %v, %.2f years), empty cells %d, gaps %v\n", s.rows, s.interval, s.years, s.empty, s.gaps)
	fmt.Fprintf(w, "temperature\tmean %.2f °C, min %.1f, max %.1f, frost days %d, hours ≥ 28 °C %d\n",
		s.meanTempC, s.minTempC, s.maxTmp, s.frostDays, s.hotHours)
	fmt.Fprintf(w, "RH\tmean %.1f %%, min %.1f, max %.1f, 00-05 UTC %.1f, mean daily max %.1f\n",
		s.meanRHPct, s.minRHPct, s.maxRH, s.nightRHPct, s.dailyPeakRHPct)
	if t.col("rain_mm") != nil {
		fmt.Fprintf(w, "RH\tin rain %.1f %%, mean daily minimum March-May %.1f %%\n", s.rainRHPct, s.springMinRHPct)
	}
	fmt.Fprintf(w, "month T\t%s\n", fmtMonths(s.monthTempC[:], 1))
	fmt.Fprintf(w, "month RH\t%s\n", fmtMonths(s.monthRHPct[:], 0))
	if t.col("rain_mm") != nil {
		fmt.Fprintf(w, "rain\t%.0f mm/year, wet hours %.1f %%, max %.1f mm/h, hours ≥ 10 mm %d\n",
			s.rainMMPerYear, 100*s.wetHourFrac, s.maxRainMMPerH, s.downpourHours)
		fmt.Fprintf(w, "month rain\t%s\n", fmtMonths(s.monthRainMM[:], 0))
		fmt.Fprintf(w, "wind\tmean %.2f m/s, Dec–Feb %.2f, Jun–Aug %.2f\n", s.meanWindMS, s.winterWindMS, s.summerWindMS)
		fmt.Fprintf(w, "rose %%\t%s (sectors 0°, 30°, … 330°)\n", fmtMonths(s.sectorPct[:], 1))
		fmt.Fprintf(w, "solar\tmean %.1f W/m² (%.0f kWh/m² a year)\n", s.meanSolarWM2, s.meanSolarWM2*8.766)
	}
	w.Flush()
	return b.String(), nil
}

func fmtMonths(x []float64, prec int) string {
	f := make([]string, len(x))
	for i, v := range x {
		f[i] = strconv.FormatFloat(v, 'f', prec, 64)
	}
	return strings.Join(f, " ")
}
