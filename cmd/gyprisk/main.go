// Command gyprisk judges whether gypsum in a building will survive its
// climate: it reads hourly climate records, works out the water, heat and
// humidity at each gypsum surface hour by hour, and reports leaching loss,
// dehydration, condensation and mould risk.
//
// Run "gyprisk help" for the list of subcommands.
package main

import "os"

func main() {
	err := run(os.Args[1:], os.Stdout, os.Stderr)
	os.Exit(exitCode(err, os.Stderr))
}
