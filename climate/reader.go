package climate

import (
	"bufio"
	"bytes"
	"fmt"
	"io"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"time"
	"unicode/utf8"
)

// Physical bounds applied to every value after unit conversion. A value
// outside them is an error (ErrRange), never clipped, except where noted.
const (
	// MinTempC and MaxTempC bound air temperature. The lowest air
	// temperature on record is −89.2 °C (Vostok, 1983) and the highest
	// 56.7 °C (Death Valley, 1913), both from the WMO World Weather and
	// Climate Extremes Archive (from memory). The upper bound leaves room
	// for room loggers in unventilated roof spaces.
	MinTempC = -90.0
	MaxTempC = 70.0

	// MaxRHPct is the largest relative humidity accepted. Capacitive
	// sensors read a few percent above 100 % near saturation; values in
	// (100, MaxRHPct] are clipped to 100 and counted in ReadStats.Clipped.
	// The 3 % allowance is common practice, no source.
	MaxRHPct = 103.0

	// MaxWindMS bounds the mean wind speed. The highest gust on record is
	// 113 m/s (Barrow Island, 1996, WMO archive, from memory); no hourly
	// or 10-minute mean near the ground comes close to 75 m/s. The bound
	// itself is common practice, no source.
	MaxWindMS = 75.0

	// MaxSolarWM2 bounds global horizontal irradiance. The solar constant
	// is 1361 W/m² (Kopp & Lean 2011, Geophys. Res. Lett. 38, L01706, from
	// memory); cloud-edge enhancement can briefly push the global value
	// near it at the ground, but not beyond 1500 W/m².
	MaxSolarWM2 = 1500.0

	// MinSolarWM2 is the most negative irradiance accepted: thermopile
	// pyranometers read a few W/m² below zero at night (thermal offset).
	// Values in [MinSolarWM2, 0) are clipped to 0 and counted. Common
	// practice, no source.
	MinSolarWM2 = -10.0

	// MaxRainMMPerH bounds rainfall per hour of interval (intervals shorter
	// than an hour are held to the hourly amount). The world record for one
	// hour is 305 mm (Holt, Missouri, 1947, WMO archive, from memory).
	MaxRainMMPerH = 350.0

	// maxLineBytes bounds the length of one line, so memory per row stays
	// bounded whatever the input.
	maxLineBytes = 1 << 16
)

// ReaderConfig is the configuration of a Reader. Set it before the first
// call to Read.
type ReaderConfig struct {
	// FileName is used in error messages only.
	FileName string
	// Comma is the field delimiter. 0 means detect it from the header line
	// among ',', ';' and TAB (the most frequent wins). With ';' or TAB,
	// numbers may use a decimal comma.
	Comma rune
	// Columns maps canonical column names (time, temp_c, rh_pct, rain_mm,
	// wind_ms, wind_dir_deg, solar_wm2) to the header names used in the
	// file, for example {"time": "Date", "temp_c": "T_air"}. Header names
	// compare case-insensitively. Unmapped columns are found by their
	// canonical names.
	Columns map[string]string
	// TempUnit is the unit of the temperature column (default °C).
	TempUnit TempUnit
	// WindUnit is the unit of the wind speed column (default m/s).
	WindUnit WindUnit
	// Location is the zone of time stamps written without an offset. Nil
	// means every stamp must carry an offset or Z. With a Location, a
	// local time that falls in a daylight-saving gap, or that occurs twice
	// when clocks go back, is an error naming the line; write such stamps
	// with their offset (an explicit offset always wins over Location).
	Location *time.Location
}

// ReadStats counts what the reader saw besides good values.
type ReadStats struct {
	Records      int                // data rows returned
	Lines        int                // lines read, header and comments included
	CommentLines int                // lines starting with '#'
	BlankLines   int                // empty lines (ignored)
	Missing      [numColumns]int    // empty cells per column (become NaN)
	Clipped      [numColumns]int    // values clipped to a bound (RH above 100 %, small negative irradiance)
	Ignored      []string           // header names not used by gyprisk
	Headers      [numColumns]string // header name used for each column present
	Delimiter    rune               // the delimiter in use
}

// MissingOf returns the number of empty cells in column c.
func (s *ReadStats) MissingOf(c Column) int { return s.Missing[c] }

