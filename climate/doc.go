// Package climate reads, checks and summarises climate records: hourly
// weather data and room-logger data, the input of every gyprisk
// assessment.
//
// # Records
//
// A record is a delimited text file with a header row and one row per
// interval. Columns (any order, names case-insensitive):
//
//	time          RFC 3339 / ISO 8601 date and time, the END of the interval (required)
//	temp_c        air temperature, °C (required)
//	rh_pct        relative humidity, % (required)
//	rain_mm       precipitation in the interval, mm
//	wind_ms       mean wind speed at 10 m, m/s
//	wind_dir_deg  direction the wind blows from, degrees clockwise from north
//	solar_wm2     global horizontal irradiance, mean over the interval, W/m²
//
// Reader streams a record row by row and checks every value against the
// physical bounds documented with MinTempC and its neighbours; a bad value
// becomes a *ParseError naming file, line, column and value. Foreign
// layouts are read through ReaderConfig: other header names, °F or K, km/h
// or knots, ';' or TAB delimiters with decimal commas, local time stamps in
// a named zone (daylight-saving gaps and repeated hours are errors, never
// silently shifted).
//
// # Methods
//
// Psychrometrics follow ISO 13788:2012 (Magnus-form saturation vapour
// pressure over water and ice), tested against IAPWS. The driving rain
// index follows ISO 15927-3:2009, clause 3 (airfield index from hourly wind
// and rain); its spell index is implemented from a secondary description
// and marked unverified. Series.Hourly turns sub-hourly records into the
// hourly values those methods need. Summarise gives the overview the
// "gyprisk climate" command prints.
//
// All values inside the package are SI (°C for temperature), in UTC.
package climate
