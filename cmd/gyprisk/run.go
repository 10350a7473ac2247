package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"sort"
	"strings"

	"github.com/spf13/pflag"
)

// version is the tool version printed by "gyprisk version" and recorded in
// every JSON and PDF output. Release builds may set it with
// -ldflags "-X main.version=...".
var version = "0.1.0-dev"

// command is one subcommand. Each lives in its own cmd_NAME.go file and
// registers itself from an init function.
type command struct {
	name    string
	summary string // one line for "gyprisk help"
	run     func(args []string, stdout, stderr io.Writer) error
}

var commands = map[string]command{}

func register(c command) {
	if _, dup := commands[c.name]; dup {
		panic("gyprisk: command registered twice: " + c.name) // programming error, caught by any test
	}
	commands[c.name] = c
}

// usageError marks a mistake in how the command was called (exit 2).
type usageError struct{ msg string }

func (e *usageError) Error() string { return e.msg }

// usagef returns a usage error (exit status 2).
func usagef(format string, a ...any) error {
	return &usageError{msg: fmt.Sprintf(format, a...)}
}

// errHelp is returned when the user asked for help; it exits 0.
var errHelp = pflag.ErrHelp

// errReported is returned when the failure has already been described on
// stderr (for example a batch run that lists its failed projects); it exits 1
// without a further message.
var errReported = errors.New("failure already reported")

// exitCode is the one place that maps errors to exit statuses:
// 0 ok (or help asked for), 1 failure (bad data, I/O), 2 usage.
func exitCode(err error, stderr io.Writer) int {
	var ue *usageError
	switch {
	case err == nil, errors.Is(err, errHelp):
		return 0
	case errors.As(err, &ue):
		fmt.Fprintf(stderr, "gyprisk: %v\nRun 'gyprisk help' for usage.\n", err)
		return 2
	case errors.Is(err, errReported):
		return 1
	default:
		fmt.Fprintf(stderr, "gyprisk: %v\n", err)
		return 1
	}
}

// run is the whole program behind main, so tests can call it.
func run(args []string, stdout, stderr io.Writer) error {
	if len(args) == 0 {
		printHelp(stderr)
		return usagef("no subcommand given")
	}
	name := args[0]
	switch name {
	case "help", "-h", "--help":
		if len(args) > 1 {
			if c, ok := commands[args[1]]; ok {
				return c.run([]string{"--help"}, stdout, stderr)
			}
			return usagef("unknown subcommand %q", args[1])
		}
		printHelp(stdout)
		return nil
	case "version", "--version":
		fmt.Fprintf(stdout, "gyprisk %s\n", version)
		return nil
	}
	c, ok := commands[name]
	if !ok {
		return usagef("unknown subcommand %q", name)
	}
	return c.run(args[1:], stdout, stderr)
}

func printHelp(w io.Writer) {
	fmt.Fprintf(w, `gyprisk %s: will this gypsum survive its climate?

Usage: gyprisk <subcommand> [options] [arguments]

Subcommands:
`, version)
	names := make([]string, 0, len(commands))
	for n := range commands {
		names = append(names, n)
	}
	sort.Strings(names)
	for _, n := range names {
		fmt.Fprintf(w, "  %-9s %s\n", n, commands[n].summary)
	}
	fmt.Fprintf(w, `  %-9s %s
  %-9s %s

Run 'gyprisk help <subcommand>' or 'gyprisk <subcommand> --help' for its options.
Exit status: 0 ok, 1 failure (bad data, I/O), 2 usage.
`, "help", "show this help", "version", "print the tool version")
}

// newFlagSet returns a flag set for a subcommand whose --help text shows
// the usage line, a description, the flags and an example.
func newFlagSet(name, usage, description, example string, stderr io.Writer) *pflag.FlagSet {
	fs := pflag.NewFlagSet(name, pflag.ContinueOnError)
	fs.SetOutput(stderr)
	fs.SortFlags = false
	fs.Usage = func() {
		fmt.Fprintf(stderr, "Usage: gyprisk %s\n\n%s\n\nOptions:\n%s\nExample:\n%s\n",
			usage, strings.TrimSpace(description), fs.FlagUsages(), example)
	}
	return fs
}

// parseFlags parses args and turns pflag's errors into usage errors.
// --help prints the usage to stderr (pflag calls fs.Usage) and returns
// errHelp (exit 0).
func parseFlags(fs *pflag.FlagSet, args []string) error {
	fs.SetOutput(io.Discard) // pflag's own messages: we report errors ourselves
	err := fs.Parse(args)
	if errors.Is(err, pflag.ErrHelp) {
		return errHelp
	}
	if err != nil {
		return usagef("%s: %v", fs.Name(), err)
	}
	return nil
}

// isTerminal reports whether f is a character device (a terminal), used to
// decide whether to draw progress on stderr.
func isTerminal(w io.Writer) bool {
	f, ok := w.(*os.File)
	if !ok {
		return false
	}
	st, err := f.Stat()
	return err == nil && st.Mode()&os.ModeCharDevice != 0
}
