using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;

namespace InternalStdCal.Tests.Calibration;

/// <summary>Properties of least-squares calibration that hold for any data (standard results).</summary>
public partial class RegressionFitTests
{
    private static readonly Gen<CalibrationModel> Models =
        Gen.Elements(CalibrationModel.Linear, CalibrationModel.LinearThroughOrigin, CalibrationModel.Quadratic);

    [Property(MaxTest = 200)]
    public Property Fit_NoiseFreeData_RecoversCoefficients() =>
        Prop.ForAll(Models.SelectMany(m => Cases(m, noisy: false)).ToArbitrary(), c =>
        {
            RegressionFit fit = RegressionFit.Fit(c.X, c.Y, c.Model);
            double xMax = c.X.Max(Math.Abs);
            double size = Math.Abs(c.A) + (Math.Abs(c.B) * xMax) + (Math.Abs(c.C) * xMax * xMax);
            return Math.Abs(fit.Intercept - c.A) <= 1e-9 * size
                && Math.Abs(fit.Slope - c.B) * xMax <= 1e-9 * size
                && Math.Abs(fit.Curvature - c.C) * xMax * xMax <= 1e-9 * size
                && fit.ResidualStandardDeviation <= 1e-9 * size;
        });

    [Property(MaxTest = 200)]
    public Property Fit_PermutedPoints_GivesSameFit() =>
        Prop.ForAll(
            Models.SelectMany(m => Cases(m, noisy: true))
                .SelectMany(c => Gen.Shuffle(Enumerable.Range(0, c.X.Length)).Select(order => (Case: c, Order: order)))
                .ToArbitrary(),
            t =>
            {
                RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model);
                RegressionFit permuted = RegressionFit.Fit(
                    t.Order.Select(i => t.Case.X[i]).ToArray(),
                    t.Order.Select(i => t.Case.Y[i]).ToArray(),
                    t.Case.Model);
                double scale = t.Case.Y.Max(Math.Abs);
                return t.Case.X.All(x => Math.Abs(fit.Predict(x) - permuted.Predict(x)) <= 1e-11 * scale)
                    && Math.Abs(fit.ResidualStandardDeviation - permuted.ResidualStandardDeviation) <= 1e-9 * (fit.ResidualStandardDeviation + (1e-6 * scale))
                    && Math.Abs(fit.RSquared - permuted.RSquared) <= 1e-12;
            });

    [Property(MaxTest = 200)]
    public Property InversePredict_AllWeightsScaled_IsUnchanged() =>
        Prop.ForAll(
            Models.SelectMany(m => Cases(m, noisy: true))
                .SelectMany(c => Gen.ArrayOf(Gen.Choose(1, 1000), c.X.Length)
                    .SelectMany(w => Gen.Choose(-6, 6).Select(k => (Case: c, Weights: w.Select(v => (double)v).ToArray(), Factor: Math.Pow(10, k)))))
                .ToArbitrary(),
            t =>
            {
                RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model, Weighting.Custom(t.Weights));
                RegressionFit scaled = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model, Weighting.Custom(t.Weights.Select(w => w * t.Factor).ToArray()));
                double y0 = fit.Predict(t.Case.X.Average());
                InversePrediction p = fit.InversePredict(y0, 2, 0.95, 3.0);
                InversePrediction q = scaled.InversePredict(y0, 2, 0.95, 3.0 * t.Factor);
                double scale = t.Case.X.Max(Math.Abs);
                return Math.Abs(p.Value - q.Value) <= 1e-10 * scale
                    && Math.Abs(p.StandardError - q.StandardError) <= 1e-9 * (p.StandardError + (1e-9 * scale))
                    && Math.Abs(p.UnknownWeight - q.UnknownWeight) <= 1e-12 * p.UnknownWeight
                    && t.Case.X.All(x => Math.Abs(fit.Predict(x) - scaled.Predict(x)) <= 1e-11 * t.Case.Y.Max(Math.Abs));
            });

    [Property(MaxTest = 200)]
    public Property InversePredict_AllResponsesScaled_IsUnchanged() =>
        Prop.ForAll(
            Models.SelectMany(m => Cases(m, noisy: true)).SelectMany(c => Gen.Choose(-6, 6).Select(k => (Case: c, Factor: Math.Pow(10, k)))).ToArbitrary(),
            t =>
            {
                RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model);
                RegressionFit scaled = RegressionFit.Fit(t.Case.X, t.Case.Y.Select(y => y * t.Factor).ToArray(), t.Case.Model);
                double xMid = t.Case.X.Average();
                double y0 = fit.Predict(xMid);
                InversePrediction p = fit.InversePredict(y0, 1);
                InversePrediction q = scaled.InversePredict(y0 * t.Factor, 1);
                double scale = t.Case.X.Max(Math.Abs);
                // Near-exact data leave s at the rounding level of the residuals, where both fits agree only to about
                // 1e-14·max|x| (found: x = 45.6, 50.8, 69 on an almost exact line); hence the absolute floor 1e-12·max|x|.
                return Math.Abs(p.Value - q.Value) <= 1e-10 * scale
                    && Math.Abs(p.StandardError - q.StandardError) <= (1e-9 * p.StandardError) + (1e-12 * scale)
                    && Math.Abs((fit.Predict(xMid) * t.Factor) - scaled.Predict(xMid)) <= 1e-11 * t.Factor * t.Case.Y.Max(Math.Abs);
            });

    [Property(MaxTest = 200)]
    public Property InverseEvaluate_IncreasingLine_IsMonotoneInResponse() =>
        Prop.ForAll(
            Cases(CalibrationModel.Linear, noisy: true)
                .Where(c => c.B > 0)
                .SelectMany(c => Gen.Two(Gen.Choose(-1000, 1000)).Select(r => (Case: c, R1: r.Item1, R2: r.Item2)))
                .ToArbitrary(),
            t =>
            {
                RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, CalibrationModel.Linear);
                double span = t.Case.Y.Max() - t.Case.Y.Min();
                double y1 = t.Case.Y.Min() + (span * Math.Min(t.R1, t.R2) / 500.0);
                double y2 = t.Case.Y.Min() + (span * Math.Max(t.R1, t.R2) / 500.0);
                return fit.Slope <= 0 || fit.InversePredict(y1).Value <= fit.InversePredict(y2).Value;
            });

    [Property(MaxTest = 200)]
    public Property InversePredict_MoreReplicates_NarrowsInterval() =>
        Prop.ForAll(
            Models.SelectMany(m => Cases(m, noisy: true)).SelectMany(c => Gen.Choose(1, 20).Select(m => (Case: c, Replicates: m))).ToArbitrary(),
            t =>
            {
                RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, t.Case.Model);
                double y0 = fit.Predict(t.Case.X.Average());
                double fewer = fit.InversePredict(y0, t.Replicates).Interval.Width;
                double more = fit.InversePredict(y0, t.Replicates + 1).Interval.Width;
                return fit.ResidualStandardDeviation > 0 ? more < fewer : more == fewer;
            });

    /// <summary>
    /// Standards with distinct x from integer steps and y = a + b·x + c·x² (a = 0 through the origin, c = 0
    /// unless quadratic) and monotone over the standards, optionally with noise of up to 1 % of the response range.
    /// </summary>
    private static Gen<GeneratedCase> Cases(CalibrationModel model, bool noisy) =>
        from n in Gen.Choose(model == CalibrationModel.Quadratic ? 4 : 3, 12)
        from start in Gen.Choose(-50, 50)
        from steps in Gen.ArrayOf(Gen.Choose(1, 200), n)
        from a in Gen.Choose(-1000, 1000)
        from b in Gen.Choose(1, 1000)
        from negative in Gen.Elements(false, true)
        from c in Gen.Choose(-100, 100)
        from noise in Gen.ArrayOf(Gen.Choose(-100, 100), n)
        select GeneratedCase.Create(model, start, steps, a / 10.0, (negative ? -b : b) / 100.0, c / 10000.0, noisy ? noise : null) into generated
        where generated.IsMonotone
        select generated;

    public sealed record GeneratedCase(CalibrationModel Model, double[] X, double[] Y, double A, double B, double C)
    {
        internal static GeneratedCase Create(CalibrationModel model, int start, int[] steps, double a, double b, double c, int[]? noise)
        {
            if (model != CalibrationModel.Quadratic)
            {
                c = 0;
            }

            if (model == CalibrationModel.LinearThroughOrigin)
            {
                a = 0;
            }

            var x = new double[steps.Length];
            double position = start;
            for (int i = 0; i < x.Length; i++)
            {
                position += steps[i] / 10.0;
                x[i] = position;
            }

            double[] y = x.Select(v => a + (b * v) + (c * v * v)).ToArray();
            if (noise is not null)
            {
                double range = y.Max() - y.Min();
                y = y.Select((v, i) => v + (range * noise[i] / 10000.0)).ToArray();
            }

            return new GeneratedCase(model, x, y, a, b, c);
        }

        /// <summary>The curve has no turning point over the standards (calibration curves are monotone).</summary>
        internal bool IsMonotone => (B + (2 * C * X.Min())) * (B + (2 * C * X.Max())) > 0;

        public override string ToString() =>
            FormattableString.Invariant($"{Model}: x = [{string.Join(", ", X)}], y = [{string.Join(", ", Y)}]");
    }
}
