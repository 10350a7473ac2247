package main

import (
	"encoding/json"
	"fmt"
	"io"
	"math"
	"strings"
	"time"
	_ "time/tzdata" // --tz must work on machines without a zoneinfo database

	"github.com/gyprisk/gyprisk/climate"
	"github.com/spf13/pflag"
)

func init() {
	register(command{
		name:    "climate",
		summary: "read, check and summarise a climate record",
		run:     runClimate,
	})
}

// climateOptions are the options of "gyprisk climate".
type climateOptions struct {
	JSON      bool
	Columns   string
	TempUnit  string
	WindUnit  string
	TZ        string
	Delimiter string
}

// AddFlags registers the options on fs.
func (o *climateOptions) AddFlags(fs *pflag.FlagSet) {
	fs.BoolVar(&o.JSON, "json", false, "write the summary as JSON to stdout")
	fs.StringVar(&o.Columns, "columns", "", "map header names, e.g. time=Date,temp_c=T_air,rh_pct=RH")
	fs.StringVar(&o.TempUnit, "temp-unit", "C", "temperature unit in the file: C, F or K")
	fs.StringVar(&o.WindUnit, "wind-unit", "ms", "wind speed unit in the file: ms, kmh or kn")
	fs.StringVar(&o.TZ, "tz", "", "IANA zone of stamps written without offset, e.g. Europe/Vienna")
	fs.StringVar(&o.Delimiter, "delimiter", "", "field delimiter: comma, semicolon or tab (default: detect)")
}

const climateDescription = `
Reads a climate record (hourly weather or room-logger data), checks every
value and prints its period, coverage, gaps, means, a monthly table, rain
per year and the annual airfield driving rain index (ISO 15927-3, clause 3)
for walls facing 0°, 30°, ... 330°.

The file has a header row and one row per interval. Columns, any order,
names case-insensitive: time (RFC 3339; the stamp marks the END of the
interval), temp_c, rh_pct (required), rain_mm, wind_ms, wind_dir_deg,
solar_wm2 (optional). Empty cells are missing values. Lines starting with
'#' are comments. A bad value stops the run with its file, line, column and
reason (exit status 1).`

const climateExample = `  gyprisk climate site.csv
  gyprisk climate logger.txt --columns time=Date,temp_c=T_air,rh_pct=RH --tz Europe/Vienna --json`

func runClimate(args []string, stdout, stderr io.Writer) error {
	var o climateOptions
	fs := newFlagSet("climate", "climate FILE [options]", climateDescription, climateExample, stderr)
	o.AddFlags(fs)
	if err := parseFlags(fs, args); err != nil {
		return err
	}
	if fs.NArg() != 1 {
		return usagef("climate: want one FILE, got %d arguments", fs.NArg())
	}
	cfg, err := o.config()
	if err != nil {
		return err
	}
	s, err := climate.ReadFile(fs.Arg(0), cfg)
	if err != nil {
		return err
	}
	sum, err := climate.Summarise(s)
	if err != nil {
		return err
	}
	if o.JSON {
		enc := json.NewEncoder(stdout)
		enc.SetIndent("", "  ")
		return enc.Encode(sum)
	}
	return writeClimateText(stdout, sum, cfg)
}

// config turns the options into a reader configuration (usage errors exit 2).
func (o *climateOptions) config() (climate.ReaderConfig, error) {
	var cfg climate.ReaderConfig
	var err error
	if cfg.TempUnit, err = climate.ParseTempUnit(o.TempUnit); err != nil {
		return cfg, usagef("climate: --temp-unit: %v", err)
	}
	if cfg.WindUnit, err = climate.ParseWindUnit(o.WindUnit); err != nil {
		return cfg, usagef("climate: --wind-unit: %v", err)
	}
	if o.TZ != "" {
		if cfg.Location, err = time.LoadLocation(o.TZ); err != nil {
			return cfg, usagef("climate: --tz %q: not a known IANA zone name (like Europe/Vienna or UTC)", o.TZ)
		}
	}
	switch strings.ToLower(o.Delimiter) {
	case "":
	case ",", "comma":
		cfg.Comma = ','
	case ";", "semicolon":
		cfg.Comma = ';'
	case "\t", `\t`, "tab":
		cfg.Comma = '\t'
	default:
		return cfg, usagef("climate: --delimiter %q: want comma, semicolon or tab", o.Delimiter)
	}
	if o.Columns != "" {
		cfg.Columns = map[string]string{}
		for _, kv := range strings.Split(o.Columns, ",") {
			k, v, ok := strings.Cut(kv, "=")
			k, v = strings.ToLower(strings.TrimSpace(k)), strings.TrimSpace(v)
			if !ok || k == "" || v == "" {
				return cfg, usagef("climate: --columns: %q is not name=Header", kv)
			}
			if !knownColumn(k) {
				return cfg, usagef("climate: --columns: unknown column %q (known: time, temp_c, rh_pct, rain_mm, wind_ms, wind_dir_deg, solar_wm2)", k)
			}
			if _, dup := cfg.Columns[k]; dup {
				return cfg, usagef("climate: --columns: %s given twice", k)
			}
			cfg.Columns[k] = v
		}
	}
	return cfg, nil
}

func knownColumn(name string) bool {
	for c := climate.ColTime; c <= climate.ColSolar; c++ {
		if c.String() == name {
			return true
		}
	}
	return false
}

// fmtF formats a value with prec decimals, "-" for a missing one.
func fmtF(v climate.Float, prec int) string {
	if math.IsNaN(float64(v)) {
		return "-"
	}
	return fmt.Sprintf("%.*f", prec, float64(v))
}

