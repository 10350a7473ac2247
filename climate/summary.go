package climate

import (
	"encoding/json"
	"errors"
	"math"
	"strconv"
	"time"
)

// Float is a float64 that encodes NaN as JSON null (a missing value).
type Float float64

// MarshalJSON writes null for NaN and ±Inf, else the shortest decimal
// rounded to 4 significant decimals after the point.
func (f Float) MarshalJSON() ([]byte, error) {
	v := float64(f)
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return []byte("null"), nil
	}
	return strconv.AppendFloat(nil, math.Round(v*1e4)/1e4, 'f', -1, 64), nil
}

// UnmarshalJSON reads null as NaN.
func (f *Float) UnmarshalJSON(b []byte) error {
	if string(b) == "null" {
		*f = Float(math.NaN())
		return nil
	}
	var v float64
	if err := json.Unmarshal(b, &v); err != nil {
		return err
	}
	*f = Float(v)
	return nil
}

// Summary describes a climate record: what the surveyor checks before
// trusting it, and the figures later steps start from. The JSON keys are a
// contract with users' scripts.
type Summary struct {
	Name              string           `json:"name"`
	Records           int              `json:"records"`
	Start             time.Time        `json:"start"` // start of the first interval
	End               time.Time        `json:"end"`   // end of the last interval
	MedianIntervalMin float64          `json:"median_interval_min"`
	HoursCovered      Float            `json:"hours_covered"`
	Years             Float            `json:"years"`
	CoveragePct       Float            `json:"coverage_pct"` // hours covered / (End − Start)
	Columns           []string         `json:"columns"`
	IgnoredColumns    []string         `json:"ignored_columns"`
	Missing           map[string]int   `json:"missing"` // empty cells per column
	Clipped           map[string]int   `json:"clipped"` // values clipped to a bound per column
	Gaps              []Gap            `json:"gaps"`
	Means             Means            `json:"means"`
	RainMMPerYear     Float            `json:"rain_mm_per_year"` // null without a rain column
	Monthly           []Month          `json:"monthly"`
	DrivingRain       []DrivingRainRow `json:"driving_rain_index"` // null when a column is missing
	DrivingRainNote   string           `json:"driving_rain_note,omitempty"`
	SpellIndex        []SpellRow       `json:"spell_index"` // null when the record is too short
	SpellIndexNote    string           `json:"spell_index_note,omitempty"`
}

// Means holds time-weighted means over the whole record.
type Means struct {
	TempC Float `json:"temp_c"`
	RHPct Float `json:"rh_pct"`
}

// Month is one calendar month of the record (in the series' Location, else
// UTC), each record counted in the month where its interval's midpoint lies.
type Month struct {
	Month       string  `json:"month"` // YYYY-MM
	TempMeanC   Float   `json:"temp_mean_c"`
	RHMeanPct   Float   `json:"rh_mean_pct"`
	RainMM      Float   `json:"rain_mm"` // sum of the rain present; null without a rain column
	Hours       float64 `json:"hours"`   // hours covered by records
	RainMissing int     `json:"rain_missing,omitempty"`
}

// DrivingRainRow is the annual airfield index of one wall orientation.
type DrivingRainRow struct {
	AzimuthDeg    float64 `json:"azimuth_deg"`
	LPerM2PerYear Float   `json:"l_per_m2_per_year"`
}

// SpellRow is the spell index of one wall orientation.
type SpellRow struct {
	AzimuthDeg    float64 `json:"azimuth_deg"`
	LPerM2        Float   `json:"l_per_m2"` // three-year return spell
	LargestLPerM2 Float   `json:"largest_annual_l_per_m2"`
}

// Orientations are the wall azimuths the summary reports: 0°, 30°, … 330°.
var Orientations = [12]float64{0, 30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330}

type meanAcc struct{ sum, w float64 }

func (m *meanAcc) add(v, w float64) {
	if !math.IsNaN(v) {
		m.sum += v * w
		m.w += w
	}
}

func (m *meanAcc) mean() Float {
	if m.w == 0 {
		return Float(math.NaN())
	}
	return Float(m.sum / m.w)
}

// Summarise describes s. Means are weighted by the time each record covers
// (Series.HoursCovered's rule); rain per year is the rain present divided by
// the years of rain record; the driving rain index is AirfieldIndices for
// Orientations; the spell index needs MinSpellYears complete years.
func Summarise(s *Series) (*Summary, error) {
	return SummariseWith(s, SummaryOptions{SpellIndex: true})
}

// SummaryOptions choose the optional, costlier parts of a summary.
type SummaryOptions struct {
	// SpellIndex asks for the ISO 15927-3 spell index of every
	// orientation (a scan of the record per orientation).
	SpellIndex bool
}

