package solar

import (
	"math"
	"time"
)

const (
	deg = math.Pi / 180

	// j2000Unix is 2000-01-01 12:00:00 UTC, Julian date 2451545.0, as a
	// Unix time in seconds.
	j2000Unix = 946728000
)

// Sun is the sun's apparent position at one instant for one site, with the
// sines and cosines that the transposition needs already evaluated.
type Sun struct {
	ZenithDeg  float64 // apparent zenith angle, refraction included, 0–180°
	AzimuthDeg float64 // clockwise from north, 0–360°

	cosZ, sinZ   float64
	cosAz, sinAz float64
}

// Up reports whether the sun's centre is above the horizon (apparent zenith
// below 90°).
func (s Sun) Up() bool { return s.cosZ > 0 }

// CosZenith returns the cosine of the apparent zenith angle.
func (s Sun) CosZenith() float64 { return s.cosZ }

// At returns the sun's apparent position at time t for a site at latitude
// latDeg (north positive) and longitude lonDeg (east positive). See
// Position for the method.
func At(t time.Time, latDeg, lonDeg float64) Sun {
	zen, az := Position(t, latDeg, lonDeg)
	return newSun(zen, az)
}

// newSun precomputes the trigonometric values of a position.
func newSun(zenithDeg, azimuthDeg float64) Sun {
	sz, cz := math.Sincos(zenithDeg * deg)
	sa, ca := math.Sincos(azimuthDeg * deg)
	return Sun{ZenithDeg: zenithDeg, AzimuthDeg: azimuthDeg, cosZ: cz, sinZ: sz, cosAz: ca, sinAz: sa}
}

// Position returns the sun's apparent zenith angle and its azimuth
// (clockwise from north), both in degrees, at time t for a site at latitude
// latDeg (−90…90, north positive) and longitude lonDeg (east positive).
//
// The method is Michalsky's implementation of the Astronomical Almanac's
// low-precision solar coordinates, with n the days since 2000-01-01 12:00 UT:
//
//	L = 280.460° + 0.9856474°·n            mean longitude
//	g = 357.528° + 0.9856003°·n            mean anomaly
//	λ = L + 1.915°·sin g + 0.020°·sin 2g   ecliptic longitude
//	ε = 23.439° − 0.0000004°·n             obliquity of the ecliptic
//	α = atan2(cos ε·sin λ, cos λ)          right ascension
//	δ = asin(sin ε·sin λ)                  declination
//	GMST = 6.697375 h + 0.0657098242 h·n + UT   (hours)
//	H = 15°·GMST + lon − α                 hour angle
//	sin e = sin δ·sin φ + cos δ·cos φ·cos H
//	A = atan2(−cos δ·sin H, sin δ·cos φ − cos δ·sin φ·cos H)
//
// and Michalsky's refraction for a standard atmosphere, added to the
// elevation e (degrees):
//
//	R = 3.51561·(0.1594 + 0.0196e + 0.00002e²)/(1 + 0.505e + 0.0845e²)  (e > −0.56°)
//	R = 0.56°                                                         otherwise
//
// The azimuth uses the two-argument arctangent, which avoids the quadrant
// error of the paper's arcsine form (corrected in its later errata).
// Stated accuracy: 0.01° in the geometric position for 1950–2050.
//
// Source: Michalsky, J. J. (1988), The Astronomical Almanac's algorithm for
// approximate solar position (1950–2050), Solar Energy 40(3), 227–235.
// Checked against the worked example of Reda & Andreas (2004), Solar Energy
// 76, 577–589.
func Position(t time.Time, latDeg, lonDeg float64) (zenithDeg, azimuthDeg float64) {
	el, az := geometric(daysSinceJ2000(t), latDeg, lonDeg)
	el += refractionDeg(el)
	return 90 - el, az
}

// daysSinceJ2000 returns the days (UT) from 2000-01-01 12:00:00 UTC to t.
func daysSinceJ2000(t time.Time) float64 {
	return float64(t.Unix()-j2000Unix)/86400 + float64(t.Nanosecond())/86400e9
}

