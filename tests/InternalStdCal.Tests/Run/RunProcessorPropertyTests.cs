using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.Tests.Run;

/// <summary>Invariances of run processing on the invented <see cref="RunScenario"/> (property tests, invented data).
/// The IS-scaling invariance follows from y = A_x/A_is (SW-846 8000C §11.4.3 ratio form, field-reference §0).</summary>
public class RunProcessorPropertyTests
{
    private static readonly RunReport Reference = RunProcessor.Process(RunScenario.Run(RunScenario.Rows()), RunScenario.Method());

    private static Arbitrary<int> Seeds => Gen.Choose(0, int.MaxValue - 1).ToArbitrary();

    [Property(MaxTest = 50)]
    public Property Process_InputRowsInAnyListOrder_GivesIdenticalResults() =>
        Prop.ForAll(Seeds, seed =>
        {
            List<RunInjection> rows = RunScenario.Rows();
            Shuffle(rows, new Random(seed));
            RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
            return Summary(report).SequenceEqual(Summary(Reference));
        });

    [Property(MaxTest = 50)]
    public Property Process_InjectionOrdersPermutedWithinRoles_LeavesConcentrationsUnchanged() =>
        Prop.ForAll(Seeds, seed =>
        {
            // Concentrations only: QC brackets legitimately move when orders move.
            var random = new Random(seed);
            List<RunInjection> rows = RunScenario.Rows();
            var permuted = new List<RunInjection>();
            foreach (IGrouping<InjectionRole, RunInjection> role in rows.GroupBy(r => r.Role))
            {
                int[] orders = role.Select(r => r.Order).ToArray();
                Shuffle(orders, random);
                permuted.AddRange(role.Select((r, k) => Rebuild(r, orders[k], r.Signals)));
            }

            RunReport report = RunProcessor.Process(RunScenario.Run(permuted), RunScenario.Method());
            return Values(report).Zip(Values(Reference), Close).All(x => x) && Reported(report).SequenceEqual(Reported(Reference))
                && report.Drift.Count == Reference.Drift.Count;
        });

    [Property(MaxTest = 50)]
    public Property Process_AllIsSignalsScaledByOneConstant_LeavesConcentrationsAndRecoveriesUnchanged() =>
        Prop.ForAll(Gen.Elements(1e-3, 0.37, 0.5, 2.0, 7.3, 1e3).ToArbitrary(), c =>
        {
            List<RunInjection> rows = RunScenario.Rows().Select(r => Rebuild(r, r.Order, ScaleIs(r.Signals, c))).ToList();
            RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
            bool concentrations = Values(report).Zip(Values(Reference), Close).All(x => x);
            bool recoveries = report.Injections.SelectMany(o => o.InternalStandardRecoveries.Select(x => x.RecoveryPercent ?? -1))
                .Zip(Reference.Injections.SelectMany(o => o.InternalStandardRecoveries.Select(x => x.RecoveryPercent ?? -1)), Close).All(x => x);
            // Drift in % of the series mean is scale-free, so the IS trends and every flag stay the same.
            bool drift = report.Drift.Select(d => d.Trend?.DriftOverRunPercent ?? -1).Zip(Reference.Drift.Select(d => d.Trend?.DriftOverRunPercent ?? -1), Close).All(x => x)
                && report.Drift.Select(d => d.IsFlagged).SequenceEqual(Reference.Drift.Select(d => d.IsFlagged));
            return concentrations && recoveries && drift
                && report.Results.Select(r => r.Qualifiers).SequenceEqual(Reference.Results.Select(r => r.Qualifiers))
                && Reported(report).SequenceEqual(Reported(Reference));
        });

    [Property(MaxTest = 100)]
    public Property Process_RowsWithMissingOrInvalidSignals_AreFlaggedNeverDropped() =>
        Prop.ForAll(Seeds, seed =>
        {
            var random = new Random(seed);
            List<RunInjection> rows = RunScenario.Rows();
            var damaged = new HashSet<int>();
            for (int i = 0; i < rows.Count; i++)
            {
                if (random.Next(3) != 0)
                {
                    continue;
                }

                RunInjection r = rows[i];
                double? pb = r.Signals.Analyte("Pb");
                double? bi = r.Signals.InternalStandard("Bi");
                switch (random.Next(3))
                {
                    case 0: pb = null; break;
                    case 1: bi = null; break;
                    default: bi = -random.Next(0, 1000); break;
                }

                rows[i] = Rebuild(r, r.Order, RunScenario.Signals(pb, bi, r.Signals.Analyte("Cd"), r.Signals.InternalStandard("In")));
                damaged.Add(r.Order);
            }

            RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
            bool everyRow = report.Injections.Select(o => o.Injection.Order).SequenceEqual(rows.Select(r => r.Order).OrderBy(o => o));
            bool damagedExcluded = report.Injections.Where(o => damaged.Contains(o.Injection.Order))
                .All(o => o.AnalyteStatuses["Pb"] == InjectionStatus.Excluded && o.Reasons.Any(t => t.StartsWith("Pb:", StringComparison.Ordinal)));
            bool damagedSamplesFlagged = report.Results.Where(r => r.Analyte == "Pb" && r.InjectionOrders.Any(damaged.Contains))
                .All(r => r.Has(ResultQualifiers.MissingOrInvalidSignal));
            bool everySample = report.Results.Count == Reference.Results.Count;
            return everyRow && damagedExcluded && damagedSamplesFlagged && everySample;
        });

