package climate

import (
	"errors"
	"io"
	"math"
	"strings"
	"testing"
	"time"
)

// Test inputs mark the expected error position like encoding/csv's tests:
// "§" right before the offending field gives line and field number, "¶" at
// the start of a line marks an error about the whole line (column 0). The
// markers are removed before the input is read.
func markedPosition(t *testing.T, in string) (clean string, line, col int) {
	t.Helper()
	lines := strings.Split(in, "\n")
	for i, l := range lines {
		if k := strings.Index(l, "¶"); k >= 0 {
			line, col = i+1, 0
			lines[i] = strings.Replace(l, "¶", "", 1)
		}
		if k := strings.Index(l, "§"); k >= 0 {
			before := l[:k]
			n := strings.Count(before, ",") + strings.Count(before, ";") + strings.Count(before, "\t")
			line, col = i+1, n+1
			lines[i] = strings.Replace(l, "§", "", 1)
		}
	}
	return strings.Join(lines, "\n"), line, col
}

func mustLoc(t *testing.T, name string) *time.Location {
	t.Helper()
	loc, err := time.LoadLocation(name)
	if err != nil {
		t.Skipf("zone %s not available: %v", name, err)
	}
	return loc
}

func readAllString(cfg ReaderConfig, in string) (*Series, error) {
	r := NewReader(strings.NewReader(in))
	r.ReaderConfig = cfg
	return r.ReadAll()
}

