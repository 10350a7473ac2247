package climate

import (
	"errors"
	"io"
	"math"
	"strconv"
	"strings"
	"testing"
	"time"
)

// FuzzReader feeds arbitrary bytes to the reader. It must never panic,
// every error must be a *ParseError with a line number (or a config
// error), and what it accepts must survive a round trip through the
// canonical format. Seeds: the f.Add calls below and testdata/fuzz/FuzzReader.
func FuzzReader(f *testing.F) {
	for _, s := range []string{
		"time,temp_c,rh_pct\n2024-01-01T00:00Z,5,80\n",
		"\ufefftime;temp_c;rh_pct;rain_mm\r\n2024-01-01 00:00+01:00;5,5;101;0,2\r\n",
		"# c\ntime\ttemp_c\trh_pct\twind_ms\twind_dir_deg\n2024-01-01T00:00:00.5Z\t-3\t\t4\t360\n",
		"\"time\",\"temp_c\",\"rh_pct\"\n\"2024-01-01T00:00Z\",\"5\",\"8\"\"0\"\n",
		"time,temp_c,rh_pct,solar_wm2\n2024-01-01T24:00Z,5,80,-3\n2024-01-02T00:30Z,1e1,1E-1,\n",
		"time,temp_c,rh_pct\n2024-02-30T00:00Z,5,80\n",
		"time,temp_c\n",
		"",
	} {
		f.Add([]byte(s))
	}
	f.Fuzz(func(t *testing.T, data []byte) {
		r := NewReader(strings.NewReader(string(data)))
		r.FileName = "fuzz.csv"
		var recs []Record
		for {
			rec, err := r.Read()
			if err == io.EOF {
				break
			}
			if err != nil {
				var pe *ParseError
				if !errors.As(err, &pe) {
					t.Fatalf("error is %T, not *ParseError: %v", err, err)
				}
				if pe.Line < 0 || pe.Line > strings.Count(string(data), "\n")+1 {
					t.Fatalf("line %d out of range: %v", pe.Line, err)
				}
				return
			}
			recs = append(recs, rec)
		}
		set := r.ColumnSet()
		// Round trip: write the accepted records in the canonical format
		// and read them back; values must match to the last bit.
		var b strings.Builder
		var cols []Column
		for c := ColTime; c < numColumns; c++ {
			if set.Has(c) {
				cols = append(cols, c)
			}
		}
		for i, c := range cols {
			if i > 0 {
				b.WriteByte(',')
			}
			b.WriteString(c.String())
		}
		b.WriteByte('\n')
		for _, rec := range recs {
			for i, c := range cols {
				if i > 0 {
					b.WriteByte(',')
				}
				if c == ColTime {
					b.WriteString(rec.Time.Format(time.RFC3339Nano))
					continue
				}
				if v := rec.Value(c); !math.IsNaN(v) {
					b.WriteString(strconv.FormatFloat(v, 'g', -1, 64))
				}
			}
			b.WriteByte('\n')
		}
		s, err := NewReader(strings.NewReader(b.String())).ReadAll()
		if err != nil {
			t.Fatalf("round trip failed: %v\n%s", err, b.String())
		}
		if len(s.Records) != len(recs) {
			t.Fatalf("round trip: %d records, want %d", len(s.Records), len(recs))
		}
		for i := range recs {
			if !s.Records[i].Time.Equal(recs[i].Time) {
				t.Fatalf("record %d time %v, want %v", i, s.Records[i].Time, recs[i].Time)
			}
			for _, c := range cols[1:] {
				g, w := s.Records[i].Value(c), recs[i].Value(c)
				if g != w && !(math.IsNaN(g) && math.IsNaN(w)) {
					t.Fatalf("record %d %s = %v, want %v", i, c, g, w)
				}
			}
		}
	})
}
