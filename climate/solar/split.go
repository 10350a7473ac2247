package solar

import "math"

// MaxBeamZenithDeg is the zenith angle beyond which Split attributes all of
// the global irradiance to the diffuse part. Near the horizon cos Z is so
// small that dividing by it turns sensor noise and the interval-mean versus
// midpoint-position mismatch into absurd beam values; 87° is a common
// cut-off (common practice, no source).
const MaxBeamZenithDeg = 87

var cosMaxBeamZenith = math.Cos(MaxBeamZenithDeg * deg)

// ErbsDiffuseFraction returns the diffuse fraction k_d = DHI/GHI of hourly
// global horizontal irradiance as a function of the clearness index
// k_t = GHI/(I0·cos Z):
//
//	k_d = 1 − 0.09·k_t                                             k_t ≤ 0.22
//	k_d = 0.9511 − 0.1604·k_t + 4.388·k_t² − 16.638·k_t³ + 12.336·k_t⁴   0.22 < k_t ≤ 0.80
//	k_d = 0.165                                                    k_t > 0.80
//
// A negative k_t is treated as 0. The correlation was fitted to hourly
// pyrheliometer and pyranometer data from five US stations (latitudes
// 31–42°N); it is the usual default for temperate sites.
// Source: Erbs, D. G., Klein, S. A. & Duffie, J. A. (1982), Estimation of
// the diffuse radiation fraction for hourly, daily and monthly-average
// global radiation, Solar Energy 28(4), 293–302.
func ErbsDiffuseFraction(kt float64) float64 {
	switch {
	case kt <= 0:
		return 1
	case kt <= 0.22:
		return 1 - 0.09*kt
	case kt <= 0.80:
		return 0.9511 + kt*(-0.1604+kt*(4.388+kt*(-16.638+kt*12.336)))
	default:
		return 0.165
	}
}

// Components is global horizontal irradiance split into its parts.
type Components struct {
	DNIWM2         float64 // direct (beam) normal irradiance, W/m²
	DHIWM2         float64 // diffuse horizontal irradiance, W/m²
	ClearnessIndex float64 // k_t = GHI/(I0·cos Z), clipped to 0–1; 0 when the sun is low or down
}

// Split divides the global horizontal irradiance ghiWM2 (W/m², the mean
// over the interval) into direct normal and diffuse horizontal parts with
// the Erbs et al. (1982) correlation (see ErbsDiffuseFraction), for an
// apparent solar zenith angle zenithDeg (at the interval midpoint) and the
// extraterrestrial normal irradiance extraWM2:
//
//	k_t = min(GHI/(I0·cos Z), 1)
//	DNI = min(GHI·(1 − k_d(k_t))/cos Z, I0)
//	DHI = GHI − DNI·cos Z
//
// so that DHI + DNI·cos Z = GHI always holds. Guards:
//   - GHI ≤ 0 (night, or a sensor's negative offset) gives zero for both parts;
//   - a zenith beyond MaxBeamZenithDeg, including a sun below the horizon
//     while the interval mean is still positive (twilight, or sunrise
//     within the interval), gives DNI = 0 and DHI = GHI;
//   - a NaN input gives NaN parts.
func Split(ghiWM2, zenithDeg, extraWM2 float64) Components {
	if math.IsNaN(ghiWM2) || math.IsNaN(zenithDeg) || math.IsNaN(extraWM2) {
		nan := math.NaN()
		return Components{nan, nan, nan}
	}
	if ghiWM2 <= 0 {
		return Components{}
	}
	cz := math.Cos(zenithDeg * deg)
	return splitCos(ghiWM2, cz, extraWM2)
}

// splitCos is Split for a known cos Z and a positive GHI.
func splitCos(ghi, cz, extra float64) Components {
	if cz < cosMaxBeamZenith || extra <= 0 {
		return Components{DHIWM2: ghi}
	}
	kt := ghi / (extra * cz)
	if kt > 1 {
		kt = 1
	}
	dni := ghi * (1 - ErbsDiffuseFraction(kt)) / cz
	if dni > extra {
		dni = extra
	}
	return Components{DNIWM2: dni, DHIWM2: ghi - dni*cz, ClearnessIndex: kt}
}
