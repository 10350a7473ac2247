package assess

import (
	"os"
	"testing"
)

// FuzzParseProject: no project file, however broken, makes Parse panic;
// it either parses or returns an error.
func FuzzParseProject(f *testing.F) {
	for _, path := range []string{"../../examples/demo/project.toml", "../../examples/basement/project.toml"} {
		if b, err := os.ReadFile(path); err == nil {
			f.Add(b)
		}
	}
	f.Add([]byte(wallProject))
	f.Add([]byte("[site]\nlatitude_deg = 91\n"))
	f.Add([]byte("[[element]]\nid = \"a\"\n[[element.variant]]\nid = \"base\"\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		p, err := Parse("fuzz.toml", data)
		if err == nil && p == nil {
			t.Fatal("nil project without an error")
		}
		if err == nil {
			// A parsed project resolves or fails cleanly, never panics.
			for i := range p.Elements {
				_, _ = resolve(&p.Elements[i], nil)
				for j := range p.Elements[i].Variants {
					_, _ = resolve(&p.Elements[i], &p.Elements[i].Variants[j])
				}
			}
			_, _ = p.thresholds()
			_, _ = p.site()
		}
	})
}
