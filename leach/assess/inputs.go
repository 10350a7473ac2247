package assess

import (
	"bytes"
	"crypto/sha256"
	"encoding/hex"
	"fmt"
	"io/fs"
	"os"
	"path"
	"path/filepath"
	"strings"
	"time"

	"github.com/gyprisk/gyprisk/climate"
)

// record is a climate record read for the assessment, with what the report
// needs to trace it.
type record struct {
	raw    *climate.Series // as read
	hourly *climate.Series // aggregated to hours (the same as raw when hourly)
	input  InputFile
}

// readFile reads a project-relative file from the project's file system
// (the embedded examples) or from disk.
func (p *Project) readFile(rel string) ([]byte, string, error) {
	if p.fsys != nil {
		name := path.Join(p.Dir, filepath.ToSlash(rel))
		b, err := fs.ReadFile(p.fsys, name)
		return b, name, err
	}
	name := p.resolvePath(rel)
	b, err := os.ReadFile(name)
	return b, name, err
}

// loadRecord reads and checks one climate record, hashing it for the
// report's traceability table. The hash runs beside the parse.
func (p *Project) loadRecord(rel, role string) (*record, error) {
	data, name, err := p.readFile(rel)
	if err != nil {
		return nil, fmt.Errorf("%s: %w", role, err)
	}
	sum := make(chan string, 1)
	go func() { sum <- hashBytes(data) }() // beside the parse

	cfg := climate.ReaderConfig{FileName: name}
	if role == roleOutdoor {
		if err := p.Site.readerConfig(&cfg); err != nil {
			<-sum
			return nil, err
		}
	}
	if p.Site.TimeZone != "" {
		loc, err := time.LoadLocation(p.Site.TimeZone)
		if err != nil {
			<-sum
			return nil, &ProjectError{File: p.Path, Key: "site.time_zone", Err: fmt.Errorf("value %q: %v", p.Site.TimeZone, err)}
		}
		cfg.Location = loc
	}
	r := climate.NewReader(bytes.NewReader(data))
	r.ReaderConfig = cfg
	raw, err := r.ReadAll()
	h := <-sum
	if err != nil {
		return nil, err
	}
	raw.Name = filepath.Base(name)
	if len(raw.Records) < 2 {
		return nil, fmt.Errorf("%s: %d records; the assessment needs at least two", name, len(raw.Records))
	}
	hourly, err := raw.Hourly()
	if err != nil {
		return nil, fmt.Errorf("%s: %w", name, err)
	}
	return &record{
		raw:    raw,
		hourly: hourly,
		input: InputFile{Role: role, Path: displayPath(p, rel), SHA256: h,
			Start: raw.Start(), End: raw.End()},
	}, nil
}

const roleOutdoor = "outdoor climate"

// readerConfig applies the [site] options for foreign record layouts.
func (s *SiteSpec) readerConfig(cfg *climate.ReaderConfig) error {
	cfg.Columns = s.ClimateColumns
	if s.ClimateTempUnit != "" {
		u, err := climate.ParseTempUnit(s.ClimateTempUnit)
		if err != nil {
			return fmt.Errorf("site.climate_temp_unit: %w", err)
		}
		cfg.TempUnit = u
	}
	if s.ClimateWindUnit != "" {
		u, err := climate.ParseWindUnit(s.ClimateWindUnit)
		if err != nil {
			return fmt.Errorf("site.climate_wind_unit: %w", err)
		}
		cfg.WindUnit = u
	}
	return nil
}

// displayPath is the path as the user wrote it, relative to the project.
func displayPath(p *Project, rel string) string {
	if p.fsys != nil {
		return path.Join(p.Dir, filepath.ToSlash(rel))
	}
	return filepath.ToSlash(p.resolvePath(rel))
}

// hashBytes returns the hex SHA-256 of b.
func hashBytes(b []byte) string {
	h := sha256.Sum256(b)
	return hex.EncodeToString(h[:])
}

// recordNotes lists what the reader repaired or found missing.
func recordNotes(r *record) []string {
	var out []string
	st := r.raw.Stats
	name := r.raw.Name
	for c := climate.ColTemp; c <= climate.ColSolar; c++ {
		if n := st.Missing[c]; n > 0 {
			out = append(out, fmt.Sprintf("%s: %d empty %s value(s) treated as missing", name, n, c))
		}
		if n := st.Clipped[c]; n > 0 {
			out = append(out, fmt.Sprintf("%s: %d %s value(s) clipped to the physical bound", name, n, c))
		}
	}
	if gaps := r.raw.Gaps(climate.DefaultGapFactor); len(gaps) > 0 {
		var hours float64
		for _, g := range gaps {
			hours += g.Hours
		}
		out = append(out, fmt.Sprintf("%s: %d gap(s) in time, %.0f hours in all, left out of every total (per-year figures divide by the hours covered)", name, len(gaps), hours))
	}
	if len(r.hourly.Records) != len(r.raw.Records) {
		out = append(out, fmt.Sprintf("%s: %d sub-hourly records aggregated to %d hours", name, len(r.raw.Records), len(r.hourly.Records)))
	}
	if len(st.Ignored) > 0 {
		out = append(out, fmt.Sprintf("%s: columns not used: %s", name, strings.Join(st.Ignored, ", ")))
	}
	return out
}
