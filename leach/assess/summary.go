package assess

import (
	"fmt"
	"io"
	"strings"
	"text/tabwriter"
)

// WriteSummary prints the readable summary table of an assessment: one
// row per element × variant × scenario with its key figures and ratings,
// then the notes and the cautions.
func WriteSummary(w io.Writer, out *Output) error {
	var b strings.Builder
	if out.Invented {
		b.WriteString("INVENTED EXAMPLE DATA — not a real building or a measured climate.\n")
	}
	fmt.Fprintf(&b, "%s — %s\n", out.Site.Name, out.Project)
	c := out.Climate
	fmt.Fprintf(&b, "Climate %s to %s, %.1f years, %.1f %% covered. Database: %s.\n\n",
		c.Start.Format("2006-01-02"), c.End.Format("2006-01-02"), c.Years, c.CoveragePct, out.Database)
	tw := tabwriter.NewWriter(&b, 0, 0, 2, ' ', tabwriter.AlignRight)
	fmt.Fprintln(tw, "element\tvariant\tscenario\twater\trecession\tyears to\tdehydr.\tcond.\tmould\tratings: leach/dehydr./cond./mould\t")
	fmt.Fprintln(tw, "\t\t\tL/m²·a\tmm/a\tlimit\th/a\th/a\tindex\t\t")
	for _, e := range out.Elements {
		years := "never"
		if y := e.Leaching.YearsToLimit; y != nil {
			years = FormatYears(*y)
			if p10, p90 := e.Leaching.YearsToLimitP10, e.Leaching.YearsToLimitP90; p10 != nil && p90 != nil {
				years += fmt.Sprintf(" (%s–%s)", FormatYears(*p10), FormatYears(*p90))
			}
		}
		fmt.Fprintf(tw, "%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s\t%s/%s/%s/%s\t\n",
			e.ID, e.Variant, e.Scenario,
			FormatFixed(e.Water.DepositedLM2PerYear+e.Water.RunoffInLM2PerYear, 0),
			FormatFixed(e.Leaching.RecessionMMPerYear, 3), years,
			FormatFixed(e.Dehydration.UnstableHoursPerYear, 0),
			FormatFixed(e.Condensation.HoursPerYear, 0),
			FormatFixed(e.Mould.IndexMax, 2),
			e.Ratings.Leaching, e.Ratings.Dehydration, e.Ratings.Condensation, e.Ratings.Mould)
	}
	if err := tw.Flush(); err != nil {
		return err
	}
	if len(out.Notes) > 0 {
		b.WriteString("\nNotes on the data and assumptions:\n")
		for _, n := range out.Notes {
			fmt.Fprintf(&b, "  - %s\n", n)
		}
	}
	b.WriteString("\n" + CautionLine + "\n")
	_, err := io.WriteString(w, b.String())
	return err
}

// CautionLine is the one-line caution printed with every summary.
const CautionLine = "Screening calculation only: it supports, and does not replace, an on-site survey by a competent professional. " +
	"Follow local building codes and licensed engineers, architects or accredited conservators. " +
	"Wet gypsum ceilings can sag and fall; old plasters and coatings may contain asbestos or lead; work at height needs proper protection."
