package main

import (
	"math"
	"math/rand/v2"
	"time"

	"github.com/gyprisk/gyprisk/climate"
)

// hour is one simulated hour of Harrowmere weather. Values are the model's
// full-precision state; rounding happens when a row is written.
type hour struct {
	end        time.Time // end of the interval (UTC)
	tempC      float64   // air temperature, °C
	rhPct      float64   // relative humidity over water, %
	vapourPa   float64   // water vapour pressure, Pa
	rainMM     float64   // precipitation in the hour, mm
	windMS     float64   // mean wind speed at 10 m, m/s
	windDirDeg float64   // direction the wind blows from, ° from north
	solarWM2   float64   // global horizontal irradiance, hourly mean, W/m²
	cover      float64   // cloud cover, fraction of the sky
}

// episode is a scripted spell of settled weather, so the demo is sure to
// contain what a surveyor looks for: hot, still, sunny days (south-west
// facades near 50 °C) and clear frosty nights. Inside an episode the model
// blends the synoptic index towards strongly anticyclonic and the
// temperature anomaly towards anomC, with a one-day ramp at each end.
type episode struct {
	start time.Time
	days  float64
	anomC float64 // target temperature anomaly, K
}

// episodes are the scripted spells of the outdoor record (listed in
// examples/README.md).
var episodes = []episode{
	{date(2021, 2, 15), 6, -5.0},  // cold, clear: frosty nights
	{date(2021, 7, 19), 5, +5.5},  // hot, still, sunny
	{date(2022, 1, 24), 5, -4.5},  // cold, clear
	{date(2022, 8, 10), 6, +8.0},  // the hottest spell: air near 33 °C
	{date(2023, 1, 16), 5, -4.5},  // cold, clear
	{date(2023, 6, 24), 4, +5.5},  // hot, still, sunny
	{date(2023, 12, 12), 4, -3.5}, // cold, clear
}

func date(y int, m time.Month, d int) time.Time {
	return time.Date(y, m, d, 0, 0, 0, 0, time.UTC)
}

// weight returns the episode's blending weight at t: 0 outside, rising
// smoothly to 1 over the first day and falling over the last.
func (e episode) weight(t time.Time) float64 {
	d := t.Sub(e.start).Hours() / 24
	if d <= 0 || d >= e.days {
		return 0
	}
	ramp := math.Min(1, math.Min(d, e.days-d))
	return ramp * ramp * (3 - 2*ramp) // smoothstep
}

// ar1 is a first-order autoregressive process with unit stationary variance
// and correlation time tauH hours:
//
//	x_k = φ x_{k−1} + √(1 − φ²) ε_k,  φ = exp(−Δt/τ),  ε_k ~ N(0, 1)
type ar1 struct{ x, phi, s float64 }

func newAR1(tauH, stepH float64) ar1 {
	phi := math.Exp(-stepH / tauH)
	return ar1{phi: phi, s: math.Sqrt(1 - phi*phi)}
}

func (a *ar1) next(r *rand.Rand) float64 {
	a.x = a.phi*a.x + a.s*r.NormFloat64()
	return a.x
}

// Model constants of the outdoor weather. They were tuned by eye until the
// statistics printed by "go run ./examples/generate -v" matched a
// temperate maritime climate; they are not fitted to any measured record.
const (
	meanTempC      = 10.5 // annual mean air temperature
	seasonAmpC     = 6.5  // amplitude of the annual cycle
	coldestDay     = 20   // day of year of the coldest climatological day
	anomSDC        = 2.0  // standard deviation of the temperature anomaly
	synopticTauH   = 40   // correlation time of the weather-type index
	anomTauH       = 80   // correlation time of the temperature anomaly
	windWeibullK   = 2.0  // Weibull shape of the hourly wind speed
	windScaleMS    = 5.25 // Weibull scale, annual mean (mean = λ·Γ(1+1/k))
	rainSpellStay  = 0.78 // probability that a wet hour is followed by another
	rainStartBase  = 0.0145
	rainMeanMMPerH = 0.95 // mean intensity of ordinary (frontal) rain hours
)

