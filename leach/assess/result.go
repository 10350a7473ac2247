package assess

import "time"

// Output is the whole result of assessing one project: what "gyprisk assess
// --json" writes and what the report package renders. The JSON keys are a
// contract with users' scripts: add keys, never rename them.
type Output struct {
	Tool       Tool            `json:"tool"`
	RunDate    string          `json:"run_date"` // RFC 3339; the only field that differs between identical runs
	Project    string          `json:"project"`  // project file path as given
	Database   string          `json:"database"` // thermodynamic database name and version
	Site       SiteOut         `json:"site"`
	Climate    ClimateOut      `json:"climate"`
	Inputs     []InputFile     `json:"inputs"`
	Options    RunOptions      `json:"options"`
	Thresholds Thresholds      `json:"thresholds"`
	Scenarios  []Scenario      `json:"scenarios"`
	Elements   []ElementResult `json:"elements"`
	Notes      []string        `json:"notes"` // repaired or dropped values, assumptions the run had to make

	// Invented is true when the site and climate are invented example data
	// (the demo, the examples). The report then prints "Invented example
	// data — not a real building" on the cover and on every page.
	Invented bool `json:"invented_example_data"`
}

// Tool names the program that made the output.
type Tool struct {
	Name    string `json:"name"`
	Version string `json:"version"`
}

// SiteOut echoes the site as assessed.
type SiteOut struct {
	Name             string  `json:"name"`
	LatitudeDeg      float64 `json:"latitude_deg"`
	LongitudeDeg     float64 `json:"longitude_deg"`
	TimeZone         string  `json:"time_zone,omitempty"`
	Terrain          string  `json:"terrain"`
	TopographyFactor float64 `json:"topography_factor"`
	Climate          string  `json:"climate"`
}

// ClimateOut describes the outdoor record the run used.
type ClimateOut struct {
	Start          time.Time `json:"start"`
	End            time.Time `json:"end"`
	CoveragePct    float64   `json:"coverage_pct"`
	Records        int       `json:"records"`
	Years          float64   `json:"years"` // hours covered / 8766
	RainMMPerYear  float64   `json:"rain_mm_per_year"`
	TempMeanC      float64   `json:"temp_mean_c"`
	RHMeanPct      float64   `json:"rh_mean_pct"`
	MissingValues  int       `json:"missing_values"`
	ClippedRHCount int       `json:"clipped_rh_values"`
	Gaps           int       `json:"gaps"`
	// Monthly and DrivingRain feed the report's climate charts.
	Monthly     []ClimateMonth   `json:"monthly"`
	DrivingRain []DrivingRainDir `json:"driving_rain_index"`
}

// ClimateMonth is one calendar month of the outdoor record.
type ClimateMonth struct {
	Month     string  `json:"month"` // YYYY-MM
	TempMeanC float64 `json:"temp_mean_c"`
	RHMeanPct float64 `json:"rh_mean_pct"`
	RainMM    float64 `json:"rain_mm"`
	Hours     float64 `json:"hours"`
}

// DrivingRainDir is the ISO 15927-3 annual airfield index for one wall
// orientation.
type DrivingRainDir struct {
	AzimuthDeg    float64 `json:"azimuth_deg"`
	LPerM2PerYear float64 `json:"l_per_m2_per_year"`
}

// InputFile identifies one input exactly, for traceability.
type InputFile struct {
	Role   string    `json:"role"` // "project", "outdoor climate", "indoor climate (element X)"
	Path   string    `json:"path"`
	SHA256 string    `json:"sha256"`
	Start  time.Time `json:"start,omitzero"`
	End    time.Time `json:"end,omitzero"`
}

// RunOptions records the options that shaped the numbers.
type RunOptions struct {
	Samples int    `json:"samples"` // Monte Carlo samples; 0 = deterministic only
	Seed    uint64 `json:"seed"`
}

// Scenario is a delta-change climate scenario applied to the record.
// "present" (all shifts zero, factors one) is always assessed.
type Scenario struct {
	ID         string  `json:"id"`
	TempShiftC float64 `json:"temp_shift_c"`
	RainFactor float64 `json:"rain_factor"`
	RHShiftPct float64 `json:"rh_shift_pct"`
	WindFactor float64 `json:"wind_factor"`
}

