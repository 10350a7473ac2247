package climate

import (
	"errors"
	"fmt"
	"math"
	"time"
)

// Interior conditions after ISO 13788:2012 (temperature factor, internal
// humidity classes, the monthly surface-humidity criterion for mould) and
// EN 15026:2007 Annex C (indoor temperature and humidity as functions of the
// outdoor temperature).
//
// Where a value below is marked "from memory", the standard's text was not
// at hand while this file was written; those values must be checked against
// the standard before a release relies on them.

// TemperatureFactor returns the temperature factor at the internal surface,
//
//	f_Rsi = (θ_si − θ_e) / (θ_i − θ_e)
//
// dimensionless, from the internal surface temperature θ_si, the outdoor
// temperature θ_e and the indoor temperature θ_i (all °C). It is 1 for a
// surface at room temperature and 0 for one at outdoor temperature. It fails
// when θ_i and θ_e are closer than 0.1 K (the factor is then undefined and
// any measurement error dominates) or an input is NaN. Source: ISO
// 13788:2012, definition of the temperature factor at the internal surface.
func TemperatureFactor(surfaceC, outdoorC, indoorC float64) (float64, error) {
	if math.IsNaN(surfaceC) || math.IsNaN(outdoorC) || math.IsNaN(indoorC) {
		return math.NaN(), errors.New("temperature factor: an input temperature is NaN")
	}
	if math.Abs(indoorC-outdoorC) < 0.1 {
		return math.NaN(), fmt.Errorf("temperature factor: indoor %.2f °C and outdoor %.2f °C are less than 0.1 K apart", indoorC, outdoorC)
	}
	return (surfaceC - outdoorC) / (indoorC - outdoorC), nil
}

// InteriorSurfaceTempC returns the internal surface temperature (°C) of an
// element with temperature factor f_Rsi between outdoor air at θ_e and
// indoor air at θ_i (°C):
//
//	θ_si = θ_e + f_Rsi · (θ_i − θ_e)
//
// Valid for 0 ≤ f_Rsi ≤ 1 (CheckTemperatureFactor); the factor of a real
// element is taken as constant, which holds for steady heat flow. Source:
// ISO 13788:2012, the definition of f_Rsi solved for θ_si.
func InteriorSurfaceTempC(outdoorC, indoorC, fRsi float64) float64 {
	return outdoorC + fRsi*(indoorC-outdoorC)
}

// CheckTemperatureFactor reports a temperature factor outside 0–1 or NaN,
// naming the value, for use where a project file is read.
func CheckTemperatureFactor(fRsi float64) error {
	if !(fRsi >= 0 && fRsi <= 1) {
		return fmt.Errorf("temperature factor f_Rsi = %v, want 0–1 (1: surface at room temperature)", fRsi)
	}
	return nil
}

// MouldCriterionRHPct is the surface relative humidity (%) that the monthly
// mean must not exceed to avoid mould growth, ISO 13788:2012 clause 5
// (critical surface humidity φ_si,cr = 0.8 for mould; BS 5250 Annex D words
// it as "should not exceed 80 % for several days").
const MouldCriterionRHPct = 80

// MinTemperatureFactor returns the lowest temperature factor an element
// needs so that its internal surface stays at or below the critical surface
// humidity φ_cr (%) with indoor vapour pressure p_i (Pa):
//
//	p_sat(θ_si,min) = p_i / (φ_cr/100)
//	θ_si,min        = the temperature of that saturation pressure (DewPointC)
//	f_Rsi,min       = (θ_si,min − θ_e) / (θ_i − θ_e)
//
// θ_e and θ_i in °C. Use MouldCriterionRHPct for mould, 100 for surface
// condensation. An element is acceptable for the month when its f_Rsi is at
// least f_Rsi,min. The result can be below 0 (no risk even at outdoor
// temperature) or above 1 (the room air itself is too humid). Source: ISO
// 13788:2012 clause 5, the design procedure for the internal surface
// temperature (clause number from memory).
func MinTemperatureFactor(outdoorC, indoorC, indoorVapourPa, critRHPct float64) (float64, error) {
	if !(indoorVapourPa > 0) || math.IsInf(indoorVapourPa, 0) {
		return math.NaN(), fmt.Errorf("minimum temperature factor: indoor vapour pressure %v Pa, want a positive number", indoorVapourPa)
	}
	if !(critRHPct > 0 && critRHPct <= 100) {
		return math.NaN(), fmt.Errorf("minimum temperature factor: critical surface humidity %v %%, want 0–100", critRHPct)
	}
	surfMinC := DewPointC(indoorVapourPa / (critRHPct / 100))
	return TemperatureFactor(surfMinC, outdoorC, indoorC)
}

