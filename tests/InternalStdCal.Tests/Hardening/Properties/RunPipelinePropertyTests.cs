using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Threading.Tasks;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.IO;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Hardening.Properties;

// Quantitation → Preparation → Run on random invented runs: a noise-free run quantifies every sample back to its
// true concentration in the original sample (liquid dilution chains and solid digests, w = C·DF·V/m); every input
// row gets exactly one status row, also when signals are missing or invalid; and the report does not depend on how
// many threads process runs at the same time (compared as results JSON text, bit for bit).
public class RunPipelinePropertyTests
{
    private static Arbitrary<int> Seeds => Gen.Choose(0, int.MaxValue).ToArbitrary();

    [Property(MaxTest = 60)]
    public Property Process_NoiseFreeRun_QuantifiesEverySampleBackToItsTrueConcentration() =>
        Prop.ForAll(Seeds, seed =>
        {
            RandomRun r = RandomRun.Build(new Random(seed), damage: false);
            RunReport report = RunProcessor.Process(r.Run, r.Method);
            foreach ((string id, string analyte, Concentration truth) in r.Truth)
            {
                AnalyteResult? result = report.ResultFor(id, analyte);
                Assert.True(result?.InSample is Measured<Concentration>, id + "/" + analyte + " has no result in the sample: " + string.Join(" | ", result?.Notes ?? Array.Empty<string>()) + "\n" + r);
                double got = result!.InSample!.Value.Value.In(truth.Unit);
                Assert.True(Math.Abs(got - truth.Value) <= 1e-8 * truth.Value, id + "/" + analyte + ": " + got.ToString("R", CultureInfo.InvariantCulture) + " for " + truth + "\n" + r);
            }
        });

    [Property(MaxTest = 60)]
    public Property Process_RandomRunWithInvalidSignals_EveryRowHasExactlyOneStatusRow() =>
        Prop.ForAll(Seeds, seed =>
        {
            RandomRun r = RandomRun.Build(new Random(seed), damage: true);
            RunReport report = RunProcessor.Process(r.Run, r.Method);
            int[] input = r.Run.Injections.Select(i => i.Order).OrderBy(o => o).ToArray();
            Assert.Equal(input, report.Injections.Select(o => o.Injection.Order).OrderBy(o => o));
            Assert.Equal(input, RunResults.From(report).Injections.Select(o => o.Order).OrderBy(o => o));
            Assert.All(report.Injections, o => Assert.Equal(r.Run.Analytes.OrderBy(a => a, StringComparer.Ordinal), o.AnalyteStatuses.Keys.OrderBy(a => a, StringComparer.Ordinal)));
        });

    [Property(MaxTest = 15)]
    public Property Process_OnOneOrManyThreads_BitIdenticalResults() =>
        Prop.ForAll(Seeds, seed =>
        {
            RandomRun r = RandomRun.Build(new Random(seed), damage: seed % 2 == 0);
            string serial = Text(RunProcessor.Process(r.Run, r.Method));
            var parallel = new string[4];
            Parallel.For(0, parallel.Length, new ParallelOptions { MaxDegreeOfParallelism = 4 }, i => parallel[i] = Text(RunProcessor.Process(r.Run, r.Method)));
            Assert.All(parallel, p => Assert.Equal(serial, p));
        });

    private static string Text(RunReport report)
    {
        var json = new StringWriter();
        RunResultsJson.Write(report, json);
        return json + "\n" + report;
    }

    /// <summary>A random run with a noise-free response y = a + b·x + c·x² per analyte (x in µg/L in the measured
    /// solution), IS signals within ±15 % of the calibration blank, and samples whose true concentration is known.</summary>
    private sealed class RandomRun
    {
        private static readonly Concentration IsConcentration = Concentration.FromMicrogramsPerLitre(10);

        private RandomRun(AnalyticalRun run, RunMethod method, List<(string, string, Concentration)> truth, string description)
        {
            Run = run;
            Method = method;
            Truth = truth;
            Description = description;
        }