// geometric returns the refraction-free elevation and the azimuth (degrees)
// after Michalsky (1988), n days from J2000.0.
func geometric(n, latDeg, lonDeg float64) (elevationDeg, azimuthDeg float64) {
	mnlong := 280.460 + 0.9856474*n
	mnanom := (357.528 + 0.9856003*n) * deg
	eclong := (mnlong + 1.915*math.Sin(mnanom) + 0.020*math.Sin(2*mnanom)) * deg
	oblqec := (23.439 - 0.0000004*n) * deg

	sinL, cosL := math.Sincos(eclong)
	sinE, cosE := math.Sincos(oblqec)
	ra := math.Atan2(cosE*sinL, cosL)
	sinDec := sinE * sinL
	cosDec := math.Sqrt(1 - sinDec*sinDec)

	// Hours of UT elapsed since the last 0 h UT: n counts from 12 h UT.
	f := n + 0.5
	hourUT := (f - math.Floor(f)) * 24
	gmst := 6.697375 + 0.0657098242*n + hourUT
	ha := (gmst*15+lonDeg)*deg - ra

	sinLat, cosLat := math.Sincos(latDeg * deg)
	sinHa, cosHa := math.Sincos(ha)
	sinEl := sinDec*sinLat + cosDec*cosLat*cosHa
	if sinEl > 1 {
		sinEl = 1
	} else if sinEl < -1 {
		sinEl = -1
	}
	az := math.Atan2(-cosDec*sinHa, sinDec*cosLat-cosDec*sinLat*cosHa) / deg
	if az < 0 {
		az += 360
	}
	return math.Asin(sinEl) / deg, az
}

// refractionDeg is Michalsky's (1988) refraction correction in degrees for
// an apparent elevation computed from a geometric elevation el (degrees).
func refractionDeg(el float64) float64 {
	if el <= -0.56 {
		return 0.56
	}
	return 3.51561 * (0.1594 + 0.0196*el + 0.00002*el*el) / (1 + 0.505*el + 0.0845*el*el)
}

// IntervalMidpoint returns the midpoint of a record interval of the given
// length that ends at end: the instant at which to evaluate the sun for an
// interval-mean irradiance (record times mark the END of the interval).
func IntervalMidpoint(end time.Time, length time.Duration) time.Time {
	return end.Add(-length / 2)
}

// SolarConstantWM2 is the total solar irradiance at the mean Earth–Sun
// distance: 1360.8 ± 0.5 W/m², rounded to 1361 W/m².
// Source: Kopp, G. & Lean, J. L. (2011), A new, lower value of total solar
// irradiance: evidence and climate significance, Geophys. Res. Lett. 38,
// L01706.
const SolarConstantWM2 = 1361

// ExtraterrestrialNormalWM2 returns the solar irradiance at the top of the
// atmosphere on a plane normal to the sun's rays on the UTC day of t:
//
//	I0 = 1361 W/m² · (1.000110 + 0.034221·cos Γ + 0.001280·sin Γ
//	                  + 0.000719·cos 2Γ + 0.000077·sin 2Γ),
//	Γ = 2π·(d − 1)/365,  d = day of the year (1–366)
//
// The bracket is the inverse square of the Earth–Sun distance in
// astronomical units; Spencer states a maximum error of about 0.0001.
// Sources: Spencer, J. W. (1971), Fourier series representation of the
// position of the sun, Search 2(5), 172; solar constant of Kopp & Lean
// (2011).
func ExtraterrestrialNormalWM2(t time.Time) float64 {
	g := 2 * math.Pi * float64(t.UTC().YearDay()-1) / 365
	s1, c1 := math.Sincos(g)
	s2, c2 := math.Sincos(2 * g)
	return SolarConstantWM2 * (1.000110 + 0.034221*c1 + 0.001280*s1 + 0.000719*c2 + 0.000077*s2)
}
