package main

import (
	"fmt"
	"io"
	"strings"

	"github.com/spf13/pflag"

	"panto/pantograph"
	"panto/pantograph/partfile"
)

// materialsUsage heads `panto help materials`.
const materialsUsage = `Usage: panto help materials [--machine FILE]

The stock materials panto works speeds and passes out for. A part's [stock] material (or
--material) is matched to the row whose name it contains, the longest name first, so "clock
brass" is brass and "stainless steel" is stainless. A material that matches no row is an
error: panto does not guess speeds. A machine file may add rows or replace them by name with
[[stock_material]] tables (name, hss_drill, hss_mill, and optionally carbide_drill,
carbide_mill, step_share, group, source); --machine shows the table with them.

Surface speeds v_c are in m/min; the spindle speed is n = 1000·v_c / (π·d) for a tool of d mm,
capped at the spindle's top speed. "pass" is the depth of a milling pass as a share of the
cutter's diameter, halved for cutters under 1 mm.

`

// runMaterialsHelp prints the speed table, with a machine file's own rows when --machine is
// given.
func runMaterialsHelp(args []string, stdout io.Writer) error {
	fl := pflag.NewFlagSet("help materials", pflag.ContinueOnError)
	fl.SetOutput(io.Discard)
	machine := fl.String("machine", "", "machine file whose [[stock_material]] rows to add")
	if err := fl.Parse(args); err != nil {
		return usagef("help", "%v\nUsage: panto help materials [--machine FILE]", err)
	}
	var m *pantograph.Machine
	if *machine != "" {
		mc, err := partfile.ReadMachineFile(*machine)
		if err != nil {
			return badFile("help", "machine file", err)
		}
		m = &mc
	}
	var b strings.Builder
	b.WriteString(materialsUsage)
	writeMaterials(&b, pantograph.MaterialsFor(m))
	_, err := io.WriteString(stdout, b.String())
	return err
}

// writeMaterials lays the table out with its sources numbered below it.
func writeMaterials(w io.Writer, t pantograph.Materials) {
	fmt.Fprintf(w, "%-15s %-18s %9s %8s %13s %12s %6s  %s\n", "name", "group", "HSS drill", "HSS mill",
		"carbide drill", "carbide mill", "pass", "source")
	var sources []string
	number := map[string]int{}
	for _, r := range t {
		n, ok := number[r.Source]
		if !ok {
			sources = append(sources, r.Source)
			n = len(sources)
			number[r.Source] = n
		}
		fmt.Fprintf(w, "%-15s %-18s %9s %8s %13s %12s %6s  [%d]\n", r.Name, r.Group, num(r.HSSDrill),
			num(r.HSSMill), num(r.CarbideDrill), num(r.CarbideMill), num(r.StepShare)+" D", n)
	}
	fmt.Fprintln(w)
	for i, s := range sources {
		fmt.Fprintf(w, "[%d] %s\n", i+1, s)
	}
}