        internal AnalyticalRun Run { get; }

        internal RunMethod Method { get; }

        internal List<(string Id, string Analyte, Concentration Truth)> Truth { get; }

        private string Description { get; }

        public override string ToString() => Description;

        internal static RandomRun Build(Random rnd, bool damage)
        {
            string[] analytes = new[] { "An-1", "An-2", "An-3" }.Take(rnd.Next(1, 4)).ToArray();
            var models = analytes.ToDictionary(a => a, _ => (RatioModel)new[] { 1, 2, 3, 4 }[rnd.Next(4)]);
            var coefficients = analytes.ToDictionary(a => a, a =>
            {
                double b = 0.01 + rnd.NextDouble();
                double intercept = models[a] is RatioModel.Linear or RatioModel.Quadratic ? rnd.NextDouble() * 0.05 : 0;
                double curve = models[a] == RatioModel.Quadratic ? (rnd.NextDouble() - 0.5) * b / 500 : 0;
                return (A: intercept, B: b, C: curve);
            });
            double Ratio(string a, double x) => coefficients[a].A + (coefficients[a].B * x) + (coefficients[a].C * x * x);

            int levels = rnd.Next(5, 8);
            double[] x = new double[levels];
            for (int i = 0, sum = 0; i < levels; i++)
            {
                sum += rnd.Next(1, 40);
                x[i] = sum / 2.0;
            }

            double isBase = 50_000 + rnd.Next(50_000);
            double IsSignal() => isBase * (0.9 + (rnd.NextDouble() * 0.2));
            InjectionSignals Signals(Func<string, double> conc)
            {
                double s = IsSignal();
                InjectionSignals signals = InjectionSignals.Empty.WithInternalStandard("IS", s);
                foreach (string a in analytes)
                {
                    signals = signals.WithAnalyte(a, Ratio(a, conc(a)) * s);
                }

                return signals;
            }

            var rows = new List<RunInjection>();
            int order = 1;
            rows.Add(RunInjection.CalibrationBlank(order++, "BLK", Signals(_ => 0)));
            for (int i = 0; i < levels; i++)
            {
                double xi = x[i];
                rows.Add(RunInjection.CalibrationStandard(order++, "CAL-" + (i + 1).ToString(CultureInfo.InvariantCulture), analytes.ToDictionary(a => a, _ => Concentration.FromMicrogramsPerLitre(xi)), Signals(_ => xi)));
            }

            double qcX = x[levels / 2];
            rows.Add(RunInjection.QualityControl(order++, "QC", analytes.ToDictionary(a => a, _ => Concentration.FromMicrogramsPerLitre(qcX)), Signals(_ => qcX)));
            var truth = new List<(string, string, Concentration)>();
            int samples = rnd.Next(1, 6);
            for (int k = 0; k < samples; k++)
            {
                string id = "S-" + k.ToString(CultureInfo.InvariantCulture);
                var measured = analytes.ToDictionary(a => a, _ => x[0] + ((x[levels - 1] - x[0]) * rnd.NextDouble()));
                // The measured solution is a concentration per volume, so its dilutions are volumetric.
                DilutionStep[] steps = Enumerable.Range(0, rnd.Next(0, 3)).Select(_ => (DilutionStep)DilutionStep.Volumetric(
                    Measured.WithStandardUncertainty(Volume.FromMillilitres(rnd.Next(1, 10)), Volume.FromMillilitres(0.01)),
                    Measured.Exact(Volume.FromMillilitres(rnd.Next(10, 100) + rnd.NextDouble())))).ToArray();
                double df = steps.Aggregate(1.0, (f, s) => f * s.DilutionFactor);
                SamplePreparation prep;
                if (rnd.Next(3) == 0)
                {
                    double grams = 0.1 + (rnd.NextDouble() * 0.4), millilitres = rnd.Next(10, 100);
                    prep = SamplePreparation.SolidToVolume(Measured.Exact(Volume.FromMillilitres(millilitres)), Measured.WithStandardUncertainty(Mass.FromGrams(grams), Mass.FromMilligrams(0.1)), ConcentrationUnit.MilligramPerKilogram, steps);

                    // w = C·DF·V/m: 1 µg/L · 1 mL / 1 g = 1 µg/kg = 0.001 mg/kg.
                    truth.AddRange(analytes.Select(a => (id, a, Concentration.From(measured[a] * df * millilitres / grams / 1000, ConcentrationUnit.MilligramPerKilogram))));
                }
                else
                {
                    prep = SamplePreparation.Liquid(steps);
                    truth.AddRange(analytes.Select(a => (id, a, Concentration.FromMicrogramsPerLitre(measured[a] * df))));
                }

                rows.Add(RunInjection.Sample(order++, id, Signals(a => measured[a]), prep));
                if (k == 0)
                {
                    rows.Add(RunInjection.SampleDuplicate(order++, id + "D", id, Signals(a => measured[a] * (0.95 + (rnd.NextDouble() * 0.1))), prep));
                    rows.Add(RunInjection.SpikedSample(order++, id + "S", id, analytes.ToDictionary(a => a, _ => Concentration.FromMicrogramsPerLitre(x[0])), Signals(a => Math.Min(measured[a] + (x[0] / df), x[levels - 1])), prep));
                }
            }

            if (damage)
            {
                for (int i = 0; i < rows.Count; i++)
                {
                    if (rnd.Next(4) == 0)
                    {
                        rows[i] = Damage(rnd, rows[i], analytes);
                    }
                }
            }

            // Injection order is the acquisition order, not the list order: shuffle the list.
            rows = rows.OrderBy(_ => rnd.Next()).ToList();
            var method = new RunMethod(
                "invented random method",
                analytes.Select(a => new AnalyteMethod(a, "IS", models[a])),
                new Dictionary<string, Concentration> { ["IS"] = IsConcentration },
                InternalStandardRecoveryWindow.UsEpa200Point8);
            string description = "levels " + string.Join(", ", x) + "; " + string.Join("; ", analytes.Select(a => a + " " + models[a] + " " + coefficients[a]));
            return new RandomRun(AnalyticalRun.Create("random", analytes, new[] { "IS" }, rows), method, truth, description);
        }

