package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"sync"

	"github.com/schollz/progressbar/v3"
	"github.com/spf13/pflag"

	"github.com/gyprisk/gyprisk/leach/assess"
	"github.com/gyprisk/gyprisk/report"
)

// batchOptions are the options of "gyprisk batch".
type batchOptions struct {
	assessOptions
	outDir string

	// noPDF skips the PDFs (each project's and the portfolio's), so that a
	// benchmark measures the assessment. Not a flag.
	noPDF bool
}

func (o *batchOptions) AddFlags(fs *pflag.FlagSet) {
	fs.StringVar(&o.outDir, "out", "batch-out", "write every output into `DIR` (created if needed)")
	o.addRunFlags(fs)
}

func init() {
	register(command{
		name:    "batch",
		summary: "assess many projects on all cores and rank them in a portfolio",
		run:     runBatch,
	})
}

// batchJob is one project of a batch.
type batchJob struct {
	path string // project file as given (or found in a folder given)
	name string // base name of its outputs in the output folder, unique in the batch
}

// batchResult is what became of one project.
type batchResult struct {
	job batchJob
	out *assess.Output // nil when err is set
	err error
}

func runBatch(args []string, stdout, stderr io.Writer) error {
	var o batchOptions
	fs := newFlagSet("batch", "batch PROJECT.toml|FOLDER... [--out DIR]",
		`Assesses many projects at once on every core, each on its own. A folder
stands for every *.toml file in it (not its subfolders), in name order.
For each project it writes DIR/NAME.pdf and DIR/NAME.json, NAME being the
project file's name without .toml (projects whose names clash get their
folder's name in front, then -2, -3, … in the order given). It then ranks
every element × variant × scenario of every project by years to its loss
limit and by worst rating in DIR/portfolio.csv and DIR/portfolio.pdf.

A project that cannot be assessed does not stop the others: it is reported
on standard error and listed in the portfolio with status "failed" and its
error, and the exit status is 1. A failed project writes no outputs (files
of an earlier run under its name are left as they were). Progress goes to
standard error as projects finish (a bar on a terminal, a line per
project otherwise); --quiet keeps only the failures and the summary.

portfolio.csv: one row per result, fewest years to the loss limit first
(empty when the surface does not recede; the _p10/_p90 band is empty
without --samples), then worst rating (high first); failed projects last.
water_l_m2_per_year is driving rain deposited plus runoff from above.`,
		"  gyprisk batch sites/ --out results/\n"+
			"  gyprisk batch north-wing.toml south-wing.toml --samples 500 --seed 7 --fixed-date 2025-06-01", stderr)
	o.AddFlags(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if fs.NArg() == 0 {
		return usagef("batch: want one or more project files or folders of them")
	}
	if o.outDir == "" {
		return usagef("batch: --out: want a folder")
	}
	opt, err := o.runOptions(fs, stderr)
	if err != nil {
		return err
	}
	return o.run(fs.Args(), opt, stderr)
}

// run assesses the projects that args name and writes every output.
func (o *batchOptions) run(args []string, opt assess.Options, stderr io.Writer) error {
	opt.Progress = nil // one bar for the whole batch, not one per project
	paths, dups, err := batchPaths(args)
	if err != nil {
		return err
	}
	if len(paths) == 0 {
		return usagef("batch: no project files (*.toml) in %s", strings.Join(args, ", "))
	}
	if !o.quiet {
		for _, d := range dups {
			fmt.Fprintf(stderr, "batch: %s given more than once; assessed once\n", d)
		}
	}
	if err := os.MkdirAll(o.outDir, 0o755); err != nil {
		return err
	}
	jobs := batchJobs(paths)
	prog := newBatchProgress(stderr, len(jobs), o.quiet)
	results := assessBatch(jobs, opt, o, prog.done)
	prog.finish()
	failed := 0
	for _, r := range results {
		if r.err != nil {
			failed++
		}
	}
	werr := writePortfolio(results, opt, o)
	if failed > 0 || !o.quiet {
		fmt.Fprintf(stderr, "batch: %d ok, %d failed\n", len(results)-failed, failed)
	}
	switch {
	case werr != nil:
		return werr
	case failed > 0:
		return errReported
	}
	return nil
}

// batchPaths expands the arguments into project files: a file stands for
// itself, a folder for the *.toml files in it (hidden files and subfolders
// left out) in name order. A path that does not exist is kept, so that it
// fails as a project and the rest still run. The same file given twice is
// assessed once; dups lists the repeats.
func batchPaths(args []string) (paths, dups []string, err error) {
	seen := map[string]bool{}
	add := func(p string) {
		key := filepath.Clean(p)
		if abs, err := filepath.Abs(p); err == nil {
			key = abs
		}
		if seen[key] {
			dups = append(dups, p)
			return
		}
		seen[key] = true
		paths = append(paths, p)
	}
	for _, a := range args {
		st, err := os.Stat(a)
		if err != nil || !st.IsDir() {
			add(a)
			continue
		}
		entries, err := os.ReadDir(a) // sorted by name
		if err != nil {
			return nil, nil, err
		}
		for _, e := range entries {
			n := e.Name()
			if strings.HasPrefix(n, ".") || !strings.EqualFold(filepath.Ext(n), ".toml") {
				continue
			}
			p := filepath.Join(a, n)
			if st, err := os.Stat(p); err == nil && st.IsDir() {
				continue
			}
			add(p)
		}
	}
	return paths, dups, nil
}

// batchJobs names each project's outputs after its file, without the
// extension. Names are unique in the batch, compared without regard to
// case (for case-insensitive file systems), and never "portfolio": a
// clashing name first gets its folder's name in front ("north-project"),
// then a number ("project-2", "project-3", …), in the order given.
func batchJobs(paths []string) []batchJob {
	taken := map[string]bool{"portfolio": true}
	free := func(n string) bool { return n != "" && !taken[strings.ToLower(n)] }
	jobs := make([]batchJob, len(paths))
	for i, p := range paths {
		base := strings.TrimSuffix(filepath.Base(p), filepath.Ext(p))
		if base == "" || base == "." || base == string(filepath.Separator) {
			base = "project"
		}
		name := base
		if !free(name) {
			if dir := filepath.Base(filepath.Dir(p)); dir != "." && dir != ".." && dir != string(filepath.Separator) {
				name = dir + "-" + base
			}
		}
		for k := 2; !free(name); k++ {
			name = fmt.Sprintf("%s-%d", base, k)
		}
		taken[strings.ToLower(name)] = true
		jobs[i] = batchJob{path: p, name: name}
	}
	return jobs
}

// assessBatch assesses the jobs on runtime.GOMAXPROCS(0) workers and
// returns the results in the order of the jobs, whatever order they
// finish in. done is called from the calling goroutine as each project
// finishes, with the count finished so far.
func assessBatch(jobs []batchJob, opt assess.Options, o *batchOptions, done func(r batchResult, n int)) []batchResult {
	results := make([]batchResult, len(jobs))
	next := make(chan int)
	finished := make(chan int)
	var wg sync.WaitGroup
	for range min(runtime.GOMAXPROCS(0), len(jobs)) {
		wg.Go(func() {
			for i := range next {
				results[i] = assessOne(jobs[i], opt, o)
				finished <- i
			}
		})
	}
	go func() {
		for i := range jobs {
			next <- i
		}
		close(next)
	}()
	go func() {
		wg.Wait()
		close(finished)
	}()
	n := 0
	for i := range finished {
		n++
		done(results[i], n)
	}
	return results
}

// assessOne loads and assesses one project and writes its PDF and JSON.
// A panic in the engine becomes this project's error, so it cannot take
// the rest of the batch down with it.
func assessOne(j batchJob, opt assess.Options, o *batchOptions) (r batchResult) {
	r.job = j
	defer func() {
		if v := recover(); v != nil {
			r.out, r.err = nil, fmt.Errorf("%s: internal error, please report it: %v", j.path, v)
		}
	}()
	p, err := assess.Load(j.path)
	if err != nil {
		r.err = err
		return r
	}
	out, err := assess.Run(p, opt)
	if err != nil {
		r.err = err
		return r
	}
	if !o.noPDF {
		if err := report.WriteFile(filepath.Join(o.outDir, j.name+".pdf"), out, report.Options{FixedDate: fixedDate(out)}); err != nil {
			r.err = err
			return r
		}
	}
	if err := writeJSON(filepath.Join(o.outDir, j.name+".json"), out, nil); err != nil {
		if !o.noPDF {
			os.Remove(filepath.Join(o.outDir, j.name+".pdf")) // no half of a project's outputs
		}
		r.err = err
		return r
	}
	// The portfolio needs none of the day-by-day trace; drop it so that a
	// large batch holds only the summaries.
	for i := range out.Elements {
		out.Elements[i].Daily = nil
	}
	r.out = out
	return r
}

// writePortfolio writes portfolio.csv and, unless PDFs are off,
// portfolio.pdf.
func writePortfolio(results []batchResult, opt assess.Options, o *batchOptions) error {
	rows := portfolioRows(results)
	if err := report.WriteFileAtomic(filepath.Join(o.outDir, "portfolio.csv"), func(w io.Writer) error {
		return writePortfolioCSV(w, rows)
	}); err != nil {
		return err
	}
	if o.noPDF {
		return nil
	}
	outs := make([]*assess.Output, len(results))
	var failures []report.Failure
	for i, r := range results {
		outs[i] = r.out
		if r.err != nil {
			failures = append(failures, report.Failure{Project: r.job.path, Err: r.err.Error()})
		}
	}
	return report.WritePortfolioFile(filepath.Join(o.outDir, "portfolio.pdf"), outs,
		report.Options{FixedDate: opt.Now, Failures: failures})
}

// batchProgress reports each finished project on stderr: a bar on a
// terminal, one line per project otherwise (for logs). Failures are
// always reported, even with --quiet.
type batchProgress struct {
	w     io.Writer
	total int
	quiet bool
	bar   *progressbar.ProgressBar // nil unless stderr is a terminal and not quiet
}

func newBatchProgress(stderr io.Writer, total int, quiet bool) *batchProgress {
	p := &batchProgress{w: stderr, total: total, quiet: quiet}
	if !quiet && isTerminal(stderr) {
		p.bar = progressbar.NewOptions(total,
			progressbar.OptionSetWriter(stderr),
			progressbar.OptionSetDescription("batch"),
			progressbar.OptionShowCount(),
			progressbar.OptionSetPredictTime(true),
			progressbar.OptionClearOnFinish())
		p.bar.RenderBlank()
	}
	return p
}

func (p *batchProgress) done(r batchResult, n int) {
	switch {
	case r.err != nil:
		if p.bar != nil {
			p.bar.Clear()
		}
		msg := r.err.Error()
		if !strings.HasPrefix(msg, r.job.path) { // most errors name the project file already
			msg = r.job.path + ": " + msg
		}
		fmt.Fprintf(p.w, "batch: %d/%d FAILED %s\n", n, p.total, msg)
	case p.bar == nil && !p.quiet:
		fmt.Fprintf(p.w, "batch: %d/%d ok %s\n", n, p.total, r.job.path)
	}
	if p.bar != nil {
		p.bar.Add(1)
	}
}

func (p *batchProgress) finish() {
	if p.bar != nil {
		p.bar.Finish()
	}
}
