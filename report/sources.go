package report

// methodSource is one method the assessment uses, what it feeds, and its
// published source. The table is printed in the report's "Method,
// assumptions and sources" section; keep it in step with the engine.
type methodSource struct {
	method  string
	usedFor string
	source  string
}

// methodSources lists each method with its source. Where the database is
// named, the report prints Output.Database in its place.
//
// Citations marked "from memory" below were recalled, not read from the
// publication; the 52 °C entry was read from WAC 51-52-0603, which adopts
// the International Mechanical Code section 603.5.1.
var methodSources = []methodSource{
	{
		method:  "Airfield driving rain index from hourly wind speed, wind direction and rain",
		usedFor: "Rain reaching each exterior wall orientation",
		source:  "ISO 15927-3:2009, Hygrothermal performance of buildings — Calculation and presentation of climatic data — Part 3: Calculation of a driving rain index for vertical surfaces from hourly wind and rain data, clause 3",
	},
	{
		method:  "Wall index: roughness C_R, topography C_T, obstruction O and wall factor W",
		usedFor: "Rain deposited on each exterior element",
		source:  "ISO 15927-3:2009, clause 5: I_WA = I_A · C_R · C_T · O · W",
	},
	{
		method:  "Saturation vapour pressure; temperature factor f_Rsi; internal humidity classes; monthly mean surface RH criterion of 80 %",
		usedFor: "Condensation, interior elements, ISO mould criterion",
		source:  "ISO 13788:2012, Hygrothermal performance of building components and building elements — Internal surface temperature to avoid critical surface humidity and interstitial condensation — Calculation methods",
	},
	{
		method:  "External surface resistance and surface heat transfer",
		usedFor: "Surface temperature of exterior elements",
		source:  "ISO 6946:2017, Building components and building elements — Thermal resistance and thermal transmittance — Calculation methods",
	},
	{
		method:  "Solar position (checked against the worked example of the NREL solar position algorithm to within 0.01°)",
		usedFor: "Sun on each surface, hour by hour",
		source:  "Michalsky J.J. 1988, The Astronomical Almanac's algorithm for approximate solar position (1950–2050), Solar Energy 40(3), 227–235; check: Reda I., Andreas A. 2004, Solar Energy 76(5), 577–589",
	},
	{ // from memory
		method:  "Diffuse fraction of global irradiance",
		usedFor: "Direct and diffuse sun on each surface",
		source:  "Erbs D.G., Klein S.A., Duffie J.A. 1982, Estimation of the diffuse radiation fraction for hourly, daily and monthly-average global radiation, Solar Energy 28(4), 293–302",
	},
	{ // from memory
		method:  "Irradiance on tilted and vertical surfaces (transposition)",
		usedFor: "Sun on each surface, hence surface temperature",
		source:  "Perez R., Ineichen P., Seals R., Michalsky J., Stewart R. 1990, Modeling daylight availability and irradiance components from direct and global irradiance, Solar Energy 44(5), 271–289; isotropic sky: Liu B.Y.H., Jordan R.C. 1963, The long-term average performance of flat-plate solar-energy collectors, Solar Energy 7(2), 53–74",
	},
	{
		method:  "Long-wave radiation to the sky: clear-sky emissivity from the dew point, cloud correction, cloud cover from the measured sun",
		usedFor: "Night cooling of surfaces, hence condensation",
		source:  "Berdahl P., Martin M. 1984, Emissivity of clear skies, Solar Energy 32(5), 663–664; Campbell G.S., Norman J.M. 1998, An Introduction to Environmental Biophysics, 2nd ed., ch. 10; Kasten F., Czeplak G. 1980, Solar Energy 24(2), 177–189 (coefficients from memory)",
	},
	{
		method:  "Surface heat balance with the gypsum layer's heat capacity; vapour exchange by the Lewis relation",
		usedFor: "Surface temperature and condensate",
		source:  "Convective coefficient h_c = 4 + 4v and R_se from ISO 6946:2017 Annex C; specific heat of gypsum plaster 1000 J/(kg·K), EN ISO 10456:2007 Table 3 (from memory); Lewis relation as in ISO 13788:2012",
	},
	{
		method:  "Equilibrium constants of gypsum, bassanite and anhydrite, the CaSO4(aq) ion pair and activity coefficients",
		usedFor: "Solubility of gypsum; the gypsum–bassanite equilibrium humidity",
		source:  databaseSource,
	},
	{ // from memory
		method:  "Surface-controlled dissolution rate of gypsum, linear up to about 94 % of saturation",
		usedFor: "Gypsum dissolved by water on the surface, hence recession",
		source:  "Jeschke A.A., Vosbeck K., Dreybrodt W. 2001, Surface controlled dissolution rates of gypsum in aqueous solutions exhibit nonlinear dissolution kinetics, Geochim. Cosmochim. Acta 65(1), 27–34",
	},
	{ // from memory
		method:  "Laminar falling film: film thickness and contact time of water running down a surface; diffusion across the film",
		usedFor: "How long run-off water stays in contact with the gypsum, and how close to saturation it gets",
		source:  "Nusselt W. 1916, Zeitschrift des VDI 60, 541–546 and 569–575, as in Bird R.B., Stewart W.E., Lightfoot E.N. 2002, Transport Phenomena, 2nd ed., §2.2; diffusion coefficient of CaSO4 1.0·10⁻⁹ m²/s, Colombani J., Bert J. 2007, Geochim. Cosmochim. Acta 71, 1913",
	},
	{
		method:  "Check of the leaching model against measured lowering of a bare gypsum surface",
		usedFor: "Confidence in the recession rates (the model gives about 1.8 times the measured rate: it errs towards more loss)",
		source:  "Sanna L., De Waele J., Calaforra J.M., Forti P. 2015, Long-term erosion rate measurements in gypsum caves of Sorbas (SE Spain) by the Micro-Erosion Meter method, Geomorphology 228, 213–225: external gypsum surface 0.170 mm a year",
	},
	{
		method:  "Strength of wet set gypsum, about half its dry strength",
		usedFor: "Wet-strength findings",
		source:  "Coquard P., Boistelle R. 1994, Int. J. Rock Mech. Min. Sci. 31 (from memory); Gypsum & Lime (J-STAGE) 1954, no. 13",
	},
	{
		method:  "Mould index, growth and decline with surface temperature and RH",
		usedFor: "Mould index over time",
		source:  "Hukka A., Viitanen H.A. 1999, A mathematical model of mould growth on wooden material, Wood Sci. Technol. 33, 475–485",
	},
	{ // from memory
		method:  "Mould sensitivity classes of building materials",
		usedFor: "Mould index for plasters and boards",
		source:  "Ojanen T., Viitanen H., Peuhkuri R., Lähdesmäki K., Vinha J., Salminen K. 2010, Mold growth modeling of building structures using sensitivity classes of materials, Thermal Performance of the Exterior Envelopes of Whole Buildings XI, ASHRAE",
	},
	{
		method:  "Long-term temperature limit of 52 °C for gypsum board",
		usedFor: "Hours above 52 °C",
		source:  "International Mechanical Code (International Code Council), section 603.5.1 Gypsum ducts: air temperature not above 125 °F (52 °C); adopted for example as WAC 51-52-0603",
	},
	{ // from memory
		method:  "Climate scenarios by delta change: shifts and factors applied to the observed record, RH recomputed from vapour pressure",
		usedFor: "Scenario results",
		source:  "Hay L.E., Wilby R.L., Leavesley G.H. 2000, A comparison of delta change and downscaled GCM scenarios for three mountainous basins in the United States, J. Am. Water Resour. Assoc. 36(2), 387–397",
	},
	{ // from memory
		method:  "Monte Carlo sampling of uncertain inputs; Spearman rank correlation for the sensitivity ranking",
		usedFor: "10–90 % bands and the sensitivity ranking",
		source:  "Spearman C. 1904, The proof and measurement of association between two things, Am. J. Psychol. 15(1), 72–101",
	},
}

