using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Text;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.IO;
using InternalStdCal.Run;
using InternalStdCal.Tests.IO;
using InternalStdCal.Uncertainty;

namespace InternalStdCal.Tests.CrossBuild;

/// <summary>
/// Computations run once against each build (see <see cref="CrossBuildTests"/>); each returns its results as
/// text with every double as its bit pattern, so equal text means bit-identical results. Invented data.
/// </summary>
internal static class CrossBuildScenarios
{
    internal static string LoadedCoreFramework() =>
        typeof(RegressionFit).Assembly.GetCustomAttributes(typeof(System.Runtime.Versioning.TargetFrameworkAttribute), false) is { Length: 1 } a
            ? ((System.Runtime.Versioning.TargetFrameworkAttribute)a[0]).FrameworkName
            : "none";

    /// <summary>The demo run processed, printed and written as results JSON and CSV.</summary>
    internal static string DemoRun()
    {
        RunReport report = RunResultsJsonTests.ProcessDemo(DriftRule.Magnitude(10));
        var json = new StringWriter();
        var csv = new StringWriter();
        RunResultsJson.Write(report, json);
        RunResultsCsv.Write(report, csv);
        return report + "\n" + json + "\n" + csv;
    }

    /// <summary>Straight, weighted and quadratic fits of seeded data at small, ordinary and large magnitudes.</summary>
    internal static string Fits()
    {
        var text = new StringBuilder();
        foreach (double scale in new[] { 1e-120, 1.0, 1e120 })
        {
            var random = new Xoshiro256StarStar(20261202);
            var x = new double[12];
            var y = new double[12];
            for (int i = 0; i < x.Length; i++)
            {
                x[i] = scale * (i + 1) * (1 + (0.01 * random.NextOpenUnit()));
                y[i] = (3 * scale) + (0.02 * x[i] * (1 + (0.02 * (random.NextOpenUnit() - 0.5))));
            }

            foreach ((CalibrationModel model, Weighting weighting) in new[]
            {
                (CalibrationModel.Linear, Weighting.None),
                (CalibrationModel.Linear, Weighting.InverseXSquared),
                (CalibrationModel.LinearThroughOrigin, Weighting.InverseX),
                (CalibrationModel.Quadratic, Weighting.None),
            })
            {
                text.Append(scale.ToString("R", CultureInfo.InvariantCulture)).Append(' ').Append(model).Append(' ').Append(weighting.Name).Append(':');
                try
                {
                    RegressionFit fit = RegressionFit.Fit(x, y, model, weighting);
                    foreach (double c in fit.Coefficients)
                    {
                        Append(text, c);
                    }

                    Append(text, fit.ResidualStandardDeviation);
                    Append(text, fit.Covariance(0, 0));
                    InverseEstimate inverse = fit.EstimateInverse(y[5], 2);
                    Append(text, inverse.Value);
                    Append(text, inverse.StandardError);
                }
                catch (ArgumentException e)
                {
                    text.Append(' ').Append(e.GetType().Name).Append(": ").Append(e.Message);
                }

                text.Append('\n');
            }
        }

        return text.ToString();
    }

