// Ratio calibration of an invented LC-MS/MS assay: the compound "QX-417" (an invented drug metabolite) in
// synthetic urine, with its deuterated analogue QX-417-d4 as internal standard at 20 µg/L in every solution.
// All numbers are invented for this demonstration.
using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);
Concentration internalStandard = Ug(20);

// 1. Calibrators: a zero calibrator (blank + IS) and eight levels, each injected twice (peak areas, counts).
var standards = new List<CalibrationStandard>
{
    CalibrationStandard.Create("ZERO", Ug(0), internalStandard, new Injection(470, 247739), new Injection(184, 247867)),
    CalibrationStandard.Create("CAL-1", Ug(0.5), internalStandard, new Injection(6949, 260369), new Injection(6550, 251853)),
    CalibrationStandard.Create("CAL-2", Ug(1), internalStandard, new Injection(12169, 255064), new Injection(11369, 232561)),
    CalibrationStandard.Create("CAL-3", Ug(2.5), internalStandard, new Injection(29831, 253054), new Injection(29655, 243578)),
    CalibrationStandard.Create("CAL-4", Ug(5), internalStandard, new Injection(59400, 243389), new Injection(66642, 261970)),
    CalibrationStandard.Create("CAL-5", Ug(10), internalStandard, new Injection(116363, 246560), new Injection(121311, 252484)),
    CalibrationStandard.Create("CAL-6", Ug(25), internalStandard, new Injection(289985, 244794), new Injection(314263, 252448)),
    CalibrationStandard.Create("CAL-7", Ug(50), internalStandard, new Injection(608938, 250485), new Injection(615479, 246784)),
    CalibrationStandard.Create("CAL-8", Ug(100), internalStandard, new Injection(1220193, 254974), new Injection(1237502, 258278)),
};

// The zero calibrator is not a calibration level (ICH M10); leave it out of the fit, recorded in the result.
var options = new CalibrationOptions { Blanks = BlankHandling.Exclude };

// 2. Which weighting? Fit every scheme and rank by the sum of |%RE| of the back-calculated calibrators.
WeightingComparison comparison = WeightingComparison.Compare(standards, CalibrationModel.Linear, options);
Console.WriteLine(comparison);

// 3. Two straight lines: unweighted and 1/x².
RegressionCalibration unweighted = RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.None, options);
RegressionCalibration weighted = RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.InverseXSquared, options);
Console.WriteLine(unweighted.Summary());
Console.WriteLine(weighted.Summary());

// 4. Acceptance under both presets (rule sets are data; print where their numbers come from).
foreach (RatioCalibration calibration in new RatioCalibration[] { unweighted, weighted })
{
    Console.WriteLine("Acceptance of: " + (calibration == weighted ? "1/x² line" : "unweighted line"));
    Console.WriteLine(AcceptanceRuleSet.IchM10Chromatographic.Evaluate(calibration));
    Console.WriteLine(AcceptanceRuleSet.UsEpa8000D.Evaluate(calibration));
}

// 5. The simplest model for comparison: the average relative response factor (SW-846 8000C §11.4.3).
ResponseFactorCalibration averageRf = ResponseFactorCalibration.Fit(standards, options);
Console.WriteLine("Average RF: mean " + averageRf.MeanResponseFactor.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)
    + ", RSD " + averageRf.ResponseFactorRsdPercent!.Value.ToString("F2", System.Globalization.CultureInfo.InvariantCulture) + " %");
Console.WriteLine(AcceptanceRuleSet.UsEpa8000D.Evaluate(averageRf));

// 6. Three urine extracts, each injected twice, quantified with the 1/x² line (95 % intervals).
var unknowns = new[]
{
    UnknownSample.Create("URINE-A", internalStandard, new Injection(10560, 259458), new Injection(10557, 253622)),
    UnknownSample.Create("URINE-B", internalStandard, new Injection(137362, 237008), new Injection(143442, 243882)),
    UnknownSample.Create("URINE-C", internalStandard, new Injection(1573695, 237352), new Injection(1596935, 244689)),
};
Console.WriteLine("Unknowns (1/x² line):");
foreach (QuantitationResult result in SampleQuantitation.QuantifyAll(weighted, unknowns))
{
    Console.WriteLine(result);
}
