// Package report writes gyprisk's PDF assessment and the short portfolio
// PDF of a batch run. It renders an assess.Output and nothing else: every
// number it prints comes from that structure, through the formatting
// functions in format.go.
//
// The assessment (Write, WriteFile) holds, in order:
//
//   - a cover: title, site, date, a banner when the data are invented,
//     the traceability of the run (project file, site, tool version,
//     thermodynamic database, options, scenarios, every input file with
//     its SHA-256 and period) and the contents with page numbers;
//   - 1 Summary: one row per element × variant × scenario with water,
//     recession, years to the loss limit (with its 10–90 % range),
//     dehydration and condensation hours and the highest mould index;
//     rated figures sit on their rating colour with the rating word and
//     one to three pips, so a greyscale print reads the same; what the
//     thresholds mean, the headline figures and a caution line;
//   - 2 Climate: coverage and gaps, monthly temperature, RH and rain, and
//     the ISO 15927-3 driving rain index by orientation as a rose;
//   - 3 Elements: one section per element with its inputs, the monthly
//     water on the surface, the surface lost against the loss limit (with
//     the sampled band), the mould index, the surface temperature and RH
//     against the gypsum–bassanite equilibrium, the findings, and where
//     the element has variants or scenarios a side-by-side table and chart;
//   - 4 Notes on the data, 5 Method, assumptions and sources (with the
//     rating thresholds and what the assessment does not cover) and
//     6 Cautions.
//
// Charts are drawn with gofpdf's vector primitives, so they stay sharp and
// their labels stay text. The Go fonts are embedded, so °C, ², Δ and ≤
// print. The document is laid out twice: the first pass learns the page
// count and the page of every section, the second prints them.
//
// WriteFileAtomic, which every gyprisk output goes through, writes to a
// temporary file in the same folder and renames it, so a failure never
// leaves a half-written file.
package report
