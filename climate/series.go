package climate

import (
	"errors"
	"math"
	"slices"
	"time"
)

// HoursPerYear is the mean length of a year used to annualise sums,
// 365.25 × 24 = 8766 h (ISO 15927-3:2009, clause 3, divides by the number
// of years of record; the Julian year is the usual convention).
const HoursPerYear = 8766.0

// DefaultGapFactor is the interval, in multiples of the median interval,
// above which the time between two records counts as a gap.
const DefaultGapFactor = 1.5

// Series is a whole climate record in memory, in time order.
type Series struct {
	Name     string         // where it came from, for messages
	Columns  ColumnSet      // columns the file carried
	Records  []Record       // strictly increasing Time, UTC, END of each interval
	Stats    ReadStats      // what the reader counted
	Location *time.Location // zone for calendar grouping (months); nil means UTC
}

// Gap is a stretch of time with no record.
type Gap struct {
	From  time.Time `json:"from"`  // end of the last record before the gap
	To    time.Time `json:"to"`    // start of the first record after it
	Hours float64   `json:"hours"` // To − From in hours
}

// Has reports whether the series carries column c.
func (s *Series) Has(c Column) bool { return s.Columns.Has(c) }

// MedianIntervalS returns the median time between consecutive records in
// seconds (3600 for an hourly record); 3600 for fewer than two records.
func (s *Series) MedianIntervalS() float64 {
	n := len(s.Records)
	if n < 2 {
		return 3600
	}
	// Fast path: a regular record (the usual case) needs no sort.
	first := s.Records[1].Time.Sub(s.Records[0].Time)
	regular := true
	for i := 2; i < n && regular; i++ {
		regular = s.Records[i].Time.Sub(s.Records[i-1].Time) == first
	}
	if regular {
		return first.Seconds()
	}
	d := make([]int64, n-1)
	for i := 1; i < n; i++ {
		d[i-1] = int64(s.Records[i].Time.Sub(s.Records[i-1].Time))
	}
	slices.Sort(d)
	m := len(d) / 2
	if len(d)%2 == 1 {
		return time.Duration(d[m]).Seconds()
	}
	return (time.Duration(d[m-1]).Seconds() + time.Duration(d[m]).Seconds()) / 2
}

// IntervalS returns the seconds that record i covers: its time minus the
// previous record's time. Record 0 is given the median interval.
func (s *Series) IntervalS(i int) float64 {
	if i == 0 {
		return s.MedianIntervalS()
	}
	return s.Records[i].Time.Sub(s.Records[i-1].Time).Seconds()
}

// coveredS returns the seconds record i covers, counting an interval longer
// than DefaultGapFactor × median as one median interval (the rest is gap).
func (s *Series) coveredS(i int, medianS float64) float64 {
	if i == 0 {
		return medianS
	}
	d := s.IntervalS(i)
	if d > DefaultGapFactor*medianS {
		return medianS
	}
	return d
}

// HoursCovered returns the time the records cover, in hours:
//
//	H = Σ min'(Δt_i) / 3600
//
// where Δt_i is IntervalS(i) and an interval longer than DefaultGapFactor
// times the median counts as one median interval (the rest is a gap).
func (s *Series) HoursCovered() float64 {
	med := s.MedianIntervalS()
	sum := 0.0
	for i := range s.Records {
		sum += s.coveredS(i, med)
	}
	return sum / 3600
}

// Years returns HoursCovered / 8766.
func (s *Series) Years() float64 { return s.HoursCovered() / HoursPerYear }

// Start returns the start of the first interval (first stamp minus the
// median interval); the zero time for an empty series.
func (s *Series) Start() time.Time {
	if len(s.Records) == 0 {
		return time.Time{}
	}
	return s.Records[0].Time.Add(-time.Duration(s.MedianIntervalS() * float64(time.Second)))
}

// End returns the last stamp (the end of the last interval).
func (s *Series) End() time.Time {
	if len(s.Records) == 0 {
		return time.Time{}
	}
	return s.Records[len(s.Records)-1].Time
}

