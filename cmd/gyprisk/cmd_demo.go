package main

import (
	"fmt"
	"io"

	"github.com/spf13/pflag"

	"github.com/gyprisk/gyprisk/examples"
	"github.com/gyprisk/gyprisk/leach/assess"
)

// demoOptions are the options of "gyprisk demo".
type demoOptions struct {
	assessOptions
	example string
}

func (o *demoOptions) AddFlags(fs *pflag.FlagSet) {
	fs.StringVarP(&o.pdfPath, "output", "o", "demo-report.pdf", "write the PDF assessment to `REPORT.pdf`")
	fs.StringVar(&o.jsonPath, "json", "", "also write the results as JSON to `PATH` (- for standard output)")
	fs.StringVar(&o.hourlyPath, "hourly", "", "also write the hour-by-hour trace to `PATH.csv`")
	fs.StringVar(&o.example, "example", "demo", "which built-in example: demo (the Old Assay House) or basement (its cellar, interior only)")
	o.addRunFlags(fs)
}

func init() {
	register(command{
		name:    "demo",
		summary: "assess the built-in invented example and write its PDF report",
		run:     runDemo,
	})
}

func runDemo(args []string, stdout, stderr io.Writer) error {
	var o demoOptions
	fs := newFlagSet("demo", "demo [-o demo-report.pdf] [--json PATH|-] [--example demo|basement]",
		`Runs the whole assessment on a built-in example and writes its PDF report.
The example is INVENTED: the fictional town of Harrowmere and its Old Assay
House, with three years of invented hourly climate. Nothing in it is measured.
The same files are in the repository under examples/.`,
		"  gyprisk demo -o demo-report.pdf\n  gyprisk demo --example basement -o cellar.pdf --json cellar.json", stderr)
	o.AddFlags(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if fs.NArg() != 0 {
		return usagef("demo: takes no arguments (got %q)", fs.Arg(0))
	}
	switch o.example {
	case "demo", "basement":
	default:
		return usagef("demo: --example %q: want demo or basement", o.example)
	}
	opt, err := o.runOptions(fs, stderr)
	if err != nil {
		return err
	}
	p, err := assess.LoadFS(examples.FS, o.example+"/project.toml")
	if err != nil {
		return err
	}
	if err := assessAndWrite(p, opt, &o.assessOptions, stdout, stderr); err != nil {
		return err
	}
	if o.pdfPath != "" {
		fmt.Fprintf(stderr, "gyprisk: wrote %s (invented example data)\n", o.pdfPath)
	}
	return nil
}
