package assess

import (
	"fmt"
	"strings"
)

// element is an element or one of its variants with every value resolved:
// the user's keys, then the variant's overrides, then the material's and
// the documented defaults. notes lists each default that was applied.
type element struct {
	id, label, variant, material, exposure string
	description                            string // the project file's note
	mat                                    Material

	azimuthDeg, tiltDeg          float64
	heightM, obstructionM        float64 // obstructionM < 0: none given
	wallFactor                   float64
	wallPosition                 string
	runoffHeightM, flowLengthM   float64
	runoffFrac                   float64 // share of the driving rain on the wall above that runs down
	solarAbsorptance             float64
	thicknessMM, lossLimitMM     float64
	bulkDensityKgM3, gypsumFrac  float64
	porosity                     float64
	mouldClass                   string
	repellentFrac, repellentLife float64
	wallUValue                   float64 // W/(m²·K); 0: adiabatic behind

	indoorClimate     string
	temperatureFactor float64 // 0: not given
	humidityClass     int     // 0: not given
	indoorTempC       float64
	indoorRHPct       float64 // NaN-free: 0 means not given (see hasIndoorRH)
	hasIndoorRH       bool

	notes []string
}

// Defaults that are not material properties. Each says where it comes from.
const (
	// defaultFlowLengthM is the length of surface the water runs over on
	// the element itself: one metre, a typical storey-band or panel depth
	// (common practice, no source). Set flow_length_m per element.
	defaultFlowLengthM = 1.0
	// defaultRepellentLifeYears: water-repellent (hydrophobic) finishes on
	// mineral facades are commonly renewed after 10–15 years (common
	// practice, no source).
	defaultRepellentLifeYears = 10
	// defaultIndoorTempC is the indoor design temperature of ISO 13788:2012
	// Annex A (20 °C, from memory).
	defaultIndoorTempC = 20
)

// resolve merges an element spec and an optional variant into an element.
func resolve(base *ElementSpec, v *ElementSpec) (*element, error) {
	spec := *base
	variant := "base"
	if v != nil {
		variant = v.ID
		spec = mergeSpec(*base, *v)
	}
	e := &element{id: spec.ID, label: spec.Label, variant: variant, description: spec.Note}
	if e.label == "" {
		e.label = spec.ID
	}
	e.exposure = spec.Exposure
	if e.exposure == "" {
		e.exposure = "exterior"
		e.note("exposure not given: taken as exterior")
	}
	if spec.Material == "" {
		return nil, fmt.Errorf("element %q: material missing (one of %s)", spec.ID, strings.Join(MaterialNames(), ", "))
	}
	mat, err := LookupMaterial(spec.Material)
	if err != nil {
		return nil, fmt.Errorf("element %q: %v", spec.ID, err)
	}
	e.mat, e.material = mat, mat.Name

	get := func(p *float64, def float64) float64 {
		if p != nil {
			return *p
		}
		return def
	}
	e.tiltDeg = get(spec.TiltDeg, 90)
	e.azimuthDeg = get(spec.AzimuthDeg, 0)
	e.heightM = get(spec.HeightM, 0)
	e.obstructionM = get(spec.ObstructionM, -1)
	e.runoffHeightM = get(spec.RunoffHeightM, 0)
	e.runoffFrac = get(spec.RunoffFraction, 1)
	e.flowLengthM = get(spec.FlowLengthM, defaultFlowLengthM)
	e.solarAbsorptance = get(spec.SolarAbsorptance, mat.SolarAbsorptance)
	e.bulkDensityKgM3 = get(spec.BulkDensityKgM3, mat.BulkDensityKgM3)
	e.gypsumFrac = get(spec.GypsumFraction, mat.GypsumFraction)
	e.porosity = get(spec.Porosity, mat.Porosity)
	e.mouldClass = mat.MouldClass
	if spec.MouldClass != "" {
		e.mouldClass = spec.MouldClass
	}
	e.repellentFrac = get(spec.RepellentFraction, 0)
	e.repellentLife = get(spec.RepellentLifeYears, defaultRepellentLifeYears)
	e.wallPosition = spec.WallPosition

	e.thicknessMM = get(spec.ThicknessMM, 0)
	e.lossLimitMM = get(spec.LossLimitMM, 0)
	switch {
	case spec.LossLimitMM == nil && spec.ThicknessMM == nil:
		return nil, fmt.Errorf("element %q: give loss_limit_mm (the loss at which repair is due) or thickness_mm", spec.ID)
	case spec.LossLimitMM == nil:
		e.lossLimitMM = e.thicknessMM
		e.note(fmt.Sprintf("loss_limit_mm not given: taken as the whole thickness, %g mm", e.thicknessMM))
	case spec.ThicknessMM != nil && e.lossLimitMM > e.thicknessMM:
		return nil, fmt.Errorf("element %q: loss_limit_mm %g exceeds thickness_mm %g", spec.ID, e.lossLimitMM, e.thicknessMM)
	}

	if e.exposure == "exterior" {
		if spec.AzimuthDeg == nil && e.tiltDeg > 0 && e.tiltDeg < 180 {
			return nil, fmt.Errorf("element %q: azimuth_deg missing (the direction the surface faces, clockwise from north)", spec.ID)
		}
		if spec.HeightM == nil {
			return nil, fmt.Errorf("element %q: height_m missing (height above ground; it sets the ISO 15927-3 roughness coefficient)", spec.ID)
		}
		if spec.IndoorClimate != "" || spec.TemperatureFactor != nil {
			return nil, fmt.Errorf("element %q: indoor_climate and temperature_factor are for interior elements", spec.ID)
		}
		if spec.WallFactor != nil {
			e.wallFactor = *spec.WallFactor
		} else {
			w, err := wallFactorFor(e.wallPosition)
			if err != nil {
				return nil, fmt.Errorf("element %q: %v", spec.ID, err)
			}
			e.wallFactor = w
			if e.wallPosition == "" {
				e.note(fmt.Sprintf("wall_factor not given: %g from the ISO 15927-3 wall factor table (%s)", w, defaultWallPosition))
			}
		}
		if e.obstructionM < 0 {
			e.note("obstruction_m not given: no obstruction within 120 m upwind assumed (obstruction factor 1)")
		}
		e.wallUValue = get(spec.WallUValue, 0)
		e.indoorTempC = get(spec.IndoorTempC, defaultIndoorTempC)
		if e.wallUValue > 0 && spec.IndoorTempC == nil {
			e.note(fmt.Sprintf("indoor_temp_c not given: the room behind the wall taken at %g °C", float64(defaultIndoorTempC)))
		}
	} else {
		e.indoorClimate = spec.IndoorClimate
		e.temperatureFactor = get(spec.TemperatureFactor, 0)
		if spec.HumidityClass != nil {
			e.humidityClass = *spec.HumidityClass
		}
		e.indoorTempC = get(spec.IndoorTempC, defaultIndoorTempC)
		if spec.IndoorRHPct != nil {
			e.indoorRHPct, e.hasIndoorRH = *spec.IndoorRHPct, true
		}
		switch {
		case e.indoorClimate != "":
			if e.humidityClass != 0 || e.hasIndoorRH {
				return nil, fmt.Errorf("element %q: give either indoor_climate (a room record) or humidity_class/indoor_rh_pct, not both", spec.ID)
			}
		case spec.TemperatureFactor == nil:
			return nil, fmt.Errorf("element %q: an interior element needs indoor_climate (a room record) or temperature_factor (f_Rsi) with humidity_class or indoor_rh_pct", spec.ID)
		case e.humidityClass == 0 && !e.hasIndoorRH:
			return nil, fmt.Errorf("element %q: temperature_factor needs humidity_class (1–5, ISO 13788 Annex A) or indoor_rh_pct", spec.ID)
		case e.humidityClass != 0 && e.hasIndoorRH:
			return nil, fmt.Errorf("element %q: give humidity_class or indoor_rh_pct, not both", spec.ID)
		}
		if spec.IndoorTempC == nil && e.indoorClimate == "" {
			e.note(fmt.Sprintf("indoor_temp_c not given: %g °C (ISO 13788 Annex A design value)", float64(defaultIndoorTempC)))
		}
	}
	return e, nil
}

