package surface

import (
	"math"

	"github.com/gyprisk/gyprisk/climate"
)

// ClearSkyEmissivity returns the effective emissivity of a cloudless sky
// from the dew point θ_dp (°C) at screen height:
//
//	ε_0 = 0.711 + 0.56·(θ_dp/100) + 0.73·(θ_dp/100)²
//
// without the paper's small diurnal (±0.013) and pressure terms. Fitted to
// night and day clear-sky measurements at six US sites for
// −13 °C ≤ θ_dp ≤ 24 °C; the result is clipped to 0–1 outside that range.
// Source: Berdahl, P. & Martin, M. (1984), Emissivity of clear skies, Solar
// Energy 32(5), 663–664 (coefficients as transcribed in public code; the
// paper itself was not read).
func ClearSkyEmissivity(dewPointC float64) float64 {
	x := dewPointC / 100
	e := 0.711 + 0.56*x + 0.73*x*x
	return clip01(e)
}

// CloudySkyEmissivity corrects a clear-sky emissivity ε_0 for a cloud
// fraction c (0 clear … 1 overcast):
//
//	ε = (1 − 0.84·c)·ε_0 + 0.84·c
//
// so an overcast sky radiates almost like a black body at air temperature.
// Source: Campbell, G. S. & Norman, J. M. (1998), An Introduction to
// Environmental Biophysics, 2nd ed., Springer, chapter 10 (the coefficient
// 0.84 as transcribed in public code; the book itself was not read).
func CloudySkyEmissivity(clearEmissivity, cloudFraction float64) float64 {
	c := clip01(cloudFraction)
	return (1-0.84*c)*clearEmissivity + 0.84*c
}

// SkyTemperatureC returns the sky's effective radiant temperature (°C) for
// air at airTempC with sky emissivity ε, the temperature of a black body
// that emits the sky's downward long-wave irradiance ε·σ·T_a⁴:
//
//	T_sky = ε^(1/4) · T_a   (kelvin)
func SkyTemperatureC(airTempC, skyEmissivity float64) float64 {
	return math.Sqrt(math.Sqrt(skyEmissivity))*(airTempC+climate.KelvinOffset) - climate.KelvinOffset
}

// SkyTemperatureFromAirC is the usual chain for one record interval: the
// sky temperature (°C) for air at airTempC with vapour pressure vapourPa and
// cloud fraction cloudFraction, through ClearSkyEmissivity (with the dew
// point of climate.DewPointC) and CloudySkyEmissivity.
func SkyTemperatureFromAirC(airTempC, vapourPa, cloudFraction float64) float64 {
	e := CloudySkyEmissivity(ClearSkyEmissivity(climate.DewPointC(vapourPa)), cloudFraction)
	return SkyTemperatureC(airTempC, e)
}

// MinCloudElevationDeg is the lowest solar elevation at which
// CloudFractionFromGlobal estimates cloud cover. Below it the clear-sky
// reference is too small and too uncertain (common practice, no source).
const MinCloudElevationDeg = 10

// CloudFractionFromGlobal estimates the cloud fraction (0–1) from the
// measured global horizontal irradiance ghiWM2 and the apparent solar
// zenith zenithDeg, by inverting the cloud-cover relation of Kasten &
// Czeplak:
//
//	G_clear = 910·sin h − 30   (W/m², h the solar elevation)
//	G/G_clear = 1 − 0.75·c^3.4  ⇒  c = ((1 − G/G_clear)/0.75)^(1/3.4)
//
// clipped to 0–1. ok is false, and the fraction meaningless, when the sun is
// below MinCloudElevationDeg or the irradiance is missing. Source: Kasten, F.
// & Czeplak, G. (1980), Solar and terrestrial radiation dependent on the
// amount and type of cloud, Solar Energy 24(2), 177–189 (coefficients from
// memory, not checked against the paper).
func CloudFractionFromGlobal(ghiWM2, zenithDeg float64) (fraction float64, ok bool) {
	h := 90 - zenithDeg
	if !(h >= MinCloudElevationDeg) || math.IsNaN(ghiWM2) {
		return 0, false
	}
	clear := 910*math.Sin(h*math.Pi/180) - 30
	r := ghiWM2 / clear
	if r >= 1 {
		return 0, true
	}
	if r <= 0.25 {
		return 1, true
	}
	return math.Pow((1-r)/0.75, 1/3.4), true
}

// CloudEstimator carries a cloud-fraction estimate through a record, one
// interval after another: in daylight (sun above MinCloudElevationDeg) it
// takes CloudFractionFromGlobal; at night and at low sun it keeps the last
// daylight value; in an interval with rain it takes the sky as overcast
// (c = 1: rain falls from cloud; common practice, no source), and keeps that
// into the following night. The zero value starts from a clear sky, the
// cautious assumption for condensation until the first daylight hour.
type CloudEstimator struct {
	last float64
}

// Update returns the cloud fraction for an interval with mean global
// horizontal irradiance ghiWM2, the apparent solar zenith zenithDeg at its
// midpoint and rainMM of precipitation (NaN for missing values, which are
// ignored). It does not allocate.
func (c *CloudEstimator) Update(ghiWM2, zenithDeg, rainMM float64) float64 {
	if rainMM > 0 {
		c.last = 1
		return 1
	}
	if f, ok := CloudFractionFromGlobal(ghiWM2, zenithDeg); ok {
		c.last = f
	}
	return c.last
}

func clip01(x float64) float64 {
	if x < 0 {
		return 0
	}
	if x > 1 {
		return 1
	}
	return x
}
