package climate

import (
	"math"
	"time"
)

// Record is one interval of a climate record. Time marks the END of the
// interval (UTC). A missing value is NaN; Series.Has says which columns the
// file carried at all.
type Record struct {
	Time       time.Time
	TempC      float64 // air temperature, °C
	RHPct      float64 // relative humidity, % (0–100 after checks)
	RainMM     float64 // precipitation in the interval, mm
	WindMS     float64 // mean wind speed at 10 m, m/s
	WindDirDeg float64 // direction the wind blows FROM, degrees clockwise from north
	SolarWM2   float64 // global horizontal irradiance, mean over the interval, W/m²
}

// Column identifies one variable of a record.
type Column int

// The columns of the gyprisk record format, in their canonical order.
const (
	ColTime Column = iota
	ColTemp
	ColRH
	ColRain
	ColWind
	ColWindDir
	ColSolar
	numColumns
)

var columnNames = [numColumns]string{"time", "temp_c", "rh_pct", "rain_mm", "wind_ms", "wind_dir_deg", "solar_wm2"}

// String returns the column's canonical header name, such as "rain_mm".
func (c Column) String() string {
	if c < 0 || c >= numColumns {
		return "column?"
	}
	return columnNames[c]
}

// Value returns the record's value for a data column (NaN for ColTime).
func (r *Record) Value(c Column) float64 {
	switch c {
	case ColTemp:
		return r.TempC
	case ColRH:
		return r.RHPct
	case ColRain:
		return r.RainMM
	case ColWind:
		return r.WindMS
	case ColWindDir:
		return r.WindDirDeg
	case ColSolar:
		return r.SolarWM2
	}
	return math.NaN()
}

// ColumnSet is a set of columns present in a file.
type ColumnSet uint16

// Has reports whether c is in the set.
func (s ColumnSet) Has(c Column) bool { return s&(1<<uint(c)) != 0 }

// With returns the set with c added.
func (s ColumnSet) With(c Column) ColumnSet { return s | 1<<uint(c) }
