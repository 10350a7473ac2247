package assess

import (
	"bytes"
	"errors"
	"fmt"
	"io/fs"
	"math"
	"os"
	"path"
	"path/filepath"
	"strings"

	"github.com/BurntSushi/toml"
)

// Project is a project file as written by the user. The TOML keys are a
// contract with users' files: add keys, never rename them.
type Project struct {
	Site        SiteSpec        `toml:"site"`
	Elements    []ElementSpec   `toml:"element"`
	Thresholds  ThresholdSpec   `toml:"thresholds"`
	Scenarios   []ScenarioSpec  `toml:"scenario"`
	Uncertainty UncertaintySpec `toml:"uncertainty"`

	// Path is the project file's path; Dir the folder relative paths
	// resolve against. Set by Load.
	Path string `toml:"-"`
	Dir  string `toml:"-"`
	// Invented marks example data that must be labelled as invented.
	Invented bool `toml:"invented"`

	data []byte // the file as read, for its hash
	fsys fs.FS  // non-nil when the project was loaded from a file system (the embedded examples)
}

// SiteSpec is the [site] table.
type SiteSpec struct {
	Name             string   `toml:"name"`
	LatitudeDeg      *float64 `toml:"latitude_deg"`
	LongitudeDeg     *float64 `toml:"longitude_deg"`
	TimeZone         string   `toml:"time_zone"`
	Terrain          string   `toml:"terrain"`
	TopographyFactor *float64 `toml:"topography_factor"`
	Climate          string   `toml:"climate"`
	// Reading options for records whose layout is not gyprisk's own
	// (the same choices as "gyprisk climate" offers on the command line).
	ClimateColumns  map[string]string `toml:"climate_columns"`
	ClimateTempUnit string            `toml:"climate_temp_unit"`
	ClimateWindUnit string            `toml:"climate_wind_unit"`
	// Albedo of the ground in front of the walls (default 0.2).
	GroundAlbedo *float64 `toml:"ground_albedo"`
}

// ElementSpec is one [[element]] table, or one [[element.variant]] table
// (which carries only the keys it overrides). Pointer fields distinguish
// "not given" from zero.
type ElementSpec struct {
	ID       string `toml:"id"`
	Label    string `toml:"label"`
	Material string `toml:"material"`
	Exposure string `toml:"exposure"`
	Note     string `toml:"note"`

	AzimuthDeg       *float64 `toml:"azimuth_deg"`
	TiltDeg          *float64 `toml:"tilt_deg"`
	HeightM          *float64 `toml:"height_m"`
	ObstructionM     *float64 `toml:"obstruction_m"`
	WallFactor       *float64 `toml:"wall_factor"`
	WallPosition     string   `toml:"wall_position"`
	RunoffHeightM    *float64 `toml:"runoff_height_m"`
	RunoffFraction   *float64 `toml:"runoff_fraction"`
	FlowLengthM      *float64 `toml:"flow_length_m"`
	SolarAbsorptance *float64 `toml:"solar_absorptance"`
	ThicknessMM      *float64 `toml:"thickness_mm"`
	LossLimitMM      *float64 `toml:"loss_limit_mm"`

	// Exterior elements on a heated wall: the wall's thermal
	// transmittance U (ISO 6946) and the room temperature behind it warm
	// the surface on cold nights. 0 (the default) treats the surface as
	// adiabatic behind.
	WallUValue *float64 `toml:"wall_u_value_w_m2k"`

	// Material property overrides.
	BulkDensityKgM3 *float64 `toml:"bulk_density_kg_m3"`
	GypsumFraction  *float64 `toml:"gypsum_fraction"`
	Porosity        *float64 `toml:"porosity"`
	MouldClass      string   `toml:"mould_class"`

	// Water-repellent finish: the fraction of the rain water on the
	// element (deposited and run-off) that runs off without dissolving
	// contact while the finish works, and the years it keeps working.
	RepellentFraction  *float64 `toml:"repellent_fraction"`
	RepellentLifeYears *float64 `toml:"repellent_life_years"`

	// Interior elements: a room record, or the temperature factor with the
	// outdoor record and an indoor humidity class or set point.
	IndoorClimate     string   `toml:"indoor_climate"`
	TemperatureFactor *float64 `toml:"temperature_factor"`
	HumidityClass     *int     `toml:"humidity_class"`
	IndoorTempC       *float64 `toml:"indoor_temp_c"`
	IndoorRHPct       *float64 `toml:"indoor_rh_pct"`

	Variants []ElementSpec `toml:"variant"`
}

