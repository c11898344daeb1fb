package cli

import (
	"fmt"
	"io"

	"upright/ui/model"
)

// command is one headless subcommand: its name, how it is called, what it
// does, and the function that runs it.
type command struct {
	name, args, summary string
	run                 func(args []string, stdout, stderr io.Writer) error
}

// commands is the one table of headless subcommands, in the order usage
// lists them. It is filled in init, as the commands' flag parsing reads it
// for its usage line.
var commands []command

func init() {
	commands = []command{
		{"compare", "[flags]", "lightest working size of each family at one length", runCompare},
		{"crossovers", "[flags]", "lengths where the answer changes", runCrossovers},
		{"curve", "--designation NAME --from 1m --to 10m [flags]", "strength of one candidate against length", runCurve},
		{"map", "--length-range 1m..12m --load-range 500kN..5000kN [--steps 100x60] [flags] --out map.png (or --json)", "the winning family over length and load (or tributary area)", runMap},
		{"variants", "[flags] --vary [NAME:]FLAG=VALUE[,FLAG=VALUE…] … [--json]", "each family's best size in up to four variants of the scheme, side by side", runVariants},
		{"sections", "[flags] --out FILE.png|.svg|.pdf (or --json)", "the best size of each family drawn in plan to one scale", runSections},
		{"building", "--bays-x 9m,9m,9m --bays-y 7.5m,7.5m --storeys 4.2m,3.6m,3.6m [flags] [--json] [--out plan.png] [--dxf plan.dxf]", "every column of a building taken down and sized, with totals per family", runBuilding},
		{"report", "[flags] --out report.pdf", "the client report as PDF", runReport},
		{"table", "[flags] [--csv table.csv]", "the candidate table as CSV", runTable},
		{"scheme", "[flags] --out FILE", "write the scheme built from the flags as a file", runScheme},
	}
}

// lookup returns the command of that name, or nil.
func lookup(name string) *command {
	for i := range commands {
		if commands[i].name == name {
			return &commands[i]
		}
	}
	return nil
}

// CommandNames lists the headless subcommands in table order.
func CommandNames() []string {
	out := make([]string, len(commands))
	for i, c := range commands {
		out[i] = c.name
	}
	return out
}

func usage(w io.Writer) {
	fmt.Fprintf(w, "upright %s: column scheme comparison (steel, concrete, timber, filled composite)\n\n", Version)
	fmt.Fprintf(w, "  upright\n      open the window\n")
	for _, c := range commands {
		fmt.Fprintf(w, "  upright %s %s\n      %s\n", c.name, c.args, c.summary)
	}
	fmt.Fprintf(w, "  upright --version\n\nRun \"upright compare -h\" for the scheme flags.\n%s\n", model.Caution)
}
