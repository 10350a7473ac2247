package report

import (
	"bytes"
	"fmt"
	"testing"

	"github.com/gyprisk/gyprisk/leach/assess"
)

var sinkLen int

// BenchmarkEmptyDocument is the baseline: a one-page document with the
// fonts embedded, the fixed cost every report pays.
func BenchmarkEmptyDocument(b *testing.B) {
	for i := 0; i < b.N; i++ {
		d := newDoc("t", "", "", false, fixedDate, nil)
		d.pdf.AddPage()
		d.font("", bodySize)
		d.pdf.Cell(10, 5, "x")
		var buf bytes.Buffer
		if err := d.pdf.Output(&buf); err != nil {
			b.Fatal(err)
		}
		sinkLen = buf.Len()
	}
}

// BenchmarkWrite renders whole reports with 1 and 4 element groups.
func BenchmarkWrite(b *testing.B) {
	full := inventedOutput(500)
	for _, n := range []int{1, 4} {
		out := *full
		var es []assess.ElementResult
		for _, g := range groupElements(full.Elements)[:n] {
			for _, r := range g.results {
				es = append(es, *r)
			}
		}
		out.Elements = es
		b.Run(fmt.Sprintf("elements=%d", n), func(b *testing.B) {
			for i := 0; i < b.N; i++ {
				var buf bytes.Buffer
				if err := Write(&buf, &out, Options{FixedDate: fixedDate}); err != nil {
					b.Fatal(err)
				}
				sinkLen = buf.Len()
			}
		})
	}
}