// ThresholdSpec is the optional [thresholds] table; a key left out keeps
// its default.
type ThresholdSpec struct {
	LeachingModerateYears     *float64 `toml:"leaching_moderate_years"`
	LeachingHighYears         *float64 `toml:"leaching_high_years"`
	DehydrationModerateHours  *float64 `toml:"dehydration_moderate_hours"`
	DehydrationHighHours      *float64 `toml:"dehydration_high_hours"`
	HotModerateHours          *float64 `toml:"hot_moderate_hours"`
	HotHighHours              *float64 `toml:"hot_high_hours"`
	CondensationModerateHours *float64 `toml:"condensation_moderate_hours"`
	CondensationHighHours     *float64 `toml:"condensation_high_hours"`
	MouldModerateIndex        *float64 `toml:"mould_moderate_index"`
	MouldHighIndex            *float64 `toml:"mould_high_index"`
}

// ScenarioSpec is one [[scenario]] table: a delta-change climate scenario.
type ScenarioSpec struct {
	ID         string   `toml:"id"`
	TempShiftC *float64 `toml:"temp_shift_c"`
	RainFactor *float64 `toml:"rain_factor"`
	RHShiftPct *float64 `toml:"rh_shift_pct"`
	WindFactor *float64 `toml:"wind_factor"`
}

// UncertaintySpec is the optional [uncertainty] table: samples and seed
// for the Monte Carlo run (the command line overrides them).
type UncertaintySpec struct {
	Samples *int    `toml:"samples"`
	Seed    *uint64 `toml:"seed"`
}

// ProjectError is a mistake in a project file, with the position of the
// offending key where it is known.
type ProjectError struct {
	File   string
	Line   int // 0 when unknown
	Column int // of the value, 1-based; 0 when unknown
	Key    string
	Err    error
}

func (e *ProjectError) Error() string {
	var b strings.Builder
	b.WriteString(e.File)
	if e.Line > 0 {
		fmt.Fprintf(&b, ":%d", e.Line)
		if e.Column > 0 {
			fmt.Fprintf(&b, ":%d", e.Column)
		}
	}
	if e.Key != "" {
		fmt.Fprintf(&b, " (%s)", e.Key)
	}
	b.WriteString(": ")
	b.WriteString(e.Err.Error())
	return b.String()
}

func (e *ProjectError) Unwrap() error { return e.Err }

// ErrUnknownKey is wrapped by the error for a key the project file format
// does not have, so a typo never silently becomes a default.
var ErrUnknownKey = errors.New("unknown key")

// Load reads and checks a project file. Unknown keys are an error naming
// the key and its line.
func Load(path string) (*Project, error) {
	data, err := os.ReadFile(path)
	if err != nil {
		return nil, err
	}
	return Parse(path, data)
}

// LoadFS reads and checks a project file from a file system, such as the
// embedded examples; the records it names are read from the same file
// system.
func LoadFS(fsys fs.FS, name string) (*Project, error) {
	data, err := fs.ReadFile(fsys, name)
	if err != nil {
		return nil, err
	}
	p, err := Parse(name, data)
	if err != nil {
		return nil, err
	}
	p.fsys = fsys
	p.Dir = path.Dir(name)
	return p, nil
}

// Parse reads a project file from memory; path is used for messages and
// to resolve relative paths.
func Parse(path string, data []byte) (*Project, error) {
	var p Project
	md, err := toml.Decode(string(data), &p)
	if err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			return nil, &ProjectError{File: path, Line: pe.Position.Line, Err: errors.New(pe.Message)}
		}
		return nil, &ProjectError{File: path, Err: err}
	}
	if und := md.Undecoded(); len(und) > 0 {
		k := und[0]
		return nil, &ProjectError{File: path, Line: keyLine(data, k), Key: k.String(),
			Err: fmt.Errorf("%w %q (check the spelling; see the README for the project file keys)", ErrUnknownKey, k[len(k)-1])}
	}
	p.Path = path
	p.Dir = filepath.Dir(path)
	p.data = data
	if err := p.check(data); err != nil {
		return nil, err
	}
	return &p, nil
}

// keyLine finds the line of the first assignment to the last part of key,
// or of the key's table header, or 0. It serves keys whose table instance
// is not known (TOML's undecoded keys).
func keyLine(data []byte, key toml.Key) int {
	header, col := keyPos(data, key.String(), nil)
	if col > 0 {
		return header
	}
	name := key[len(key)-1]
	for i, l := range bytes.Split(data, []byte("\n")) {
		if _, ok := assignment(strings.TrimSpace(string(l)), name); ok {
			return i + 1
		}
	}
	return header
}

