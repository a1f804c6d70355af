// Demo: quantify invented unknowns against an internal-standard ratio calibration.
// Scenario (invented): lead in digested plant material by ICP-MS, bismuth as the internal standard,
// 10 µg/L Bi in every standard and sample solution.
using System;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

Concentration bi = Concentration.FromMicrogramsPerLitre(10);

// 1. Calibration standards: nominal Pb, IS concentration, duplicate injections (Pb counts, Bi counts).
CalibrationStandard[] standards =
{
    CalibrationStandard.Create("CAL-1", Concentration.FromMicrogramsPerLitre(0.5), bi, new Injection(1_020, 201_000), new Injection(990, 198_500)),
    CalibrationStandard.Create("CAL-2", Concentration.FromMicrogramsPerLitre(1), bi, new Injection(2_010, 199_000), new Injection(2_060, 202_000)),
    CalibrationStandard.Create("CAL-3", Concentration.FromMicrogramsPerLitre(5), bi, new Injection(10_150, 200_500), new Injection(9_900, 197_000)),
    CalibrationStandard.Create("CAL-4", Concentration.FromMicrogramsPerLitre(10), bi, new Injection(20_400, 201_500), new Injection(19_800, 198_000)),
    CalibrationStandard.Create("CAL-5", Concentration.FromMicrogramsPerLitre(25), bi, new Injection(50_900, 202_500), new Injection(49_700, 199_500)),
    CalibrationStandard.Create("CAL-6", Concentration.FromMicrogramsPerLitre(50), bi, new Injection(99_000, 198_000), new Injection(101_500, 203_000)),
};

// 2. Fit: straight line, 1/x weighting.
RegressionCalibration calibration = RegressionCalibration.Fit(standards, CalibrationModel.Linear, Weighting.InverseX);
Console.WriteLine(calibration.Summary());
Console.WriteLine();

// 3. Acceptance under two published rule sets.
foreach (AcceptanceRuleSet rules in new[] { AcceptanceRuleSet.IchM10Chromatographic, AcceptanceRuleSet.UsEpa8000D })
{
    Console.WriteLine(rules.Evaluate(calibration));
    Console.WriteLine();
}

// 4. Unknowns: duplicate injections each; the IS recovery is visible in the Bi counts.
UnknownSample[] unknowns =
{
    UnknownSample.Create("LEAF-01", bi, new Injection(6_150, 196_000), new Injection(6_020, 193_500)),
    UnknownSample.Create("LEAF-02", bi, new Injection(31_800, 188_000), new Injection(32_400, 190_500)),
    UnknownSample.Create("LEAF-03", bi, new Injection(140_000, 199_000), new Injection(138_500, 197_000)),
};

Console.WriteLine("Results (concentration in the measured solution):");
foreach (QuantitationResult result in SampleQuantitation.QuantifyAll(calibration, unknowns))
{
    Console.WriteLine(result);
}
