package examples

import (
	"bufio"
	"io/fs"
	"strings"
	"testing"
)

// The embedded tree holds the climate records the demo and the interior
// example need, each labelled as invented and with the expected header.
func TestFSHoldsClimateRecords(t *testing.T) {
	for _, tc := range []struct {
		path, header string
	}{
		{"demo/climate-outdoor.csv", "time,temp_c,rh_pct,rain_mm,wind_ms,wind_dir_deg,solar_wm2"},
		{"demo/climate-bathroom.csv", "time,temp_c,rh_pct"},
		{"basement/climate-basement.csv", "time,temp_c,rh_pct"},
		{"basement/logger-export-sample.csv", "Datum;Temperatur;rF"},
	} {
		f, err := FS.Open(tc.path)
		if err != nil {
			t.Errorf("%s: %v", tc.path, err)
			continue
		}
		sc := bufio.NewScanner(f)
		first, header := "", ""
		for sc.Scan() {
			l := sc.Text()
			if first == "" {
				first = l
			}
			if !strings.HasPrefix(l, "#") {
				header = l
				break
			}
		}
		f.Close()
		if !strings.HasPrefix(first, "# INVENTED DATA") {
			t.Errorf("%s: first line %q does not label the data as invented", tc.path, first)
		}
		if header != tc.header {
			t.Errorf("%s: header %q, want %q", tc.path, header, tc.header)
		}
	}
}

// The generator is not part of the embedded tree.
func TestFSLeavesOutGenerator(t *testing.T) {
	err := fs.WalkDir(FS, ".", func(path string, d fs.DirEntry, err error) error {
		if err != nil {
			return err
		}
		if strings.HasPrefix(path, "generate") || strings.HasSuffix(path, ".go") {
			t.Errorf("embedded %s", path)
		}
		return nil
	})
	if err != nil {
		t.Fatal(err)
	}
}