func TestReaderErrors(t *testing.T) {
	berlin := mustLoc(t, "Europe/Berlin")
	const hdr = "time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n"
	tests := []struct {
		name  string
		cfg   ReaderConfig
		in    string
		kind  error
		inMsg string
	}{
		{"rh above 103", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,§107.5,0,1,90,0\n", ErrRange, "relative humidity above 103 %"},
		{"rh below 0", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,§-0.5,0,1,90,0\n", ErrRange, "below 0"},
		{"negative rain", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,§-0.1,1,90,0\n", ErrRange, "negative rainfall"},
		{"rain above record", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,§400,1,90,0\n", ErrRange, "world record"},
		{"wind dir 361", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,1,§361,0\n", ErrRange, "0 to 360"},
		{"wind dir negative", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,1,§-1,0\n", ErrRange, "0 to 360"},
		{"temp hot", ReaderConfig{}, hdr + "2024-01-01T01:00Z,§75,80,0,1,90,0\n", ErrRange, "outside -90 to 70"},
		{"temp in F converted", ReaderConfig{TempUnit: Fahrenheit}, hdr + "2024-01-01T01:00Z,§170,80,0,1,90,0\n", ErrRange, "converted from F"},
		{"wind too fast", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,§80,90,0\n", ErrRange, "above 75 m/s"},
		{"negative wind", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,§-2,90,0\n", ErrRange, "negative wind"},
		{"solar too high", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,1,90,§1600\n", ErrRange, "above 1500"},
		{"solar too negative", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,1,90,§-20\n", ErrRange, "below -10"},
		{"bad number", ReaderConfig{}, hdr + "2024-01-01T01:00Z,§5..1,80,0,1,90,0\n", ErrSyntax, "not a number"},
		{"NA is not empty", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,§NA,0,1,90,0\n", ErrSyntax, "leave the cell empty"},
		{"decimal comma with comma delimiter", ReaderConfig{}, hdr + "2024-01-01T01:00Z,\"§5,1\",80,0,1,90,0\n", ErrSyntax, "decimal comma needs"},
		{"inf rejected", ReaderConfig{}, hdr + "2024-01-01T01:00Z,§Inf,80,0,1,90,0\n", ErrSyntax, "not a number"},
		{"too few fields", ReaderConfig{}, hdr + "2024-01-01T00:00Z,5,80,0,1,90,0\n¶2024-01-01T01:00Z,5,80,0,1,90\n", ErrFieldCount, "6 fields, the header has 7"},
		{"too many fields", ReaderConfig{}, hdr + "¶2024-01-01T01:00Z,5,80,0,1,90,0,\n", ErrFieldCount, "8 fields"},
		{"bad time", ReaderConfig{}, hdr + "§31.01.2024 13:00,5,80,0,1,90,0\n", ErrTimeSyntax, "not a date"},
		{"no such date", ReaderConfig{}, hdr + "§2023-02-29T13:00Z,5,80,0,1,90,0\n", ErrTimeSyntax, "no such date"},
		{"hour 25", ReaderConfig{}, hdr + "§2023-02-28T25:00Z,5,80,0,1,90,0\n", ErrTimeSyntax, "no such time"},
		{"empty time", ReaderConfig{}, hdr + "§,5,80,0,1,90,0\n", ErrTimeSyntax, "empty time stamp"},
		{"junk after time", ReaderConfig{}, hdr + "§2023-02-28T13:00Zx,5,80,0,1,90,0\n", ErrTimeSyntax, "unexpected text"},
		{"no offset, no zone", ReaderConfig{}, hdr + "§2024-01-01 01:00,5,80,0,1,90,0\n", ErrNoOffset, "--tz"},
		{"duplicate time", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,80,0,1,90,0\n§2024-01-01T02:00+01:00,5,80,0,1,90,0\n", ErrTimeOrder, "same instant as line 2"},
		{"time backwards", ReaderConfig{}, hdr + "2024-01-01T02:00Z,5,80,0,1,90,0\n# a comment in between\n§2024-01-01T01:00Z,5,80,0,1,90,0\n", ErrTimeOrder, "before 2024-01-01T02:00:00Z on line 2"},
		{"DST gap", ReaderConfig{Location: berlin}, hdr + "2024-03-31 01:00,5,80,0,1,90,0\n§2024-03-31 02:30,5,80,0,1,90,0\n", ErrLocalTime, "does not exist in Europe/Berlin"},
		{"repeated autumn hour", ReaderConfig{Location: berlin}, hdr + "2024-10-27 01:30,5,80,0,1,90,0\n§2024-10-27 02:30,5,80,0,1,90,0\n", ErrLocalTime, "occurs twice"},
		{"missing rh column", ReaderConfig{}, "¶time,temp_c,rain_mm\n2024-01-01T01:00Z,5,0\n", ErrHeader, `missing required column rh_pct in the header "time,temp_c,rain_mm"`},
		{"empty file", ReaderConfig{}, "", ErrHeader, "empty"},
		{"duplicate column", ReaderConfig{}, "time,temp_c,rh_pct,§TEMP_C\n", ErrHeader, "appears twice"},
		{"mapping to absent header", ReaderConfig{Columns: map[string]string{"temp_c": "T_air"}}, "¶time,temp_c,rh_pct\n", ErrHeader, `no column "T_air"`},
		{"mapping unknown column", ReaderConfig{Columns: map[string]string{"pressure": "p"}}, "¶time,temp_c,rh_pct\n", ErrHeader, "unknown column"},
		{"unclosed quote", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,§\"80,0,1,90,0\n", ErrSyntax, "not closed"},
		{"text after quote", ReaderConfig{}, hdr + "2024-01-01T01:00Z,5,§\"80\"x,0,1,90,0\n", ErrSyntax, "after closing quote"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			in, line, col := markedPosition(t, tt.in)
			cfg := tt.cfg
			cfg.FileName = "site.csv"
			_, err := readAllString(cfg, in)
			var pe *ParseError
			if !errors.As(err, &pe) {
				t.Fatalf("err = %v (%T), want *ParseError", err, err)
			}
			if !errors.Is(err, tt.kind) {
				t.Errorf("errors.Is(err, %v) = false; err = %v", tt.kind, err)
			}
			if pe.File != "site.csv" || pe.Line != line || pe.Column != col {
				t.Errorf("position %s:%d:%d, want site.csv:%d:%d; err = %v", pe.File, pe.Line, pe.Column, line, col, err)
			}
			if !strings.Contains(err.Error(), tt.inMsg) {
				t.Errorf("message %q does not contain %q", err, tt.inMsg)
			}
		})
	}
}

func TestParseErrorFormat(t *testing.T) {
	in := "time,temp_c,rh_pct\n2024-01-01T00:00Z,5,107.5\n"
	r := NewReader(strings.NewReader(in))
	r.FileName = "site.csv"
	_, err := r.Read()
	const want = `site.csv:2:3 (rh_pct): value "107.5": relative humidity above 103 %`
	if err == nil || err.Error() != want {
		t.Fatalf("err = %v, want %s", err, want)
	}
	// Errors are sticky.
	if _, err2 := r.Read(); err2 != err {
		t.Errorf("second Read = %v, want the same error", err2)
	}
}

func TestReaderFormats(t *testing.T) {
	vienna := mustLoc(t, "Europe/Vienna")
	want := []Record{
		{Time: time.Date(2024, 1, 1, 0, 0, 0, 0, time.UTC), TempC: 5.5, RHPct: 80, RainMM: 0.2, WindMS: 3, WindDirDeg: 270, SolarWM2: 0},
		{Time: time.Date(2024, 1, 1, 1, 0, 0, 0, time.UTC), TempC: -1.25, RHPct: 100, RainMM: math.NaN(), WindMS: 4, WindDirDeg: 0, SolarWM2: 0},
	}
	tests := []struct {
		name    string
		cfg     ReaderConfig
		in      string
		clipped int
		missing int
	}{
		{"canonical", ReaderConfig{},
			"time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n" +
				"2024-01-01T00:00:00Z,5.5,80,0.2,3,270,0\n2024-01-01T01:00:00Z,-1.25,101,,4,0,-3\n", 2, 1},
		{"BOM, CRLF, comments, blank lines, spaces", ReaderConfig{},
			"\ufeff# invented test data\r\nTime , Temp_C,RH_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\r\n\r\n" +
				"2024-01-01T01:00:00+01:00, 5.5 ,80,0.2,3,270,0\r\n# logger restarted\r\n2024-01-01 01:00Z,-1.25,100,,4,0,0", 0, 1},
		{"semicolon and decimal comma, local time", ReaderConfig{Location: vienna},
			"time;temp_c;rh_pct;rain_mm;wind_ms;wind_dir_deg;solar_wm2\n" +
				"2024-01-01 01:00;5,5;80;0,2;3;270;0\n2024-01-01T02:00:00.000;-1,25;100;;4;0;0\n", 0, 1},
		{"tab, quotes, mapping, units", ReaderConfig{
			Columns:  map[string]string{"time": "Date", "temp_c": "T air", "rh_pct": "RH", "wind_ms": "Wind", "rain_mm": "P"},
			TempUnit: Fahrenheit, WindUnit: KilometresPerHour},
			"\"Date\"\t\"T air\"\tRH\tP\tWind\twind_dir_deg\tsolar_wm2\tstation \"\"A\"\"\n" +
				"2024-01-01T00:00Z\t41,9\t80\t0,2\t10,8\t270\t0\tx\n\"2024-01-01T01:00Z\"\t29,75\t100\t\t14,4\t0\t0\t\"a \"\"quoted\"\" note\"\n", 0, 1},
		{"kelvin and knots, 24:00", ReaderConfig{TempUnit: Kelvin, WindUnit: Knots},
			"time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2\n" +
				"2023-12-31T24:00Z,278.65,80,0.2,5.831533477321814,270,0\n2024-01-01T01:00Z,271.9,100,,7.775377969762419,0,0\n", 0, 1},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			s, err := readAllString(tt.cfg, tt.in)
			if err != nil {
				t.Fatal(err)
			}
			if len(s.Records) != len(want) {
				t.Fatalf("%d records, want %d", len(s.Records), len(want))
			}
			for i, got := range s.Records {
				w := want[i]
				if !got.Time.Equal(w.Time) || got.Time.Location() != time.UTC {
					t.Errorf("record %d time %v, want %v UTC", i, got.Time, w.Time)
				}
				for c := ColTemp; c < numColumns; c++ {
					g, e := got.Value(c), w.Value(c)
					if math.IsNaN(e) != math.IsNaN(g) || (!math.IsNaN(e) && math.Abs(g-e) > 1e-9) {
						t.Errorf("record %d %s = %v, want %v", i, c, g, e)
					}
				}
			}
			clipped := s.Stats.Clipped[ColRH] + s.Stats.Clipped[ColSolar]
			if clipped != tt.clipped || s.Stats.Missing[ColRain] != tt.missing {
				t.Errorf("clipped %d missing %d, want %d and %d", clipped, s.Stats.Missing[ColRain], tt.clipped, tt.missing)
			}
			if !s.Has(ColSolar) || !s.Has(ColWindDir) {
				t.Errorf("columns %b lack solar or wind direction", s.Columns)
			}
		})
	}
}

func TestReaderIgnoredAndOptional(t *testing.T) {
	s, err := readAllString(ReaderConfig{}, "time,temp_c,rh_pct,battery_v\n2024-06-01T12:00Z,21,55,3.1\n")
	if err != nil {
		t.Fatal(err)
	}
	if s.Has(ColRain) || !s.Has(ColRH) {
		t.Errorf("columns wrong: %b", s.Columns)
	}
	if len(s.Stats.Ignored) != 1 || s.Stats.Ignored[0] != "battery_v" {
		t.Errorf("ignored = %q, want [battery_v]", s.Stats.Ignored)
	}
	if !math.IsNaN(s.Records[0].RainMM) {
		t.Errorf("absent rain column should read as NaN")
	}
}

// A repeated autumn hour is fine when the stamps carry their offsets, and
// a zone's whole year of local hours reads without error.
func TestReaderDSTWithOffsets(t *testing.T) {
	berlin := mustLoc(t, "Europe/Berlin")
	in := "time,temp_c,rh_pct\n2024-10-27 01:30,5,80\n2024-10-27 02:30+02:00,5,80\n2024-10-27 02:30+01:00,5,80\n2024-10-27 03:30,5,80\n"
	s, err := readAllString(ReaderConfig{Location: berlin}, in)
	if err != nil {
		t.Fatal(err)
	}
	for i := 1; i < len(s.Records); i++ {
		if d := s.Records[i].Time.Sub(s.Records[i-1].Time); d != time.Hour {
			t.Errorf("step %d = %v, want 1h", i, d)
		}
	}
	var b strings.Builder
	b.WriteString("time,temp_c,rh_pct\n")
	start := time.Date(2023, 1, 1, 0, 0, 0, 0, berlin)
	n := 0
	for t := start; t.Year() == 2023; t = t.Add(time.Hour) {
		if t.Month() == 10 && t.Day() == 29 && t.Hour() == 2 {
			continue // the repeated hour is tested above
		}
		b.WriteString(t.Format("2006-01-02 15:04") + ",5,80\n")
		n++
	}
	s, err = readAllString(ReaderConfig{Location: berlin}, b.String())
	if err != nil {
		t.Fatal(err)
	}
	if len(s.Records) != n {
		t.Fatalf("%d records, want %d", len(s.Records), n)
	}
}

func TestReaderStreaming(t *testing.T) {
	r := NewReader(strings.NewReader("time,temp_c,rh_pct\n2024-06-01T12:00Z,21,55\n2024-06-01T13:00Z,22,50\n"))
	n := 0
	for {
		_, err := r.Read()
		if err == io.EOF {
			break
		}
		if err != nil {
			t.Fatal(err)
		}
		n++
	}
	if n != 2 || r.Stats().Records != 2 || r.Stats().Lines != 3 || !r.ColumnSet().Has(ColTime) {
		t.Errorf("n=%d stats=%+v", n, r.Stats())
	}
}

func TestParseNum(t *testing.T) {
	tests := []struct {
		in       string
		decComma bool
		want     float64
		ok       bool
	}{
		{"0", false, 0, true}, {"-0.05", false, -0.05, true}, {"+12.50", false, 12.5, true},
		{"12,5", true, 12.5, true}, {"12,5", false, 0, false}, {".5", false, 0.5, true},
		{"5.", false, 5, true}, {"1e3", false, 1000, true}, {"1.5E-2", false, 0.015, true},
		{"0.1234567890123456789", false, 0.1234567890123456789, true},
		{"123456789012345678", false, 123456789012345678, true},
		{"", false, 0, false}, {"-", false, 0, false}, {".", false, 0, false}, {"1.2.3", false, 0, false},
		{"1e", false, 0, false}, {"e5", false, 0, false}, {"NaN", false, 0, false}, {"0x10", false, 0, false},
		{"1_000", false, 0, false}, {"1e999", false, 0, false},
	}
	for _, tt := range tests {
		got, ok := parseNum([]byte(tt.in), tt.decComma)
		if ok != tt.ok || (ok && got != tt.want) {
			t.Errorf("parseNum(%q, %v) = %v, %v; want %v, %v", tt.in, tt.decComma, got, ok, tt.want, tt.ok)
		}
	}
}

func TestUnits(t *testing.T) {
	tests := []struct {
		name string
		got  float64
		want float64
	}{
		{"32 °F", Fahrenheit.ToC(32), 0},            // definition of the Fahrenheit scale
		{"212 °F", Fahrenheit.ToC(212), 100},        // definition of the Fahrenheit scale
		{"273.15 K", Kelvin.ToC(273.15), 0},         // SI Brochure 9th ed. 2019, 2.3.1
		{"36 km/h", KilometresPerHour.ToMS(36), 10}, // 1 km/h = 1/3.6 m/s
		{"1 knot", Knots.ToMS(1), 0.514444444444},   // 1 nautical mile = 1852 m, SI Brochure Table 8
	}
	for _, tt := range tests {
		if math.Abs(tt.got-tt.want) > 1e-9 {
			t.Errorf("%s = %v, want %v", tt.name, tt.got, tt.want)
		}
	}
	for _, s := range []string{"c", "°C", "F", "k"} {
		if _, err := ParseTempUnit(s); err != nil {
			t.Errorf("ParseTempUnit(%q): %v", s, err)
		}
	}
	if _, err := ParseTempUnit("R"); err == nil {
		t.Error("ParseTempUnit(R) accepted")
	}
	for _, s := range []string{"ms", "m/s", "kmh", "km/h", "kn", "knots"} {
		if _, err := ParseWindUnit(s); err != nil {
			t.Errorf("ParseWindUnit(%q): %v", s, err)
		}
	}
	if _, err := ParseWindUnit("mph"); err == nil {
		t.Error("ParseWindUnit(mph) accepted")
	}
}
