package assess

import (
	"bufio"
	"io"
	"strconv"
	"time"
)

// hourlyWriter writes the per-hour trace of every result as one long CSV
// table, one row per hour × element × variant × scenario:
//
//	time,id,variant,scenario,surface_temp_c,surface_rh_pct,deposited_l_m2,runoff_in_l_m2,condensate_l_m2,dissolved_g_m2,delta_g_bassanite_j_per_mol,mould_index
//
// time is the end of the hour (RFC 3339, UTC), like the climate record.
// surface_rh_pct is not clipped: above 100 means condensation.
type hourlyWriter struct {
	w   *bufio.Writer
	buf []byte
}

const hourlyHeader = "time,id,variant,scenario,surface_temp_c,surface_rh_pct,deposited_l_m2,runoff_in_l_m2,condensate_l_m2,dissolved_g_m2,delta_g_bassanite_j_per_mol,mould_index\n"

func newHourlyWriter(w io.Writer) *hourlyWriter {
	hw := &hourlyWriter{w: bufio.NewWriterSize(w, 1<<16)}
	hw.w.WriteString(hourlyHeader)
	return hw
}

// write appends the rows of one run.
func (hw *hourlyWriter) write(r *elementRun, scenario string) error {
	tr := r.trace
	for i := 0; i < r.sh.n; i++ {
		b := hw.buf[:0]
		b = r.sh.time(i).UTC().AppendFormat(b, time.RFC3339)
		b = append(b, ',')
		b = appendCSVField(b, r.e.id)
		b = append(b, ',')
		b = appendCSVField(b, r.e.variant)
		b = append(b, ',')
		b = appendCSVField(b, scenario)
		for _, v := range [...]struct {
			x   float64
			dec int
		}{
			{tr.surfTempC[i], 2}, {tr.surfRHPct[i], 2}, {tr.depositL[i], 4}, {tr.runoffL[i], 4},
			{tr.condL[i], 5}, {tr.dissolvedG[i], 5}, {tr.deltaG[i], 1}, {tr.mouldM[i], 4},
		} {
			b = append(b, ',')
			b = strconv.AppendFloat(b, v.x, 'f', v.dec, 64)
		}
		b = append(b, '\n')
		hw.buf = b
		if _, err := hw.w.Write(b); err != nil {
			return err
		}
	}
	return nil
}

func (hw *hourlyWriter) flush() error { return hw.w.Flush() }

// appendCSVField quotes a field when it holds a comma, quote or newline.
func appendCSVField(b []byte, s string) []byte {
	needs := false
	for i := 0; i < len(s); i++ {
		if c := s[i]; c == ',' || c == '"' || c == '\n' || c == '\r' {
			needs = true
			break
		}
	}
	if !needs {
		return append(b, s...)
	}
	b = append(b, '"')
	for i := 0; i < len(s); i++ {
		if s[i] == '"' {
			b = append(b, '"')
		}
		b = append(b, s[i])
	}
	return append(b, '"')
}
