// Demo: quantify an analytical run end to end. Reads the invented river-water run file, processes it with a method
// set up in code, prints the results with their flags and writes them as JSON and CSV, an HTML run report and SVG plots.
// Usage: dotnet run --project samples/QuantifyDemo [output-folder] [run-file.csv]
using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Reporting;
using InternalStdCal.Run;
using InternalStdCal.Uncertainty;

namespace InternalStdCal.Samples;

/// <summary>The QuantifyDemo console program.</summary>
internal static class QuantifyDemo
{
    private static readonly string RunFile = Path.Combine("samples", "data", "river-water-run.csv");
    private static readonly string[] BudgetSamples = { "RW-02" };

    private static int Main(string[] args) => Run(args, Console.Out);

    /// <summary>Runs the demo, printing to <paramref name="output"/>; returns the exit code (0 = done).</summary>
    internal static int Run(IReadOnlyList<string> args, TextWriter output)
    {
        string outputFolder = Path.GetFullPath(args.Count > 0 ? args[0] : "quantify-output");
        string? runFile = args.Count > 1 ? Path.GetFullPath(args[1]) : FindRunFile();
        if (runFile is null || !File.Exists(runFile))
        {
            output.WriteLine($"Run file not found: {runFile ?? RunFile}. Start the demo inside the repository, or give the run file as the second argument.");
            return 1;
        }

        // 1. Read the run. A bad row is reported with its line and column; the good rows are kept.
        RunReadResult read = RunCsv.ReadFile(runFile);
        output.WriteLine($"Run file: {runFile}");
        foreach (RunFileProblem problem in read.Problems)
        {
            output.WriteLine($"  file problem: {problem}");
        }

        if (read.Run is null)
        {
            output.WriteLine("No run could be read from the file.");
            return 1;
        }

        // 2. The method: which IS corrects which analyte, the calibration function, the acceptance and QC criteria,
        //    and the LOD/LOQ in the original sample. The numbers are those of an invented lab SOP, not a published method.
        const string Sop = "invented demo SOP (common practice)";
        var calibrationRules = new AcceptanceRuleSet("Demo SOP calibration", Sop)
        {
            MinCorrelationCoefficientLinear = 0.995,
            MaxAbsRelativeErrorPercent = 10,
            MaxAbsRelativeErrorAtLowestLevelPercent = 20,
        };
        var method = new RunMethod(
            "Demo SOP: trace metals in river water",
            new[]
            {
                new AnalyteMethod("Cd-111", "Rh-103", RatioModel.Linear, acceptance: calibrationRules, limits: new ReportingLimits(Ug(0.05), Ug(0.15))),
                new AnalyteMethod("Cu-63", "Rh-103", RatioModel.Linear, acceptance: calibrationRules, limits: new ReportingLimits(Ug(0.3), Ug(1))),
                new AnalyteMethod("Pb-208", "Bi-209", RatioModel.Linear, acceptance: calibrationRules, limits: new ReportingLimits(Ug(0.1), Ug(0.3))),
            },
            read.InternalStandardConcentrations, // from the file's header, e.g. "is:Rh-103 [10 µg/L]"
            InternalStandardRecoveryWindow.UsEpa200Point8)
        {
            QualityControlRecovery = new RecoveryWindow("QC recovery", Sop, 90, 110),
            DuplicateRpd = new RpdLimit("duplicate RPD", Sop, 20),
            SpikeRecovery = new RecoveryWindow("spike recovery", Sop, 75, 125),
            Drift = DriftRule.MagnitudeOrSignificance(10), // trend of IS signals and QC recoveries over the run
        };

        // 3. Process: calibrate each analyte, quantify every sample, check IS recovery, QC, duplicates and spikes.
        RunReport report = RunProcessor.Process(read.Run, method);
        output.WriteLine($"Method: {method.Name}; {method.RecoveryWindow}");
        output.WriteLine();
        foreach (AnalyteCalibration c in report.Calibrations)
        {
            string verdict = c.Calibration is null ? "FAILED: " + c.Failure : c.IsAccepted ? "accepted" : "REJECTED";
            output.WriteLine($"Calibration {c.Analyte} / IS {c.Method.InternalStandard}: {c.Method.Model}, {c.Calibration?.PointCount ?? 0} points, {verdict}");
        }

        // 4. The results in the original sample, one row per sample and analyte, with flags.
        output.WriteLine();
        output.WriteLine($"Results in the original sample ({Invariant(100 * method.ConfidenceLevel)} % interval)");
        output.WriteLine(Row("sample", "role", "analyte", "result", "interval", "flags"));
        foreach (AnalyteResult r in report.Results.OrderBy(r => r.InjectionOrders[0]).ThenBy(r => r.Analyte, StringComparer.Ordinal))
        {
            string result = r.Reported?.ToString() ?? "n/a"; // "< 0.15 µg/L (LOQ)" when censored; the estimate is kept
            string interval = r.SampleLower is Concentration lo && r.SampleUpper is Concentration hi
                ? $"{Invariant(lo.Value)} to {hi.ToString("G3", CultureInfo.InvariantCulture)}"
                : "-";
            output.WriteLine(Row(r.SampleId, r.Role.ToString(), r.Analyte, result, interval, RunReport.QualifierText(r.Qualifiers)));
        }

        // 5. Quality control: only what needs a look is listed.
        output.WriteLine();
        output.WriteLine($"QC checks passed: {report.QualityControl.Count(c => c.Passed == true)} of {report.QualityControl.Count}; "
            + $"duplicates: {report.Duplicates.Count(c => c.Passed == true)} of {report.Duplicates.Count}; "
            + $"spikes: {report.Spikes.Count(c => c.Passed == true)} of {report.Spikes.Count}");
        foreach (InjectionOutcome o in report.Injections.Where(o => o.Reasons.Count > 0))
        {
            output.WriteLine($"  injection {o.Injection.Order} ({o.Injection.Id}): {string.Join(" ", o.Reasons)}");
        }

        output.WriteLine($"Drift across injection order (flag when {method.Drift}):");
        foreach (DriftCheck d in report.Drift)
        {
            string trend = d.Trend is DriftTrend t
                ? $"{Invariant(t.DriftOverRunPercent)} % of mean over the run (CI {Invariant(t.DriftOverRunPercentInterval.Lower)} to {Invariant(t.DriftOverRunPercentInterval.Upper)} %), {(t.IsFlagged ? "FLAGGED" : "not flagged")}"
                : "no trend: " + d.Failure;
            output.WriteLine($"  {d}: {trend}");
        }

        // 6. The uncertainty budget of one result (GUM law of propagation), with one component of our own SOP.
        AnalyteResult rw02 = report.ResultFor("RW-02", "Pb-208")!;
        var matrix = UncertainInput.Normal("matrix factor (SOP)", 1, 0.01);
        output.WriteLine();
        output.WriteLine("Uncertainty budget, RW-02 Pb-208 in the original sample:");
        output.Write(rw02.UncertaintyBudget(new[] { matrix }));

        // 7. Write the results for other programs.
        Directory.CreateDirectory(outputFolder);
        RunResults results = RunResults.From(report);
        string json = Path.Combine(outputFolder, read.Run.Name + "-results.json");
        string csv = Path.Combine(outputFolder, read.Run.Name + "-results.csv");
        RunResultsJson.WriteFile(results, json);
        RunResultsCsv.WriteFile(results, csv);

        // 8. The run report for people (one self-contained HTML file) and two plots as SVG files.
        string html = Path.Combine(outputFolder, "run-report.html");
        var reportOptions = new RunHtmlReportOptions { Title = "River-water survey: run report", UncertaintyBudgetSamples = BudgetSamples };
        File.WriteAllText(html, RunHtmlReport.Render(report, reportOptions));
        string curve = Path.Combine(outputFolder, "calibration-curve-Cd-111.svg");
        PlotExport.SaveSvg(CalibrationPlots.Curve(report.Calibrations.Single(c => c.Analyte == "Cd-111").Calibration!, method.ConfidenceLevel, "Calibration curve: Cd-111"), curve);
        string recovery = Path.Combine(outputFolder, "is-recovery-Rh-103.svg");
        PlotExport.SaveSvg(RunPlots.InternalStandardRecovery(report, "Rh-103"), recovery);
        output.WriteLine();
        output.WriteLine("Written:");
        output.WriteLine($"  {json}");
        output.WriteLine($"  {csv}");
        output.WriteLine($"  {html}");
        output.WriteLine($"  {curve}");
        output.WriteLine($"  {recovery}");
        output.WriteLine();
        output.WriteLine("The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide.");
        return 0;
    }

    private static Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);

    private static string Invariant(double value) => value.ToString("G3", CultureInfo.InvariantCulture);

    private static string Row(string sample, string role, string analyte, string result, string interval, string flags) =>
        $"{sample,-8}{role,-17}{analyte,-9}{result,19}  {interval,-25} {flags}";

    // The run file: searched for in samples/data above the program's folder, then above the current folder.
    private static string? FindRunFile()
    {
        foreach (string start in new[] { AppContext.BaseDirectory, Directory.GetCurrentDirectory() })
        {
            for (DirectoryInfo? dir = new(start); dir is not null; dir = dir.Parent)
            {
                string candidate = Path.Combine(dir.FullName, RunFile);
                if (File.Exists(candidate))
                {
                    return candidate;
                }
            }
        }

        return null;
    }
}
