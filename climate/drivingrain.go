package climate

import (
	"errors"
	"fmt"
	"math"
	"strings"
	"time"
)

// ErrNoColumn is returned when a method needs a column the record lacks.
var ErrNoColumn = errors.New("column missing from the record")

// ErrTooShort is returned when a record is too short for a statistic.
var ErrTooShort = errors.New("record too short")

// DrivingRainHourLPerM2 returns one hour's contribution to the airfield
// driving rain index on a vertical wall facing azimuth Θ:
//
//	I = (2/9) · v · r^(8/9) · cos(D − Θ)   if cos(D − Θ) > 0, else 0
//
// v is the hourly mean wind speed at 10 m (m/s), r the hourly rainfall
// (mm/h), D the direction the wind blows from and Θ the direction the wall
// faces (the outward normal), both in degrees clockwise from north. The
// result is in litres per square metre of wall in that hour. The formula
// holds for hourly data only: feed it sub-hourly values through
// Series.Hourly. Source: ISO 15927-3:2009, clause 3 (airfield indices from
// hourly wind and rain data). NaN inputs give NaN.
func DrivingRainHourLPerM2(windMS, rainMM, windDirDeg, wallAzimuthDeg float64) float64 {
	if math.IsNaN(windMS) || math.IsNaN(rainMM) || math.IsNaN(windDirDeg) {
		return math.NaN()
	}
	if rainMM <= 0 || windMS <= 0 {
		return 0
	}
	c := math.Cos((windDirDeg - wallAzimuthDeg) * math.Pi / 180)
	if c <= 0 {
		return 0
	}
	return 2.0 / 9.0 * windMS * math.Pow(rainMM, 8.0/9.0) * c
}

// drivingRainHours checks the columns and returns the hourly series.
func drivingRainHours(s *Series) (*Series, error) {
	var missing []string
	for _, c := range []Column{ColRain, ColWind, ColWindDir} {
		if !s.Has(c) {
			missing = append(missing, c.String())
		}
	}
	if len(missing) > 0 {
		return nil, fmt.Errorf("%w: the driving rain index needs rain_mm, wind_ms and wind_dir_deg; %s has no %s",
			ErrNoColumn, nameOr(s.Name), strings.Join(missing, ", "))
	}
	h, err := s.Hourly()
	if err != nil {
		return nil, fmt.Errorf("driving rain index of %s: %w", nameOr(s.Name), err)
	}
	return h, nil
}

func nameOr(name string) string {
	if name == "" {
		return "the record"
	}
	return name
}

func validDR(r *Record) bool {
	return !math.IsNaN(r.RainMM) && !math.IsNaN(r.WindMS) && !math.IsNaN(r.WindDirDeg)
}

// AirfieldIndex returns the annual airfield driving rain index for a wall
// facing wallAzimuthDeg:
//
//	I_A = Σ I_hour / N,   N = (hours with v, r and D all present) / 8766
//
// in L/(m²·year), with I_hour from DrivingRainHourLPerM2. Sub-hourly
// records are aggregated with Series.Hourly first. Hours missing any of the
// three values are left out of both the sum and the length, which keeps
// the index an annual mean. ISO 15927-3:2009, clause 3, asks for at least
// 10 years of data (from memory); shorter records give an indicative value.
// The wall index (terrain, topography, obstruction and wall factors,
// clause 5) is not applied here. Source: ISO 15927-3:2009, clause 3.
func AirfieldIndex(s *Series, wallAzimuthDeg float64) (lPerM2PerYear float64, err error) {
	v, err := AirfieldIndices(s, []float64{wallAzimuthDeg})
	if err != nil {
		return math.NaN(), err
	}
	return v[0], nil
}

// AirfieldIndices returns AirfieldIndex for each azimuth, aggregating the
// record only once.
func AirfieldIndices(s *Series, azimuthsDeg []float64) ([]float64, error) {
	h, err := drivingRainHours(s)
	if err != nil {
		return nil, err
	}
	sums := make([]float64, len(azimuthsDeg))
	n := 0
	for i := range h.Records {
		r := &h.Records[i]
		if !validDR(r) {
			continue
		}
		n++
		if r.RainMM <= 0 || r.WindMS <= 0 {
			continue
		}
		for k, az := range azimuthsDeg {
			sums[k] += DrivingRainHourLPerM2(r.WindMS, r.RainMM, r.WindDirDeg, az)
		}
	}
	if n == 0 {
		return nil, fmt.Errorf("%w: %s has no hour with rain, wind speed and direction all present", ErrTooShort, nameOr(s.Name))
	}
	years := float64(n) / HoursPerYear
	for k := range sums {
		sums[k] /= years
	}
	return sums, nil
}

// Spell thresholds. A spell is a run of hours of driving rain on the wall
// separated from the next by at least SpellDryHours in which the hourly
// index stays below SpellWetLPerM2. These values are as described for
// ISO 15927-3:2009 by the UK Met Office's wind-driven rain computation
// (CEDA catalogue record 4e0c93f0, "Computation for Wind-Driven Rain");
// not checked against the text of the standard itself.
const (
	SpellDryHours  = 96
	SpellWetLPerM2 = 0.001
	// MinSpellYears is the number of complete calendar years SpellIndex
	// needs before it fits an extreme-value distribution. Our choice,
	// after the standard's call for at least 10 years of data (from memory).
	MinSpellYears = 10
	// spellYearCoverage is the share of a calendar year's hours that must
	// carry rain, wind speed and direction for its maximum spell to count.
	spellYearCoverage = 0.9
)