// keyPos finds where dotted key ("element.variant.tilt_deg") is assigned
// in the instance of its table given by idx (the index of each array
// table on the path: element i, variant j of it, scenario k; nil: the
// first instance). It returns the line and the column of the value
// (1-based), the instance's header line if the key is not written there,
// or 0, 0.
func keyPos(data []byte, dotted string, idx []int) (line, col int) {
	parts := strings.Split(dotted, ".")
	table, name := strings.Join(parts[:len(parts)-1], "."), parts[len(parts)-1]
	counts := map[string]int{} // instances of each array table seen so far
	current, header := "", 0
	matches := func() bool {
		if current != table {
			return false
		}
		path := strings.Split(table, ".")
		for d := range path {
			want := 0
			if d < len(idx) {
				want = idx[d]
			}
			if counts[strings.Join(path[:d+1], ".")]-1 != want {
				return false
			}
		}
		return true
	}
	for i, raw := range bytes.Split(data, []byte("\n")) {
		l := strings.TrimSpace(string(raw))
		switch {
		case strings.HasPrefix(l, "[["):
			current = strings.TrimSpace(strings.TrimSuffix(strings.TrimPrefix(l, "[["), "]]"))
			counts[current]++
			for k := range counts { // a new element restarts its variants
				if strings.HasPrefix(k, current+".") {
					delete(counts, k)
				}
			}
			if matches() {
				header = i + 1
			}
			continue
		case strings.HasPrefix(l, "["):
			current = strings.TrimSpace(strings.TrimSuffix(strings.TrimPrefix(l, "["), "]"))
			counts[current] = 1 // a plain table has one instance
			if matches() {
				header = i + 1
			}
			continue
		}
		if !matches() {
			continue
		}
		if off, ok := assignment(l, name); ok {
			lead := len(raw) - len(bytes.TrimLeft(raw, " \t"))
			return i + 1, lead + off + 1
		}
	}
	return header, 0
}

// assignment reports whether the trimmed line l assigns name, and the
// byte offset of the value within l.
func assignment(l, name string) (int, bool) {
	if !strings.HasPrefix(l, name) {
		return 0, false
	}
	rest := l[len(name):]
	trimmed := strings.TrimLeft(rest, " \t")
	if !strings.HasPrefix(trimmed, "=") {
		return 0, false
	}
	after := strings.TrimLeft(trimmed[1:], " \t")
	return len(l) - len(after), true
}

// check validates values that TOML types cannot: ranges, choices and
// required keys.
func (p *Project) check(data []byte) error {
	at := func(idx ...int) func(key, format string, a ...any) error {
		return func(key, format string, a ...any) error {
			line, col := keyPos(data, key, idx)
			return &ProjectError{File: p.Path, Line: line, Column: col, Key: key, Err: fmt.Errorf(format, a...)}
		}
	}
	bad := at()
	s := &p.Site
	if s.LatitudeDeg == nil || s.LongitudeDeg == nil {
		return bad("site.latitude_deg", "missing: latitude_deg and longitude_deg are required (they place the sun)")
	}
	if v := *s.LatitudeDeg; !(v >= -90 && v <= 90) {
		return bad("site.latitude_deg", "value %g outside −90…90", v)
	}
	if v := *s.LongitudeDeg; !(v >= -180 && v <= 180) {
		return bad("site.longitude_deg", "value %g outside −180…180", v)
	}
	if s.TopographyFactor != nil && !(*s.TopographyFactor > 0 && *s.TopographyFactor <= 2) {
		return bad("site.topography_factor", "value %g outside (0, 2]", *s.TopographyFactor)
	}
	if s.GroundAlbedo != nil && !(*s.GroundAlbedo >= 0 && *s.GroundAlbedo <= 1) {
		return bad("site.ground_albedo", "value %g outside 0…1", *s.GroundAlbedo)
	}
	if len(p.Elements) == 0 {
		return bad("element", "the project has no [[element]]")
	}
	seen := map[string]bool{}
	for i := range p.Elements {
		e := &p.Elements[i]
		bad := at(i)
		if e.ID == "" {
			return bad("element.id", "element %d has no id", i+1)
		}
		if seen[e.ID] {
			return bad("element.id", "element id %q used twice", e.ID)
		}
		seen[e.ID] = true
		if err := e.checkValues(bad, "element"); err != nil {
			return err
		}
		vseen := map[string]bool{"base": true}
		for j := range e.Variants {
			v := &e.Variants[j]
			bad := at(i, j)
			if v.ID == "" {
				return bad("element.variant.id", "variant %d of element %q has no id", j+1, e.ID)
			}
			if vseen[v.ID] {
				return bad("element.variant.id", "variant id %q of element %q used twice (\"base\" is the element itself)", v.ID, e.ID)
			}
			vseen[v.ID] = true
			if len(v.Variants) > 0 {
				return bad("element.variant.variant", "variants cannot have variants")
			}
			if err := v.checkValues(bad, "element.variant"); err != nil {
				return err
			}
		}
	}
	sseen := map[string]bool{"present": true}
	for k, sc := range p.Scenarios {
		bad := at(k)
		if sc.ID == "" {
			return bad("scenario.id", "a [[scenario]] has no id")
		}
		if sseen[sc.ID] {
			return bad("scenario.id", "scenario id %q used twice (\"present\" is always assessed)", sc.ID)
		}
		sseen[sc.ID] = true
		if sc.RainFactor != nil && !(*sc.RainFactor >= 0 && *sc.RainFactor <= 5) {
			return bad("scenario.rain_factor", "scenario %q: value %g outside 0…5", sc.ID, *sc.RainFactor)
		}
		if sc.WindFactor != nil && !(*sc.WindFactor >= 0 && *sc.WindFactor <= 3) {
			return bad("scenario.wind_factor", "scenario %q: value %g outside 0…3", sc.ID, *sc.WindFactor)
		}
		if sc.TempShiftC != nil && math.Abs(*sc.TempShiftC) > 15 {
			return bad("scenario.temp_shift_c", "scenario %q: value %g outside −15…15 °C", sc.ID, *sc.TempShiftC)
		}
		if sc.RHShiftPct != nil && math.Abs(*sc.RHShiftPct) > 50 {
			return bad("scenario.rh_shift_pct", "scenario %q: value %g outside −50…50 %%", sc.ID, *sc.RHShiftPct)
		}
	}
	if u := p.Uncertainty.Samples; u != nil && (*u < 0 || *u > 100000) {
		return bad("uncertainty.samples", "value %d outside 0…100000", *u)
	}
	return nil
}