    [Property(MaxTest = 50)]
    public Property Process_ReplicateOutlierFlag_NeverRemovesAnInjectionAndIgnoresIsScale() =>
        Prop.ForAll(Seeds, seed =>
        {
            // n = 3–8 replicate injections of an extra sample, Pb ratios around 0.22, sometimes one far off.
            var random = new Random(seed);
            int n = random.Next(3, 9);
            double[] pb = Enumerable.Range(0, n).Select(_ => 22000 + random.Next(-500, 501)).Select(x => (double)x).ToArray();
            if (random.Next(2) == 0)
            {
                pb[random.Next(n)] = 30000;
            }

            List<RunInjection> rows = RunScenario.Rows();
            rows.AddRange(pb.Select((x, k) => RunInjection.Sample(18 + k, "S9", RunScenario.Signals(x, 100000, 15000, 50000))));
            RunReport report = RunProcessor.Process(RunScenario.Run(rows), RunScenario.Method());
            RunReport scaled = RunProcessor.Process(RunScenario.Run(rows.Select(r => Rebuild(r, r.Order, ScaleIs(r.Signals, 3.7))).ToList()), RunScenario.Method());
            AnalyteResult r = report.ResultFor("S9", "Pb")!;
            bool expected = GrubbsTest.Evaluate(pb.Select(x => x / 100000).ToArray(), 0.05, OutlierSide.TwoSided).IsOutlier;
            return r.Quantitation!.Replicates == n
                && report.Injections.Where(o => o.Injection.Id == "S9").All(o => o.AnalyteStatuses["Pb"] == InjectionStatus.Quantified)
                && r.Has(ResultQualifiers.SuspectReplicate) == expected
                && scaled.ResultFor("S9", "Pb")!.Qualifiers == r.Qualifiers;
        });

    internal static RunInjection Rebuild(RunInjection r, int order, InjectionSignals signals) => r.Role switch
    {
        InjectionRole.CalibrationStandard => RunInjection.CalibrationStandard(order, r.Id, Copy(r.Nominal), signals, r.AcquiredAt),
        InjectionRole.CalibrationBlank => RunInjection.CalibrationBlank(order, r.Id, signals, r.AcquiredAt),
        InjectionRole.MethodBlank => RunInjection.MethodBlank(order, r.Id, signals, r.Preparation, r.AcquiredAt),
        InjectionRole.QualityControl => RunInjection.QualityControl(order, r.Id, Copy(r.Nominal), signals, r.AcquiredAt),
        InjectionRole.Sample => RunInjection.Sample(order, r.Id, signals, r.Preparation, r.AcquiredAt),
        InjectionRole.SampleDuplicate => RunInjection.SampleDuplicate(order, r.Id, r.ParentId!, signals, r.Preparation, r.AcquiredAt),
        _ => RunInjection.SpikedSample(order, r.Id, r.ParentId!, Copy(r.Added), signals, r.Preparation, r.AcquiredAt),
    };

    private static Dictionary<string, Concentration> Copy(IReadOnlyDictionary<string, Concentration> map) => map.ToDictionary(p => p.Key, p => p.Value);

    private static InjectionSignals ScaleIs(InjectionSignals s, double c) =>
        new(s.Analytes.ToDictionary(p => p.Key, p => p.Value), s.InternalStandards.ToDictionary(p => p.Key, p => p.Value * c));

    private static void Shuffle<T>(IList<T> list, Random random)
    {
        for (int i = list.Count - 1; i > 0; i--)
        {
            int j = random.Next(i + 1);
            (list[i], list[j]) = (list[j], list[i]);
        }
    }

    private static IEnumerable<string> Summary(RunReport report) =>
        report.Results.Select(r => r.SampleId + "|" + r.Analyte + "|" + (r.InMeasuredSolution?.Value.ToString("R", null) ?? "-") + "|" + (r.InSample?.Value.Value.ToString("R", null) ?? "-") + "|" + r.Reported + "|" + r.Qualifiers)
            .Concat(report.QualityControl.Select(c => c.Injection.Order + "|" + c.Analyte + "|" + c.RecoveryPercent?.ToString("R", null)))
            .Concat(report.Injections.Select(o => o.Injection.Order + "|" + o.Status + "|" + string.Join(";", o.Reasons)))
            .Concat(report.Drift.Select(d => d + "|" + string.Join(",", d.InjectionOrders) + "|" + d.Trend?.Slope.ToString("R", null) + "|" + d.IsFlagged))
            .Concat(report.Notes);

    // Reported status of every result by id and analyte ("-" without a reported value).
    private static IEnumerable<string> Reported(RunReport report) =>
        report.Results.OrderBy(r => r.SampleId, StringComparer.Ordinal).ThenBy(r => r.Analyte, StringComparer.Ordinal)
            .Select(r => r.Reported?.Status.ToString() ?? "-");

    // Every concentration of the report in a fixed order (results by id and analyte, then QC by id and nominal); −1 for none.
    private static IEnumerable<double> Values(RunReport report) =>
        report.Results.OrderBy(r => r.SampleId, StringComparer.Ordinal).ThenBy(r => r.Analyte, StringComparer.Ordinal)
            .SelectMany(r => new[] { r.InMeasuredSolution?.Value ?? -1, r.InSample?.Value.Value ?? -1, r.SampleLower?.Value ?? -1, r.SampleUpper?.Value ?? -1 })
            .Concat(report.QualityControl.OrderBy(c => c.Analyte, StringComparer.Ordinal).ThenBy(c => c.Found?.Value ?? -1).Select(c => c.Found?.Value ?? -1));

    private static bool Close(double a, double b) => Math.Abs(a - b) <= 1e-9 * Math.Max(1, Math.Abs(a));
}