// Spell is one spell of driving rain on a wall.
type Spell struct {
	Start  time.Time // end of the first wet hour's interval minus one hour
	End    time.Time // end of the last wet hour
	LPerM2 float64   // Σ I_hour over the spell, L/m²
}

// Spells returns the spells of driving rain on a wall facing
// wallAzimuthDeg, in time order. An hour is wet when its index
// (DrivingRainHourLPerM2) is at least SpellWetLPerM2; a spell ends when no
// wet hour follows within SpellDryHours. Hours absent from the record count
// as dry. Unverified against the standard's text: see SpellDryHours.
func Spells(s *Series, wallAzimuthDeg float64) ([]Spell, error) {
	h, err := drivingRainHours(s)
	if err != nil {
		return nil, err
	}
	var out []Spell
	var cur *Spell
	var lastWet time.Time
	for i := range h.Records {
		r := &h.Records[i]
		if !validDR(r) {
			continue
		}
		ih := DrivingRainHourLPerM2(r.WindMS, r.RainMM, r.WindDirDeg, wallAzimuthDeg)
		if cur != nil && r.Time.Sub(lastWet) > SpellDryHours*time.Hour {
			cur = nil
		}
		if ih < SpellWetLPerM2 {
			if cur != nil {
				cur.LPerM2 += ih
			}
			continue
		}
		if cur == nil {
			out = append(out, Spell{Start: r.Time.Add(-time.Hour)})
			cur = &out[len(out)-1]
		}
		cur.LPerM2 += ih
		cur.End = r.Time
		lastWet = r.Time
	}
	return out, nil
}

// SpellIndex is the spell index of a wall orientation.
type SpellIndex struct {
	AzimuthDeg float64
	// AnnualMaxLPerM2 holds the largest spell starting in each complete
	// calendar year, oldest first.
	AnnualMaxLPerM2 []float64
	Years           []int // the calendar years of AnnualMaxLPerM2
	// ThreeYearLPerM2 is the spell expected to be exceeded on average once
	// in three years (return period T = 3 years), from a Gumbel
	// distribution fitted to the annual maxima by moments:
	//
	//	α = s·√6/π,  u = m − 0.5772·α,  I_S = u − α·ln(−ln(1 − 1/T))
	//
	// with m and s the mean and sample standard deviation of the maxima.
	ThreeYearLPerM2 float64
}

// SpellIndexOf returns the spell index for a wall facing wallAzimuthDeg.
// It needs at least MinSpellYears complete calendar years (in s.Location,
// else UTC) and otherwise returns ErrTooShort. The fitting method is our
// reading of "the worst spell likely in any three-year period" and is not
// verified against ISO 15927-3:2009's text.
func SpellIndexOf(s *Series, wallAzimuthDeg float64) (SpellIndex, error) {
	res := SpellIndex{AzimuthDeg: wallAzimuthDeg, ThreeYearLPerM2: math.NaN()}
	h, err := drivingRainHours(s)
	if err != nil {
		return res, err
	}
	loc := s.Location
	if loc == nil {
		loc = time.UTC
	}
	valid := map[int]int{}
	for i := range h.Records {
		if validDR(&h.Records[i]) {
			valid[h.Records[i].Time.Add(-time.Minute).In(loc).Year()]++
		}
	}
	spells, err := Spells(s, wallAzimuthDeg)
	if err != nil {
		return res, err
	}
	peak := map[int]float64{}
	for _, sp := range spells {
		y := sp.Start.In(loc).Year()
		if sp.LPerM2 > peak[y] {
			peak[y] = sp.LPerM2
		}
	}
	first, last := math.MaxInt, math.MinInt
	for y := range valid {
		first, last = min(first, y), max(last, y)
	}
	for y := first; y <= last; y++ {
		hours := float64(time.Date(y+1, 1, 1, 0, 0, 0, 0, loc).Sub(time.Date(y, 1, 1, 0, 0, 0, 0, loc)).Hours())
		if float64(valid[y]) >= spellYearCoverage*hours {
			res.Years = append(res.Years, y)
			res.AnnualMaxLPerM2 = append(res.AnnualMaxLPerM2, peak[y])
		}
	}
	if n := len(res.Years); n < MinSpellYears {
		return res, fmt.Errorf("%w: the spell index needs %d complete years of rain and wind, %s has %d",
			ErrTooShort, MinSpellYears, nameOr(s.Name), n)
	}
	res.ThreeYearLPerM2 = gumbelReturn(res.AnnualMaxLPerM2, 3)
	return res, nil
}

// gumbelReturn returns the T-year return value of a Gumbel distribution
// fitted to xs by the method of moments (Euler's constant 0.5772).
func gumbelReturn(xs []float64, t float64) float64 {
	n := float64(len(xs))
	m := 0.0
	for _, x := range xs {
		m += x
	}
	m /= n
	ss := 0.0
	for _, x := range xs {
		ss += (x - m) * (x - m)
	}
	sd := math.Sqrt(ss / (n - 1))
	alpha := sd * math.Sqrt(6) / math.Pi
	u := m - 0.5772156649*alpha
	return u - alpha*math.Log(-math.Log(1-1/t))
}
