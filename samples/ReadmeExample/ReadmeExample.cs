// The C# example shown in README.md; compiled and run by the test project (tests/Readme).
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Samples;

/// <summary>The README's usage example, kept compiling by the test project.</summary>
public static class ReadmeExample
{
    /// <summary>Fits a 1/x-weighted ratio calibration and quantifies one unknown.</summary>
    /// <returns>The quantitation result of the unknown.</returns>
    public static QuantitationResult Run()
    {
        // Invented scenario: an element in digested feed, 10 µg/L of an IS element in every solution.
        Concentration isConc = Concentration.FromMicrogramsPerLitre(10);
        CalibrationStandard[] standards =
        {
            CalibrationStandard.Create("S1", Concentration.FromMicrogramsPerLitre(1), isConc, new Injection(2_050, 100_000)),
            CalibrationStandard.Create("S2", Concentration.FromMicrogramsPerLitre(5), isConc, new Injection(10_100, 99_000)),
            CalibrationStandard.Create("S3", Concentration.FromMicrogramsPerLitre(10), isConc, new Injection(20_500, 101_000)),
            CalibrationStandard.Create("S4", Concentration.FromMicrogramsPerLitre(25), isConc, new Injection(50_300, 100_500)),
            CalibrationStandard.Create("S5", Concentration.FromMicrogramsPerLitre(50), isConc, new Injection(99_800, 99_500)),
        };

        RegressionCalibration calibration = RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.InverseX);
        UnknownSample unknown = UnknownSample.Create("Feed-07", isConc, new Injection(31_000, 97_000), new Injection(30_600, 96_500));
        return SampleQuantitation.Quantify(calibration, unknown);
    }
}