// simulateOutdoor returns hours of invented Harrowmere weather, the first
// ending one hour after start. The model, hour by hour:
//
//   - a weather-type index S (AR(1), 40 h): positive is cyclonic (cloudy,
//     windy, wet; mild in winter, cool in summer), negative anticyclonic;
//   - daily-mean temperature: annual cosine + AR(1) anomaly + S coupling,
//     plus a diurnal cosine peaking at 15:00 solar time whose amplitude
//     shrinks with cloud cover;
//   - cloud cover: a logistic function of S and a fast AR(1) (6 h);
//   - rain: a two-state Markov chain (wet/dry) whose start probability
//     rises with S and in autumn and winter; intensities exponential;
//     occasional convective downpours on warm summer afternoons;
//   - humidity through the dew point: a dew-point depression below the
//     daily-mean temperature (largest in spring and in anticyclonic
//     weather), pulled to near saturation in and after rain, so RH is high
//     at night and in rain and lowest on clear spring afternoons;
//   - wind: Weibull (k = 2) by a Gaussian copula of S and an AR(1), stronger
//     in winter, in rain and in the afternoon; the direction is that of a
//     mean vector (from 235° when cyclonic, from 60° when anticyclonic)
//     plus a wandering AR(1) vector;
//   - solar: Haurwitz clear sky, hourly mean, times the Kasten–Czeplak cloud
//     factor, times 0.6 in rain;
//   - scripted spells (episodes): settled weather on fixed dates, each hot
//     spell ending in a thunderstorm on its last afternoon.
func simulateOutdoor(r *rand.Rand, start time.Time, hours int) []hour {
	out := make([]hour, hours)
	syn := newAR1(synopticTauH, 1)
	anom := newAR1(anomTauH, 1)
	cloudNoise := newAR1(6, 1)
	dewNoise := newAR1(24, 1)
	windNoise := newAR1(10, 1)
	dirE, dirN := newAR1(12, 1), newAR1(12, 1)
	tempNoise := newAR1(3, 1)
	// Start the slow processes from their stationary distribution.
	syn.x, anom.x = r.NormFloat64(), r.NormFloat64()

	raining := false
	wet := 0.0 // 1 in rain, decaying over about 3 h after it
	for i := range out {
		end := start.Add(time.Duration(i+1) * time.Hour)
		mid := end.Add(-30 * time.Minute)
		doy := float64(mid.YearDay()-1) + float64(mid.Hour())/24 + float64(mid.Minute())/1440
		winter := math.Cos(2 * math.Pi * (doy - coldestDay) / 365.25) // +1 mid-winter, −1 mid-summer
		solarHour := float64(mid.Hour()) + float64(mid.Minute())/60 + siteLonDeg/15

		// Scripted spells.
		ep, epAnom := 0.0, 0.0
		for _, e := range episodes {
			if w := e.weight(mid); w > ep {
				ep, epAnom = w, e.anomC
			}
		}

		s := syn.next(r)
		s = s*(1-ep) - 1.8*ep
		a := anomSDC*anom.next(r)*(1-ep) + epAnom*ep

		tDay := meanTempC - seasonAmpC*winter + a + 1.1*winter*s

		// Cloud cover, fraction of the sky. Summer is a little less cloudy.
		x := 0.9*s + 0.75*cloudNoise.next(r) - 0.25*(1-winter)/2
		cover := 1 / (1 + math.Exp(-2.2*(x+0.75)))
		cover *= 1 - 0.9*ep

		// Rain: wet/dry Markov chain. Start probability peaks in late
		// November and is lowest in late May.
		wetSeason := 1 + 0.55*math.Cos(2*math.Pi*(doy-330)/365.25)
		var rainMM float64
		if ep < 0.3 {
			if raining {
				raining = r.Float64() < rainSpellStay+0.06*math.Tanh(s)
			} else {
				p := math.Min(0.5, rainStartBase*wetSeason*math.Exp(0.8*s))
				raining = r.Float64() < p
			}
		} else {
			raining = false
		}
		if raining {
			mean := rainMeanMMPerH * (0.8 + 0.2*wetSeason) * (1 + 0.25*math.Max(0, s))
			rainMM = 0.1 + r.ExpFloat64()*(mean-0.1)
			cover = math.Max(cover, 0.88+0.12*r.Float64())
		}

		amp := (4.3-1.2*winter)*(1-0.8*math.Pow(cover, 1.5)) + 0.4
		diurnal := math.Cos(2 * math.Pi * (solarHour - 15) / 24)
		tempC := tDay + amp*diurnal + 0.3*tempNoise.next(r)

		// Convective downpours: warm summer afternoons, often as a hot
		// spell breaks.
		if winter < -0.3 && solarHour >= 12 && solarHour <= 20 && tempC > 21 && ep < 0.9 {
			p := 0.006 * (tempC - 21) / 4 * (1 + 2*ep)
			if r.Float64() < p {
				rainMM += 7 + r.ExpFloat64()*5
				rainMM = math.Min(rainMM, 24)
				cover = math.Max(cover, 0.95)
				tempC -= 2.5
			}
		}
		// A hot spell breaks with a thunderstorm on its last afternoon.
		for _, e := range episodes {
			if e.anomC <= 0 {
				continue
			}
			storm := e.start.Add(time.Duration((e.days - 0.35) * 24 * float64(time.Hour))).Truncate(time.Hour)
			if k := int(mid.Sub(storm).Hours()); mid.After(storm) && k < 2 {
				rainMM += []float64{12, 3}[k] + []float64{8, 4}[k]*r.Float64()
				cover = 1
				tempC -= 3
			}
		}
		if rainMM > 0 {
			wet = 1
		} else {
			wet *= math.Exp(-1.0 / 3)
		}

		// Humidity through the dew point, over water (meteorological RH).
		ddClim := 2.8 + 2.0*math.Cos(2*math.Pi*(doy-115)/365.25)
		dd := ddClim - 0.9*s + 0.7*dewNoise.next(r)
		if epAnom > 0 { // hot spells bring dry continental air
			dd += 4.5 * ep
		} else {
			dd += 1.5 * ep
		}
		dd = math.Max(0.3, math.Min(14, dd))
		dew := (tDay-dd)*(1-wet) + (tempC-0.4)*wet
		if dew > tempC {
			dew = tempC
		}
		vapour := climate.SatVapourPressureWaterPa(dew)
		rh := 100 * vapour / climate.SatVapourPressureWaterPa(tempC)

		// Wind: Weibull by a Gaussian copula.
		z := 0.65*s + 0.76*windNoise.next(r)
		u := 0.5 * math.Erfc(-z/math.Sqrt2)
		u = math.Min(u, 1-1e-12)
		lambda := windScaleMS * (1 + 0.18*winter) * (1 + 0.12*math.Cos(2*math.Pi*(solarHour-14)/24)*(1-0.5*cover))
		wind := lambda * math.Pow(-math.Log(1-u), 1/windWeibullK)
		if raining {
			wind *= 1.12
		}
		wind *= 1 - 0.7*ep

		// Wind direction: the direction the "from" vector points to.
		cyc := 1 / (1 + math.Exp(-2*s))
		fromE := 1.2*cyc*math.Sin(235*math.Pi/180) + 0.5*(1-cyc)*math.Sin(60*math.Pi/180) + 0.55*dirE.next(r)
		fromN := 1.2*cyc*math.Cos(235*math.Pi/180) + 0.5*(1-cyc)*math.Cos(60*math.Pi/180) + 0.55*dirN.next(r)
		dir := math.Mod(math.Atan2(fromE, fromN)*180/math.Pi+360, 360)

		solar := meanGHIWM2(end, siteLatDeg, siteLonDeg) * cloudFactor(cover)
		if rainMM > 0 {
			solar *= 0.6
		}

		out[i] = hour{
			end: end, tempC: tempC, rhPct: rh, vapourPa: vapour, rainMM: rainMM,
			windMS: wind, windDirDeg: dir, solarWM2: solar, cover: cover,
		}
	}
	return out
}