// Gaps returns the stretches where the time between two records exceeds
// thresholdFactor × the median interval (thresholdFactor ≤ 1 means
// DefaultGapFactor). The gap runs from the earlier record's stamp to the
// start of the later record's interval, taken as one median interval long.
func (s *Series) Gaps(thresholdFactor float64) []Gap {
	if thresholdFactor <= 1 {
		thresholdFactor = DefaultGapFactor
	}
	med := s.MedianIntervalS()
	medD := time.Duration(med * float64(time.Second))
	var gaps []Gap
	for i := 1; i < len(s.Records); i++ {
		if s.IntervalS(i) > thresholdFactor*med {
			from := s.Records[i-1].Time
			to := s.Records[i].Time.Add(-medD)
			gaps = append(gaps, Gap{From: from, To: to, Hours: to.Sub(from).Hours()})
		}
	}
	return gaps
}

// ErrCoarse is returned by Hourly for records with intervals longer than
// an hour.
var ErrCoarse = errors.New("record is coarser than hourly")

// Hourly returns the series aggregated to clock hours (UTC). A series whose
// median interval is already one hour is returned as it is. Each record
// belongs to the hour in which its interval ends (a stamp on the hour
// closes that hour). Within an hour:
//
//	θ, φ, G, v:  time-weighted means of the values present, if values
//	             cover at least half the hour, else NaN
//	D:           direction of the vector mean  atan2(Σ w·v·sin D, Σ w·v·cos D)
//	             (unit vectors when all speeds are zero)
//	r:           sum, only if rain values cover the whole hour, else NaN
//
// Hours with no record are left out (they stay gaps). Records coarser than
// an hour give ErrCoarse: an hourly method must not be fed 3-hourly sums.
func (s *Series) Hourly() (*Series, error) {
	med := s.MedianIntervalS()
	if len(s.Records) < 2 || math.Abs(med-3600) < 1 {
		return s, nil
	}
	if med > 3600 {
		return nil, ErrCoarse
	}
	out := &Series{Name: s.Name, Columns: s.Columns, Stats: s.Stats, Location: s.Location}
	type acc struct {
		w, v       [numColumns]float64 // covered seconds and weighted sums
		u, n       float64             // wind vector components
		uw, nw     float64             // unit vector components
		rainFull   bool
		rainCovers float64
	}
	var a acc
	var cur time.Time
	flush := func() {
		if cur.IsZero() {
			return
		}
		nan := math.NaN()
		rec := Record{Time: cur, TempC: nan, RHPct: nan, RainMM: nan, WindMS: nan, WindDirDeg: nan, SolarWM2: nan}
		for _, c := range []Column{ColTemp, ColRH, ColWind, ColSolar} {
			if a.w[c] >= 1800 {
				v := a.v[c] / a.w[c]
				switch c {
				case ColTemp:
					rec.TempC = v
				case ColRH:
					rec.RHPct = v
				case ColWind:
					rec.WindMS = v
				case ColSolar:
					rec.SolarWM2 = v
				}
			}
		}
		if a.w[ColWindDir] >= 1800 {
			u, n := a.u, a.n
			if u == 0 && n == 0 {
				u, n = a.uw, a.nw
			}
			if u != 0 || n != 0 {
				d := math.Atan2(u, n) * 180 / math.Pi
				if d < 0 {
					d += 360
				}
				rec.WindDirDeg = d
			}
		}
		if a.rainFull && a.rainCovers >= 3600-1 {
			rec.RainMM = a.v[ColRain]
		}
		out.Records = append(out.Records, rec)
	}
	for i := range s.Records {
		r := &s.Records[i]
		end := r.Time.Truncate(time.Hour)
		if !end.Equal(r.Time) {
			end = end.Add(time.Hour)
		}
		if !end.Equal(cur) {
			flush()
			a = acc{rainFull: true}
			cur = end
		}
		dt := s.IntervalS(i)
		if i > 0 && dt > DefaultGapFactor*med {
			dt = med // the part before is a gap
		}
		for c := ColTemp; c < numColumns; c++ {
			v := r.Value(c)
			if c == ColRain {
				if math.IsNaN(v) {
					a.rainFull = false
				} else {
					a.v[c] += v
					a.rainCovers += dt
				}
				continue
			}
			if math.IsNaN(v) {
				continue
			}
			a.w[c] += dt
			if c == ColWindDir {
				sn, cs := math.Sincos(v * math.Pi / 180)
				a.uw += dt * sn
				a.nw += dt * cs
				if !math.IsNaN(r.WindMS) {
					a.u += dt * r.WindMS * sn
					a.n += dt * r.WindMS * cs
				}
				continue
			}
			a.v[c] += dt * v
		}
	}
	flush()
	return out, nil
}
