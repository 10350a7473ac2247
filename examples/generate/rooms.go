package main

import (
	"math"
	"math/rand/v2"
	"time"

	"github.com/gyprisk/gyprisk/climate"
)

// reading is one interval of a room logger.
type reading struct {
	end   time.Time // end of the interval (UTC)
	tempC float64   // air temperature, °C
	rhPct float64   // relative humidity, %
}

// runningMean is an exponential moving average with time constant tauH
// hours, sampled every stepH hours.
type runningMean struct {
	v, k float64
	init bool
}

func newRunningMean(tauH, stepH float64) runningMean {
	return runningMean{k: 1 - math.Exp(-stepH/tauH)}
}

func (m *runningMean) add(x float64) float64 {
	if !m.init {
		m.v, m.init = x, true
		return x
	}
	m.v += m.k * (x - m.v)
	return m.v
}

// simulateBathroom returns hourly readings of the bathroom of the Old Assay
// House (invented), driven by the outdoor hours. The model:
//
//   - temperature: heated to 20.5 °C from 06:00 to 23:00 and 18.5 °C at
//     night while the 3-day outdoor mean is below 14 °C; otherwise free
//     running at 15 + 0.45 × (3-day outdoor mean), so summer follows the
//     outdoors a little; a first-order lag of 3 h; showers warm the room
//     by up to 1 K;
//   - vapour pressure: outdoor (1-day mean) plus a moisture excess of
//     60 Pa in summer rising linearly to 760 Pa when the 3-day outdoor
//     mean is 0 °C (a poorly ventilated room: closed windows, no extract
//     fan), in the manner of the ISO 13788 humidity-class excesses;
//   - showers (planShowers): on most mornings and many evenings, the air
//     approaching 99 % RH (rise time constant 3 min), then an exponential
//     decay of the excess vapour with a time constant of 90 min in the
//     heating season and 60 min outside it; computed minute by minute and
//     averaged to the hour.
func simulateBathroom(r *rand.Rand, outdoor []hour) []reading {
	out := make([]reading, len(outdoor))
	mean72 := newRunningMean(72, 1)
	vap24 := newRunningMean(24, 1)
	tempIn := 20.0
	excess := 0.0 // shower vapour excess above the baseline, Pa
	var showers []showerSpell
	day := -1
	for i, h := range outdoor {
		t72 := mean72.add(h.tempC)
		pOut := vap24.add(h.vapourPa)
		start := h.end.Add(-time.Hour)
		if d := start.YearDay(); d != day {
			day = d
			showers = planShowers(r, start)
		}

		heated := t72 < 14
		free := 15 + 0.45*t72
		target := free
		if heated {
			set := 18.5
			if hr := start.Hour(); hr >= 6 && hr < 23 {
				set = 20.5
			}
			target = math.Max(set, free)
		}
		baseExcess := 60 + 700*math.Max(0, math.Min(1, (14-t72)/14))
		tauDecayMin := 60.0
		if heated {
			tauDecayMin = 90
		}

		// Minute by minute through the hour.
		var sumT, sumRH float64
		for m := 0; m < 60; m++ {
			now := start.Add(time.Duration(m) * time.Minute)
			tempIn += (target - tempIn) * (1.0 / 180)
			inShower := false
			for _, s := range showers {
				if !now.Before(s.from) && now.Before(s.to) {
					inShower = true
				}
			}
			tNow := tempIn + math.Min(1, excess/1500)
			pBase := pOut + baseExcess
			if inShower {
				full := 0.99*climate.SatVapourPressureWaterPa(tNow) - pBase
				excess += (full - excess) * (1 - math.Exp(-1.0/3))
			} else {
				excess *= math.Exp(-1.0 / tauDecayMin)
			}
			rh := 100 * (pBase + excess) / climate.SatVapourPressureWaterPa(tNow)
			sumT += tNow
			sumRH += math.Min(rh, 99)
		}
		out[i] = reading{end: h.end, tempC: sumT / 60, rhPct: sumRH / 60}
	}
	return out
}

type showerSpell struct{ from, to time.Time }