// ISO13788SafetyFactor multiplies the humidity-class vapour pressure excess
// when the indoor vapour pressure is derived from it, p_i = p_e + 1.10·Δp
// (ISO 13788:2012, clause 5; from memory).
const ISO13788SafetyFactor = 1.10

// humidityClassExcessPa is Δp at θ_e ≤ 0 °C for the internal humidity
// classes 1–5 of ISO 13788:2012 Annex A (from memory; not checked against
// the standard's figure). Class 1: unoccupied buildings, storage of dry
// goods; 2: offices, dwellings with normal occupancy and ventilation; 3:
// buildings with unknown occupancy; 4: sports halls, kitchens, canteens; 5:
// special buildings such as laundries, breweries, swimming pools.
var humidityClassExcessPa = [...]float64{1: 270, 2: 540, 3: 810, 4: 1080, 5: 1350}

// HumidityClassExcessPa returns the indoor–outdoor vapour pressure excess Δp
// (Pa) of an ISO 13788 internal humidity class at outdoor temperature θ_e
// (°C, a monthly mean in the standard's method):
//
//	Δp = Δp_0                  θ_e ≤ 0 °C
//	Δp = Δp_0 · (1 − θ_e/20)   0 < θ_e < 20 °C
//	Δp = 0                     θ_e ≥ 20 °C
//
// with Δp_0 = 270, 540, 810, 1080, 1350 Pa for classes 1–5. It fails for a
// class outside 1–5 or a NaN temperature. Source: ISO 13788:2012 Annex A
// (values from memory, not checked against the standard; ISO 13788 also
// states the classes as a humidity-by-volume excess Δν in g/m³, which is not
// offered here because its values could not be checked either).
func HumidityClassExcessPa(class int, outdoorC float64) (float64, error) {
	if class < 1 || class > 5 {
		return math.NaN(), fmt.Errorf("internal humidity class %d, want 1–5 (ISO 13788 Annex A)", class)
	}
	if math.IsNaN(outdoorC) {
		return math.NaN(), errors.New("internal humidity class: outdoor temperature is NaN")
	}
	d0 := humidityClassExcessPa[class]
	switch {
	case outdoorC <= 0:
		return d0, nil
	case outdoorC >= 20:
		return 0, nil
	}
	return d0 * (1 - outdoorC/20), nil
}

// IndoorVapourPressureClassPa returns the indoor vapour pressure (Pa) of a
// room in an ISO 13788 internal humidity class:
//
//	p_i = p_e + 1.10 · Δp(θ_e)
//
// with p_e = φ_e/100 · p_sat(θ_e) the outdoor vapour pressure (θ_e in °C,
// φ_e in %) and Δp from HumidityClassExcessPa. The factor 1.10 is the
// standard's safety margin (ISO13788SafetyFactor). Source: ISO 13788:2012
// clause 5 and Annex A (from memory).
func IndoorVapourPressureClassPa(class int, outdoorC, outdoorRHPct float64) (float64, error) {
	dp, err := HumidityClassExcessPa(class, outdoorC)
	if err != nil {
		return math.NaN(), err
	}
	return VapourPressurePa(outdoorC, outdoorRHPct) + ISO13788SafetyFactor*dp, nil
}

