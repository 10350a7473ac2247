// Package mould implements the VTT mould growth model: the mould index M of
// a surface, stepped hour by hour from its temperature and relative
// humidity.
//
// # The model
//
// Hukka & Viitanen (1999, "A mathematical model of mould growth on wooden
// material", Wood Sci. Technol. 33, 475–485) turned the regression models of
// Viitanen's laboratory tests on pine and spruce sapwood into differential
// equations for the mould index: a growth rate when the surface is warm and
// humid enough, an upper limit M_max that depends on how humid it is, and a
// slow decline in dry periods. Ojanen et al. (2010, "Mold growth modeling of
// building structures using sensitivity classes of materials", Thermal
// Performance of the Exterior Envelopes of Whole Buildings XI, ASHRAE) and
// Viitanen et al. (2010, "Moisture and bio-deterioration risk of building
// materials and structures", J. Building Physics 33(3), 201–224) extended it
// to other building materials through four sensitivity classes, which scale
// the growth rate (k1), set the ceiling (A, B, C), the lowest humidity that
// allows growth (RH_min) and the rate of decline (C_mat). This package
// implements the extended model; see Params for the class table and Step for
// the equations.
//
// # The mould index
//
// The index is read on the visual scale of the laboratory tests
// (Hukka & Viitanen 1999, Table 1; wording from memory):
//
//	0  no growth
//	1  small amounts of growth, visible under a microscope only
//	2  several local colonies, visible under a microscope
//	3  visual findings: under 10 % of the surface, or up to 50 % under the microscope
//	4  visual: 10–50 % of the surface, or over 50 % under the microscope
//	5  plenty of growth: over 50 % of the surface visually
//	6  heavy, tight growth covering almost the whole surface
//
// M = 1 is the onset of growth and M = 3 the first growth visible to the
// naked eye; a report should say so beside the number.
//
// # What was verified
//
// The published papers themselves could not be read while this package was
// written. The equations and the class table were recalled and then
// compared, value by value, with two open implementations of the published
// equations (A. Laukkarinen, Tampere University, 2011–2016, "mi.py" in
// github.com/anssilaukkarinen/trh-1; C. Kongsgaard, RIBuild project,
// delphin_6_automation), which agree with each other on every class
// coefficient and decline rate used here. The doc comments say "from
// memory" where a value rests on recall alone.
//
// A mould index says nothing about health risk by itself. Visible or
// suspected mould in a building calls for inspection by a qualified person
// under local rules.
package mould
