package mould_test

import (
	"fmt"

	"github.com/gyprisk/gyprisk/leach/mould"
)

// A paper-faced board (sensitive class) behind a damp patch: four weeks at
// 22 °C and 97 % RH, then a dry week. The conditions are invented.
func Example() {
	m, err := mould.New(mould.Sensitive)
	if err != nil {
		fmt.Println(err)
		return
	}
	for h := 0; h < 4*7*24; h++ {
		m.Step(22, 97, 1)
	}
	fmt.Printf("after four humid weeks: M = %.2f\n", m.Index())
	for h := 0; h < 7*24; h++ {
		m.Step(22, 50, 1)
	}
	fmt.Printf("after a dry week:       M = %.2f\n", m.Index())
	fmt.Printf("ceiling at 22 °C, 97 %%: M_max = %.2f\n", mould.MaxIndex(mould.Sensitive, 22, 97))
	// By hand: M = 1 after 404 h (TestTimeToIndex), then 268 h at
	// 0.386/(7·1.390) per day gives 1.44; the dry week takes
	// 0.5 × (6 h × 0.032 + 144 h × 0.016)/24 = 0.052.
	// Output:
	// after four humid weeks: M = 1.44
	// after a dry week:       M = 1.39
	// ceiling at 22 °C, 97 %: M_max = 4.68
}

func ExampleRHCritPct() {
	for _, t := range []float64{2, 10, 20, 25} {
		fmt.Printf("%.0f °C: growth from %.1f %% RH\n", t, mould.RHCritPct(t))
	}
	// Output:
	// 2 °C: growth from 94.4 % RH
	// 10 °C: growth from 82.0 % RH
	// 20 °C: growth from 80.0 % RH
	// 25 °C: growth from 80.0 % RH
}
