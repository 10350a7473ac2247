package solar

import (
	"math"
	"time"
)

// DefaultAlbedo is the ground reflectance used when nothing better is
// known: 0.2, the conventional value for grass and mixed urban ground
// (common practice, no source).
const DefaultAlbedo = 0.2

// Irradiance is the short-wave irradiance on a surface, W/m².
type Irradiance struct {
	BeamWM2       float64 // direct beam, DNI·cos θ
	SkyDiffuseWM2 float64 // diffuse from the sky vault (Perez 1990)
	GroundWM2     float64 // reflected from the ground (isotropic)
	TotalWM2      float64 // sum of the three
}

// Plane is a surface orientation with its trigonometry evaluated once.
type Plane struct {
	TiltDeg    float64 // from the horizontal: 0 faces up, 90 is vertical, 180 faces down
	AzimuthDeg float64 // the direction the surface faces, clockwise from north

	cosT, sinT   float64
	cosAz, sinAz float64
}

// NewPlane returns the plane with tilt tiltDeg (0–180°) facing azimuthDeg.
func NewPlane(tiltDeg, azimuthDeg float64) Plane {
	st, ct := math.Sincos(tiltDeg * deg)
	sa, ca := math.Sincos(azimuthDeg * deg)
	return Plane{TiltDeg: tiltDeg, AzimuthDeg: azimuthDeg, cosT: ct, sinT: st, cosAz: ca, sinAz: sa}
}

// CosIncidence returns the cosine of the angle between the sun's rays and
// the plane's outward normal (negative when the sun is behind the plane):
//
//	cos θ = cos Z·cos β + sin Z·sin β·cos(γ_s − γ)
//
// Source: Duffie & Beckman, Solar Engineering of Thermal Processes (any
// edition), the angle-of-incidence relation for a surface of tilt β and
// azimuth γ (from memory; a standard identity of spherical trigonometry).
func (p *Plane) CosIncidence(s *Sun) float64 {
	cosDaz := s.cosAz*p.cosAz + s.sinAz*p.sinAz
	return s.cosZ*p.cosT + s.sinZ*p.sinT*cosDaz
}

// Sky is the state of the sky in one interval: the sun, the split of the
// global horizontal irradiance, and the Perez brightness coefficients. It
// does not depend on the receiving surface, so it is computed once per
// interval and then applied to every plane with OnPlane.
type Sky struct {
	Sun
	GHIWM2 float64
	Components
	F1, F2 float64 // Perez circumsolar and horizon-brightening coefficients
}

// NewSky splits the global horizontal irradiance ghiWM2 for the sun
// position s (at the interval midpoint) and the extraterrestrial normal
// irradiance extraWM2, and evaluates the Perez brightness coefficients.
// A NaN irradiance gives a Sky whose irradiances are NaN.
func NewSky(s Sun, ghiWM2, extraWM2 float64) Sky {
	sky := Sky{Sun: s, GHIWM2: ghiWM2}
	switch {
	case math.IsNaN(ghiWM2) || math.IsNaN(extraWM2):
		nan := math.NaN()
		sky.Components = Components{nan, nan, nan}
		return sky
	case ghiWM2 <= 0:
		sky.GHIWM2 = 0
		return sky
	}
	sky.Components = splitCos(ghiWM2, s.cosZ, extraWM2)
	if s.cosZ > 0 {
		sky.F1, sky.F2 = PerezBrightness(sky.DHIWM2, sky.DNIWM2, s.ZenithDeg, extraWM2)
	}
	return sky
}

// OnPlane returns the irradiance on plane p under this sky, with ground
// reflectance albedo (0–1; DefaultAlbedo when unknown):
//
//	I_beam   = DNI·max(0, cos θ)
//	I_sky    = DHI·[(1 − F1)·(1 + cos β)/2 + F1·a/b + F2·sin β],  clipped at 0
//	I_ground = GHI·albedo·(1 − cos β)/2
//	a = max(0, cos θ),  b = max(cos 85°, cos Z)
//
// Sources: Perez, R., Ineichen, P., Seals, R., Michalsky, J. & Stewart, R.
// (1990), Modeling daylight availability and irradiance components from
// direct and global irradiance, Solar Energy 44(5), 271–289 (sky diffuse);
// Liu, B. Y. H. & Jordan, R. C. (1963), Solar Energy 7, 53–74 (isotropic
// ground reflection). OnPlane does not allocate.
func (s *Sky) OnPlane(p *Plane, albedo float64) Irradiance {
	if s.GHIWM2 <= 0 {
		return Irradiance{}
	}
	ci := p.CosIncidence(&s.Sun)
	a := ci
	if a < 0 {
		a = 0
	}
	b := s.cosZ
	if b < cos85 {
		b = cos85
	}
	var r Irradiance
	r.BeamWM2 = s.DNIWM2 * a
	d := s.DHIWM2 * ((1-s.F1)*(1+p.cosT)/2 + s.F1*a/b + s.F2*p.sinT)
	if d > 0 {
		r.SkyDiffuseWM2 = d
	}
	r.GroundWM2 = s.GHIWM2 * albedo * (1 - p.cosT) / 2
	r.TotalWM2 = r.BeamWM2 + r.SkyDiffuseWM2 + r.GroundWM2
	return r
}