// MoistureLoad selects the indoor humidity curve of EN 15026 Annex C.
type MoistureLoad int

const (
	// NormalMoistureLoad: dwellings and offices of normal occupancy.
	NormalMoistureLoad MoistureLoad = iota + 1
	// HighMoistureLoad: 10 % RH higher than normal.
	HighMoistureLoad
)

// EN15026IndoorClimate returns the indoor temperature (°C) and relative
// humidity (%) of residential and office buildings as functions of the
// daily mean outdoor temperature θ_e,d (°C):
//
//	θ_i = 20                     θ_e,d ≤ 10 °C
//	θ_i = 15 + θ_e,d/2           10 < θ_e,d < 20 °C
//	θ_i = 25                     θ_e,d ≥ 20 °C
//
//	φ_i = 30 (+10)               θ_e,d ≤ −10 °C
//	φ_i = 40 (+10) + θ_e,d       −10 < θ_e,d < 20 °C
//	φ_i = 60 (+10)               θ_e,d ≥ 20 °C
//
// the bracketed +10 % for a high moisture load. Source: EN 15026:2007 Annex
// C (from memory; cross-checked against an open implementation of the
// standard's curves, RIBuild delphin_6_automation; the standard was not
// read). It fails for an unknown load or a NaN temperature.
func EN15026IndoorClimate(dailyMeanOutdoorC float64, load MoistureLoad) (tempC, rhPct float64, err error) {
	if load != NormalMoistureLoad && load != HighMoistureLoad {
		return math.NaN(), math.NaN(), fmt.Errorf("EN 15026 indoor climate: unknown moisture load %d", int(load))
	}
	if math.IsNaN(dailyMeanOutdoorC) {
		return math.NaN(), math.NaN(), errors.New("EN 15026 indoor climate: outdoor temperature is NaN")
	}
	t, rh := en15026(dailyMeanOutdoorC, load)
	return t, rh, nil
}

func en15026(te float64, load MoistureLoad) (tempC, rhPct float64) {
	tempC = 15 + te/2
	tempC = min(max(tempC, 20), 25)
	rhPct = min(max(40+te, 30), 60)
	if load == HighMoistureLoad {
		rhPct += 10
	}
	return tempC, rhPct
}

// indoorKind is how an IndoorModel derives the room's conditions.
type indoorKind int

const (
	indoorNone indoorKind = iota
	indoorFixed
	indoorClass
	indoorEN15026
)

// IndoorModel gives the indoor air temperature and vapour pressure of a room
// from the outdoor conditions, for interior elements described by a
// temperature factor instead of a room record. The zero value is not a
// model; build one with FixedIndoor, ClassIndoor or EN15026Indoor. At
// allocates nothing.
type IndoorModel struct {
	kind  indoorKind
	tempC float64 // fixed indoor temperature (fixed and class kinds)
	rhPct float64 // fixed indoor RH (fixed kind)
	class int
	load  MoistureLoad
}

// FixedIndoor is a room held at a set point: temperature tempC (°C) and
// relative humidity rhPct (%, 0–100) all year, as in air-conditioned rooms
// or museum stores.
func FixedIndoor(tempC, rhPct float64) (IndoorModel, error) {
	if !(tempC >= -40 && tempC <= 80) {
		return IndoorModel{}, fmt.Errorf("indoor set point %v °C, want −40 to 80 °C", tempC)
	}
	if !(rhPct >= 0 && rhPct <= 100) {
		return IndoorModel{}, fmt.Errorf("indoor set point %v %% RH, want 0–100 %%", rhPct)
	}
	return IndoorModel{kind: indoorFixed, tempC: tempC, rhPct: rhPct}, nil
}

