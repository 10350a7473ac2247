package assess

import (
	"fmt"
	"math"
	"runtime"
	"sync"
	"time"

	"github.com/gyprisk/gyprisk/climate"
	"github.com/gyprisk/gyprisk/climate/solar"
	"github.com/gyprisk/gyprisk/climate/surface"
)

// site is the resolved [site] table.
type site struct {
	out          SiteOut
	latDeg       float64
	lonDeg       float64
	terrain      climate.Terrain
	topography   float64
	groundAlbedo float64
}

func (p *Project) site() (*site, error) {
	s := &site{topography: 1, groundAlbedo: solar.DefaultAlbedo}
	sp := p.Site
	if sp.LatitudeDeg != nil {
		s.latDeg = *sp.LatitudeDeg
	}
	if sp.LongitudeDeg != nil {
		s.lonDeg = *sp.LongitudeDeg
	}
	if sp.TopographyFactor != nil {
		s.topography = *sp.TopographyFactor
	}
	if sp.GroundAlbedo != nil {
		s.groundAlbedo = *sp.GroundAlbedo
	}
	terrain := sp.Terrain
	if terrain == "" {
		terrain = "III"
	}
	t, err := climate.ParseTerrain(terrain)
	if err != nil {
		return nil, &ProjectError{File: p.Path, Key: "site.terrain", Err: err}
	}
	s.terrain = t
	s.out = SiteOut{Name: sp.Name, LatitudeDeg: s.latDeg, LongitudeDeg: s.lonDeg, TimeZone: sp.TimeZone,
		Terrain: terrain, TopographyFactor: s.topography, Climate: sp.Climate}
	return s, nil
}

// siteHours holds everything about each hour of a record that does not
// depend on the element: the weather, the sun and sky, and the calendar.
// It is computed once per scenario and shared by every element, so the
// per-element loop does only the work that depends on orientation and
// material. Slices run in parallel, one entry per hour.
type siteHours struct {
	site *site
	n    int
	t0   time.Time      // end of the first interval
	loc  *time.Location // calendar zone

	endS  []float64 // seconds since the first record's end (the integration axis)
	dtS   []float64 // seconds the interval covers (gaps excluded)
	wTrap []float64 // trapezoid weight of each hour's rate, s (see trapezoidWeights)
	segs  [][2]int  // contiguous runs [from, to) between gaps
	month []int32   // index into months
	day   []int32   // index into days

	months []string
	days   []time.Time

	tempC, rhPct, vapPa []float64
	rainMM, windMS      []float64
	drBase              []float64 // ISO 15927-3 driving rain for a wall facing into the wind, L/m² in the hour
	windCos, windSin    []float64 // of the direction the wind blows from
	skyTempC            []float64
	sky                 []solar.Sky // nil for a room record
	years               float64
}

// newSiteHours precomputes the site's hours from the hourly outdoor series
// s (whose records recs may have been changed by a scenario).
func newSiteHours(st *site, s *climate.Series, recs []climate.Record) (*siteHours, error) {
	sh, err := newHours(s, recs)
	if err != nil {
		return nil, err
	}
	sh.site = st
	n := sh.n
	sh.drBase = make([]float64, n)
	sh.windCos = make([]float64, n)
	sh.windSin = make([]float64, n)
	sh.skyTempC = make([]float64, n)
	sh.sky = make([]solar.Sky, n)
	// The sun and sky of each hour are independent of the others: split
	// them over the cores. The cloud estimate carries from hour to hour,
	// so the sky temperatures follow in one pass.
	parallelChunks(n, func(lo, hi int) {
		for i := lo; i < hi; i++ {
			r := &recs[i]
			dir := r.WindDirDeg
			if math.IsNaN(dir) {
				dir = 0
			}
			sh.drBase[i] = climate.DrivingRainHourLPerM2(sh.windMS[i], sh.rainMM[i], dir, dir) * sh.dtS[i] / 3600
			sh.windSin[i], sh.windCos[i] = math.Sincos(dir * math.Pi / 180)

			mid := solar.IntervalMidpoint(r.Time, time.Duration(sh.dtS[i]*float64(time.Second)))
			sun := solar.At(mid, st.latDeg, st.lonDeg)
			ghi := r.SolarWM2
			if math.IsNaN(ghi) {
				ghi = 0
			}
			sh.sky[i] = solar.NewSky(sun, ghi, solar.ExtraterrestrialNormalWM2(mid))
		}
	})
	var clouds surface.CloudEstimator
	for i := range recs {
		cloud := clouds.Update(sh.sky[i].GHIWM2, sh.sky[i].ZenithDeg, sh.rainMM[i])
		sh.skyTempC[i] = surface.SkyTemperatureFromAirC(sh.tempC[i], sh.vapPa[i], cloud)
	}
	return sh, nil
}

