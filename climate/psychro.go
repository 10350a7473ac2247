package climate

import "math"

// Psychrometrics after ISO 13788:2012 (saturation vapour pressure as a
// function of temperature, the building-physics convention). One formula is
// used throughout gyprisk, so that dew points, surface humidities and
// condensation all agree with each other.
//
// The annex letter and equation numbers cited below (Annex E, E.7, E.8)
// are from memory: the text of the standard was not available to check
// them. The coefficients are checked instead against IAPWS in
// psychro_test.go: over water the formula is within 0.2 % of the IAPWS-95
// saturation line (Wagner & Pruss 2002, J. Phys. Chem. Ref. Data 31) from
// 0 to 80 °C; over ice it is within 0.2 % of the IAPWS R14-08(2011)
// sublimation curve down to −10 °C, 0.5 % at −20 °C, 1 % at −30 °C and
// 1.8 % at −40 °C (always low).

// RvJPerKgK is the specific gas constant of water vapour,
// R/M = 8.314462618 / 0.01801528 = 461.52 J/(kg·K)
// (CODATA 2018 molar gas constant; IUPAC molar mass of water).
const RvJPerKgK = 461.52

// KelvinOffset converts °C to K.
const KelvinOffset = 273.15

// SatVapourPressureWaterPa returns the saturation vapour pressure over
// plane liquid water:
//
//	p_sat = 610.5 · exp(17.269·θ / (237.3 + θ))
//
// θ in °C, p_sat in Pa. Valid for −40 ≤ θ ≤ 80 °C (supercooled water below
// 0 °C). Source: ISO 13788:2012, Annex E, equation (E.7) (annex and equation
// number from memory); the Magnus form.
func SatVapourPressureWaterPa(tempC float64) float64 {
	return 610.5 * math.Exp(17.269*tempC/(237.3+tempC))
}

// SatVapourPressureIcePa returns the saturation vapour pressure over ice:
//
//	p_sat = 610.5 · exp(21.875·θ / (265.5 + θ))
//
// θ in °C, p_sat in Pa. Valid for −40 ≤ θ ≤ 0 °C.
// Source: ISO 13788:2012, Annex E, equation (E.8) (annex and equation
// number from memory).
func SatVapourPressureIcePa(tempC float64) float64 {
	return 610.5 * math.Exp(21.875*tempC/(265.5+tempC))
}

// SatVapourPressurePa returns the saturation vapour pressure that ISO 13788
// uses for building surfaces: over water at θ ≥ 0 °C and over ice below.
// θ in °C, result in Pa, valid for −40 ≤ θ ≤ 80 °C.
func SatVapourPressurePa(tempC float64) float64 {
	if tempC >= 0 {
		return SatVapourPressureWaterPa(tempC)
	}
	return SatVapourPressureIcePa(tempC)
}

// VapourPressurePa returns the partial pressure of water vapour of air at
// temperature θ (°C) and relative humidity φ (%):
//
//	p = φ/100 · p_sat(θ)
//
// in Pa, with p_sat from SatVapourPressurePa. Source: ISO 13788:2012, 3.1
// (definition of relative humidity).
func VapourPressurePa(tempC, rhPct float64) float64 {
	return rhPct / 100 * SatVapourPressurePa(tempC)
}

// DewPointC returns the temperature (°C) at which vapour pressure p (Pa)
// saturates, the exact inverse of SatVapourPressurePa: over water where
// p ≥ 610.5 Pa, over ice (the frost point) below,
//
//	θ_d = 237.3·L / (17.269 − L),  L = ln(p/610.5)   (water)
//	θ_d = 265.5·L / (21.875 − L)                     (ice)
//
// Valid for 12.8 Pa ≤ p ≤ 47 kPa (−40 to 80 °C); p ≤ 0 gives −Inf.
// Source: inverse of ISO 13788:2012, Annex E, equations (E.7) and (E.8).
func DewPointC(vapourPa float64) float64 {
	if vapourPa <= 0 {
		return math.Inf(-1)
	}
	l := math.Log(vapourPa / 610.5)
	if l >= 0 {
		return 237.3 * l / (17.269 - l)
	}
	return 265.5 * l / (21.875 - l)
}

// AbsoluteHumidityKgPerM3 returns the mass of water vapour per cubic metre
// of air, from the ideal gas law:
//
//	ν = p / (R_v · (θ + 273.15))
//
// p in Pa, θ in °C, ν in kg/m³. Source: ISO 13788:2012, equation (1)
// (humidity by volume), with R_v = 461.5 J/(kg·K).
func AbsoluteHumidityKgPerM3(tempC, vapourPa float64) float64 {
	return vapourPa / (RvJPerKgK * (tempC + KelvinOffset))
}

// RHAtPct returns the relative humidity (%) that air with vapour pressure p
// (Pa) has when it is at another temperature θ_s (°C), for example at a
// cold surface:
//
//	φ_s = 100 · p / p_sat(θ_s)
//
// The result is not clipped: a value above 100 means the surface is below
// the dew point of the air (condensation). Source: ISO 13788:2012, 4.2.
func RHAtPct(vapourPa, surfaceTempC float64) float64 {
	return 100 * vapourPa / SatVapourPressurePa(surfaceTempC)
}