// ClassIndoor is a heated room at a constant temperature tempC (°C; ISO
// 13788 uses 20 °C where nothing better is known, from memory) whose vapour
// pressure follows ISO 13788 internal humidity class 1–5 (see
// IndoorVapourPressureClassPa).
func ClassIndoor(class int, tempC float64) (IndoorModel, error) {
	if _, err := HumidityClassExcessPa(class, 0); err != nil {
		return IndoorModel{}, err
	}
	if !(tempC >= -40 && tempC <= 80) {
		return IndoorModel{}, fmt.Errorf("indoor temperature %v °C, want −40 to 80 °C", tempC)
	}
	return IndoorModel{kind: indoorClass, tempC: tempC, class: class}, nil
}

// EN15026Indoor is a residential or office room that follows the indoor
// climate curves of EN 15026 Annex C (see EN15026IndoorClimate).
func EN15026Indoor(load MoistureLoad) (IndoorModel, error) {
	if _, _, err := EN15026IndoorClimate(0, load); err != nil {
		return IndoorModel{}, err
	}
	return IndoorModel{kind: indoorEN15026, load: load}, nil
}

// At returns the indoor air temperature (°C) and vapour pressure (Pa) for
// outdoor temperature outdoorC (°C) and relative humidity outdoorRHPct (%).
//
// The standards define their curves on averages: ISO 13788 on monthly
// means, EN 15026 on the daily mean outdoor temperature. The caller chooses
// what to pass: the hour's values give an hour-by-hour room (gyprisk's
// extension of the methods), running means follow the standards more
// closely. The ISO 13788 monthly criterion is evaluated on monthly means in
// any case (MonthlyRH). The vapour pressure is not capped at saturation: a
// humidity class that would make the room air exceed 100 % RH shows up as
// surface humidities above 100 %. NaN inputs give NaN results.
func (m IndoorModel) At(outdoorC, outdoorRHPct float64) (indoorC, vapourPa float64) {
	switch m.kind {
	case indoorFixed:
		return m.tempC, VapourPressurePa(m.tempC, m.rhPct)
	case indoorClass:
		if math.IsNaN(outdoorC) {
			return m.tempC, math.NaN()
		}
		dp, _ := HumidityClassExcessPa(m.class, outdoorC) // class checked in ClassIndoor
		return m.tempC, VapourPressurePa(outdoorC, outdoorRHPct) + ISO13788SafetyFactor*dp
	case indoorEN15026:
		if math.IsNaN(outdoorC) {
			return math.NaN(), math.NaN()
		}
		t, rh := en15026(outdoorC, m.load)
		return t, VapourPressurePa(t, rh)
	}
	return math.NaN(), math.NaN()
}

// String describes the model, for reports.
func (m IndoorModel) String() string {
	switch m.kind {
	case indoorFixed:
		return fmt.Sprintf("set point %.1f °C, %.0f %% RH", m.tempC, m.rhPct)
	case indoorClass:
		return fmt.Sprintf("%.1f °C, ISO 13788 internal humidity class %d", m.tempC, m.class)
	case indoorEN15026:
		if m.load == HighMoistureLoad {
			return "EN 15026 Annex C, high moisture load"
		}
		return "EN 15026 Annex C, normal moisture load"
	}
	return "no indoor model"
}

// MonthRH is one calendar month of surface humidity.
type MonthRH struct {
	Month string  // YYYY-MM
	Hours float64 // hours covered
	// MeanSurfaceTempC and MeanVapourPa are the time-weighted monthly means.
	MeanSurfaceTempC float64
	MeanVapourPa     float64
	// SurfaceRHPct is the monthly surface humidity as ISO 13788 forms it,
	// from the monthly means: 100 · p̄ / p_sat(θ̄_si).
	SurfaceRHPct float64
	// MeanOfHourlyRHPct is the time-weighted mean of the hourly surface
	// humidities, each capped at 100 %, for comparison.
	MeanOfHourlyRHPct float64
}

// Fails reports whether the month fails the ISO 13788 mould criterion: its
// surface humidity (from monthly means) above MouldCriterionRHPct.
func (m MonthRH) Fails() bool { return m.SurfaceRHPct > MouldCriterionRHPct }