    /// <summary>
    /// Straight lines through the span entry point for every length 3…20 (every tail of the four-lane sums) and
    /// every weighting, on seeded data near 1, offset by 1000, and offset by 1000 with 1e-6 noise (refinement
    /// pass): the netstandard2.0 build sums
    /// one double at a time, the net8.0 build with vectors where the hardware has them.
    /// </summary>
    internal static string LineFits()
    {
        var text = new StringBuilder();
        var random = new Xoshiro256StarStar(20261203);
        for (int n = 3; n <= 20; n++)
        {
            var x = new double[n];
            var u = new double[n];
            var s = new double[n];
            for (int i = 0; i < n; i++)
            {
                x[i] = 0.5 * (i + 1) * (1 + (0.01 * random.NextOpenUnit()));
                u[i] = random.NextOpenUnit() - 0.5;
                s[i] = 0.5 + random.NextOpenUnit();
            }

            foreach ((double offset, double noise) in new[] { (0.0, 0.01), (1000.0, 0.01), (1000.0, 1e-6) })
            {
                var xs = new double[n];
                var y = new double[n];
                for (int i = 0; i < n; i++)
                {
                    xs[i] = x[i] + offset;
                    y[i] = (0.002 + (0.0198 * xs[i])) * (1 + (noise * u[i]));
                }

                foreach (Weighting weighting in new[]
                {
                    Weighting.None, Weighting.InverseX, Weighting.InverseXSquared, Weighting.InverseY, Weighting.InverseYSquared,
                    Weighting.InverseVariance(s), Weighting.Custom(s),
                })
                {
                    LineFit line = RegressionFit.FitLine(xs, y, weighting);
                    text.Append(n).Append(' ').Append(offset).Append(' ').Append(noise).Append(' ').Append(weighting.Name).Append(':');
                    foreach (double v in new[] { line.Intercept, line.Slope, line.WeightedMeanX, line.WeightedMeanY, line.WeightedSumOfSquaresX, line.MinX, line.MaxX, line.ResidualStandardDeviation(xs, y) })
                    {
                        Append(text, v);
                    }

                    text.Append(line.IsRefined ? " refined\n" : "\n");
                }
            }
        }

        return text.ToString();
    }

    /// <summary>GUM and Monte Carlo (fixed and adaptive) evaluations of one product model.</summary>
    internal static string Uncertainty()
    {
        MeasurementModel model = MeasurementModel.Product(
            "y", "mg/L", 1, new[] { UncertainInput.Rectangular("a", 1, 0.1), UncertainInput.Normal("b", 2, 0.05), UncertainInput.Triangular("c", 0.5, 0.01) }, new[] { 1.0, -1.0, 2.0 });
        var text = new StringBuilder();
        GumEvaluation gum = model.EvaluateGum();
        text.Append(gum).Append('\n');
        foreach (MonteCarloEvaluation mc in new[] { model.EvaluateMonteCarlo(50_000, 7), model.EvaluateMonteCarloAdaptive(11) })
        {
            Append(text, mc.Value);
            Append(text, mc.StandardUncertainty);
            Append(text, mc.SymmetricInterval.Lower);
            Append(text, mc.SymmetricInterval.Upper);
            Append(text, mc.ShortestInterval.Lower);
            Append(text, mc.ShortestInterval.Upper);
            text.Append(' ').Append(mc.Trials.ToString(CultureInfo.InvariantCulture)).Append('\n');
        }

        return text.ToString();
    }

    /// <summary>The TwoProduct error term (fused multiply-add on net8.0, Dekker's split on netstandard2.0) over
    /// seeded operands in the documented range, |a|, |b| ≤ 1e300 with a finite product.</summary>
    internal static string ProductErrors()
    {
        var random = new Xoshiro256StarStar(42);
        var text = new StringBuilder();
        for (int i = 0; i < 20_000; i++)
        {
            double a = Operand(ref random, 300);
            double b = Operand(ref random, 300);
            double p = a * b;
            if (double.IsInfinity(p) || Math.Abs(p) < 1e-290)
            {
                continue;
            }

            Append(text, CompensatedSum.ProductError(a, b, p));
        }

        return text.ToString();
    }

    /// <summary>The message for an undefined enum value (Enum.IsDefined/GetNames differ by target).</summary>
    internal static string UndefinedEnumMessage()
    {
        try
        {
            _ = new CalibrationOptions { Blanks = (BlankHandling)99 };
            return "no exception";
        }
        catch (ArgumentOutOfRangeException e)
        {
            return e.Message;
        }
    }

    private static double Operand(ref Xoshiro256StarStar random, int maxDecade)
    {
        double decade = Math.Floor(((2 * random.NextOpenUnit()) - 1) * maxDecade);
        double mantissa = 1 + (9 * random.NextOpenUnit());
        return (random.NextOpenUnit() < 0.5 ? -1 : 1) * mantissa * Math.Pow(10, decade);
    }

    private static void Append(StringBuilder text, double value) =>
        text.Append(' ').Append(BitConverter.DoubleToInt64Bits(value).ToString("X16", CultureInfo.InvariantCulture));
}
