// Command generate writes gyprisk's invented example climate records.
//
// Nothing it writes was measured. The records belong to a scenario of our
// own: Harrowmere, a fictional town with a temperate maritime climate, and
// the Old Assay House, an invented 19th-century townhouse with gypsum
// elements. The weather is a small stochastic model (see simulateOutdoor)
// tuned so that the records' statistics are plausible, which is all the
// demo needs; it is not a weather generator for design work.
//
// Usage, from the repository root:
//
//	go run ./examples/generate -out examples        # rewrite the files
//	go run ./examples/generate -out /tmp/x -v       # and print statistics
//
// Output is deterministic for a seed: every random number comes from
// math/rand/v2's PCG generator, one stream per file, seeded with -seed
// (default 1867). The test in this directory checks that the committed
// files are exactly what the default seed produces.
//
// Files written under -out:
//
//	demo/climate-outdoor.csv        3 years hourly, all seven columns
//	demo/climate-bathroom.csv       3 years hourly, room logger (time, temp_c, rh_pct)
//	basement/climate-basement.csv   2 years at 15 minutes, cellar room logger
//	basement/logger-export-sample.csv
//	                                3 days of the cellar logger in a foreign
//	                                layout (semicolon, decimal comma, local time)
package main

import (
	"flag"
	"fmt"
	"io"
	"os"
	"path/filepath"
)

// defaultSeed is the seed of the committed example files.
const defaultSeed = 1867

// The invented site. The coordinates are round values chosen at sea off a
// western coast, so that they point at no real town.
const (
	siteName   = "Harrowmere"
	siteLatDeg = 51.0 // north
	siteLonDeg = -5.0 // east positive: 5.0° W
	siteElevM  = 40.0
)

func main() {
	if err := run(os.Args[1:], os.Stdout, os.Stderr); err != nil {
		fmt.Fprintln(os.Stderr, "generate:", err)
		os.Exit(1)
	}
}

func run(args []string, stdout, stderr io.Writer) error {
	fs := flag.NewFlagSet("generate", flag.ContinueOnError)
	fs.SetOutput(stderr)
	outDir := fs.String("out", "examples", "directory to write the example files under")
	seed := fs.Uint64("seed", defaultSeed, "seed of the PCG random number generator")
	verbose := fs.Bool("v", false, "print the statistics of the generated records")
	if err := fs.Parse(args); err != nil {
		return err
	}
	if fs.NArg() > 0 {
		return fmt.Errorf("unexpected argument %q", fs.Arg(0))
	}
	files := generate(*seed)
	for _, f := range files {
		path := filepath.Join(*outDir, filepath.FromSlash(f.path))
		if err := writeAtomic(path, f.data); err != nil {
			return err
		}
		fmt.Fprintf(stdout, "wrote %s (%d bytes)\n", path, len(f.data))
	}
	if *verbose {
		for _, f := range files {
			s, err := summarise(f.data, f.path)
			if err != nil {
				return err
			}
			fmt.Fprintf(stdout, "\n%s\n%s", f.path, s)
		}
	}
	return nil
}

// writeAtomic writes data to a temporary file in path's directory and
// renames it over path, so a failure never leaves a half-written file.
func writeAtomic(path string, data []byte) error {
	dir := filepath.Dir(path)
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return err
	}
	tmp, err := os.CreateTemp(dir, "."+filepath.Base(path)+".*.tmp")
	if err != nil {
		return err
	}
	name := tmp.Name()
	_, err = tmp.Write(data)
	if cerr := tmp.Close(); err == nil {
		err = cerr
	}
	if err == nil {
		err = os.Chmod(name, 0o644)
	}
	if err == nil {
		err = os.Rename(name, path)
	}
	if err != nil {
		os.Remove(name)
		return fmt.Errorf("writing %s: %w", path, err)
	}
	return nil
}