        private static RunInjection Damage(Random rnd, RunInjection r, string[] analytes)
        {
            InjectionSignals s = InjectionSignals.Empty;
            foreach (string a in analytes)
            {
                double? v = r.Signals.Analyte(a);
                if (rnd.Next(3) == 0)
                {
                    v = rnd.Next(2) == 0 ? null : -rnd.Next(1, 1000);
                }

                if (v is double d)
                {
                    s = s.WithAnalyte(a, d);
                }
            }

            switch (rnd.Next(4))
            {
                case 0:
                    break;
                case 1:
                    s = s.WithInternalStandard("IS", 0);
                    break;
                case 2:
                    s = s.WithInternalStandard("IS", -rnd.Next(1, 1000));
                    break;
                default:
                    s = s.WithInternalStandard("IS", r.Signals.InternalStandard("IS")!.Value);
                    break;
            }

            return r.Role switch
            {
                InjectionRole.CalibrationBlank => RunInjection.CalibrationBlank(r.Order, r.Id, s),
                InjectionRole.CalibrationStandard => RunInjection.CalibrationStandard(r.Order, r.Id, r.Nominal, s),
                InjectionRole.QualityControl => RunInjection.QualityControl(r.Order, r.Id, r.Nominal, s),
                InjectionRole.Sample => RunInjection.Sample(r.Order, r.Id, s, r.Preparation),
                InjectionRole.SampleDuplicate => RunInjection.SampleDuplicate(r.Order, r.Id, r.ParentId!, s, r.Preparation),
                _ => RunInjection.SpikedSample(r.Order, r.Id, r.ParentId!, r.Added, s, r.Preparation),
            };
        }
    }
}
