package main

import (
	"bytes"
	"encoding/json"
	"errors"
	"flag"
	"io"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/gyprisk/gyprisk/climate"
)

// The -update flag regenerates golden files. Another test file of this
// package may define it too, so it is registered only if absent.
func init() {
	if flag.Lookup("update") == nil {
		flag.Bool("update", false, "rewrite golden files under testdata/")
	}
}

func updating() bool {
	f := flag.Lookup("update")
	return f != nil && f.Value.String() == "true"
}

func runCmd(args ...string) (stdout, stderr string, code int) {
	var o, e bytes.Buffer
	err := run(args, &o, &e)
	code = exitCode(err, &e)
	return o.String(), e.String(), code
}

func TestClimateGolden(t *testing.T) {
	tests := []struct {
		golden string
		args   []string
	}{
		{"site.golden", []string{"climate", "testdata/climate/site.csv"}},
		{"foreign.golden", []string{"climate", "testdata/climate/foreign.txt", "--columns", "time=Datum,temp_c=T_Luft,rh_pct=rF,rain_mm=Niederschlag,wind_ms=Wind",
			"--temp-unit", "F", "--wind-unit", "kmh", "--tz", "Europe/Vienna"}},
	}
	for _, tt := range tests {
		t.Run(tt.golden, func(t *testing.T) {
			out, errOut, code := runCmd(tt.args...)
			if code != 0 {
				t.Fatalf("exit %d: %s", code, errOut)
			}
			path := filepath.Join("testdata", "climate", tt.golden)
			if updating() {
				if err := os.WriteFile(path, []byte(out), 0o644); err != nil {
					t.Fatal(err)
				}
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (run go test -update to create it)", err)
			}
			if out != string(want) {
				t.Errorf("output differs from %s (go test -update regenerates it; read the diff):\n%s", path, out)
			}
		})
	}
}

func TestClimateJSON(t *testing.T) {
	out, errOut, code := runCmd("climate", "testdata/climate/site.csv", "--json")
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errOut)
	}
	var m map[string]json.RawMessage
	if err := json.Unmarshal([]byte(out), &m); err != nil {
		t.Fatal(err)
	}
	for _, k := range []string{"records", "start", "end", "coverage_pct", "gaps", "means", "rain_mm_per_year", "monthly", "driving_rain_index"} {
		if _, ok := m[k]; !ok {
			t.Errorf("JSON lacks %q", k)
		}
	}
	var sum climate.Summary
	if err := json.Unmarshal([]byte(out), &sum); err != nil {
		t.Fatal(err)
	}
	// 72 hours written, hour 30 left out: 71 records, one 1-hour gap.
	if sum.Records != 71 || len(sum.Gaps) != 1 || sum.Gaps[0].Hours != 1 || len(sum.DrivingRain) != 12 {
		t.Errorf("records %d gaps %+v rows %d", sum.Records, sum.Gaps, len(sum.DrivingRain))
	}
	if math.Abs(float64(sum.CoveragePct)-100*71.0/72) > 1e-3 {
		t.Errorf("coverage %v, want %v", sum.CoveragePct, 100*71.0/72)
	}
}

func TestClimateErrors(t *testing.T) {
	tests := []struct {
		name  string
		args  []string
		code  int
		inErr string
	}{
		{"bad data", []string{"climate", "testdata/climate/broken.csv"}, 1,
			`testdata/climate/broken.csv:4:3 (rh_pct): value "107.5": relative humidity above 103 %`},
		{"no such file", []string{"climate", "testdata/climate/nothing.csv"}, 1, "no such file"},
		{"no file", []string{"climate"}, 2, "want one FILE"},
		{"bad temp unit", []string{"climate", "x.csv", "--temp-unit", "R"}, 2, "--temp-unit"},
		{"bad wind unit", []string{"climate", "x.csv", "--wind-unit", "mph"}, 2, "--wind-unit"},
		{"bad zone", []string{"climate", "x.csv", "--tz", "Mars/Olympus"}, 2, "IANA zone"},
		{"bad delimiter", []string{"climate", "x.csv", "--delimiter", "|"}, 2, "--delimiter"},
		{"bad mapping", []string{"climate", "x.csv", "--columns", "pressure=p"}, 2, "unknown column"},
		{"malformed mapping", []string{"climate", "x.csv", "--columns", "temp_c"}, 2, "name=Header"},
		{"unknown flag", []string{"climate", "x.csv", "--frobnicate"}, 2, "unknown flag"},
		{"local stamps without --tz", []string{"climate", "testdata/climate/foreign.txt", "--columns", "time=Datum,temp_c=T_Luft,rh_pct=rF"}, 1, "--tz"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, errOut, code := runCmd(tt.args...)
			if code != tt.code || !strings.Contains(errOut, tt.inErr) {
				t.Errorf("exit %d, stderr %q; want exit %d and %q", code, errOut, tt.code, tt.inErr)
			}
		})
	}
	// The data error reaches run's caller as a *climate.ParseError.
	err := run([]string{"climate", "testdata/climate/broken.csv"}, io.Discard, io.Discard)
	var pe *climate.ParseError
	if !errors.As(err, &pe) || !errors.Is(err, climate.ErrRange) {
		t.Errorf("err = %v (%T), want a *climate.ParseError wrapping ErrRange", err, err)
	}
}

func TestClimateHelp(t *testing.T) {
	_, errOut, code := runCmd("climate", "--help")
	if code != 0 || !strings.Contains(errOut, "Example:") || !strings.Contains(errOut, "--tz") {
		t.Errorf("exit %d, help %q", code, errOut)
	}
}
