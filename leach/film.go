package leach

import "math"

// StandardGravityMS2 is the standard acceleration of gravity (CGPM 1901).
const StandardGravityMS2 = 9.80665

// FilmSaturation returns the saturation Ω = c/c_eq (0 to 1) that a film of
// water of thickness filmThicknessM (m), starting free of CaSO4, reaches
// after contactTimeS (s) on a gypsum surface at tempC.
//
// The film is stagnant in its own frame (a falling film carries it along
// the wall; the contact time is then the run length over the film velocity,
// see FallingFilm). Dissolution at the wall is limited in series by the
// surface reaction (the rate law) and by diffusion across the film, taken
// by the linear-driving-force approximation for a slab with a flux at one
// face and none at the free surface: the wall concentration c_s exceeds the
// film mean c by J·h/(3D) (Glueckauf 1955, Trans. Faraday Soc. 51, 1540,
// slab coefficient 3D/h², from memory). With u = 1 − c/c_eq, u_s = 1 −
// c_s/c_eq and g = 3D·c_eq/h,
//
//	J = R(u_s) = g·(u − u_s),     h·c_eq·du/dt = −J,     u(0) = 1
//
// On the linear branch (u_s > 1 − Ωs) this is solved in closed form,
//
//	u = exp(−λt),   λ = k1 / ((1 + k1/g)·h·c_eq)
//
// and on the near-equilibrium branch, where R = kn·u_s^n, time is an
// explicit function of u_s,
//
//	t − t_a = h·c_eq·[(u_s^(1−n) − u_a^(1−n))/(kn·(n − 1)) + (n/g)·ln(u_a/u_s)]
//
// which is inverted by Newton's method in ln u_s (convex, started on the
// side from which it converges monotonically). No time stepping: a call costs a few exp/log.
//
// Valid for tempC within the law's Ceq table, filmThicknessM > 0 and
// contactTimeS ≥ 0; NaN otherwise, and NaN when law.Ceq is nil. The
// dissolved mass per litre is FilmSaturation × law.Ceq.At(tempC) g/L; the
// saturated value is the hard upper bound.
func FilmSaturation(law RateLaw, tempC, filmThicknessM, contactTimeS float64) float64 {
	if law.Ceq == nil || !(filmThicknessM > 0) || !(contactTimeS >= 0) || math.IsInf(filmThicknessM, 0) {
		return math.NaN()
	}
	ceq := law.Ceq.CeqMolPerM3(tempC)
	d := law.DiffusionCoefficient(tempC)
	if math.IsNaN(ceq) || math.IsNaN(d) {
		return math.NaN()
	}
	if contactTimeS == 0 {
		return 0
	}
	if math.IsInf(contactTimeS, 1) {
		return 1
	}
	sh := newFilmShape(law)
	return sh.saturation(law.k1At(tempC), ceq, d, filmThicknessM, contactTimeS)
}

// filmShape holds the constants of a rate law's shape (order n and switch
// Ωs) that the closed forms need, evaluated once.
type filmShape struct {
	n, uSwS       float64 // order and u_s at the switch
	knPerK1       float64 // (1 − Ωs)^(1−n), so kn = k1·knPerK1; also u_s,switch^(1−n)
	lnUSwS        float64
	epsPow, lnEps float64 // at the saturation cut-off
}

// filmEps is the wall undersaturation u_s at which a film counts as
// saturated: beyond it the saturation differs from 1 by about 10⁻⁶.
const filmEps = 1e-6

func newFilmShape(law RateLaw) filmShape {
	s := filmShape{n: law.Order, uSwS: 1 - law.SwitchSaturation}
	s.knPerK1 = math.Pow(s.uSwS, 1-s.n)
	s.lnUSwS = math.Log(s.uSwS)
	s.epsPow = math.Pow(filmEps, 1-s.n)
	s.lnEps = math.Log(filmEps)
	return s
}

