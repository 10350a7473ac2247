// Package report writes gyprisk's PDF assessment: cover and traceability,
// a summary table first, the climate, one section per element with its
// charts and plain-language findings, the methods and sources, and the
// cautions. It also provides WriteFileAtomic, which every gyprisk output
// goes through so that nothing is ever half-written.
package report