// ClippedOf returns the number of values clipped in column c.
func (s *ReadStats) ClippedOf(c Column) int { return s.Clipped[c] }

// Reader reads a climate record row by row, checking every value. It holds
// one line in memory at a time (at most 64 KiB), so records of any length
// read in bounded memory per row.
//
// The format: a header row, then one row per interval. The time column is
// RFC 3339 / ISO 8601 (2024-01-31T13:00:00Z, 2024-01-31 13:00+01:00, or
// without offset when ReaderConfig.Location is set) and marks the END of the
// interval. Lines starting with '#' and empty lines are skipped; a UTF-8
// byte-order mark and CRLF line ends are accepted; fields may be quoted with
// '"' ("" inside for a quote) but may not span lines. An empty cell is a
// missing value (NaN), counted in ReadStats.Missing. "24:00" is accepted
// as midnight at the end of the day.
type Reader struct {
	ReaderConfig

	br      *bufio.Reader
	size    int64 // bytes in the input when known (for ReadAll's capacity), else -1
	nread   int64 // bytes consumed by readLine
	started bool
	err     error // sticky

	line     int
	comma    byte
	decComma bool
	nFields  int
	colIdx   [numColumns]int // field index of each column, -1 if absent
	set      ColumnSet
	stats    ReadStats
	fields   [][]byte
	lineBuf  []byte

	prev     time.Time
	prevLine int
	havePrev bool

	// zone cache for local stamps: inside [safeFrom, safeTo) the offset
	// zoneOff is the only one that maps a wall clock to an instant.
	zoneOK           bool
	zoneOff          time.Duration
	safeFrom, safeTo time.Time
}

// NewReader returns a Reader reading from r.
func NewReader(r io.Reader) *Reader {
	size := int64(-1)
	switch v := r.(type) {
	case interface{ Len() int }: // bytes.Reader, strings.Reader, bytes.Buffer
		size = int64(v.Len())
	case *os.File:
		if st, err := v.Stat(); err == nil && st.Mode().IsRegular() {
			if off, err := v.Seek(0, io.SeekCurrent); err == nil {
				size = st.Size() - off
			}
		}
	}
	return &Reader{br: bufio.NewReaderSize(r, 64<<10), size: size}
}

// ColumnSet returns the columns found in the header (valid after the first
// Read).
func (r *Reader) ColumnSet() ColumnSet { return r.set }

// Stats returns the counts so far.
func (r *Reader) Stats() ReadStats { return r.stats }

// Read returns the next record, with Time in UTC and missing values NaN. At
// the end of the input it returns io.EOF. Errors about the data are
// *ParseError; after any error Read keeps returning it.
func (r *Reader) Read() (Record, error) {
	if r.err != nil {
		return Record{}, r.err
	}
	rec, err := r.read()
	if err != nil {
		r.err = err
	}
	return rec, err
}

// ReadAll reads the remaining records into a Series.
func (r *Reader) ReadAll() (*Series, error) {
	s := &Series{Name: r.FileName, Location: r.Location}
	const probe = 64
	for {
		if len(s.Records) == probe && r.size > 0 && r.nread > 0 {
			// Size the slice from the bytes per line so far, to avoid
			// growing and copying a 30-year record a dozen times.
			perLine := float64(r.nread) / float64(r.stats.Lines)
			if est := int(float64(r.size-r.nread)/perLine*1.02) + probe + 16; est > cap(s.Records) && est < 1<<26 {
				s.Records = append(make([]Record, 0, est), s.Records...)
			}
		}
		rec, err := r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			return nil, err
		}
		s.Records = append(s.Records, rec)
	}
	s.Columns = r.set
	s.Stats = r.stats
	return s, nil
}

// ReadFile reads and checks a whole climate record file. cfg.FileName, if
// empty, is set to path.
func ReadFile(path string, cfg ReaderConfig) (*Series, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	if cfg.FileName == "" {
		cfg.FileName = path
	}
	r := NewReader(f)
	r.ReaderConfig = cfg
	s, err := r.ReadAll()
	if err != nil {
		return nil, err
	}
	s.Name = filepath.Base(path)
	return s, nil
}

func (r *Reader) errf(col int, kind error, format string, a ...any) *ParseError {
	e := &ParseError{File: r.FileName, Line: r.line, Err: because(kind, format, a...)}
	if col >= 0 && col < len(r.fields) {
		e.Column = col + 1
		e.Value = string(r.fields[col])
	}
	return e
}

