using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Quantitation;

/// <summary>
/// A random internal-standard calibration design for property tests: 5–8 levels, 1–3 injections each, a true ratio
/// function y = a + b·q + c·q² of q = C_x/C_is, relative noise up to ±2 %, drifting IS signals, and one unknown.
/// </summary>
internal sealed class CalibrationDesign
{
    private CalibrationDesign(double[] conc, double[] isConc, double a, double b, double c, int reps, double[] noise, double[] isSignal, double unknownConc, double unknownIs, double unknownIsSignal)
    {
        Conc = conc;
        IsConc = isConc;
        A = a;
        B = b;
        C = c;
        Reps = reps;
        Noise = noise;
        IsSignal = isSignal;
        UnknownConc = unknownConc;
        UnknownIs = unknownIs;
        UnknownIsSignal = unknownIsSignal;
    }

    internal double[] Conc { get; }

    internal double[] IsConc { get; }

    internal double A { get; }

    internal double B { get; }

    internal double C { get; }

    internal int Reps { get; }

    internal double[] Noise { get; }

    internal double[] IsSignal { get; }

    internal double UnknownConc { get; }

    internal double UnknownIs { get; }

    internal double UnknownIsSignal { get; }

    /// <summary>Designs with a common IS concentration (concentration axis) or one per standard (ratio axis).</summary>
    internal static Arbitrary<CalibrationDesign> Arbitrary(bool variableIs, bool noisy, bool intercept, bool curved) =>
        (from n in Gen.Choose(5, 8)
         from steps in Gen.ArrayOf(Gen.Choose(1, 20), n)
         from reps in Gen.Choose(1, 3)
         from isBase in Gen.Choose(1, 50)
         from isSteps in Gen.ArrayOf(Gen.Choose(5, 20), n)
         from a in Gen.Choose(0, 50)
         from b in Gen.Choose(50, 2000)
         from c in Gen.Choose(-20, 20)
         from noise in Gen.ArrayOf(Gen.Choose(-200, 200), n * 3)
         from isSignal in Gen.ArrayOf(Gen.Choose(20000, 120000), n * 3)
         from unknownAt in Gen.Choose(5, 95)
         from unknownIsStep in Gen.Choose(5, 20)
         from unknownIsSignal in Gen.Choose(20000, 120000)
         select Build(steps, reps, isBase, isSteps, a, b, c, noise, isSignal, unknownAt, unknownIsStep, unknownIsSignal, variableIs, noisy, intercept, curved))
        .ToArbitrary();

    internal double RatioAt(double q) => A + (B * q) + (C * q * q);

    internal IReadOnlyList<CalibrationStandard> Standards(double isScale = 1, double analyteSignalScale = 1, double isSignalScale = 1)
    {
        var list = new List<CalibrationStandard>();
        for (int i = 0; i < Conc.Length; i++)
        {
            double q = Conc[i] / IsConc[i];
            var injections = new List<Injection>();
            for (int j = 0; j < Reps; j++)
            {
                int k = (i * 3) + j;
                double ais = IsSignal[k];
                injections.Add(new Injection(RatioAt(q) * (1 + Noise[k]) * ais * analyteSignalScale, ais * isSignalScale));
            }

            list.Add(new CalibrationStandard(
                "S" + (i + 1).ToString(CultureInfo.InvariantCulture),
                Concentration.FromMicrogramsPerLitre(Conc[i]),
                Concentration.FromMicrogramsPerLitre(IsConc[i] * isScale),
                injections));
        }

        return list;
    }

    internal UnknownSample Unknown(double isScale = 1, double analyteSignalScale = 1, double isSignalScale = 1) =>
        UnknownSample.Create(
            "U",
            Concentration.FromMicrogramsPerLitre(UnknownIs * isScale),
            new Injection(RatioAt(UnknownConc / UnknownIs) * UnknownIsSignal * analyteSignalScale, UnknownIsSignal * isSignalScale));

    /// <inheritdoc />
    public override string ToString() => string.Format(
        CultureInfo.InvariantCulture,
        "conc [{0}], IS [{1}], y = {2} + {3}·q + {4}·q², reps {5}, unknown {6} (IS {7})",
        string.Join(", ", Conc),
        string.Join(", ", IsConc),
        A,
        B,
        C,
        Reps,
        UnknownConc,
        UnknownIs);

    private static CalibrationDesign Build(int[] steps, int reps, int isBase, int[] isSteps, int a, int b, int c, int[] noise, int[] isSignal, int unknownAt, int unknownIsStep, int unknownIsSignal, bool variableIs, bool noisy, bool intercept, bool curved)
    {
        double[] conc = new double[steps.Length];
        double sum = 0;
        for (int i = 0; i < steps.Length; i++)
        {
            sum += steps[i] * 0.5;
            conc[i] = sum;
        }

        double isC = isBase;
        double[] isConc = isSteps.Select(s => variableIs ? isC * s / 10.0 : isC).ToArray();
        double unknownIs = variableIs ? isC * unknownIsStep / 10.0 : isC;
        double qMax = conc.Zip(isConc, (x, y) => x / y).Max();

        // Curvature kept small enough that y stays monotone over the range: |c|·2·qMax ≤ 0.2·b.
        double slope = b / 1000.0;
        double curvature = curved ? c / 100.0 * slope / qMax : 0;

        // Unknown between the lowest and highest standard on the ratio axis.
        double qMin = conc.Zip(isConc, (x, y) => x / y).Min();
        double qUnknown = qMin + ((qMax - qMin) * unknownAt / 100.0);
        return new CalibrationDesign(
            conc,
            isConc,
            intercept ? a / 1000.0 : 0,
            slope,
            curvature,
            reps,
            noise.Select(e => noisy ? e / 10000.0 : 0).ToArray(),
            isSignal.Select(s => (double)s).ToArray(),
            qUnknown * unknownIs,
            unknownIs,
            unknownIsSignal);
    }
}
