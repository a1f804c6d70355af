using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.Calibration;

namespace InternalStdCal.Tests.Limits;

/// <summary>Calibrations and data shared by the limits tests.</summary>
internal static class LimitsData
{
    /// <summary>Field-reference §1.2 fluorescence line (data from memory of Miller &amp; Miller, numbers computed), unit ng/L (= pg/mL).</summary>
    internal static RegressionCalibration Fluorescence(CalibrationOptions? options = null) =>
        RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear, null, options);

    /// <summary>Field-reference §3.2 worked MDL example (constructed data, computed), here in µg/L.</summary>
    internal static IReadOnlyList<Concentration> WorkedSpikes() =>
        new[] { 0.52, 0.47, 0.55, 0.49, 0.58, 0.45, 0.51 }.Select(Ug).ToList();

    internal static IReadOnlyList<BlankResult> WorkedBlanks(double sign = 1) =>
        new[] { 0.05, 0.02, 0.08, 0.00, 0.04, 0.06, 0.03 }.Select(v => BlankResult.Numeric(Ug(sign * v))).ToList();

    internal static Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);

    internal static Concentration Ng(double value) => Concentration.From(value, ConcentrationUnit.NanogramPerLitre);
}
