package assess

import (
	"fmt"
	"math"

	"github.com/gyprisk/gyprisk/climate"
	"github.com/gyprisk/gyprisk/climate/surface"
	"github.com/gyprisk/gyprisk/leach/mould"
)

// interiorHours works through the hours of an interior element. The
// surface sees the room air: from a room record, or from an indoor model
// (a set point, or an ISO 13788 humidity class) driven by the outdoor
// record. With a temperature factor the surface sits between the room and
// the outdoor air,
//
//	θ_si = θ_e + f_Rsi·(θ_i − θ_e)      (ISO 13788:2012, 3.1.5)
//
// and without one, at the room air temperature. No rain reaches it: the
// only water is condensate.
func (r *elementRun) interiorHours(outdoor, room *siteHours, mm *mould.Model, h *hourState) error {
	e := r.e
	var model climate.IndoorModel
	var err error
	if room == nil {
		if e.humidityClass != 0 {
			model, err = climate.ClassIndoor(e.humidityClass, e.indoorTempC)
		} else {
			model, err = climate.FixedIndoor(e.indoorTempC, e.indoorRHPct)
		}
		if err != nil {
			return fmt.Errorf("element %q: %v", e.id, err)
		}
	}
	// With both a room record and a temperature factor, each room hour
	// needs the outdoor temperature of the same hour.
	var outdoorAt map[int64]int
	if room != nil && e.temperatureFactor > 0 {
		if outdoor == nil {
			return fmt.Errorf("element %q: temperature_factor needs the outdoor record (site.climate)", e.id)
		}
		outdoorAt = make(map[int64]int, outdoor.n)
		for i := 0; i < outdoor.n; i++ {
			outdoorAt[outdoor.time(i).Unix()] = i
		}
	}
	sh := r.sh
	missingOutdoor := 0
	for i := 0; i < sh.n; i++ {
		var ti, pi, ts float64
		if room != nil {
			ti, pi = room.tempC[i], room.vapPa[i]
			ts = ti
			if outdoorAt != nil {
				if j, ok := outdoorAt[room.time(i).Unix()]; ok {
					ts = climate.InteriorSurfaceTempC(outdoor.tempC[j], ti, e.temperatureFactor)
				} else {
					missingOutdoor++
				}
			}
		} else {
			ti, pi = model.At(outdoor.tempC[i], outdoor.rhPct[i])
			ts = ti
			if e.temperatureFactor > 0 {
				ts = climate.InteriorSurfaceTempC(outdoor.tempC[i], ti, e.temperatureFactor)
			}
		}
		h.deposit, h.runoff = 0, 0
		h.tempC, h.vapPa = ts, pi
		h.rhPct = climate.RHAtPct(pi, ts)
		h.condKg = condensate(surface.CondensationRateKgPerM2S(interiorHcWPerM2K, ti, pi, ts), sh.dtS[i])
		h.dTdAlpha = 0
		h.slopeDeg = flowSlope(e.tiltDeg)
		if math.IsNaN(h.tempC) || math.IsNaN(h.rhPct) {
			return fmt.Errorf("element %q: no surface state at %s (missing room or outdoor values)", e.id, sh.time(i).Format("2006-01-02T15:04Z07:00"))
		}
		r.step(i, h, mm)
	}
	if missingOutdoor > 0 {
		r.notes = append(r.notes, fmt.Sprintf("%s (%s): %d room-record hours have no outdoor hour to pair with; for them the surface was taken at room air temperature", e.id, e.variant, missingOutdoor))
	}
	return nil
}
