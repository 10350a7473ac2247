package leach

import "fmt"

// RangeError reports an argument outside the range in which a method is
// valid.
type RangeError struct {
	Quantity string  // what was out of range, e.g. "temperature (°C)"
	Value    float64 // the value given
	Min, Max float64 // the valid range, inclusive
}

func (e *RangeError) Error() string {
	return fmt.Sprintf("leach: %s %g outside the valid range %g to %g", e.Quantity, e.Value, e.Min, e.Max)
}

func checkRange(quantity string, v, lo, hi float64) error {
	if !(v >= lo && v <= hi) { // also catches NaN
		return &RangeError{Quantity: quantity, Value: v, Min: lo, Max: hi}
	}
	return nil
}

func checkTemp(tempC float64) error {
	return checkRange("temperature (°C)", tempC, MinTempC, MaxTempC)
}