func (e *element) note(s string) { e.notes = append(e.notes, s) }

// mergeSpec returns base with every key the variant gives overriding it.
func mergeSpec(base, v ElementSpec) ElementSpec {
	out := base
	out.Variants = nil
	str := func(dst *string, src string) {
		if src != "" {
			*dst = src
		}
	}
	f := func(dst **float64, src *float64) {
		if src != nil {
			*dst = src
		}
	}
	str(&out.Label, v.Label)
	str(&out.Material, v.Material)
	str(&out.Exposure, v.Exposure)
	str(&out.Note, v.Note)
	str(&out.WallPosition, v.WallPosition)
	str(&out.MouldClass, v.MouldClass)
	str(&out.IndoorClimate, v.IndoorClimate)
	for _, p := range []struct {
		dst **float64
		src *float64
	}{
		{&out.AzimuthDeg, v.AzimuthDeg}, {&out.TiltDeg, v.TiltDeg}, {&out.HeightM, v.HeightM},
		{&out.ObstructionM, v.ObstructionM}, {&out.WallFactor, v.WallFactor}, {&out.RunoffHeightM, v.RunoffHeightM}, {&out.RunoffFraction, v.RunoffFraction},
		{&out.FlowLengthM, v.FlowLengthM}, {&out.SolarAbsorptance, v.SolarAbsorptance}, {&out.ThicknessMM, v.ThicknessMM},
		{&out.LossLimitMM, v.LossLimitMM}, {&out.BulkDensityKgM3, v.BulkDensityKgM3}, {&out.GypsumFraction, v.GypsumFraction},
		{&out.Porosity, v.Porosity}, {&out.RepellentFraction, v.RepellentFraction}, {&out.RepellentLifeYears, v.RepellentLifeYears},
		{&out.TemperatureFactor, v.TemperatureFactor}, {&out.WallUValue, v.WallUValue}, {&out.IndoorTempC, v.IndoorTempC}, {&out.IndoorRHPct, v.IndoorRHPct},
	} {
		f(p.dst, p.src)
	}
	if v.HumidityClass != nil {
		out.HumidityClass = v.HumidityClass
	}
	return out
}
