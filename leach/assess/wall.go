package assess

import "github.com/gyprisk/gyprisk/climate"

// defaultWallPosition is the ISO 15927-3 wall-factor row used when an
// element gives neither wall_factor nor wall_position: the most exposed
// row, the top of a multi-storey wall (W = 0.5), so that a missing input
// errs on the wet side.
const defaultWallPosition = climate.WallPosition("multi-storey-top")

// wallFactorFor returns the ISO 15927-3 wall factor W of a named position
// (see climate.WallPositions), or of defaultWallPosition for "".
func wallFactorFor(position string) (float64, error) {
	if position == "" {
		return climate.WallFactor(defaultWallPosition)
	}
	return climate.WallFactor(climate.WallPosition(position))
}