func writeClimateText(w io.Writer, s *climate.Summary, cfg climate.ReaderConfig) error {
	var b strings.Builder
	const stamp = "2006-01-02 15:04 MST"
	loc := cfg.Location
	if loc == nil {
		loc = time.UTC
	}
	fmt.Fprintf(&b, "Climate record %s\n\n", s.Name)
	row := func(k, v string) { fmt.Fprintf(&b, "  %-18s %s\n", k, v) }
	row("period", s.Start.In(loc).Format(stamp)+" to "+s.End.In(loc).Format(stamp))
	row("records", fmt.Sprintf("%d, median interval %g min", s.Records, s.MedianIntervalMin))
	row("coverage", fmt.Sprintf("%s %% of the period (%s h, %s years)", fmtF(s.CoveragePct, 1), fmtF(s.HoursCovered, 0), fmtF(s.Years, 2)))
	row("columns", strings.Join(s.Columns, ", "))
	if len(s.IgnoredColumns) > 0 {
		row("not used", strings.Join(s.IgnoredColumns, ", "))
	}
	var miss []string
	for _, c := range s.Columns {
		if n := s.Missing[c]; n > 0 {
			miss = append(miss, fmt.Sprintf("%s %d", c, n))
		}
	}
	if len(miss) == 0 {
		miss = []string{"none"}
	}
	row("missing values", strings.Join(miss, ", "))
	var clip []string
	for _, c := range s.Columns {
		if n := s.Clipped[c]; n > 0 {
			switch c {
			case "rh_pct":
				clip = append(clip, fmt.Sprintf("rh_pct %d (100-103 %% set to 100 %%)", n))
			case "solar_wm2":
				clip = append(clip, fmt.Sprintf("solar_wm2 %d (small negative set to 0)", n))
			}
		}
	}
	if len(clip) > 0 {
		row("clipped values", strings.Join(clip, ", "))
	}
	row("mean temperature", fmtF(s.Means.TempC, 1)+" °C")
	row("mean RH", fmtF(s.Means.RHPct, 1)+" %")
	row("rain per year", fmtF(s.RainMMPerYear, 0)+" mm")

	fmt.Fprintf(&b, "\nGaps (no record for longer than %g x the median interval): %d\n", climate.DefaultGapFactor, len(s.Gaps))
	const maxGaps = 20
	for i, g := range s.Gaps {
		if i == maxGaps {
			fmt.Fprintf(&b, "  ... and %d more (see --json)\n", len(s.Gaps)-maxGaps)
			break
		}
		fmt.Fprintf(&b, "  %s to %s  %8.1f h\n", g.From.In(loc).Format(stamp), g.To.In(loc).Format(stamp), g.Hours)
	}

	fmt.Fprintf(&b, "\nMonthly\n  %-7s  %9s  %7s  %8s  %7s\n", "month", "temp °C", "RH %", "rain mm", "hours")
	for _, m := range s.Monthly {
		fmt.Fprintf(&b, "  %-7s  %9s  %7s  %8s  %7.0f\n", m.Month, fmtF(m.TempMeanC, 1), fmtF(m.RHMeanPct, 1), fmtF(m.RainMM, 1), m.Hours)
	}

	fmt.Fprintf(&b, "\nDriving rain on a wall facing each direction (ISO 15927-3 clause 3, airfield index)\n")
	if s.DrivingRain == nil {
		fmt.Fprintf(&b, "  not available: %s\n", s.DrivingRainNote)
	} else {
		spell := map[float64]climate.SpellRow{}
		for _, r := range s.SpellIndex {
			spell[r.AzimuthDeg] = r
		}
		if s.SpellIndex != nil {
			fmt.Fprintf(&b, "  %-8s  %10s  %16s\n", "facing", "L/m²/year", "3-year spell L/m²")
		} else {
			fmt.Fprintf(&b, "  %-8s  %10s\n", "facing", "L/m²/year")
		}
		for _, r := range s.DrivingRain {
			name := fmt.Sprintf("%3.0f° %s", r.AzimuthDeg, compass(r.AzimuthDeg))
			if sp, ok := spell[r.AzimuthDeg]; ok {
				fmt.Fprintf(&b, "  %-8s  %10s  %16s\n", name, fmtF(r.LPerM2PerYear, 1), fmtF(sp.LPerM2, 1))
			} else {
				fmt.Fprintf(&b, "  %-8s  %10s\n", name, fmtF(r.LPerM2PerYear, 1))
			}
		}
		if s.DrivingRainNote != "" {
			fmt.Fprintf(&b, "  note: %s\n", s.DrivingRainNote)
		}
		if s.SpellIndex == nil && s.SpellIndexNote != "" {
			fmt.Fprintf(&b, "  spell index not given: %s\n", s.SpellIndexNote)
		} else if s.SpellIndexNote != "" {
			fmt.Fprintf(&b, "  note: %s\n", s.SpellIndexNote)
		}
		fmt.Fprintf(&b, "  These are airfield values: the wall index also needs the terrain, topography,\n"+
			"  obstruction and wall factors of ISO 15927-3 clause 5.\n")
	}
	_, err := io.WriteString(w, b.String())
	return err
}

// compass names an azimuth to the nearest of 16 points.
func compass(deg float64) string {
	pts := [...]string{"N", "NNE", "NE", "ENE", "E", "ESE", "SE", "SSE", "S", "SSW", "SW", "WSW", "W", "WNW", "NW", "NNW"}
	i := int(math.Mod(math.Round(deg/22.5), 16))
	if i < 0 {
		i += 16
	}
	return pts[i]
}
