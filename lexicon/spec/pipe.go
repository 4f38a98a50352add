package spec

import "strings"

// pipeSchedules are the schedule numbers of pipe wall thickness: those
// of ASME B36.10M for welded and seamless steel pipe, which ASTM D1785
// uses for PVC pipe (40, 80 and 120), and the S schedules of ASME
// B36.19M for stainless steel. The list is written from memory of those
// standards, not from a fetched copy.
var pipeSchedules = map[string]string{
	"5": "ASME B36.10M", "10": "ASME B36.10M", "20": "ASME B36.10M", "30": "ASME B36.10M", "40": "ASME B36.10M",
	"60": "ASME B36.10M", "80": "ASME B36.10M", "100": "ASME B36.10M", "120": "ASME B36.10M", "140": "ASME B36.10M",
	"160": "ASME B36.10M",
	"5S":  "ASME B36.19M", "10S": "ASME B36.19M", "40S": "ASME B36.19M", "80S": "ASME B36.19M",
}

// PipeSchedule returns the pipe schedule with the given number, "40",
// "80" or "10s", ignoring case and surrounding space. A schedule sets a
// pipe's wall thickness for its size, and with it the pressure the pipe
// is rated for, so a thinner schedule is no substitute: callers should
// hold it hard.
//
// Code: "SCH 40". Attributes: "schedule" ("40", "10S"). No dimensions:
// the wall a schedule gives depends on the pipe's nominal size.
//
// It reports false for any number the standards do not list.
func PipeSchedule(number string) (Designation, bool) {
	n := strings.ToUpper(strings.TrimSpace(number))
	src, ok := pipeSchedules[n]
	if !ok {
		return Designation{}, false
	}
	return Designation{
		System:     Schedule,
		Code:       "SCH " + n,
		Dimensions: map[string]float64{},
		Attributes: map[string]string{"schedule": n},
		Source:     src,
	}, true
}