func (r *Reader) fieldErr(c Column, kind error, format string, a ...any) *ParseError {
	e := r.errf(r.colIdx[c], kind, format, a...)
	e.Field = r.stats.Headers[c]
	return e
}

// readLine returns the next line without its line end. The slice is valid
// until the next call.
func (r *Reader) readLine() ([]byte, error) {
	line, err := r.br.ReadSlice('\n')
	if err == bufio.ErrBufferFull {
		r.lineBuf = append(r.lineBuf[:0], line...)
		for err == bufio.ErrBufferFull {
			line, err = r.br.ReadSlice('\n')
			r.lineBuf = append(r.lineBuf, line...)
			if len(r.lineBuf) > maxLineBytes {
				r.line++
				r.stats.Lines++
				return nil, &ParseError{File: r.FileName, Line: r.line,
					Err: because(ErrSyntax, "line longer than %d bytes", maxLineBytes)}
			}
		}
		line = r.lineBuf
	}
	if err == io.EOF && len(line) > 0 {
		err = nil // last line without a line end
	}
	if err != nil {
		return nil, err
	}
	r.line++
	r.stats.Lines++
	r.nread += int64(len(line))
	if n := len(line); n > 0 && line[n-1] == '\n' {
		line = line[:n-1]
	}
	if n := len(line); n > 0 && line[n-1] == '\r' {
		line = line[:n-1]
	}
	return line, nil
}

// nextLine skips blank and comment lines.
func (r *Reader) nextLine() ([]byte, error) {
	for {
		line, err := r.readLine()
		if err != nil {
			return nil, err
		}
		if r.line == 1 {
			line = bytes.TrimPrefix(line, []byte("\xef\xbb\xbf"))
		}
		if len(bytes.TrimSpace(line)) == 0 {
			r.stats.BlankLines++
			continue
		}
		if line[0] == '#' {
			r.stats.CommentLines++
			continue
		}
		return line, nil
	}
}

// split cuts line into r.fields, unquoting quoted fields in place.
func (r *Reader) split(line []byte) error {
	r.fields = r.fields[:0]
	comma := r.comma
	i := 0
	for {
		if i < len(line) && line[i] == '"' {
			// Quoted field: unescape "" in place.
			w := i
			j := i + 1
			for {
				if j >= len(line) {
					r.fields = append(r.fields, line[i:])
					return r.errf(len(r.fields)-1, ErrSyntax, "quoted field not closed (a quoted field may not span lines)")
				}
				c := line[j]
				if c == '"' {
					if j+1 < len(line) && line[j+1] == '"' {
						line[w] = '"'
						w++
						j += 2
						continue
					}
					break
				}
				line[w] = c
				w++
				j++
			}
			r.fields = append(r.fields, line[i:w])
			j++ // closing quote
			if j == len(line) {
				return nil
			}
			if line[j] != comma {
				return r.errf(len(r.fields)-1, ErrSyntax, "unexpected %q after closing quote", line[j])
			}
			i = j + 1
			continue
		}
		k := bytes.IndexByte(line[i:], comma)
		if k < 0 {
			r.fields = append(r.fields, line[i:])
			return nil
		}
		r.fields = append(r.fields, line[i:i+k])
		i += k + 1
	}
}

// detectComma returns the most frequent of ',', ';' and TAB outside quotes.
func detectComma(line []byte) byte {
	var n [3]int
	quoted := false
	for _, c := range line {
		switch c {
		case '"':
			quoted = !quoted
		case ',':
			if !quoted {
				n[0]++
			}
		case ';':
			if !quoted {
				n[1]++
			}
		case '\t':
			if !quoted {
				n[2]++
			}
		}
	}
	best, comma := 0, byte(',')
	for i, c := range []byte{',', ';', '\t'} {
		if n[i] > best {
			best, comma = n[i], c
		}
	}
	return comma
}

