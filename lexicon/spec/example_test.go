package spec_test

import (
	"errors"
	"fmt"

	"github.com/whittle-search/whittle/lexicon/spec"
)

func ExampleLumberNominal() {
	d, ok := spec.LumberNominal(2, 4)
	fmt.Println(d.Code, ok, d.Dimensions["thickness"], "x", d.Dimensions["width"], "mm")
	fmt.Println(d.Attributes["dressed_thickness_frac"], "x", d.Attributes["dressed_width_frac"], "in,", d.Source)
	// Output:
	// 2x4 true 38 x 89 mm
	// 1-1/2 x 3-1/2 in, PS 20
}

func ExampleTyreSize() {
	d, err := spec.TyreSize(225, 45, 'R', 17)
	if err != nil {
		panic(err)
	}
	fmt.Printf("%s: overall %.1f mm, sidewall %.2f mm\n", d.Code, d.Dimensions["overall_diameter"], d.Dimensions["sidewall_height"])
	_, err = spec.TyreSize(225, 45, 'R', 30)
	fmt.Println(errors.Is(err, spec.ErrOutOfRange))
	// Output:
	// 225/45R17: overall 634.3 mm, sidewall 101.25 mm
	// true
}

func ExampleWireGauge() {
	d, _ := spec.WireGauge(14, 2)
	fmt.Printf("%s: conductor %.3f mm, %.3f mm²\n", d.Code, d.Dimensions["diameter"], d.Dimensions["area_mm2"])
	d, _ = spec.WireGauge(-3, 0)
	fmt.Printf("%s: conductor %.3f mm\n", d.Code, d.Dimensions["diameter"])
	// Output:
	// 14/2 AWG: conductor 1.628 mm, 2.081 mm²
	// 4/0 AWG: conductor 11.684 mm
}

func ExampleMetricThreadSize() {
	d, _ := spec.MetricThreadSize(8, 0)
	fmt.Println(d.Code, d.Attributes["pitch_kind"])
	d, _ = spec.MetricThreadSize(10, 1.25)
	fmt.Println(d.Code, d.Attributes["pitch_kind"])
	_, err := spec.MetricThreadSize(8, 1.5)
	fmt.Println(errors.Is(err, spec.ErrNotStandard))
	// Output:
	// M8x1.25 coarse
	// M10x1.25 fine
	// true
}

func ExampleMetricFineThreads() {
	ds, _ := spec.MetricFineThreads(10)
	for _, d := range ds {
		fmt.Println(d.Code, d.Attributes["pitch_kind"])
	}
	// Output:
	// M10x0.75 fine
	// M10x1 fine
	// M10x1.25 fine
}

func ExampleUnifiedThreadSize() {
	d, _ := spec.UnifiedThreadSize("1/4", 0)
	fmt.Printf("%s: major %.2f mm, pitch %.3f mm\n", d.Code, d.Dimensions["major_diameter"], d.Dimensions["pitch"])
	d, _ = spec.UnifiedThreadSize("#10", 32)
	fmt.Println(d.Code)
	// Output:
	// 1/4-20 UNC: major 6.35 mm, pitch 1.270 mm
	// #10-32 UNF
}

func ExamplePaperSize() {
	d, ok := spec.PaperSize("a4")
	fmt.Println(d.Code, ok, d.Dimensions["width"], "x", d.Dimensions["height"], "mm")
	// Output: A4 true 210 x 297 mm
}

func ExampleBatterySize() {
	d, _ := spec.BatterySize("LR6")
	fmt.Println(d.Code, d.Attributes["voltage_v"], "V", d.Dimensions["diameter"], "x", d.Dimensions["height"], "mm")
	d, _ = spec.BatterySize("pp3")
	fmt.Println(d.Code, d.Attributes["iec"], d.Dimensions["width"], "x", d.Dimensions["depth"], "x", d.Dimensions["height"], "mm")
	// Output:
	// AA 1.5 V 14.5 x 50.5 mm
	// 9V 6LR61 26.5 x 17.5 x 48.5 mm
}

func ExamplePipeSchedule() {
	d, ok := spec.PipeSchedule("80")
	fmt.Println(d.Code, d.Source, ok)
	_, ok = spec.PipeSchedule("50")
	fmt.Println(ok)
	// Output:
	// SCH 80 ASME B36.10M true
	// false
}

func ExampleFlotationTyreSize() {
	d, _ := spec.FlotationTyreSize(33, 12.5, 'r', 20)
	fmt.Printf("%s %.1f mm across, %.1f mm wide\n", d.Code, d.Dimensions["overall_diameter"], d.Dimensions["section_width"])
	// Output: 33X12.50R20 838.2 mm across, 317.5 mm wide
}
