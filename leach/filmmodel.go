package leach

import (
	"fmt"
	"math"
)

// FilmModel is FilmSaturation and FallingFilm for repeated use: the
// temperature-dependent properties (c_eq, the diffusion coefficient D and
// the kinematic viscosity ν of water) are tabulated once on a fine
// temperature grid and interpolated linearly, and the constants of the
// rate law are evaluated once. The formulas are those of FilmSaturation
// and FallingFilm; only the evaluation differs. Its answers agree with
// FilmSaturation to within 10⁻⁶ in saturation (see the tests) and it does
// not allocate, so it suits the hour-by-hour engine, which calls it for
// every wet hour of every element and Monte Carlo sample.
type FilmModel struct {
	filmShape
	law                RateLaw
	minC, stepC, inv   float64
	ceq, diff, kinVisc []float64 // mol/m³, m²/s, m²/s at each node
}

// NewFilmModel tabulates law's properties from minC to maxC (°C) in
// steps of stepC. The range must lie inside law.Ceq's range.
func NewFilmModel(law RateLaw, minC, maxC, stepC float64) (*FilmModel, error) {
	if law.Ceq == nil {
		return nil, fmt.Errorf("leach: film model needs the rate law's solubility table")
	}
	lo, hi := law.Ceq.Range()
	if !(minC >= lo && maxC <= hi && maxC > minC) {
		return nil, fmt.Errorf("leach: film model range %g–%g °C outside the solubility table's %g–%g °C", minC, maxC, lo, hi)
	}
	if !(stepC > 0) || (maxC-minC)/stepC > 1e6 {
		return nil, fmt.Errorf("leach: film model step %g °C", stepC)
	}
	if !(law.Order > 1) || !(law.SwitchSaturation > 0 && law.SwitchSaturation < 1) || !(law.K1MolPerM2S > 0) {
		return nil, fmt.Errorf("leach: film model needs k1 > 0, order > 1 and 0 < Ωs < 1")
	}
	nodes := int(math.Ceil((maxC-minC)/stepC)) + 1
	m := &FilmModel{law: law, minC: minC, stepC: stepC, inv: 1 / stepC,
		ceq: make([]float64, nodes), diff: make([]float64, nodes), kinVisc: make([]float64, nodes)}
	for i := range nodes {
		t := math.Min(minC+float64(i)*stepC, maxC)
		m.ceq[i] = law.Ceq.CeqMolPerM3(t)
		m.diff[i] = law.DiffusionCoefficient(t)
		m.kinVisc[i] = WaterViscosityPaS(t) / WaterDensityKgPerM3(t)
	}
	m.filmShape = newFilmShape(law)
	return m, nil
}

// WithRateFactor returns a copy whose surface rate constant k1 is
// multiplied by f (the tables are shared).
func (m *FilmModel) WithRateFactor(f float64) *FilmModel {
	c := *m
	c.law.K1MolPerM2S *= f
	return &c
}

// interp returns the tabulated property v at tempC, clamped to the range.
func (m *FilmModel) interp(v []float64, tempC float64) float64 {
	x := (tempC - m.minC) * m.inv
	if !(x > 0) {
		return v[0]
	}
	i := int(x)
	if i >= len(v)-1 {
		return v[len(v)-1]
	}
	f := x - float64(i)
	return v[i] + f*(v[i+1]-v[i])
}

// Film returns the Nusselt falling-film thickness (m) and mean velocity
// (m/s) of FallingFilm, with ν from the table. NaN for a flow that is not
// positive or a slope outside (0, 90].
func (m *FilmModel) Film(flowM2PerS, slopeDeg, tempC float64) (thicknessM, velocityMS float64) {
	if !(flowM2PerS > 0) || math.IsInf(flowM2PerS, 0) || !(slopeDeg > 0 && slopeDeg <= 90) {
		return math.NaN(), math.NaN()
	}
	nu := m.interp(m.kinVisc, tempC)
	s := math.Sin(slopeDeg * math.Pi / 180)
	d := math.Cbrt(3 * nu * flowM2PerS / (StandardGravityMS2 * s))
	return d, flowM2PerS / d
}

// Saturation returns the saturation Ω = c/c_eq that a film of thickness
// filmThicknessM (m), starting free of CaSO4, reaches after contactTimeS
// (s) at tempC: the same model and closed forms as FilmSaturation (see
// there), with a saturation cut-off: once the wall undersaturation would
// fall below 10⁻⁶ the film is returned as saturated (1).
func (m *FilmModel) Saturation(tempC, filmThicknessM, contactTimeS float64) float64 {
	if !(filmThicknessM > 0) || !(contactTimeS >= 0) || math.IsInf(filmThicknessM, 0) || math.IsNaN(tempC) {
		return math.NaN()
	}
	if contactTimeS == 0 {
		return 0
	}
	ceq := m.interp(m.ceq, tempC)
	d := m.interp(m.diff, tempC)
	return m.saturation(m.law.k1At(tempC), ceq, d, filmThicknessM, contactTimeS)
}
