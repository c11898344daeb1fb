// Command upright compares steel, concrete and timber column schemes at an
// unbraced height, end condition and axial load. With no arguments it opens
// the window; with a subcommand (compare, crossovers, curve, report) it runs
// headless.
package main

import (
	"os"

	"upright/ui"
	"upright/ui/cli"
)

func main() {
	args := os.Args[1:]
	if cli.IsCommand(args) {
		os.Exit(cli.Run(args, os.Stdout, os.Stderr))
	}
	os.Exit(ui.Run(args))
}