// SummariseWith is Summarise with a choice of the optional parts; a part
// left out is absent (null) in the summary.
func SummariseWith(s *Series, opt SummaryOptions) (*Summary, error) {
	if len(s.Records) == 0 {
		return nil, errors.New("climate: " + nameOr(s.Name) + " has no records")
	}
	sum := &Summary{
		Name:              s.Name,
		Records:           len(s.Records),
		Start:             s.Start().UTC(),
		End:               s.End().UTC(),
		MedianIntervalMin: s.MedianIntervalS() / 60,
		Missing:           map[string]int{},
		Clipped:           map[string]int{},
		Gaps:              s.Gaps(DefaultGapFactor),
		IgnoredColumns:    s.Stats.Ignored,
	}
	if sum.Gaps == nil {
		sum.Gaps = []Gap{}
	}
	if sum.IgnoredColumns == nil {
		sum.IgnoredColumns = []string{}
	}
	for c := ColTime; c < numColumns; c++ {
		if s.Has(c) {
			sum.Columns = append(sum.Columns, c.String())
			if c != ColTime {
				sum.Missing[c.String()] = s.Stats.Missing[c]
			}
			if c == ColRH || c == ColSolar {
				sum.Clipped[c.String()] = s.Stats.Clipped[c]
			}
		}
	}
	hours := s.HoursCovered()
	sum.HoursCovered = Float(hours)
	sum.Years = Float(hours / HoursPerYear)
	if span := sum.End.Sub(sum.Start).Hours(); span > 0 {
		sum.CoveragePct = Float(100 * hours / span)
	}

	loc := s.Location
	if loc == nil {
		loc = time.UTC
	}
	med := s.MedianIntervalS()
	var temp, rh meanAcc
	rainSum, rainS := 0.0, 0.0
	type monthAcc struct {
		key         string
		temp, rh    meanAcc
		rain, hours float64
		rainMissing int
	}
	var months []*monthAcc
	for i := range s.Records {
		r := &s.Records[i]
		dt := s.coveredS(i, med)
		temp.add(r.TempC, dt)
		rh.add(r.RHPct, dt)
		mid := r.Time.Add(-time.Duration(dt / 2 * float64(time.Second))).In(loc)
		key := mid.Format("2006-01")
		if len(months) == 0 || months[len(months)-1].key != key {
			months = append(months, &monthAcc{key: key})
		}
		m := months[len(months)-1]
		m.temp.add(r.TempC, dt)
		m.rh.add(r.RHPct, dt)
		m.hours += dt / 3600
		if s.Has(ColRain) {
			if math.IsNaN(r.RainMM) {
				m.rainMissing++
			} else {
				m.rain += r.RainMM
				rainSum += r.RainMM
				rainS += dt
			}
		}
	}
	sum.Means = Means{TempC: temp.mean(), RHPct: rh.mean()}
	sum.RainMMPerYear = Float(math.NaN())
	if s.Has(ColRain) && rainS > 0 {
		sum.RainMMPerYear = Float(rainSum / (rainS / 3600 / HoursPerYear))
	}
	for _, m := range months {
		row := Month{Month: m.key, TempMeanC: m.temp.mean(), RHMeanPct: m.rh.mean(),
			RainMM: Float(math.NaN()), Hours: math.Round(m.hours*1000) / 1000, RainMissing: m.rainMissing}
		if s.Has(ColRain) {
			row.RainMM = Float(m.rain)
		}
		sum.Monthly = append(sum.Monthly, row)
	}

	idx, err := AirfieldIndices(s, Orientations[:])
	switch {
	case err == nil:
		for k, az := range Orientations {
			sum.DrivingRain = append(sum.DrivingRain, DrivingRainRow{AzimuthDeg: az, LPerM2PerYear: Float(idx[k])})
		}
		if y := float64(sum.Years); y < 10 {
			span := strconv.FormatFloat(y, 'f', 1, 64) + " years"
			if y < 1 {
				span = strconv.FormatFloat(math.Round(float64(sum.HoursCovered)), 'f', 0, 64) + " hours"
			}
			sum.DrivingRainNote = "airfield index from " + span +
				" of record; ISO 15927-3 asks for at least 10 years, so treat it as indicative"
		}
	case errors.Is(err, ErrNoColumn), errors.Is(err, ErrTooShort), errors.Is(err, ErrCoarse):
		sum.DrivingRainNote = err.Error()
	default:
		return nil, err
	}
	if sum.DrivingRain != nil && opt.SpellIndex {
		for _, az := range Orientations {
			si, err := SpellIndexOf(s, az)
			if err != nil {
				sum.SpellIndex = nil
				sum.SpellIndexNote = err.Error()
				break
			}
			largest := 0.0
			for _, v := range si.AnnualMaxLPerM2 {
				largest = math.Max(largest, v)
			}
			sum.SpellIndex = append(sum.SpellIndex, SpellRow{AzimuthDeg: az, LPerM2: Float(si.ThreeYearLPerM2), LargestLPerM2: Float(largest)})
		}
		if sum.SpellIndex != nil {
			sum.SpellIndexNote = "spell definition and three-year fit not verified against the text of ISO 15927-3"
		}
	}
	return sum, nil
}