// parallelChunks calls fn on contiguous chunks [lo, hi) of 0…n, one per
// core, and waits for them.
func parallelChunks(n int, fn func(lo, hi int)) {
	k := min(runtime.GOMAXPROCS(0), max(1, n/4096))
	var wg sync.WaitGroup
	for c := range k {
		lo, hi := c*n/k, (c+1)*n/k
		wg.Add(1)
		go func() {
			defer wg.Done()
			fn(lo, hi)
		}()
	}
	wg.Wait()
}

// newHours fills the calendar and the air state, and checks what the
// integration needs: times strictly increasing and no value that cannot
// be worked with. Missing temperature or humidity in an hour is carried
// over from the hour before (counted in the notes by the reader); a
// missing rain or wind value counts as none.
func newHours(s *climate.Series, recs []climate.Record) (*siteHours, error) {
	n := len(recs)
	if n < 2 {
		return nil, fmt.Errorf("%s: fewer than two hours", s.Name)
	}
	sh := &siteHours{n: n, t0: recs[0].Time, loc: s.Location}
	sh.endS = make([]float64, n)
	sh.dtS = make([]float64, n)
	sh.month = make([]int32, n)
	sh.day = make([]int32, n)
	sh.tempC = make([]float64, n)
	sh.rhPct = make([]float64, n)
	sh.vapPa = make([]float64, n)
	sh.rainMM = make([]float64, n)
	sh.windMS = make([]float64, n)

	loc := s.Location
	if loc == nil {
		loc = time.UTC
	}
	med := s.MedianIntervalS()
	t0 := recs[0].Time
	segStart := 0
	lastT, lastRH := math.NaN(), math.NaN()
	for i := range recs {
		r := &recs[i]
		sh.endS[i] = r.Time.Sub(t0).Seconds()
		if i > 0 {
			d := sh.endS[i] - sh.endS[i-1]
			if !(d > 0) {
				return nil, fmt.Errorf("%s: time %s does not follow %s", s.Name, r.Time.Format(time.RFC3339), recs[i-1].Time.Format(time.RFC3339))
			}
			if d > climate.DefaultGapFactor*med {
				sh.segs = append(sh.segs, [2]int{segStart, i})
				segStart = i
				d = med
			}
			sh.dtS[i] = d
		} else {
			sh.dtS[i] = med
		}
		mid := r.Time.Add(-time.Duration(sh.dtS[i] / 2 * float64(time.Second))).In(loc)
		sh.month[i] = sh.monthIndex(mid)
		sh.day[i] = sh.dayIndex(mid)

		t, rh := r.TempC, r.RHPct
		if math.IsNaN(t) {
			t = lastT
		}
		if math.IsNaN(rh) {
			rh = lastRH
		}
		if math.IsNaN(t) || math.IsNaN(rh) {
			return nil, fmt.Errorf("%s: the record starts with missing temperature or humidity at %s; trim the leading empty rows", s.Name, r.Time.Format(time.RFC3339))
		}
		lastT, lastRH = t, rh
		sh.tempC[i], sh.rhPct[i] = t, rh
		sh.vapPa[i] = climate.VapourPressurePa(t, rh)
		sh.rainMM[i] = zeroNaN(r.RainMM)
		sh.windMS[i] = zeroNaN(r.WindMS)
	}
	sh.segs = append(sh.segs, [2]int{segStart, n})
	var covered float64
	for _, d := range sh.dtS {
		covered += d
	}
	sh.years = covered / 3600 / climate.HoursPerYear
	sh.wTrap = trapezoidWeights(sh.endS, sh.dtS, sh.segs)
	return sh, nil
}

func (sh *siteHours) monthIndex(t time.Time) int32 {
	key := t.Format("2006-01")
	if k := len(sh.months); k > 0 && sh.months[k-1] == key {
		return int32(k - 1)
	}
	sh.months = append(sh.months, key)
	return int32(len(sh.months) - 1)
}

func (sh *siteHours) dayIndex(t time.Time) int32 {
	d := time.Date(t.Year(), t.Month(), t.Day(), 0, 0, 0, 0, time.UTC)
	if k := len(sh.days); k > 0 && sh.days[k-1].Equal(d) {
		return int32(k - 1)
	}
	sh.days = append(sh.days, d)
	return int32(len(sh.days) - 1)
}

func zeroNaN(v float64) float64 {
	if math.IsNaN(v) {
		return 0
	}
	return v
}

// time returns the end of interval i.
func (sh *siteHours) time(i int) time.Time {
	return sh.t0.Add(time.Duration(sh.endS[i] * float64(time.Second)))
}