// databaseSource marks the entry whose source is the run's thermodynamic
// database (Output.Database).
const databaseSource = "\x00database"

// notCovered is what the assessment does not look at.
var notCovered = []string{
	"Structural capacity: whether a wall, ceiling or fixing can carry its loads, wet or dry.",
	"Fire performance of gypsum boards, plasters or linings.",
	"Salts other than gypsum (sulfates of sodium or magnesium, chlorides, nitrates) and their crystallisation damage.",
	"Moisture transport inside the wall: capillary uptake, drying through the thickness, interstitial condensation and rising damp.",
	"Workmanship, cracks, failed joints, leaking gutters and pipes, and other defects that bring water the climate record does not show.",
}

// caution is one caution of the cautions section.
type caution struct{ lead, text string }

// cautions are printed in full in the cautions section; the first is also
// summarised on the summary page.
var cautions = []caution{
	{"A screening, not a survey.", "This assessment is a screening calculation from a climate record and assumed material properties. It helps decide where to look and what to ask. It supports, and does not replace, an on-site survey by a competent professional who has seen the building."},
	{"Codes and professionals decide.", "Repairs, changes and interventions follow the building codes and regulations that apply where the building stands, and the advice of licensed engineers, architects or accredited conservators. Nothing in this report is a design, a specification or a certificate."},
	{"Wet ceilings can come down.", "Gypsum ceilings and boards that have been wet lose much of their strength and can sag and fall without warning. Keep people out from under them and have them assessed before anyone works on or below them."},
	{"Test before you cut.", "Old plasters, renders, paints and textured coatings may contain asbestos or lead. Have samples tested before cutting, drilling, sanding or stripping, and follow the local rules for their removal."},
	{"Work at height safely.", "Inspecting cornices, soffits, facades and ceilings means working at height: use scaffolds or access platforms with edge protection, and people trained to use them."},
}

// cautionLine is the short caution; the summary page adds a pointer to
// the cautions section, the portfolio a pointer to each building's report.
const cautionLine = "This is a screening calculation. It supports, and does not replace, an on-site survey by a competent professional; decisions follow local codes and licensed professionals' advice. Wet gypsum ceilings can sag and fall: keep people clear."

// summaryCaution is the caution line on the summary page.
const summaryCaution = cautionLine + " Read section 6 before anyone acts on these figures."

// mouldScale describes the mould index levels (Hukka & Viitanen 1999,
// Wood Sci. Technol. 33, table of the index, paraphrased; from memory).
var mouldScale = []string{
	0: "no growth",
	1: "some growth visible only under a microscope",
	2: "moderate growth visible only under a microscope",
	3: "growth just visible to the eye",
	4: "growth clearly visible, covering up to about half the surface",
	5: "plenty of growth, covering more than half the surface",
	6: "heavy growth covering nearly the whole surface",
}
