// Package solar turns a global horizontal irradiance record into the
// irradiance on a building surface of any tilt and orientation.
//
// The chain, evaluated once per record interval, is
//
//  1. the sun's position (Position, At): Michalsky's version of the
//     Astronomical Almanac's low-precision algorithm;
//  2. the extraterrestrial normal irradiance (ExtraterrestrialNormalWM2):
//     the solar constant times Spencer's eccentricity correction;
//  3. the direct/diffuse split of the global horizontal value (Split):
//     the Erbs, Klein & Duffie diffuse-fraction correlation;
//  4. the transposition onto the surface (Sky.OnPlane, Tilted): the Perez
//     1990 anisotropic sky for the diffuse part, the cosine of the angle of
//     incidence for the beam, and an isotropic ground reflection.
//
// Steps 1–3 and the sky-dependent part of step 4 depend only on the site
// and the hour; NewSky bundles them so that an assessment computes them once
// per hour and then calls OnPlane for every element (a few nanoseconds, no
// allocation). Tilted is the one-call form for occasional use.
//
// Conventions. Angles are in degrees. Azimuths are measured clockwise from
// north (east = 90°, south = 180°), both for the sun and for the direction a
// surface faces. Tilt is measured from the horizontal: 0° faces straight up,
// 90° is a vertical wall. Irradiances are in W/m².
//
// Time. A climate record's time stamp marks the END of its interval, and its
// irradiance is the mean over the interval, so the representative sun
// position is the one at the interval's midpoint: pass
// IntervalMidpoint(end, length) to At or Position, not the stamp itself.
// Times are converted to UTC; the algorithm neglects ΔT = TT − UT (about
// 1 minute this century, well inside its stated accuracy).
package solar
