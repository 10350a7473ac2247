// Package assess works out, hour by hour, what the climate does to each
// gypsum element of a project: the water that reaches and runs over its
// surface, the gypsum that water dissolves and the recession it causes,
// the hours in which heat and dry air make gypsum unstable, and the
// condensation, mould and wet-strength risks.
//
// A project is a TOML file (see Load) that names a site, its outdoor
// climate record and its elements. Assess turns it into an Output, the
// structure behind gyprisk's JSON and PDF.
package assess