// planShowers draws the day's showers: a morning one on 90 % of days
// (starting 06:20–07:50 UTC on weekdays, 08:00–10:00 at weekends) lasting
// 25–50 min (one or two people), and an evening one on 70 % of days
// (starting 20:00–22:30, 20–35 min).
func planShowers(r *rand.Rand, midnight time.Time) []showerSpell {
	var s []showerSpell
	add := func(fromH, spanH, minMin, maxMin float64) {
		from := midnight.Add(time.Duration((fromH + spanH*r.Float64()) * float64(time.Hour)))
		dur := time.Duration((minMin + (maxMin-minMin)*r.Float64()) * float64(time.Minute))
		s = append(s, showerSpell{from.Truncate(time.Minute), from.Add(dur).Truncate(time.Minute)})
	}
	weekend := midnight.Weekday() == time.Saturday || midnight.Weekday() == time.Sunday
	if r.Float64() < 0.9 {
		if weekend {
			add(8, 2, 25, 50)
		} else {
			add(6.33, 1.5, 25, 50)
		}
	}
	if r.Float64() < 0.7 {
		add(20, 2.5, 20, 35)
	}
	return s
}

// simulateBasement returns 15-minute readings of a cellar room logger,
// driven by the outdoor hours (linearly interpolated to the quarter hour).
// The model:
//
//   - temperature: ground-coupled, 13.5 °C mean with a 3.2 K annual cycle
//     lagging the air by about two months (coldest late March, warmest
//     mid-September), plus 0.15 × the outdoor 5-day anomaly and a slow
//     AR(1) (6 h, 0.08 K);
//   - vapour pressure: 0.45 × the outdoor 2-day mean plus 0.55 × the vapour
//     pressure in equilibrium with damp walls at 86 % RH plus 80 Pa of
//     moisture from the walls, so the room is dampest in late summer when
//     warm humid air meets cool walls; RH above 94 % is bounded softly
//     at 97 %;
//   - visits: the door is opened a few times a week for 15–45 min (air a
//     little warmer and more humid), which shows in a 15-minute record;
//   - logger noise: 0.3 % RH.
func simulateBasement(r *rand.Rand, outdoor []hour, start time.Time, steps int) []reading {
	const stepH = 0.25
	out := make([]reading, steps)
	vap48 := newRunningMean(48, stepH)
	anom120 := newRunningMean(120, stepH)
	slow := newAR1(6, stepH)
	noise := newAR1(1, stepH)
	visitLeft := 0 // quarter hours of an open door
	for i := range out {
		end := start.Add(time.Duration(i+1) * 15 * time.Minute)
		mid := end.Add(-7*time.Minute - 30*time.Second)
		tOut, pOut := interpolateOutdoor(outdoor, mid)
		doy := float64(mid.YearDay()-1) + float64(mid.Hour())/24
		clim := meanTempC - seasonAmpC*math.Cos(2*math.Pi*(doy-coldestDay)/365.25)
		a := anom120.add(tOut - clim)
		tempC := 13.5 - 3.2*math.Cos(2*math.Pi*(doy-80)/365.25) + 0.15*a + 0.08*slow.next(r)
		p := 0.45*vap48.add(pOut) + 0.55*0.86*climate.SatVapourPressureWaterPa(tempC) + 80

		if visitLeft == 0 && r.Float64() < 0.004 && mid.Hour() >= 8 && mid.Hour() < 20 {
			visitLeft = 1 + r.IntN(3)
		}
		if visitLeft > 0 {
			visitLeft--
			tempC += 0.4
			p += 0.25 * math.Max(0, pOut-p)
		}

		rh := 100 * p / climate.SatVapourPressureWaterPa(tempC)
		if rh > 94 {
			rh = 94 + 3*(1-math.Exp(-(rh-94)/3))
		}
		rh += 0.3 * noise.next(r)
		out[i] = reading{end: end, tempC: tempC, rhPct: rh}
	}
	return out
}

// interpolateOutdoor returns the outdoor temperature and vapour pressure at
// t, linearly interpolated between the hour stamps of the outdoor series
// (clamped at its ends).
func interpolateOutdoor(outdoor []hour, t time.Time) (tempC, vapourPa float64) {
	f := t.Sub(outdoor[0].end).Hours()
	if f <= 0 {
		return outdoor[0].tempC, outdoor[0].vapourPa
	}
	i := int(f)
	if i >= len(outdoor)-1 {
		last := outdoor[len(outdoor)-1]
		return last.tempC, last.vapourPa
	}
	w := f - float64(i)
	a, b := outdoor[i], outdoor[i+1]
	return a.tempC*(1-w) + b.tempC*w, a.vapourPa*(1-w) + b.vapourPa*w
}