func (r *Reader) readHeader() error {
	r.started = true
	for i := range r.colIdx {
		r.colIdx[i] = -1
	}
	line, err := r.nextLine()
	if err == io.EOF {
		return &ParseError{File: r.FileName, Line: r.line, Err: because(ErrHeader, "no header line: the file is empty")}
	}
	if err != nil {
		return err
	}
	switch {
	case r.Comma == 0:
		r.comma = detectComma(line)
	case r.Comma < utf8.RuneSelf && r.Comma != '"' && r.Comma != '#' && r.Comma != '\r' && r.Comma != '\n' &&
		!(r.Comma >= '0' && r.Comma <= '9') && r.Comma != '.' && r.Comma != '-' && r.Comma != '+':
		r.comma = byte(r.Comma)
	default:
		return fmt.Errorf("climate: invalid delimiter %q", r.Comma)
	}
	r.decComma = r.comma == ';' || r.comma == '\t'
	r.stats.Delimiter = rune(r.comma)

	// Reverse the mapping: lower-case header name -> column.
	mapped := map[string]Column{}
	remapped := [numColumns]bool{}
	for canon, hdr := range r.Columns {
		c, ok := columnByName(canon)
		if !ok {
			return &ParseError{File: r.FileName, Line: r.line, Err: because(ErrHeader,
				"column mapping names unknown column %q (known: %s)", canon, strings.Join(columnNames[:], ", "))}
		}
		mapped[strings.ToLower(strings.TrimSpace(hdr))] = c
		remapped[c] = true
	}

	if err := r.split(line); err != nil {
		return err
	}
	r.nFields = len(r.fields)
	for i, f := range r.fields {
		name := strings.TrimSpace(string(f))
		key := strings.ToLower(name)
		c, ok := mapped[key]
		if !ok {
			c, ok = columnByName(key)
			if ok && remapped[c] {
				ok = false // the mapping points this column elsewhere
			}
		}
		if !ok {
			r.stats.Ignored = append(r.stats.Ignored, name)
			continue
		}
		if j := r.colIdx[c]; j >= 0 {
			e := r.errf(i, ErrHeader, "column %s appears twice (fields %d and %d)", c, j+1, i+1)
			e.Field = name
			return e
		}
		r.colIdx[c] = i
		r.set = r.set.With(c)
		r.stats.Headers[c] = name
	}
	for canon, hdr := range r.Columns {
		c, _ := columnByName(canon)
		if r.colIdx[c] < 0 {
			return &ParseError{File: r.FileName, Line: r.line, Err: because(ErrHeader,
				"column mapping %s=%s: no column %q in the header %q", canon, hdr, hdr, string(line))}
		}
	}
	var missing []string
	for _, c := range []Column{ColTime, ColTemp, ColRH} {
		if r.colIdx[c] < 0 {
			missing = append(missing, c.String())
		}
	}
	if len(missing) > 0 {
		return &ParseError{File: r.FileName, Line: r.line, Err: because(ErrHeader,
			"missing required column %s in the header %q (delimiter %q; map other names with --columns, e.g. temp_c=T_air)",
			strings.Join(missing, ", "), headerPreview(line), rune(r.comma))}
	}
	return nil
}

func headerPreview(line []byte) string {
	if len(line) > 200 {
		return string(line[:200]) + "…"
	}
	return string(line)
}

func columnByName(name string) (Column, bool) {
	for c, n := range columnNames {
		if strings.EqualFold(n, name) {
			return Column(c), true
		}
	}
	return 0, false
}

