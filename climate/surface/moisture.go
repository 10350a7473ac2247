package surface

import "github.com/gyprisk/gyprisk/climate"

const (
	// AirGasConstantJPerKgK is the specific gas constant of dry air,
	// 287.05 J/(kg·K) (CODATA 2018 molar gas constant over the molar mass
	// 28.9647 g/mol of the US Standard Atmosphere 1976).
	AirGasConstantJPerKgK = 287.05

	// AirHeatCapacityJPerKgK is the specific heat capacity of air at
	// constant pressure near 10 °C, 1006 J/(kg·K) (handbook value, from
	// memory).
	AirHeatCapacityJPerKgK = 1006

	// StandardPressurePa is the standard atmosphere, 101 325 Pa.
	StandardPressurePa = 101325
)

// MassTransferCoefficient returns the surface vapour-pressure transfer
// coefficient β_p in kg/(m²·s·Pa) for a convective heat transfer
// coefficient hcWPerM2K, from the Lewis relation with Le = 1:
//
//	β_c = h_c / (ρ_a·c_p)            (m/s, concentration-based)
//	β_p = β_c / (R_v·T) = h_c·R_a / (p_atm·c_p·R_v)
//
// The temperature cancels because ρ_a·T = p_atm/R_a; the result is
// β_p ≈ 6.1·10⁻⁹ s/m × h_c at standard pressure. Valid for ordinary
// outdoor conditions (wind-driven forced convection, small vapour
// concentrations). Sources: the Chilton–Colburn (Lewis) analogy as used in
// building physics, e.g. Hens, H. (2012), Building Physics – Heat, Air and
// Moisture, 2nd ed., Ernst & Sohn, on surface film coefficients (from
// memory).
func MassTransferCoefficient(hcWPerM2K float64) float64 {
	return hcWPerM2K * AirGasConstantJPerKgK / (StandardPressurePa * AirHeatCapacityJPerKgK * climate.RvJPerKgK)
}

// CondensationRateKgPerM2S returns the vapour mass flux onto a surface at
// surfaceTempC from air with vapour pressure airVapourPa:
//
//	g = β_p·(p_e − p_sat(θ_s))   kg/(m²·s)
//
// with β_p from MassTransferCoefficient(hcWPerM2K) and p_sat from
// climate.SatVapourPressurePa (ISO 13788:2012 Annex E, over ice below
// 0 °C). Positive means condensation (the surface is below the air's dew
// point); negative is the evaporation rate a wet surface would have, which
// the caller must limit to the water actually there. airTempC is accepted
// for symmetry with the heat balance and is not needed by the Le = 1 form.
func CondensationRateKgPerM2S(hcWPerM2K, airTempC, airVapourPa, surfaceTempC float64) float64 {
	_ = airTempC
	return MassTransferCoefficient(hcWPerM2K) * (airVapourPa - climate.SatVapourPressurePa(surfaceTempC))
}

// SurfaceRHPct returns the relative humidity (%) of the air layer at a
// surface at surfaceTempC in air with vapour pressure airVapourPa:
// climate.RHAtPct. Above 100 the surface is condensing.
func SurfaceRHPct(airVapourPa, surfaceTempC float64) float64 {
	return climate.RHAtPct(airVapourPa, surfaceTempC)
}

// LatentHeatJPerKg returns the latent heat released when vapour condenses
// on a surface at tempC: of vaporisation over water (θ ≥ 0 °C), of
// sublimation over ice below, matching the phase that ISO 13788's
// saturation pressure assumes:
//
//	L_v = 2.501·10⁶ − 2370·θ   J/kg   (θ ≥ 0 °C)
//	L_s = 2.834·10⁶            J/kg   (θ < 0 °C)
//
// Source: Rogers, R. R. & Yau, M. K. (1989), A Short Course in Cloud
// Physics, 3rd ed., Pergamon, Table 2.1 (from memory).
func LatentHeatJPerKg(tempC float64) float64 {
	if tempC < 0 {
		return 2.834e6
	}
	return 2.501e6 - 2370*tempC
}
