package climate_test

import (
	"errors"
	"fmt"
	"strings"

	"github.com/gyprisk/gyprisk/climate"
)

// ExampleReader reads a record row by row; the third row's humidity is
// out of range, and the error names the file, line, column and value.
func ExampleReader() {
	data := "# invented example\ntime;temp_c;rh_pct\n2024-01-01T01:00:00Z;3,5;88\n2024-01-01T02:00:00Z;3,1;107\n"
	r := climate.NewReader(strings.NewReader(data))
	r.FileName = "logger.csv"
	for {
		rec, err := r.Read()
		if err != nil {
			var pe *climate.ParseError
			if errors.As(err, &pe) {
				fmt.Println(pe)
			}
			break
		}
		fmt.Printf("%s %.1f °C %.0f %%\n", rec.Time.Format("15:04"), rec.TempC, rec.RHPct)
	}
	// Output:
	// 01:00 3.5 °C 88 %
	// logger.csv:4:3 (rh_pct): value "107": relative humidity above 103 %
}

// ExampleDewPointC gives the dew point of air at 20 °C and 60 % RH with
// the ISO 13788 formula.
func ExampleDewPointC() {
	p := climate.VapourPressurePa(20, 60)
	fmt.Printf("p = %.0f Pa, dew point %.1f °C\n", p, climate.DewPointC(p))
	// Output:
	// p = 1402 Pa, dew point 12.0 °C
}