func (r *Reader) read() (Record, error) {
	if !r.started {
		if err := r.readHeader(); err != nil {
			return Record{}, err
		}
	}
	line, err := r.nextLine()
	if err != nil {
		return Record{}, err
	}
	if err := r.split(line); err != nil {
		return Record{}, err
	}
	if len(r.fields) != r.nFields {
		return Record{}, &ParseError{File: r.FileName, Line: r.line, Err: because(ErrFieldCount,
			"%d fields, the header has %d (delimiter %q)", len(r.fields), r.nFields, rune(r.comma))}
	}

	nan := math.NaN()
	rec := Record{TempC: nan, RHPct: nan, RainMM: nan, WindMS: nan, WindDirDeg: nan, SolarWM2: nan}

	// Time.
	tf := trimSpace(r.fields[r.colIdx[ColTime]])
	if len(tf) == 0 {
		return Record{}, r.fieldErr(ColTime, ErrTimeSyntax, "empty time stamp (every row needs one)")
	}
	t, err := r.parseTime(tf)
	if err != nil {
		return Record{}, err
	}
	if r.havePrev && !t.After(r.prev) {
		if t.Equal(r.prev) {
			return Record{}, r.fieldErr(ColTime, ErrTimeOrder, "duplicate time stamp: same instant as line %d", r.prevLine)
		}
		return Record{}, r.fieldErr(ColTime, ErrTimeOrder, "time goes backwards: %s is before %s on line %d",
			t.Format(time.RFC3339), r.prev.Format(time.RFC3339), r.prevLine)
	}
	intervalH := 1.0
	if r.havePrev {
		intervalH = t.Sub(r.prev).Hours()
	}
	rec.Time = t

	for c := ColTemp; c < numColumns; c++ {
		j := r.colIdx[c]
		if j < 0 {
			continue
		}
		f := trimSpace(r.fields[j])
		if len(f) == 0 {
			r.stats.Missing[c]++
			continue
		}
		v, ok := parseNum(f, r.decComma)
		if !ok {
			hint := ""
			if bytes.IndexByte(f, ',') >= 0 && !r.decComma {
				hint = " (a decimal comma needs a ';' or TAB delimiter)"
			}
			return Record{}, r.fieldErr(c, ErrSyntax, "not a number%s; leave the cell empty for a missing value", hint)
		}
		switch c {
		case ColTemp:
			v = r.TempUnit.ToC(v)
			if v < MinTempC || v > MaxTempC {
				return Record{}, r.fieldErr(c, ErrRange, "air temperature %.1f °C outside %g to %g °C%s",
					v, MinTempC, MaxTempC, unitNote(r.TempUnit != Celsius, r.TempUnit.String()))
			}
			rec.TempC = v
		case ColRH:
			switch {
			case v < 0:
				return Record{}, r.fieldErr(c, ErrRange, "relative humidity below 0 %%")
			case v > MaxRHPct:
				return Record{}, r.fieldErr(c, ErrRange, "relative humidity above %g %%", MaxRHPct)
			case v > 100:
				v = 100
				r.stats.Clipped[c]++
			}
			rec.RHPct = v
		case ColRain:
			if v < 0 {
				return Record{}, r.fieldErr(c, ErrRange, "negative rainfall")
			}
			if lim := MaxRainMMPerH * math.Max(1, intervalH); v > lim {
				return Record{}, r.fieldErr(c, ErrRange, "rainfall %g mm in %s exceeds %g mm (%g mm per hour, above the world record)",
					v, fmtHours(intervalH), lim, MaxRainMMPerH)
			}
			rec.RainMM = v
		case ColWind:
			v = r.WindUnit.ToMS(v)
			if v < 0 {
				return Record{}, r.fieldErr(c, ErrRange, "negative wind speed")
			}
			if v > MaxWindMS {
				return Record{}, r.fieldErr(c, ErrRange, "mean wind speed %.1f m/s above %g m/s%s",
					v, MaxWindMS, unitNote(r.WindUnit != MetresPerSecond, r.WindUnit.String()))
			}
			rec.WindMS = v
		case ColWindDir:
			if v < 0 || v > 360 {
				return Record{}, r.fieldErr(c, ErrRange, "wind direction outside 0 to 360°")
			}
			rec.WindDirDeg = v
		case ColSolar:
			switch {
			case v < MinSolarWM2:
				return Record{}, r.fieldErr(c, ErrRange, "irradiance below %g W/m²", MinSolarWM2)
			case v > MaxSolarWM2:
				return Record{}, r.fieldErr(c, ErrRange, "irradiance above %g W/m²", MaxSolarWM2)
			case v < 0:
				v = 0
				r.stats.Clipped[c]++
			}
			rec.SolarWM2 = v
		}
	}
	r.prev, r.prevLine, r.havePrev = t, r.line, true
	r.stats.Records++
	return rec, nil
}

func unitNote(converted bool, unit string) string {
	if !converted {
		return ""
	}
	return " (converted from " + unit + ")"
}

func fmtHours(h float64) string {
	if h == 1 {
		return "one hour"
	}
	return strconv.FormatFloat(h, 'g', 4, 64) + " h"
}

func trimSpace(b []byte) []byte {
	for len(b) > 0 && (b[0] == ' ' || b[0] == '\t') {
		b = b[1:]
	}
	for len(b) > 0 && (b[len(b)-1] == ' ' || b[len(b)-1] == '\t') {
		b = b[:len(b)-1]
	}
	return b
}

