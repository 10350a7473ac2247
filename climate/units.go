package climate

import (
	"fmt"
	"strings"
)

// TempUnit is the temperature unit of a file's temp_c column. The reader
// converts to °C at the edge; everything inside gyprisk is °C.
type TempUnit int

// Temperature units. The zero value is degrees Celsius.
const (
	Celsius    TempUnit = iota // °C (no conversion)
	Fahrenheit                 // °F: θ = (t − 32)·5/9
	Kelvin                     // K:  θ = T − 273.15
)

// ParseTempUnit accepts C, °C, F, °F or K (case-insensitive).
func ParseTempUnit(s string) (TempUnit, error) {
	switch strings.ToUpper(strings.TrimPrefix(strings.TrimSpace(s), "°")) {
	case "C", "DEGC", "CELSIUS":
		return Celsius, nil
	case "F", "DEGF", "FAHRENHEIT":
		return Fahrenheit, nil
	case "K", "KELVIN":
		return Kelvin, nil
	}
	return Celsius, fmt.Errorf("unknown temperature unit %q (want C, F or K)", s)
}

// String returns "C", "F" or "K".
func (u TempUnit) String() string {
	switch u {
	case Celsius:
		return "C"
	case Fahrenheit:
		return "F"
	case Kelvin:
		return "K"
	}
	return fmt.Sprintf("TempUnit(%d)", int(u))
}

// ToC converts a temperature in unit u to °C:
//
//	θ = (t − 32)·5/9    (°F)
//	θ = T − 273.15      (K)
//
// Source: the definitions of the scales (BIPM, The International System of
// Units, 9th edition 2019, 2.3.1 for the kelvin and the degree Celsius).
func (u TempUnit) ToC(v float64) float64 {
	switch u {
	case Fahrenheit:
		return (v - 32) * 5 / 9
	case Kelvin:
		return v - KelvinOffset
	}
	return v
}

// WindUnit is the speed unit of a file's wind_ms column.
type WindUnit int

// Wind speed units. The zero value is metres per second.
const (
	MetresPerSecond   WindUnit = iota // m/s (no conversion)
	KilometresPerHour                 // km/h: v = x / 3.6
	Knots                             // kn:   v = x · 1852/3600
)

// knotMS is one knot in m/s: the international nautical mile is exactly
// 1852 m (BIPM SI Brochure, 9th edition 2019, Table 8, non-SI units).
const knotMS = 1852.0 / 3600.0

// ParseWindUnit accepts ms, m/s, kmh, km/h, kn, kt or knots (case-insensitive).
func ParseWindUnit(s string) (WindUnit, error) {
	switch strings.ToLower(strings.TrimSpace(s)) {
	case "ms", "m/s", "mps":
		return MetresPerSecond, nil
	case "kmh", "km/h", "kph":
		return KilometresPerHour, nil
	case "kn", "kt", "kts", "knot", "knots":
		return Knots, nil
	}
	return MetresPerSecond, fmt.Errorf("unknown wind speed unit %q (want ms, kmh or kn)", s)
}

// String returns "ms", "kmh" or "kn", the spellings the command line takes.
func (u WindUnit) String() string {
	switch u {
	case MetresPerSecond:
		return "ms"
	case KilometresPerHour:
		return "kmh"
	case Knots:
		return "kn"
	}
	return fmt.Sprintf("WindUnit(%d)", int(u))
}

// ToMS converts a speed in unit u to m/s:
//
//	v = x / 3.6          (km/h)
//	v = x · 1852/3600    (knots)
func (u WindUnit) ToMS(v float64) float64 {
	switch u {
	case KilometresPerHour:
		return v / 3.6
	case Knots:
		return v * knotMS
	}
	return v
}
