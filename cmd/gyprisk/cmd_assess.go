package main

import (
	"encoding/json"
	"fmt"
	"io"
	"time"

	"github.com/spf13/pflag"

	"github.com/gyprisk/gyprisk/leach/assess"
	"github.com/gyprisk/gyprisk/report"
)

// assessOptions are the options of "gyprisk assess" (and, through it,
// "gyprisk demo" and "gyprisk batch").
type assessOptions struct {
	jsonPath   string
	hourlyPath string
	pdfPath    string
	samples    int
	seed       uint64
	fixedDate  string
	quiet      bool
}

func (o *assessOptions) AddFlags(fs *pflag.FlagSet) {
	fs.StringVar(&o.jsonPath, "json", "", "write the results as JSON to `PATH` (- for standard output)")
	fs.StringVar(&o.hourlyPath, "hourly", "", "write the hour-by-hour trace of every element to `PATH.csv`")
	fs.StringVarP(&o.pdfPath, "output", "o", "", "write the PDF assessment to `REPORT.pdf`")
	o.addRunFlags(fs)
}

// addRunFlags adds the flags that shape the numbers, shared with demo and
// batch.
func (o *assessOptions) addRunFlags(fs *pflag.FlagSet) {
	fs.IntVar(&o.samples, "samples", 0, "Monte Carlo samples for the uncertainty bands (0 = none; when not given: the project's [uncertainty] samples, else none)")
	fs.Uint64Var(&o.seed, "seed", 1, "random seed for the Monte Carlo samples; the same seed gives the same numbers")
	fs.StringVar(&o.fixedDate, "fixed-date", "", "print this date (YYYY-MM-DD) as the run date instead of today, for reproducible outputs")
	fs.BoolVarP(&o.quiet, "quiet", "q", false, "no progress on standard error")
}

// runOptions turns the flags into the engine's options.
func (o *assessOptions) runOptions(fs *pflag.FlagSet, stderr io.Writer) (assess.Options, error) {
	opt := assess.Options{Samples: o.samples, Seed: o.seed, ToolVersion: version}
	if !fs.Changed("samples") {
		opt.Samples = -1 // the project decides
	} else if o.samples < 0 || o.samples > 100000 {
		return opt, usagef("--samples %d: want 0…100000", o.samples)
	}
	opt.SeedGiven = fs.Changed("seed")
	if o.fixedDate != "" {
		t, err := time.Parse("2006-01-02", o.fixedDate)
		if err != nil {
			return opt, usagef("--fixed-date %q: want YYYY-MM-DD", o.fixedDate)
		}
		opt.Now = t
	} else {
		opt.Now = time.Now()
	}
	if !o.quiet && isTerminal(stderr) {
		opt.Progress = terminalProgress(stderr)
	}
	return opt, nil
}

func init() {
	register(command{
		name:    "assess",
		summary: "assess every gypsum element of a project",
		run:     runAssess,
	})
}

func runAssess(args []string, stdout, stderr io.Writer) error {
	var o assessOptions
	fs := newFlagSet("assess", "assess PROJECT.toml [--json PATH|-] [--hourly PATH.csv] [-o REPORT.pdf]",
		`Works through the project's climate record hour by hour and reports, for each
element, the water reaching it, the leaching loss and years to its loss limit,
dehydration, condensation, mould and frost. With no output option it prints a
summary table.`,
		"  gyprisk assess examples/demo/project.toml -o report.pdf --json results.json\n"+
			"  gyprisk assess site.toml --samples 1000 --seed 7 --json -", stderr)
	o.AddFlags(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if fs.NArg() != 1 {
		return usagef("assess: want one project file, got %d arguments", fs.NArg())
	}
	opt, err := o.runOptions(fs, stderr)
	if err != nil {
		return err
	}
	p, err := assess.Load(fs.Arg(0))
	if err != nil {
		return err
	}
	return assessAndWrite(p, opt, &o, stdout, stderr)
}

// assessAndWrite runs one project and writes the outputs the options ask
// for; with none, it prints the summary table to stdout.
func assessAndWrite(p *assess.Project, opt assess.Options, o *assessOptions, stdout, stderr io.Writer) error {
	var out *assess.Output
	runTo := func(hourly io.Writer) (err error) {
		opt.Hourly = hourly
		out, err = assess.Run(p, opt)
		return err
	}
	var err error
	if o.hourlyPath != "" {
		err = report.WriteFileAtomic(o.hourlyPath, runTo) // the trace is written during the run
	} else {
		err = runTo(nil)
	}
	if err != nil {
		return err
	}
	return writeOutputs(out, o, stdout)
}

func writeOutputs(out *assess.Output, o *assessOptions, stdout io.Writer) error {
	wrote := o.hourlyPath != ""
	if o.jsonPath != "" {
		wrote = true
		if err := writeJSON(o.jsonPath, out, stdout); err != nil {
			return err
		}
	}
	if o.pdfPath != "" {
		wrote = true
		if err := report.WriteFile(o.pdfPath, out, report.Options{FixedDate: fixedDate(out)}); err != nil {
			return err
		}
	}
	if !wrote {
		return assess.WriteSummary(stdout, out)
	}
	return nil
}

// fixedDate is the run date the report prints.
func fixedDate(out *assess.Output) time.Time {
	t, _ := time.Parse(time.RFC3339, out.RunDate)
	return t
}

// writeJSON writes v as indented JSON to path, or to stdout for "-".
func writeJSON(path string, v any, stdout io.Writer) error {
	enc := func(w io.Writer) error {
		e := json.NewEncoder(w)
		e.SetIndent("", "  ")
		return e.Encode(v)
	}
	if path == "-" {
		return enc(stdout)
	}
	return report.WriteFileAtomic(path, enc)
}

// terminalProgress draws a one-line progress indicator on a terminal.
func terminalProgress(w io.Writer) func(done, total int, what string) {
	return func(done, total int, what string) {
		if done >= total {
			fmt.Fprintf(w, "\r\033[K")
			return
		}
		fmt.Fprintf(w, "\r\033[K%3d%%  %s", 100*done/max(total, 1), what)
	}
}
