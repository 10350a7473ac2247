// Package surface computes the state of an exterior building surface from
// the outdoor air, wind, sky and sun, hour by hour: its temperature from a
// quasi-steady heat balance, the long-wave exchange with the sky, and the
// water vapour it takes up (condensation) or gives off (evaporation).
//
// The balance (Surface.Solve) per unit area of the outer surface is
//
//	α·I + h_c·(θ_e − θ_s) + ε·σ·[F_sky·(T_sky⁴ − T_s⁴) + F_gnd·(T_e⁴ − T_s⁴)]
//	    + U·(θ_i − θ_s) + L·g = 0,      g = β_p·(p_e − p_sat(θ_s))
//
// with the absorbed short-wave irradiance α·I (from package solar), the
// convective coefficient h_c of ISO 6946:2017 Annex C, the sky temperature
// of a clear-sky emissivity model with a cloud correction (sky.go), the
// view factors of a tilted plane, an optional conduction to a known inner
// temperature, and the latent heat of the vapour flux g from the Lewis
// relation (moisture.go). The latent term acts when the surface condenses
// or when the caller says it is wet; a dry surface does not evaporate.
//
// Quasi-steady means that the wall's heat capacity is ignored: the surface
// is in balance with each hour's conditions. For thin, light finishes this is
// close; for a massive wall it overstates the daily swing of surface
// temperature (a clear night chills it less in reality, a sunny noon heats
// it less). That errs on the side of more condensation hours and higher peak
// temperatures, which is the cautious side for the assessment.
//
// Units: temperatures in °C at the API (kelvin inside the radiation terms),
// vapour pressures in Pa, fluxes in W/m², mass fluxes in kg/(m²·s). All
// saturation pressures come from climate.SatVapourPressurePa (ISO 13788).
package surface
