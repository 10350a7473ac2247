package assess

import (
	"math"
	"testing"

	"github.com/gyprisk/gyprisk/climate"
)

// TestMonthlyCriterionMatchesClimate: the engine's own monthly sums give
// the same ISO 13788 monthly surface humidities as climate.MonthlyRH, the
// reference accumulator, fed the same hours.
func TestMonthlyCriterionMatchesClimate(t *testing.T) {
	rows := synthYear(24*75, 13, 0.8)
	p := testProject(t, wallProject, map[string]string{"c.csv": csvRecord(testStart, rows)})
	e, err := resolve(&p.Elements[0], nil)
	if err != nil {
		t.Fatal(err)
	}
	sh, chem := outdoorHours(t, p)
	r, err := assessElement(e, sh, nil, chem, true)
	if err != nil {
		t.Fatal(err)
	}
	var ref climate.MonthlyRH
	for i := 0; i < sh.n; i++ {
		if err := ref.Add(sh.time(i), sh.dtS[i]/3600, r.trace.surfTempC[i], sh.vapPa[i]); err != nil {
			t.Fatal(err)
		}
	}
	months := ref.Months()
	if len(months) != len(r.monthly) {
		t.Fatalf("%d months, reference %d", len(r.monthly), len(months))
	}
	for k, m := range months {
		if got := r.monthly[k].SurfaceRHISO13788Pct; r.monthly[k].Month != m.Month || math.Abs(got-m.SurfaceRHPct) > 1e-9 {
			t.Errorf("%s: %.6f %%, reference %s %.6f %%", r.monthly[k].Month, got, m.Month, m.SurfaceRHPct)
		}
	}
	if got, want := len(r.failingMonths), len(ref.Failing()); got != want {
		t.Errorf("%d failing months, reference %d", got, want)
	}
}
