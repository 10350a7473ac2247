package assess

import (
	"fmt"
	"sort"
	"strings"
)

// Material holds the properties the assessment needs for one kind of
// gypsum finish. Any of them can be overridden per element.
type Material struct {
	Name string
	// BulkDensityKgM3 is the dry bulk density of the set material, kg/m³.
	BulkDensityKgM3 float64
	// GypsumFraction is the mass fraction of CaSO4·2H2O in the set
	// material, 0–1: the part of the mass that water can dissolve.
	GypsumFraction float64
	// Porosity is the open porosity, 0–1.
	Porosity float64
	// MouldClass is the sensitivity class of the VTT mould model.
	MouldClass string
	// SolarAbsorptance is the default short-wave absorptance of the
	// finished surface, 0–1.
	SolarAbsorptance float64
	// Source says where the values come from.
	Source string
}

// materials is the built-in table. Values are typical mid-range values for
// the material as built; a surveyor with a sample or a product sheet should
// override them. Each row names where its values come from.
var materials = map[string]Material{
	"gypsum-plaster": {
		Name: "gypsum-plaster", BulkDensityKgM3: 1100, GypsumFraction: 0.92, Porosity: 0.50,
		MouldClass: "medium-resistant", SolarAbsorptance: 0.35,
		Source: "density: EN 13279-1 gypsum building plasters, typical set densities 900–1300 kg/m³ (from memory); " +
			"gypsum fraction and porosity: set plaster of water/plaster ratio 0.6–0.8 (from memory); " +
			"mould class: mineral plaster medium resistant (Ojanen et al. 2010); absorptance: light render (from memory)",
	},
	"gypsum-lime-mortar": {
		Name: "gypsum-lime-mortar", BulkDensityKgM3: 1550, GypsumFraction: 0.45, Porosity: 0.35,
		MouldClass: "medium-resistant", SolarAbsorptance: 0.50,
		Source: "historic gypsum–lime mortars with 30–60 % gypsum binder and sand (from memory); " +
			"mould class: mineral mortar medium resistant (Ojanen et al. 2010); absorptance: medium-coloured render (from memory)",
	},
	"gypsum-stucco": {
		Name: "gypsum-stucco", BulkDensityKgM3: 1250, GypsumFraction: 0.95, Porosity: 0.42,
		MouldClass: "medium-resistant", SolarAbsorptance: 0.30,
		Source: "fine gypsum stucco and modelling plaster of low water/plaster ratio (from memory); " +
			"mould class medium resistant (Ojanen et al. 2010); absorptance: pale finish (from memory)",
	},
	"gypsum-board": {
		Name: "gypsum-board", BulkDensityKgM3: 700, GypsumFraction: 0.90, Porosity: 0.60,
		MouldClass: "sensitive", SolarAbsorptance: 0.30,
		Source: "EN 520 gypsum plasterboard, typical 650–800 kg/m³ (from memory); " +
			"mould class: paper-faced gypsum board sensitive (Ojanen et al. 2010); absorptance: white paint (from memory)",
	},
	"anhydrite-screed": {
		Name: "anhydrite-screed", BulkDensityKgM3: 2050, GypsumFraction: 0.30, Porosity: 0.15,
		MouldClass: "resistant", SolarAbsorptance: 0.60,
		Source: "EN 13454-1 calcium sulfate binders; screeds of binder:sand ≈ 1:2.5, 1900–2200 kg/m³ (from memory); " +
			"mould class resistant (mineral, no organic additives; from memory); absorptance: grey screed (from memory)",
	},
}

// LookupMaterial returns a built-in material by name.
func LookupMaterial(name string) (Material, error) {
	m, ok := materials[strings.ToLower(strings.TrimSpace(name))]
	if !ok {
		return Material{}, fmt.Errorf("unknown material %q (known: %s)", name, strings.Join(MaterialNames(), ", "))
	}
	return m, nil
}

// MaterialNames lists the built-in materials in order.
func MaterialNames() []string {
	names := make([]string, 0, len(materials))
	for n := range materials {
		names = append(names, n)
	}
	sort.Strings(names)
	return names
}
