using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// An invented multi-element run from <see cref="FixedSeedData"/>: 40 analytes (A01…A40) corrected by 4 internal
/// standards (IS1…IS4, analyte i uses IS (i mod 4) + 1), a calibration blank and 7 standards at the start, then
/// blocks of 8 injections (5 samples, a duplicate, a spike, a check standard) up to the requested count. Analyte
/// response ratio y = a + b·x with ±0.5 % noise; IS signals 10⁵ ± 10 %. Every sample is diluted 1 → 10 mL.
/// </summary>
internal static class RunData
{
    internal const int AnalyteCount = 40;
    internal const int InternalStandardCount = 4;

    private static readonly double[] Levels = { 0.5, 1, 2, 5, 10, 20, 50 };

    internal static string Analyte(int i) => "A" + (i + 1).ToString("00", System.Globalization.CultureInfo.InvariantCulture);

    internal static string InternalStandard(int i) => "IS" + ((i % InternalStandardCount) + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);

    internal static AnalyticalRun Run(int injections, int analyteCount = AnalyteCount)
    {
        ulong state = FixedSeedData.Seed;
        var analytes = new string[analyteCount];
        var slopes = new double[analyteCount];
        for (int i = 0; i < analyteCount; i++)
        {
            analytes[i] = Analyte(i);
            slopes[i] = 0.01 + (0.002 * i);
        }

        var internalStandards = new string[InternalStandardCount];
        for (int k = 0; k < InternalStandardCount; k++)
        {
            internalStandards[k] = InternalStandard(k);
        }

        var dilution = SamplePreparation.Liquid(DilutionStep.Volumetric(Measured.Exact(Volume.FromMillilitres(1)), Measured.Exact(Volume.FromMillilitres(10))));
        var rows = new List<RunInjection>(injections);
        int order = 0;
        rows.Add(RunInjection.CalibrationBlank(++order, "BLK", Signals(0, slopes, ref state)));
        for (int l = 0; l < Levels.Length && rows.Count < injections; l++)
        {
            rows.Add(RunInjection.CalibrationStandard(++order, "CAL-" + (l + 1).ToString(System.Globalization.CultureInfo.InvariantCulture), Nominal(Levels[l], analytes), Signals(Levels[l], slopes, ref state)));
        }

        int sample = 0;
        double x = 0;
        while (rows.Count < injections)
        {
            // Slots 0–4 samples (new x), 5 duplicate of sample 4 (same x), 6 its spike (+100 µg/L = +10 measured), 7 QC.
            int slot = (rows.Count - 8) % 8;
            if (slot < 5)
            {
                x = 0.5 + (30 * FixedSeedData.NextUnit(ref state));
            }

            switch (slot)
            {
                case 5:
                    rows.Add(RunInjection.SampleDuplicate(++order, "S" + Id(sample) + "-D", "S" + Id(sample), Signals(x, slopes, ref state), dilution));
                    break;
                case 6:
                    rows.Add(RunInjection.SpikedSample(++order, "S" + Id(sample) + "-MS", "S" + Id(sample), Nominal(100, analytes), Signals(x + 10, slopes, ref state), dilution));
                    break;
                case 7:
                    rows.Add(RunInjection.QualityControl(++order, "CCV", Nominal(10, analytes), Signals(10, slopes, ref state)));
                    break;
                default:
                    rows.Add(RunInjection.Sample(++order, "S" + Id(++sample), Signals(x, slopes, ref state), dilution));
                    break;
            }
        }

        return AnalyticalRun.Create("invented benchmark run", analytes, internalStandards, rows);
    }

    internal static RunMethod Method(int analyteCount = AnalyteCount)
    {
        var analytes = new AnalyteMethod[analyteCount];
        for (int i = 0; i < analyteCount; i++)
        {
            analytes[i] = new AnalyteMethod(
                Analyte(i),
                InternalStandard(i),
                RatioModel.Linear,
                Weighting.InverseX,
                new CalibrationOptions { Blanks = BlankHandling.Exclude },
                acceptance: AcceptanceRuleSet.UsEpa8000D,
                limits: new ReportingLimits(Concentration.FromMicrogramsPerLitre(0.05), Concentration.FromMicrogramsPerLitre(0.15)));
        }

        var isConcentrations = new Dictionary<string, Concentration>(StringComparer.Ordinal);
        for (int k = 0; k < InternalStandardCount; k++)
        {
            isConcentrations[InternalStandard(k)] = Concentration.FromMicrogramsPerLitre(10);
        }

        return new RunMethod("invented multi-element method", analytes, isConcentrations, InternalStandardRecoveryWindow.UsEpa200Point8)
        {
            QualityControlRecovery = new RecoveryWindow("invented QC window", "invented", 90, 110),
            DuplicateRpd = new RpdLimit("invented RPD limit", "invented", 20),
            SpikeRecovery = new RecoveryWindow("invented spike window", "invented", 75, 125),
        };
    }

    private static string Id(int sample) => sample.ToString("0000", System.Globalization.CultureInfo.InvariantCulture);

    private static Dictionary<string, Concentration> Nominal(double x, string[] analytes)
    {
        var d = new Dictionary<string, Concentration>(StringComparer.Ordinal);
        foreach (string a in analytes)
        {
            d[a] = Concentration.FromMicrogramsPerLitre(x);
        }

        return d;
    }

    private static InjectionSignals Signals(double x, double[] slopes, ref ulong state)
    {
        var isSignals = new Dictionary<string, double>(StringComparer.Ordinal);
        var isValues = new double[InternalStandardCount];
        for (int k = 0; k < InternalStandardCount; k++)
        {
            isValues[k] = 1e5 * (0.9 + (0.2 * FixedSeedData.NextUnit(ref state)));
            isSignals[InternalStandard(k)] = isValues[k];
        }

        var signals = new Dictionary<string, double>(StringComparer.Ordinal);
        for (int i = 0; i < slopes.Length; i++)
        {
            double y = (0.002 + (slopes[i] * x)) * (1 + (0.01 * (FixedSeedData.NextUnit(ref state) - 0.5)));
            signals[Analyte(i)] = y * isValues[i % InternalStandardCount];
        }

        return new InjectionSignals(signals, isSignals);
    }
}
