package climate

import (
	"math"
	"testing"
	"time"
)

func mustRead(t *testing.T, in string) *Series {
	t.Helper()
	s, err := readAllString(ReaderConfig{FileName: "test.csv"}, in)
	if err != nil {
		t.Fatal(err)
	}
	return s
}

func TestSeriesIntervalsAndGaps(t *testing.T) {
	// Hourly with the 03:00 and 04:00 records missing.
	s := mustRead(t, `time,temp_c,rh_pct
2024-01-01T01:00Z,1,80
2024-01-01T02:00Z,2,80
2024-01-01T05:00Z,5,80
2024-01-01T06:00Z,6,80
`)
	if got := s.MedianIntervalS(); got != 3600 {
		t.Errorf("median interval %g s, want 3600", got)
	}
	if got := s.IntervalS(0); got != 3600 {
		t.Errorf("first interval %g s, want the median 3600", got)
	}
	if got := s.IntervalS(2); got != 3*3600 {
		t.Errorf("interval 2 = %g s, want 10800", got)
	}
	if got := s.HoursCovered(); got != 4 {
		t.Errorf("hours covered %g, want 4", got)
	}
	if got, want := s.Years(), 4/8766.0; got != want {
		t.Errorf("years %g, want %g", got, want)
	}
	gaps := s.Gaps(0)
	want := Gap{From: time.Date(2024, 1, 1, 2, 0, 0, 0, time.UTC), To: time.Date(2024, 1, 1, 4, 0, 0, 0, time.UTC), Hours: 2}
	if len(gaps) != 1 || gaps[0] != want {
		t.Errorf("gaps %+v, want [%+v]", gaps, want)
	}
	if !s.Start().Equal(time.Date(2024, 1, 1, 0, 0, 0, 0, time.UTC)) {
		t.Errorf("start %v", s.Start())
	}
}

func TestHourly(t *testing.T) {
	// Six 10-minute records closing the hour 13:00 and one closing 14:00
	// (incomplete). Winds of 4 m/s from 230° and 6 m/s from 250° alternate.
	// The vector mean (speed-weighted, as WMO defines the mean wind
	// direction), by hand:
	//   Σ v·sin D = 3·(4·(−0.766044) + 6·(−0.939693)) = −26.107
	//   Σ v·cos D = 3·(4·(−0.642788) + 6·(−0.342020)) = −13.870
	//   D = atan2(−26.107, −13.870) = 242.02°
	// In the second hour 5 m/s from 350°, 10°, 350°:
	//   atan2(−2·0.173648 + 0.173648, 3·0.984808) = −3.364° → 356.64°
	// (a scalar mean would give 236.7°).
	in := `time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2
2024-01-01T12:10Z,1,80,0.5,4,230,100
2024-01-01T12:20Z,2,82,0.5,6,250,200
2024-01-01T12:30Z,3,84,0,4,230,300
2024-01-01T12:40Z,4,86,0.25,6,250,400
2024-01-01T12:50Z,5,88,0.25,4,230,500
2024-01-01T13:00Z,6,90,0.5,6,250,600
2024-01-01T13:10Z,7,90,0.2,5,350,0
2024-01-01T13:20Z,7,90,0.2,5,10,0
2024-01-01T13:30Z,7,90,0.2,5,350,0
`
	s := mustRead(t, in)
	h, err := s.Hourly()
	if err != nil {
		t.Fatal(err)
	}
	if len(h.Records) != 2 {
		t.Fatalf("%d hours, want 2", len(h.Records))
	}
	r := h.Records[0]
	if !r.Time.Equal(time.Date(2024, 1, 1, 13, 0, 0, 0, time.UTC)) {
		t.Errorf("hour stamp %v, want 13:00 (end of the hour)", r.Time)
	}
	checks := []struct {
		name      string
		got, want float64
	}{
		{"temp", r.TempC, 3.5}, {"rh", r.RHPct, 85}, {"rain sum", r.RainMM, 2}, {"wind", r.WindMS, 5},
		{"direction", r.WindDirDeg, 242.0197}, {"solar", r.SolarWM2, 350},
	}
	for _, c := range checks {
		if math.Abs(c.got-c.want) > 1e-4 {
			t.Errorf("%s = %v, want %v", c.name, c.got, c.want)
		}
	}
	r = h.Records[1]
	if d := r.WindDirDeg; math.Abs(d-356.636) > 0.001 {
		t.Errorf("vector mean of 350°, 10°, 350° = %v, want 356.636", d)
	}
	if !math.IsNaN(r.RainMM) {
		t.Errorf("rain of a half-covered hour = %v, want NaN", r.RainMM)
	}
	if r.TempC != 7 {
		t.Errorf("temp of the half-covered hour = %v, want 7 (half the hour is enough for means)", r.TempC)
	}
	// Already hourly: returned as is.
	hs := mustRead(t, "time,temp_c,rh_pct\n2024-01-01T01:00Z,1,80\n2024-01-01T02:00Z,2,80\n")
	if h2, _ := hs.Hourly(); h2 != hs {
		t.Error("an hourly series should be returned as is")
	}
	// Coarser than hourly: an error.
	ds := mustRead(t, "time,temp_c,rh_pct\n2024-01-01T03:00Z,1,80\n2024-01-01T06:00Z,2,80\n")
	if _, err := ds.Hourly(); err != ErrCoarse {
		t.Errorf("3-hourly: err = %v, want ErrCoarse", err)
	}
}