// ElementResult is one element × variant × scenario.
type ElementResult struct {
	ID           string          `json:"id"`
	Label        string          `json:"label"`
	Description  string          `json:"description,omitempty"` // free text from the project file, for the report
	Variant      string          `json:"variant"`               // "base" for the element itself
	Scenario     string          `json:"scenario"`              // "present" for the record as is
	Material     string          `json:"material"`
	Exposure     string          `json:"exposure"` // "exterior" | "interior"
	Inputs       ElementInputs   `json:"inputs"`
	Water        WaterOut        `json:"water"`
	Leaching     LeachingOut     `json:"leaching"`
	Dehydration  DehydrationOut  `json:"dehydration"`
	Condensation CondensationOut `json:"condensation"`
	Mould        MouldOut        `json:"mould"`
	Frost        FrostOut        `json:"frost"`
	Ratings      Ratings         `json:"ratings"`
	Findings     []string        `json:"findings"` // plain sentences for a client
	Monthly      []ElementMonth  `json:"monthly"`

	// Daily is a day-by-day trace for the report's charts; the hourly
	// detail goes to the --hourly CSV instead of the JSON.
	Daily []ElementDay `json:"-"`
}

// ElementInputs echoes the resolved inputs of an element (after material
// defaults and variant overrides), so a reader can see what was assumed.
type ElementInputs struct {
	AzimuthDeg          float64 `json:"azimuth_deg"`
	TiltDeg             float64 `json:"tilt_deg"`
	HeightM             float64 `json:"height_m"`
	ObstructionM        float64 `json:"obstruction_m"`
	WallFactor          float64 `json:"wall_factor"`
	RoughnessCoeff      float64 `json:"roughness_coefficient"`
	TopographyFactor    float64 `json:"topography_factor"`
	ObstructionFactor   float64 `json:"obstruction_factor"`
	RunoffHeightM       float64 `json:"runoff_height_m"`
	FlowLengthM         float64 `json:"flow_length_m"`
	RunoffFraction      float64 `json:"runoff_fraction"`
	SolarAbsorptance    float64 `json:"solar_absorptance"`
	ThicknessMM         float64 `json:"thickness_mm"`
	LossLimitMM         float64 `json:"loss_limit_mm"`
	BulkDensityKgM3     float64 `json:"bulk_density_kg_m3"`
	GypsumFraction      float64 `json:"gypsum_fraction"`
	Porosity            float64 `json:"porosity"`
	MouldClass          string  `json:"mould_class"`
	RepellentFraction   float64 `json:"repellent_fraction"`
	RepellentLifeYears  float64 `json:"repellent_life_years"`
	WallUValueWPerM2K   float64 `json:"wall_u_value_w_m2k"`
	HeatCapacityJPerM2K float64 `json:"heat_capacity_j_m2k"` // of the gypsum layer, ρ·c_p·d
	TemperatureFactor   float64 `json:"temperature_factor,omitempty"`
	HumidityClass       int     `json:"humidity_class,omitempty"`
	IndoorClimate       string  `json:"indoor_climate,omitempty"`
}

// WaterOut is the water that reaches and runs over the surface.
type WaterOut struct {
	DepositedLM2PerYear  float64 `json:"deposited_l_m2_per_year"`
	RunoffInLM2PerYear   float64 `json:"runoff_in_l_m2_per_year"`
	CondensateLM2PerYear float64 `json:"condensate_l_m2_per_year"`
	WetHoursPerYear      float64 `json:"wet_hours_per_year"`
}

// LeachingOut is the dissolution loss. YearsToLimit is nil (JSON null)
// when the surface does not recede at all.
type LeachingOut struct {
	DissolvedGM2PerYear       float64  `json:"dissolved_g_m2_per_year"`
	RecessionMMPerYear        float64  `json:"recession_mm_per_year"`
	YearsToLimit              *float64 `json:"years_to_limit"`
	SaturationBoundGM2PerYear float64  `json:"saturation_bound_g_m2_per_year"` // water × solubility: the hard ceiling
	MeanSaturationFraction    float64  `json:"mean_saturation_fraction"`

	// Uncertainty bands (present when --samples > 0).
	RecessionMMPerYearP10 *float64      `json:"recession_mm_per_year_p10,omitempty"`
	RecessionMMPerYearP50 *float64      `json:"recession_mm_per_year_p50,omitempty"`
	RecessionMMPerYearP90 *float64      `json:"recession_mm_per_year_p90,omitempty"`
	YearsToLimitP10       *float64      `json:"years_to_limit_p10,omitempty"`
	YearsToLimitP50       *float64      `json:"years_to_limit_p50,omitempty"`
	YearsToLimitP90       *float64      `json:"years_to_limit_p90,omitempty"`
	Sensitivity           []Sensitivity `json:"sensitivity,omitempty"`
}

