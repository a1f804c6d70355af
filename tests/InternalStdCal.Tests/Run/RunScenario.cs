using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.Tests.Run;

/// <summary>
/// An invented ICP-MS-style run: Pb corrected by Bi, Cd corrected by In, a calibration blank and five standards,
/// three check standards (QC), a method blank, samples with dilutions, a duplicate, a matrix spike and a digested
/// solid. Signals were made by hand as A = y·A_IS with y = a + b·x0 on the OLS lines worked out in
/// <see cref="RunProcessorTests"/>.
/// </summary>
internal static class RunScenario
{
    internal static readonly Concentration IsConcentration = Ug(10);

    internal static Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);

    internal static SamplePreparation TenfoldDilution { get; } = SamplePreparation.Liquid(
        DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(10))));

    // 0.2500 g digested and made up to 50 mL, then 5 mL of the digest diluted to 25 mL.
    internal static SamplePreparation Digest { get; } = SamplePreparation.SolidToVolume(
        Measured.Exact(Volume.FromMillilitres(50)),
        Measured.Exact(Mass.FromGrams(0.25)),
        ConcentrationUnit.MilligramPerKilogram,
        DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(5)), Measured.Exact(Volume.FromMillilitres(25))));

    internal static InjectionSignals Signals(double? pb, double? bi, double? cd, double? @in)
    {
        InjectionSignals s = InjectionSignals.Empty;
        if (pb is double a)
        {
            s = s.WithAnalyte("Pb", a);
        }

        if (cd is double c)
        {
            s = s.WithAnalyte("Cd", c);
        }

        if (bi is double b)
        {
            s = s.WithInternalStandard("Bi", b);
        }

        if (@in is double i)
        {
            s = s.WithInternalStandard("In", i);
        }

        return s;
    }

    internal static Dictionary<string, Concentration> Nominal(double pb, double cd) => new() { ["Pb"] = Ug(pb), ["Cd"] = Ug(cd) };

    internal static List<RunInjection> Rows() => new()
    {
        RunInjection.CalibrationBlank(1, "BLK", Signals(2200, 100000, 200, 50000)),
        RunInjection.CalibrationStandard(2, "CAL-1", Nominal(1, 0.5), Signals(11466, 98000, 5194, 49000)),
        RunInjection.CalibrationStandard(3, "CAL-2", Nominal(2, 1), Signals(22542, 102000, 10506, 51000)),
        RunInjection.CalibrationStandard(4, "CAL-3", Nominal(4, 2), Signals(41778, 99000, 20402, 50500)),
        RunInjection.CalibrationStandard(5, "CAL-4", Nominal(8, 4), Signals(82416, 101000, 39897, 49500)),
        RunInjection.CalibrationStandard(6, "CAL-5", Nominal(15, 7.5), Signals(152200, 100000, 75200, 50000)),
        RunInjection.QualityControl(7, "CCV", Nominal(5, 2), Signals(53000.3125, 100000, 20252.5, 50000)),
        RunInjection.MethodBlank(8, "MB", Signals(2484.53125, 100000, 462.4, 50000)),
        RunInjection.Sample(9, "S1", Signals(31993.75, 100000, 15255, 50000), TenfoldDilution),
        RunInjection.SampleDuplicate(10, "S1-D", "S1", Signals(33244.953125, 95000, 16904.68, 52000), TenfoldDilution),
        RunInjection.SpikedSample(11, "S1-MS", "S1", new Dictionary<string, Concentration> { ["Pb"] = Ug(20), ["Cd"] = Ug(10) }, Signals(50999.6875, 100000, 24250.5, 50000), TenfoldDilution),
        RunInjection.Sample(12, "S2", Signals(62003.125, 100000, 1262, 50000), Digest),
        RunInjection.Sample(13, "S3", Signals(67112.03125, 55000, null, 50000)),
        RunInjection.Sample(14, "S4", Signals(202046.875, 100000, 1000, 0)),
        RunInjection.QualityControl(15, "CCV", Nominal(5, 2), Signals(49999.375, 100000, 16254.5, 50000)),
        RunInjection.Sample(16, "S5", Signals(21990.625, 100000, 30247.5, 50000)),
        RunInjection.QualityControl(17, "CCV", Nominal(5, 2), Signals(52000, 100000, 21252, 50000)),
    };

    internal static AnalyticalRun Run(IEnumerable<RunInjection> rows) =>
        AnalyticalRun.Create("batch-demo", new[] { "Pb", "Cd" }, new[] { "Bi", "In" }, rows);

    internal static RunMethod Method() => new(
        "invented two-element method",
        new[]
        {
            new AnalyteMethod("Pb", "Bi", RatioModel.Linear, acceptance: AcceptanceRuleSet.UsEpa8000D, limits: new ReportingLimits(Ug(0.1), Ug(0.3))),
            new AnalyteMethod("Cd", "In", RatioModel.Linear, limits: new ReportingLimits(Ug(0.05), Ug(0.15))),
        },
        new Dictionary<string, Concentration> { ["Bi"] = IsConcentration, ["In"] = IsConcentration },
        InternalStandardRecoveryWindow.UsEpa200Point8)
    {
        QualityControlRecovery = new RecoveryWindow("test QC window", "invented for this test", 90, 110),
        DuplicateRpd = new RpdLimit("test RPD limit", "invented for this test", 20),
        SpikeRecovery = new RecoveryWindow("test spike window", "invented for this test", 75, 125),
        Drift = DriftRule.MagnitudeAndSignificance(10),
    };
}
