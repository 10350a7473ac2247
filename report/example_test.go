package report

import (
	"fmt"

	"github.com/gyprisk/gyprisk/leach/assess"
)

func ExampleRankByYears() {
	y := func(v float64) *float64 { return &v }
	outs := []*assess.Output{{
		Site: assess.SiteOut{Name: "Invented Mill"},
		Elements: []assess.ElementResult{
			{ID: "parapet", Variant: "base", Scenario: "present", Leaching: assess.LeachingOut{YearsToLimit: y(41)}},
			{ID: "soffit", Variant: "base", Scenario: "present"}, // does not recede
			{ID: "cornice", Variant: "base", Scenario: "present", Leaching: assess.LeachingOut{YearsToLimit: y(12)}},
		},
	}}
	rows := PortfolioRows(outs)
	RankByYears(rows)
	for _, r := range rows {
		fmt.Println(r.ID, fmtYearsToLimit(assess.LeachingOut{YearsToLimit: r.YearsToLimit}))
	}
	// Output:
	// cornice 12
	// parapet 41
	// soffit not reached
}