// Sensitivity ranks one sampled input by how much it moves the recession.
type Sensitivity struct {
	Input string `json:"input"`
	// RankCorrelation is Spearman's rank correlation between the input and
	// the recession over the samples.
	RankCorrelation float64 `json:"rank_correlation"`
}

// DehydrationOut counts the hours heat and dry air make gypsum unstable.
type DehydrationOut struct {
	UnstableHoursPerYear          float64 `json:"unstable_hours_per_year"`           // ΔG(gypsum→bassanite) < 0
	AnhydriteFavouredHoursPerYear float64 `json:"anhydrite_favoured_hours_per_year"` // kinetically hindered
	MaxSurfaceTempC               float64 `json:"max_surface_temp_c"`
	HoursAbove52CPerYear          float64 `json:"hours_above_52c_per_year"`
	MinDeltaGJPerMol              float64 `json:"min_delta_g_j_per_mol"`
}

// CondensationOut counts surface condensation.
type CondensationOut struct {
	HoursPerYear          float64 `json:"hours_per_year"`
	CondensateKgM2PerYear float64 `json:"condensate_kg_m2_per_year"`
}

// MouldOut is the VTT mould index and the ISO 13788 monthly criterion.
type MouldOut struct {
	IndexMax            float64  `json:"index_max"`
	MonthsOver80Pct     int      `json:"months_over_80pct"`
	MonthsOver80PctList []string `json:"months_over_80pct_list"`
	Class               string   `json:"class"`
}

// FrostOut counts freeze–thaw cycles while the surface is wet.
type FrostOut struct {
	WetFreezeThawCyclesPerYear float64 `json:"wet_freeze_thaw_cycles_per_year"`
}

// Ratings are "low", "moderate" or "high".
type Ratings struct {
	Leaching     string `json:"leaching"`
	Dehydration  string `json:"dehydration"`
	Condensation string `json:"condensation"`
	Mould        string `json:"mould"`
}

// ElementMonth is one calendar month of an element's results.
type ElementMonth struct {
	Month            string  `json:"month"` // YYYY-MM
	DepositedLM2     float64 `json:"deposited_l_m2"`
	RunoffInLM2      float64 `json:"runoff_in_l_m2"`
	DissolvedGM2     float64 `json:"dissolved_g_m2"`
	SurfaceTempMeanC float64 `json:"surface_temp_mean_c"`
	SurfaceTempMaxC  float64 `json:"surface_temp_max_c"`
	SurfaceRHMeanPct float64 `json:"surface_rh_mean_pct"`
	// SurfaceRHISO13788Pct is the month's surface RH as ISO 13788 forms
	// it, from the monthly mean vapour pressure and surface temperature.
	SurfaceRHISO13788Pct float64 `json:"surface_rh_iso13788_pct"`
	MouldIndexMax        float64 `json:"mould_index_max"`
}

// ElementDay is one day of an element's trace (for charts).
type ElementDay struct {
	Date             time.Time // midnight UTC that starts the day
	SurfaceTempMaxC  float64
	SurfaceTempMeanC float64
	SurfaceRHMinPct  float64 // lowest surface RH in the day
	SurfaceRHMeanPct float64
	// EquilibriumRHPct is the gypsum–bassanite equilibrium RH at the day's
	// maximum surface temperature: below it gypsum is unstable.
	EquilibriumRHPct float64
	CumLossMM        float64 // cumulative recession since the record start
	CumLossMMP10     float64 // band (0 when no samples)
	CumLossMMP90     float64
	MouldIndex       float64 // at the end of the day
	WaterLM2         float64 // deposited + runoff in the day
}
