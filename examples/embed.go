// Package examples holds gyprisk's invented example projects and climate
// records, embedded so that "gyprisk demo" works from any folder.
//
// Everything here is invented for the demo and the documentation: the town
// of Harrowmere, the Old Assay House and every value in the climate records.
// Nothing was measured. The records are written by the generator in
// examples/generate (go run ./examples/generate -out examples); see
// examples/README.md for what each file holds and its statistics.
package examples

import "embed"

// FS holds the two example directories, with paths relative to examples/:
//
//	demo/       the demo project: the Old Assay House, with
//	            demo/climate-outdoor.csv (3 years hourly, all columns) and
//	            demo/climate-bathroom.csv (3 years hourly, room logger)
//	basement/   the interior-only example: the cellar, with
//	            basement/climate-basement.csv (2 years at 15 minutes) and
//	            basement/logger-export-sample.csv (a foreign-layout sample)
//
// The generator and this package's README are not embedded.
//
//go:embed demo basement
var FS embed.FS