// MonthlyRH accumulates the hourly state of a surface into calendar months
// for the ISO 13788 mould criterion (monthly mean surface RH ≤ 80 %). Each
// interval counts in the month of its midpoint, in Location (UTC when nil),
// the convention of the record summary. Add allocates only when a month is
// completed. The zero value is ready to use.
type MonthlyRH struct {
	Location *time.Location

	months []MonthRH
	cur    struct {
		year              int
		month             time.Month
		hours             float64
		sumT, sumP, sumRH float64 // time-weighted sums
	}
	lastEnd time.Time
}

// Add records an interval of durationH hours that ended at end, with the
// surface at surfaceTempC (°C) and the air at the surface carrying vapour
// pressure vapourPa (Pa). It fails, naming the interval, for NaN or
// infinite values, a non-positive duration, or an interval that ends no
// later than the previous one.
func (a *MonthlyRH) Add(end time.Time, durationH, surfaceTempC, vapourPa float64) error {
	switch {
	case !(durationH > 0) || math.IsInf(durationH, 1):
		return fmt.Errorf("monthly surface humidity: interval ending %s lasts %v h, want a positive number", end.Format(time.RFC3339), durationH)
	case !indoorFinite(surfaceTempC) || !indoorFinite(vapourPa) || vapourPa < 0:
		return fmt.Errorf("monthly surface humidity: interval ending %s has surface %v °C, vapour pressure %v Pa", end.Format(time.RFC3339), surfaceTempC, vapourPa)
	case !a.lastEnd.IsZero() && !end.After(a.lastEnd):
		return fmt.Errorf("monthly surface humidity: interval ending %s does not follow %s", end.Format(time.RFC3339), a.lastEnd.Format(time.RFC3339))
	}
	a.lastEnd = end
	loc := a.Location
	if loc == nil {
		loc = time.UTC
	}
	mid := end.Add(-time.Duration(durationH / 2 * float64(time.Hour))).In(loc)
	y, mo, _ := mid.Date()
	if a.cur.hours > 0 && (y != a.cur.year || mo != a.cur.month) {
		a.flush()
	}
	if a.cur.hours == 0 {
		a.cur.year, a.cur.month = y, mo
	}
	a.cur.hours += durationH
	a.cur.sumT += surfaceTempC * durationH
	a.cur.sumP += vapourPa * durationH
	a.cur.sumRH += min(RHAtPct(vapourPa, surfaceTempC), 100) * durationH
	return nil
}

func (a *MonthlyRH) flush() {
	c := &a.cur
	if c.hours == 0 {
		return
	}
	t, p := c.sumT/c.hours, c.sumP/c.hours
	a.months = append(a.months, MonthRH{
		Month:             fmt.Sprintf("%04d-%02d", c.year, int(c.month)),
		Hours:             c.hours,
		MeanSurfaceTempC:  t,
		MeanVapourPa:      p,
		SurfaceRHPct:      RHAtPct(p, t),
		MeanOfHourlyRHPct: c.sumRH / c.hours,
	})
	c.hours, c.sumT, c.sumP, c.sumRH = 0, 0, 0, 0
}

// Months returns every month seen so far, the last one possibly partial,
// in order. Partial months at the start and end of a record are included;
// their Hours say how much of the month they cover.
func (a *MonthlyRH) Months() []MonthRH {
	out := make([]MonthRH, len(a.months), len(a.months)+1)
	copy(out, a.months)
	if a.cur.hours > 0 {
		saved := *a
		saved.months = nil
		saved.flush()
		out = append(out, saved.months...)
	}
	return out
}

// Failing returns the months (YYYY-MM) that fail the ISO 13788 mould
// criterion, in order.
func (a *MonthlyRH) Failing() []string {
	var out []string
	for _, m := range a.Months() {
		if m.Fails() {
			out = append(out, m.Month)
		}
	}
	return out
}

func indoorFinite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }
