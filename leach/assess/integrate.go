package assess

import (
	"fmt"

	"gonum.org/v1/gonum/integrate"
)

// The record gives a rate f_i (per second) for each interval i that ends
// at x_i. Over each contiguous run of intervals between gaps, gyprisk
// integrates the rate with the trapezoidal rule on the (possibly
// irregular) time axis, and adds half an interval at each end of the run
// so that the run's first and last intervals count in full:
//
//	∫ f dt ≈ Σ_{i=a+1}^{b} (f_{i−1} + f_i)/2 · (x_i − x_{i−1}) + f_a·Δt_a/2 + f_b·Δt_b/2
//
// On a regular axis this equals Σ f_i·Δt, the exact total of the interval
// amounts. The trapezoidal sum comes from gonum's integrate.Trapezoidal.

// integrateRate integrates rate over the runs segs of the axis x (seconds)
// with interval lengths dt. It returns an error, never a panic, if an axis
// is not strictly increasing.
func integrateRate(x, dt, rate []float64, segs [][2]int) (float64, error) {
	var total float64
	for _, s := range segs {
		a, b := s[0], s[1]
		if b-a == 1 {
			total += rate[a] * dt[a]
			continue
		}
		for i := a + 1; i < b; i++ {
			if !(x[i] > x[i-1]) {
				return 0, fmt.Errorf("integration axis not increasing at point %d (%g after %g)", i, x[i], x[i-1])
			}
		}
		total += integrate.Trapezoidal(x[a:b], rate[a:b])
		total += rate[a]*dt[a]/2 + rate[b-1]*dt[b-1]/2
	}
	return total, nil
}

// trapezoidWeights returns w with Σ w_i·f_i equal to integrateRate's
// result for any f: the weights of the same rule, precomputed so that the
// running total (for the report's cumulative curves) and the Monte Carlo
// samples need no second pass over the axis.
func trapezoidWeights(x, dt []float64, segs [][2]int) []float64 {
	w := make([]float64, len(x))
	for _, s := range segs {
		a, b := s[0], s[1]
		w[a] += dt[a] / 2
		w[b-1] += dt[b-1] / 2
		for i := a + 1; i < b; i++ {
			h := (x[i] - x[i-1]) / 2
			w[i-1] += h
			w[i] += h
		}
	}
	return w
}
