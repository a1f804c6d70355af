using System;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Tests.IO;

namespace InternalStdCal.Tests.Reporting;

// The invented river-water demo run (samples/data/river-water-run.csv) processed with the QuantifyDemo method,
// except Cu-63 weighted 1/x and Pb-208 as an average response factor so that every plot path is exercised:
// invented data, used only to exercise the plots and the report.
internal static class DemoRun
{
    private static readonly Lazy<RunReport> Lazy = new(Create);

    internal static RunReport Report => Lazy.Value;

    internal static AcceptanceRuleSet Rules { get; } = new("Demo SOP calibration", "invented demo SOP (common practice)")
    {
        MinCorrelationCoefficientLinear = 0.995,
        MaxAbsRelativeErrorPercent = 10,
        MaxAbsRelativeErrorAtLowestLevelPercent = 20,
    };

    private static RunReport Create()
    {
        RunReadResult read = RunCsv.ReadFile(RunCsvTests.DemoFile);
        const string Sop = "invented demo SOP (common practice)";
        var method = new RunMethod(
            "Demo SOP: trace metals in river water",
            new[]
            {
                new AnalyteMethod("Cd-111", "Rh-103", RatioModel.Linear, acceptance: Rules, limits: new ReportingLimits(Ug(0.05), Ug(0.15))),
                new AnalyteMethod("Cu-63", "Rh-103", RatioModel.Linear, Weighting.InverseX, new CalibrationOptions { Blanks = BlankHandling.Exclude }, acceptance: Rules, limits: new ReportingLimits(Ug(0.3), Ug(1))),
                new AnalyteMethod("Pb-208", "Bi-209", RatioModel.AverageResponseFactor, options: new CalibrationOptions { Blanks = BlankHandling.Exclude }, acceptance: Rules, limits: new ReportingLimits(Ug(0.1), Ug(0.3))),
            },
            read.InternalStandardConcentrations,
            InternalStandardRecoveryWindow.UsEpa200Point8)
        {
            QualityControlRecovery = new RecoveryWindow("QC recovery", Sop, 90, 110),
            DuplicateRpd = new RpdLimit("duplicate RPD", Sop, 20),
            SpikeRecovery = new RecoveryWindow("spike recovery", Sop, 75, 125),
            Drift = DriftRule.MagnitudeOrSignificance(10),
        };
        return RunProcessor.Process(read.Run!, method);
    }

    private static Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);
}