// pow10 holds the powers of ten that float64 represents exactly.
var pow10 = [...]float64{1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10,
	1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22}

// parseNum parses a decimal number: optional sign, digits with one optional
// decimal point ('.' and, if decComma, ','), optional exponent. No
// allocation on the fast path: up to 15 significant digits and 22 decimals,
// where mantissa / 10^n is exact to the last bit (both operands are exact
// float64s and IEEE division rounds once). Anything longer goes to
// strconv.ParseFloat. Inf, NaN, hex and underscores are rejected.
func parseNum(b []byte, decComma bool) (float64, bool) {
	i := 0
	neg := false
	if i < len(b) && (b[i] == '+' || b[i] == '-') {
		neg = b[i] == '-'
		i++
	}
	var mant uint64
	nd, frac := 0, 0
	sawDigit, sawDot := false, false
	for ; i < len(b); i++ {
		c := b[i]
		switch {
		case c >= '0' && c <= '9':
			sawDigit = true
			if mant == 0 && c == '0' {
				if sawDot {
					frac++
				}
				continue
			}
			if nd >= 15 {
				return parseNumSlow(b, decComma)
			}
			mant = mant*10 + uint64(c-'0')
			nd++
			if sawDot {
				frac++
			}
		case (c == '.' || (decComma && c == ',')) && !sawDot:
			sawDot = true
		case c == 'e' || c == 'E':
			if !sawDigit {
				return 0, false
			}
			return parseNumSlow(b, decComma)
		default:
			return 0, false
		}
	}
	if !sawDigit {
		return 0, false
	}
	if frac >= len(pow10) {
		return parseNumSlow(b, decComma)
	}
	f := float64(mant) / pow10[frac]
	if neg {
		f = -f
	}
	return f, true
}

func parseNumSlow(b []byte, decComma bool) (float64, bool) {
	buf := make([]byte, len(b))
	for i, c := range b {
		switch {
		case c >= '0' && c <= '9', c == '+', c == '-', c == '.', c == 'e', c == 'E':
			buf[i] = c
		case c == ',' && decComma:
			buf[i] = '.'
		default:
			return 0, false
		}
	}
	f, err := strconv.ParseFloat(string(buf), 64)
	if err != nil || math.IsInf(f, 0) || math.IsNaN(f) {
		return 0, false
	}
	return f, true
}

// digits parses n ASCII digits at b[i:].
func digits(b []byte, i, n int) (int, bool) {
	if i+n > len(b) {
		return 0, false
	}
	v := 0
	for _, c := range b[i : i+n] {
		if c < '0' || c > '9' {
			return 0, false
		}
		v = v*10 + int(c-'0')
	}
	return v, true
}

const timeHint = "expected a date and time like 2024-01-31T13:00:00Z, 2024-01-31 13:00+01:00 or, with a zone given, 2024-01-31 13:00"