// Tilted is the one-call form of NewSky and OnPlane: the irradiance on a
// surface of tilt tiltDeg facing surfaceAzDeg, from the global horizontal
// irradiance ghiWM2 with the sun at zenithDeg, sunAzDeg (apparent, at the
// interval midpoint), on the day of t (for the extraterrestrial
// irradiance), with ground reflectance albedo. For many surfaces under one
// sky, build the Sky once with NewSky and call OnPlane instead.
func Tilted(ghiWM2, zenithDeg, sunAzDeg, tiltDeg, surfaceAzDeg float64, t time.Time, albedo float64) Irradiance {
	sky := NewSky(newSun(zenithDeg, sunAzDeg), ghiWM2, ExtraterrestrialNormalWM2(t))
	p := NewPlane(tiltDeg, surfaceAzDeg)
	return sky.OnPlane(&p, albedo)
}

var cos85 = math.Cos(85 * deg)

// perezKappa is the constant of the sky clearness formula for a zenith
// angle in radians (Perez et al. 1990).
const perezKappa = 1.041

// perezEpsilonEdges are the upper edges of the first seven sky clearness
// bins; the eighth bin is ε ≥ 6.2 (Perez et al. 1990, Table 1).
var perezEpsilonEdges = [7]float64{1.065, 1.23, 1.5, 1.95, 2.8, 4.5, 6.2}

// perezCoefficients are f11, f12, f13, f21, f22, f23 for the eight sky
// clearness bins: the "all sites composite" set of Perez et al. (1990),
// Solar Energy 44, Table 6, as transcribed identically in several public
// implementations and in ISO 52010-1:2017 (the standard itself not read).
var perezCoefficients = [8][6]float64{
	{-0.008, 0.588, -0.062, -0.060, 0.072, -0.022},
	{0.130, 0.683, -0.151, -0.019, 0.066, -0.029},
	{0.330, 0.487, -0.221, 0.055, -0.064, -0.026},
	{0.568, 0.187, -0.295, 0.109, -0.152, -0.014},
	{0.873, -0.392, -0.362, 0.226, -0.462, 0.001},
	{1.132, -1.237, -0.412, 0.288, -0.823, 0.056},
	{1.060, -1.600, -0.359, 0.264, -1.127, 0.131},
	{0.678, -0.327, -0.250, 0.156, -1.377, 0.251},
}

// PerezBrightness returns the Perez circumsolar (F1) and horizon-brightening
// (F2) coefficients for diffuse horizontal dhiWM2, direct normal dniWM2, an
// apparent zenith zenithDeg (< 90°) and extraterrestrial normal extraWM2:
//
//	ε  = ((DHI + DNI)/DHI + κ·Z³) / (1 + κ·Z³),  κ = 1.041, Z in radians
//	Δ  = DHI·m/I0,  m the relative air mass (RelativeAirMass)
//	F1 = max(0, f11 + f12·Δ + f13·Z)
//	F2 = f21 + f22·Δ + f23·Z
//
// with f the coefficients of the clearness bin of ε. Without diffuse
// irradiance or with the sun down both are 0, which reduces the Perez model
// to the isotropic sky. Source: Perez et al. (1990), Solar Energy 44(5),
// 271–289.
func PerezBrightness(dhiWM2, dniWM2, zenithDeg, extraWM2 float64) (f1, f2 float64) {
	if !(dhiWM2 > 0) || !(zenithDeg < 90) || !(extraWM2 > 0) {
		return 0, 0
	}
	z := zenithDeg * deg
	kz3 := perezKappa * z * z * z
	eps := ((dhiWM2+dniWM2)/dhiWM2 + kz3) / (1 + kz3)
	bin := 0
	for bin < len(perezEpsilonEdges) && eps >= perezEpsilonEdges[bin] {
		bin++
	}
	delta := dhiWM2 * RelativeAirMass(zenithDeg) / extraWM2
	f := &perezCoefficients[bin]
	f1 = f[0] + f[1]*delta + f[2]*z
	if f1 < 0 {
		f1 = 0
	}
	f2 = f[3] + f[4]*delta + f[5]*z
	return f1, f2
}

// RelativeAirMass returns the relative optical air mass for an apparent
// zenith angle zenithDeg (< 90° gives a finite value; ≥ 90° gives +Inf):
//
//	m = 1 / (cos Z + 0.50572·(96.07995 − Z)^−1.6364),  Z in degrees
//
// Source: Kasten, F. & Young, A. T. (1989), Revised optical air mass tables
// and approximation formula, Applied Optics 28(22), 4735–4738.
func RelativeAirMass(zenithDeg float64) float64 {
	if !(zenithDeg < 90) {
		return math.Inf(1)
	}
	return 1 / (math.Cos(zenithDeg*deg) + 0.50572*math.Pow(96.07995-zenithDeg, -1.6364))
}