// checkValues checks the ranges of the keys an element or variant gives.
func (e *ElementSpec) checkValues(bad func(key, format string, a ...any) error, table string) error {
	in := func(key string, v *float64, lo, hi float64) error {
		if v != nil && !(*v >= lo && *v <= hi) {
			return bad(table+"."+key, "%q: value %g outside %g…%g", e.ID, *v, lo, hi)
		}
		return nil
	}
	checks := []struct {
		key    string
		v      *float64
		lo, hi float64
	}{
		{"azimuth_deg", e.AzimuthDeg, 0, 360},
		{"tilt_deg", e.TiltDeg, 0, 180},
		{"height_m", e.HeightM, 0, 300},
		{"obstruction_m", e.ObstructionM, 0, 10000},
		{"wall_factor", e.WallFactor, 0, 2},
		{"runoff_height_m", e.RunoffHeightM, 0, 300},
		{"runoff_fraction", e.RunoffFraction, 0, 1},
		{"flow_length_m", e.FlowLengthM, 0.01, 50},
		{"solar_absorptance", e.SolarAbsorptance, 0, 1},
		{"thickness_mm", e.ThicknessMM, 0.1, 1000},
		{"loss_limit_mm", e.LossLimitMM, 0.01, 1000},
		{"bulk_density_kg_m3", e.BulkDensityKgM3, 100, 3000},
		{"gypsum_fraction", e.GypsumFraction, 0.01, 1},
		{"porosity", e.Porosity, 0, 0.95},
		{"repellent_fraction", e.RepellentFraction, 0, 0.99},
		{"repellent_life_years", e.RepellentLifeYears, 0, 200},
		{"temperature_factor", e.TemperatureFactor, 0, 1},
		{"wall_u_value_w_m2k", e.WallUValue, 0, 10},
		{"indoor_temp_c", e.IndoorTempC, -10, 40},
		{"indoor_rh_pct", e.IndoorRHPct, 0, 100},
	}
	for _, c := range checks {
		if err := in(c.key, c.v, c.lo, c.hi); err != nil {
			return err
		}
	}
	if e.HumidityClass != nil && (*e.HumidityClass < 1 || *e.HumidityClass > 5) {
		return bad(table+".humidity_class", "%q: value %d outside 1…5 (ISO 13788 Annex A classes)", e.ID, *e.HumidityClass)
	}
	switch e.Exposure {
	case "", "exterior", "interior":
	default:
		return bad(table+".exposure", "%q: value %q: want \"exterior\" or \"interior\"", e.ID, e.Exposure)
	}
	if e.Material != "" {
		if _, err := LookupMaterial(e.Material); err != nil {
			return bad(table+".material", "%q: %v", e.ID, err)
		}
	}
	return nil
}

// resolvePath makes a project-relative path absolute against the project
// folder.
func (p *Project) resolvePath(rel string) string {
	if rel == "" || filepath.IsAbs(rel) {
		return rel
	}
	return filepath.Join(p.Dir, rel)
}