// parseTime parses YYYY-MM-DD[T ]hh:mm[:ss[.fff]][Z|±hh[:mm]] by hand (the
// fixed RFC 3339 / ISO 8601 layouts; no allocation) and returns the instant
// in UTC.
func (r *Reader) parseTime(b []byte) (time.Time, error) {
	bad := func(why string) (time.Time, error) {
		return time.Time{}, r.fieldErr(ColTime, ErrTimeSyntax, "%s; %s", why, timeHint)
	}
	y, ok1 := digits(b, 0, 4)
	mo, ok2 := digits(b, 5, 2)
	d, ok3 := digits(b, 8, 2)
	if !ok1 || !ok2 || !ok3 || b[4] != '-' || b[7] != '-' {
		return bad("not a date")
	}
	if len(b) < 16 || (b[10] != 'T' && b[10] != 't' && b[10] != ' ') || b[13] != ':' {
		return bad("no time of day")
	}
	h, ok1 := digits(b, 11, 2)
	mi, ok2 := digits(b, 14, 2)
	if !ok1 || !ok2 {
		return bad("no time of day")
	}
	i := 16
	s, ns := 0, 0
	if i < len(b) && b[i] == ':' {
		var ok bool
		if s, ok = digits(b, i+1, 2); !ok {
			return bad("bad seconds")
		}
		i += 3
		if i < len(b) && (b[i] == '.' || b[i] == ',') {
			i++
			scale, n := 100000000, 0
			for i < len(b) && b[i] >= '0' && b[i] <= '9' {
				if n < 9 {
					ns += int(b[i]-'0') * scale
					scale /= 10
				}
				n++
				i++
			}
			if n == 0 {
				return bad("bad fraction of a second")
			}
		}
	}
	hasOff := false
	off := 0
	if i < len(b) {
		switch b[i] {
		case 'Z', 'z':
			hasOff = true
			i++
		case '+', '-':
			sign := 1
			if b[i] == '-' {
				sign = -1
			}
			oh, ok := digits(b, i+1, 2)
			if !ok {
				return bad("bad UTC offset")
			}
			i += 3
			om := 0
			if i < len(b) {
				if b[i] == ':' {
					i++
				}
				if om, ok = digits(b, i, 2); !ok {
					return bad("bad UTC offset")
				}
				i += 2
			}
			if oh > 18 || om > 59 {
				return bad("UTC offset out of range")
			}
			off = sign * (oh*3600 + om*60)
			hasOff = true
		}
	}
	if i != len(b) {
		return bad("unexpected text after the time")
	}
	if mo < 1 || mo > 12 || d < 1 || d > daysIn(y, mo) {
		return bad("no such date")
	}
	if h > 24 || mi > 59 || s > 59 || (h == 24 && (mi != 0 || s != 0 || ns != 0)) {
		return bad("no such time of day")
	}
	wall := time.Date(y, time.Month(mo), d, h, mi, s, ns, time.UTC)
	if hasOff {
		return wall.Add(-time.Duration(off) * time.Second), nil
	}
	if r.Location == nil {
		return time.Time{}, r.fieldErr(ColTime, ErrNoOffset,
			"time stamp has no UTC offset: give the zone of the logger (--tz ZONE, e.g. --tz Europe/Vienna) or write stamps with Z or ±hh:mm")
	}
	return r.localToUTC(wall, h == 24)
}

func daysIn(y, m int) int {
	switch m {
	case 2:
		if y%4 == 0 && (y%100 != 0 || y%400 == 0) {
			return 29
		}
		return 28
	case 4, 6, 9, 11:
		return 30
	}
	return 31
}

// localToUTC converts a wall clock reading (carried as a UTC time) in
// r.Location to an instant, rejecting wall clocks that do not exist (clocks
// went forward) or that occur twice (clocks went back).
func (r *Reader) localToUTC(wall time.Time, endOfDay bool) (time.Time, error) {
	if r.zoneOK {
		c := wall.Add(-r.zoneOff)
		if !c.Before(r.safeFrom) && c.Before(r.safeTo) {
			return c, nil
		}
	}
	loc := r.Location
	var offs [3]time.Duration
	for k, probe := range []time.Duration{-36 * time.Hour, 0, 36 * time.Hour} {
		_, o := wall.Add(probe).In(loc).Zone()
		offs[k] = time.Duration(o) * time.Second
	}
	var found []time.Time
	var foundOff time.Duration
	for k, o := range offs {
		if (k > 0 && o == offs[0]) || (k == 2 && o == offs[1]) {
			continue
		}
		c := wall.Add(-o)
		if _, co := c.In(loc).Zone(); time.Duration(co)*time.Second == o {
			found = append(found, c)
			foundOff = o
		}
	}
	show := wall.Format("2006-01-02 15:04:05")
	if endOfDay {
		show = wall.Add(-24*time.Hour).Format("2006-01-02") + " 24:00:00"
	}
	switch len(found) {
	case 0:
		return time.Time{}, r.fieldErr(ColTime, ErrLocalTime,
			"local time %s does not exist in %s (the clocks went forward); check the logger's clock setting", show, loc)
	case 1:
	default:
		return time.Time{}, r.fieldErr(ColTime, ErrLocalTime,
			"local time %s occurs twice in %s (the clocks went back); write this stamp with its UTC offset", show, loc)
	}
	c := found[0]
	start, end := c.In(loc).ZoneBounds()
	const margin = 26 * time.Hour
	r.zoneOK, r.zoneOff = true, foundOff
	r.safeFrom = time.Unix(-1<<62, 0)
	if !start.IsZero() {
		r.safeFrom = start.Add(margin)
	}
	r.safeTo = time.Unix(1<<62, 0)
	if !end.IsZero() {
		r.safeTo = end.Add(-margin)
	}
	return c.UTC(), nil
}
