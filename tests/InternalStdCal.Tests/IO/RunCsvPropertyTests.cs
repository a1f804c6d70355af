using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.IO;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.Tests.IO;

// Property tests on invented, randomly generated runs: writing then reading gives an equal run (common practice
// for a file format: a round trip loses nothing the format claims to hold).
public class RunCsvPropertyTests
{
    private static readonly string[] Names = { "Cd-111", "Pb 208", "Hg,202", "As\"75", "Cu:63", "Zn-66" };

    private static readonly ConcentrationUnit[] Units = { ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.NanomolePerLitre, ConcentrationUnit.MilligramPerKilogram, ConcentrationUnit.Percent };

    private static Arbitrary<AnalyticalRun> Runs => Gen.Choose(0, int.MaxValue).Select(seed => Generate(new Random(seed))).ToArbitrary();

    [Property(MaxTest = 200)]
    public Property Write_AnyRun_CsvReadsBackEqual() =>
        Prop.ForAll(Runs, run =>
        {
            var text = new StringWriter();
            RunCsv.Write(run, text);
            RunReadResult back = RunCsv.Read(new StringReader(text.ToString()), run.Name);
            Xunit.Assert.True(back.IsClean, string.Join("; ", back.Problems) + "\n" + text);
            RunAssert.Equal(run, back.Run!);
        });

    [Property(MaxTest = 200)]
    public Property Write_AnyRun_JsonReadsBackEqual() =>
        Prop.ForAll(Runs, run =>
        {
            var text = new StringWriter();
            RunJson.Write(run, text);
            RunReadResult back = RunJson.Read(new StringReader(text.ToString()));
            Xunit.Assert.True(back.IsClean, string.Join("; ", back.Problems) + "\n" + text);
            RunAssert.Equal(run, back.Run!);
        });

    private static AnalyticalRun Generate(Random rnd)
    {
        string[] analytes = Names.OrderBy(_ => rnd.Next()).Take(rnd.Next(1, 4)).ToArray();
        string[] iss = new[] { "Rh-103", "In 115", "Bi,209" }.Take(rnd.Next(1, 4)).ToArray();
        int count = rnd.Next(1, 15);
        var rows = new List<RunInjection>();
        var samples = new List<string>();
        var orders = Enumerable.Range(0, count).Select(i => i * 3 - 7 + rnd.Next(0, 3)).OrderBy(_ => rnd.Next()).ToArray();
        for (int i = 0; i < count; i++)
        {
            int order = orders[i];
            string id = "ID-" + i + (rnd.Next(4) == 0 ? ", \"quoted\"" : string.Empty);
            var signals = new InjectionSignals(Signals(rnd, analytes), Signals(rnd, iss));
            DateTimeOffset? time = rnd.Next(3) == 0 ? null : new DateTimeOffset(2026, 1, 1, 0, 0, 0, TimeSpan.FromMinutes(15 * rnd.Next(-40, 50))).AddTicks((long)(rnd.NextDouble() * TimeSpan.TicksPerDay * 300));
            int kind = samples.Count == 0 ? rnd.Next(5) : rnd.Next(7);
            rows.Add(kind switch
            {
                0 => RunInjection.CalibrationStandard(order, id, Concentrations(rnd, analytes, allowZero: true), signals, time),
                1 => RunInjection.CalibrationBlank(order, id, signals, time),
                2 => RunInjection.QualityControl(order, id, Concentrations(rnd, analytes, allowZero: false), signals, time),
                3 => RunInjection.MethodBlank(order, id, signals, Preparation(rnd), time),
                4 => RunInjection.Sample(order, id, signals, Preparation(rnd), time),
                5 => RunInjection.SampleDuplicate(order, id, samples[rnd.Next(samples.Count)], signals, Preparation(rnd), time),
                _ => RunInjection.SpikedSample(order, id, samples[rnd.Next(samples.Count)], Concentrations(rnd, analytes, allowZero: false), signals, Preparation(rnd), time),
            });
            if (kind == 4)
            {
                samples.Add(id);
            }
        }

        return AnalyticalRun.Create("run " + rnd.Next(), analytes, iss, rows);
    }

    private static Dictionary<string, double> Signals(Random rnd, string[] names) =>
        names.Where(_ => rnd.Next(5) > 0).ToDictionary(n => n, _ => rnd.Next(4) switch
        {
            0 => Math.Round(rnd.NextDouble() * 1e5, 1),
            1 => -rnd.NextDouble() * 10,
            2 => 0,
            _ => (rnd.NextDouble() - 0.3) * Math.Pow(10, rnd.Next(-30, 30)),
        });

    private static Dictionary<string, Concentration> Concentrations(Random rnd, string[] analytes, bool allowZero)
    {
        var d = analytes.Where(_ => rnd.Next(3) > 0).ToDictionary(a => a, a => Concentration.From(allowZero && rnd.Next(4) == 0 ? 0 : rnd.NextDouble() * Math.Pow(10, rnd.Next(-3, 4)) + 1e-9, Units[rnd.Next(Units.Length)]));
        if (d.Count == 0)
        {
            d[analytes[0]] = Concentration.FromMicrogramsPerLitre(1.5);
        }

        return d;
    }

    private static SamplePreparation? Preparation(Random rnd)
    {
        DilutionStep Step() => rnd.Next(3) switch
        {
            0 => DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1 + rnd.Next(5))), Measured.Exact(Volume.FromMillilitres(10 + rnd.NextDouble() * 90))),
            1 => DilutionStep.Volumetric(Measured.WithStandardUncertainty(Volume.FromMicrolitres(100 + rnd.NextDouble()), Volume.FromMicrolitres(0.5)), Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02))),
            _ => DilutionStep.Gravimetric(Measured.Exact(Mass.FromGrams(0.5 + rnd.NextDouble())), Measured.WithStandardUncertainty(Mass.FromGrams(20 + rnd.NextDouble()), Mass.FromMilligrams(0.1))),
        };
        DilutionStep[] steps = Enumerable.Range(0, rnd.Next(0, 3)).Select(_ => Step()).ToArray();
        return rnd.Next(4) switch
        {
            0 => null,
            1 => SamplePreparation.Liquid(steps),
            2 => SamplePreparation.SolidToVolume(Measured.WithStandardUncertainty(Volume.FromMillilitres(50), Volume.FromMillilitres(0.04)), Measured.Exact(Mass.FromGrams(0.2 + rnd.NextDouble())), ConcentrationUnit.MilligramPerKilogram, steps),
            _ => SamplePreparation.SolidToMass(Measured.Exact(Mass.FromGrams(50 + rnd.NextDouble())), Measured.WithStandardUncertainty(Mass.FromGrams(0.25), Mass.FromMilligrams(0.1)), ConcentrationUnit.MicrogramPerKilogram, steps),
        };
    }
}