// saturation is FilmSaturation's closed form for a surface constant k1
// (mol/(m²·s)), saturation concentration ceq (mol/m³), diffusion
// coefficient d (m²/s), film thickness h (m) and contact time t (s > 0),
// with a cut-off: once the wall undersaturation would fall below 10⁻⁶ the
// film is returned as saturated (1).
func (s *filmShape) saturation(k1, ceq, d, h, t float64) float64 {
	n := s.n
	kn := k1 * s.knPerK1
	g := 3 * d * ceq / h // mol/(m²·s) per unit of u
	hc := h * ceq        // mol/m²
	uSw := s.uSwS * (1 + k1/g)

	// ua is u_s where the non-linear branch starts.
	ua, uaPow, lnUa := s.uSwS, s.knPerK1, s.lnUSwS
	if uSw < 1 {
		lambda := k1 / ((1 + k1/g) * hc)
		tSw := -math.Log(uSw) / lambda
		if t <= tSw {
			return -math.Expm1(-lambda * t)
		}
		t -= tSw
	} else {
		// Transport is so slow that the wall is past the switch from the
		// start: solve u_s + kn·u_s^n/g = 1 on (0, uSwS].
		ua = wallUndersaturation(1, kn, n, g, s.uSwS)
		uaPow, lnUa = math.Pow(ua, 1-n), math.Log(ua)
	}
	// Saturated already? The time to reach u_s = ε is explicit.
	if tEps := hc * ((s.epsPow-uaPow)/(kn*(n-1)) + (n/g)*(lnUa-s.lnEps)); t >= tEps {
		return 1
	}
	// Newton in x = ln u_s on f(x) = t(x) − t, convex and decreasing. The
	// start, which drops the (positive) logarithmic term, has f ≥ 0, so the
	// iterates rise monotonically to the root without overshooting.
	x := math.Log(kn*(n-1)*t/hc+uaPow) / (1 - n)
	for iter := 0; iter < 60; iter++ {
		e := math.Exp((1 - n) * x)
		f := hc*((e-uaPow)/(kn*(n-1))+(n/g)*(lnUa-x)) - t
		fp := hc * (-e/kn - n/g)
		dx := f / fp
		x -= dx
		if x > lnUa {
			x = lnUa
		}
		if math.Abs(dx) < 1e-10 {
			break
		}
	}
	us := math.Exp(x)
	u := us + kn*us*math.Exp((n-1)*x)/g
	return 1 - u
}

// wallUndersaturation solves u_s + kn·u_s^n/g = u for u_s in (0, hi] by
// safeguarded Newton (the left side increases with u_s).
func wallUndersaturation(u, kn, n, g, hi float64) float64 {
	lo := 0.0
	x := math.Min(u, hi)
	for iter := 0; iter < 100; iter++ {
		p := kn * math.Pow(x, n) / g
		f := x + p - u
		if f > 0 {
			hi = x
		} else {
			lo = x
		}
		fp := 1 + n*p/x
		nx := x - f/fp
		if !(nx > lo && nx < hi) {
			nx = 0.5 * (lo + hi)
		}
		if f == 0 || math.Abs(nx-x) <= 1e-12*x {
			return nx
		}
		x = nx
	}
	return x
}

// FallingFilm returns the thickness (m) and mean velocity (m/s) of a
// laminar film of water running down a plane wall at slopeDeg from the
// horizontal (90 = vertical) with volume flow flowM2PerS per metre of width
// (m²/s), at tempC, by Nusselt's falling-film solution,
//
//	δ = (3·ν·q / (g·sin θ))^(1/3)
//	v̄ = q/δ = ρ·g·sin θ·δ² / (3·μ)
//
// with ν = μ/ρ from WaterViscosityPaS and WaterDensityKgPerM3. Source:
// Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed. 2002, §2.2
// (there with the angle β from the vertical, cos β = sin θ). The solution
// holds for wave-free laminar flow, Re = 4q/ν below about 20, and
// approximately (with ripples) up to Re ≈ 1000. Valid for flowM2PerS > 0,
// 0 < slopeDeg ≤ 90 and 0 ≤ tempC ≤ 150; NaN otherwise.
func FallingFilm(flowM2PerS, slopeDeg, tempC float64) (thicknessM, velocityMS float64) {
	if !(flowM2PerS > 0) || math.IsInf(flowM2PerS, 0) || !(slopeDeg > 0 && slopeDeg <= 90) {
		return math.NaN(), math.NaN()
	}
	nu := WaterViscosityPaS(tempC) / WaterDensityKgPerM3(tempC)
	if math.IsNaN(nu) {
		return math.NaN(), math.NaN()
	}
	delta := NusseltThicknessM(flowM2PerS, slopeDeg, nu)
	return delta, flowM2PerS / delta
}

// NusseltThicknessM returns the thickness (m) of a laminar film of any
// Newtonian liquid of kinematic viscosity kinematicViscosityM2PerS (m²/s)
// carrying flowM2PerS (m²/s per metre of width) down a plane at slopeDeg
// from the horizontal,
//
//	δ = (3·ν·q / (g·sin θ))^(1/3)
//
// Source: Bird, Stewart & Lightfoot, Transport Phenomena, 2nd ed. 2002,
// §2.2, equation for δ in terms of the mass flow per width. NaN for
// non-positive arguments or slopeDeg outside (0, 90].
func NusseltThicknessM(flowM2PerS, slopeDeg, kinematicViscosityM2PerS float64) float64 {
	if !(flowM2PerS > 0) || !(kinematicViscosityM2PerS > 0) || !(slopeDeg > 0 && slopeDeg <= 90) {
		return math.NaN()
	}
	s := math.Sin(slopeDeg * math.Pi / 180)
	return math.Cbrt(3 * kinematicViscosityM2PerS * flowM2PerS / (StandardGravityMS2 * s))
}
