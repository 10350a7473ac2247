package assess

import "testing"

func TestFormatSig(t *testing.T) {
	for _, c := range []struct {
		v    float64
		n    int
		want string
	}{
		{0.7345, 2, "0.73"}, {0.0012345, 2, "0.0012"}, {12.3, 2, "12"}, {1234, 2, "1234"}, {0, 2, "0"}, {-0.0004, 1, "-0.0004"},
	} {
		if got := FormatSig(c.v, c.n); got != c.want {
			t.Errorf("FormatSig(%g, %d) = %q, want %q", c.v, c.n, got, c.want)
		}
	}
}
