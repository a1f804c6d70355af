using System;
using System.Collections.Generic;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// The span entry point <see cref="RegressionFit.FitLine"/>: the same numbers as the class path bit for bit, the
/// standard least-squares invariants, and bad input named like the class path (project rule).
/// </summary>
public partial class RegressionFitTests
{
    /// <summary>Weightings for generated cases: none, 1/x and 1/x² (positive x only), custom, 1/s².</summary>
    private static Gen<(GeneratedCase Case, Weighting Weighting)> WeightedLineCases =>
        from c in Cases(CalibrationModel.Linear, noisy: true)
        from kind in Gen.Choose(0, 4)
        from values in Gen.ArrayOf(Gen.Choose(1, 1000), c.X.Length)
        select (c, kind switch
        {
            1 when c.X.Min() > 0 => Weighting.InverseX,
            2 when c.X.Min() > 0 => Weighting.InverseXSquared,
            3 => Weighting.Custom(values.Select(v => (double)v).ToArray()),
            4 => Weighting.InverseVariance(values.Select(v => v / 100.0).ToArray()),
            _ => Weighting.None,
        });

    [Property(MaxTest = 300)]
    public Property FitLine_AnyData_EqualsClassPathBitForBit() =>
        Prop.ForAll(WeightedLineCases.ToArbitrary(), t =>
        {
            LineFit line = RegressionFit.FitLine(t.Case.X, t.Case.Y, t.Weighting);
            RegressionFit fit = RegressionFit.Fit(t.Case.X, t.Case.Y, CalibrationModel.Linear, t.Weighting);

            // A list (not an array) takes the checked path with exactly scaled weights: still the same numbers.
            RegressionFit listed = RegressionFit.Fit(new List<double>(t.Case.X), new List<double>(t.Case.Y), CalibrationModel.Linear, t.Weighting);
            return line.Intercept.Equals(fit.Intercept) && line.Slope.Equals(fit.Slope)
                && line.WeightedMeanX.Equals(fit.WeightedMeanX) && line.WeightedMeanY.Equals(fit.WeightedMeanY)
                && line.WeightedSumOfSquaresX.Equals(fit.WeightedSumOfSquaresX)
                && line.MinX.Equals(fit.MinX) && line.MaxX.Equals(fit.MaxX) && line.Count == fit.Count
                && line.ResidualStandardDeviation(t.Case.X, t.Case.Y).Equals(fit.ResidualStandardDeviation)
                && t.Case.X.All(x => line.Predict(x).Equals(fit.Predict(x)))
                && listed.Intercept.Equals(fit.Intercept) && listed.Slope.Equals(fit.Slope);
        });

    [Property(MaxTest = 200)]
    public Property FitLine_NoiseFreeData_RecoversCoefficients() =>
        Prop.ForAll(Cases(CalibrationModel.Linear, noisy: false).ToArbitrary(), c =>
        {
            LineFit line = RegressionFit.FitLine(c.X, c.Y);
            double xMax = c.X.Max(Math.Abs);
            double size = Math.Abs(c.A) + (Math.Abs(c.B) * xMax);
            return Math.Abs(line.Intercept - c.A) <= 1e-12 * size
                && Math.Abs(line.Slope - c.B) * xMax <= 1e-12 * size
                && line.ResidualStandardDeviation(c.X, c.Y) <= 1e-12 * size;
        });

    [Property(MaxTest = 200)]
    public Property FitLine_PermutedPoints_GivesSameLine() =>
        Prop.ForAll(
            WeightedLineCases
                .Where(t => !t.Weighting.IsPerPoint)
                .SelectMany(t => Gen.Shuffle(Enumerable.Range(0, t.Case.X.Length)).Select(order => (t.Case, t.Weighting, Order: order)))
                .ToArbitrary(),
            t =>
            {
                LineFit line = RegressionFit.FitLine(t.Case.X, t.Case.Y, t.Weighting);
                double[] px = t.Order.Select(i => t.Case.X[i]).ToArray(), py = t.Order.Select(i => t.Case.Y[i]).ToArray();
                LineFit permuted = RegressionFit.FitLine(px, py, t.Weighting);
                double scale = t.Case.Y.Max(Math.Abs);
                double s = line.ResidualStandardDeviation(t.Case.X, t.Case.Y);
                return t.Case.X.All(x => Math.Abs(line.Predict(x) - permuted.Predict(x)) <= 1e-12 * scale)
                    && Math.Abs(s - permuted.ResidualStandardDeviation(px, py)) <= 1e-9 * (s + (1e-6 * scale));
            });

    [Property(MaxTest = 200)]
    public Property FitLine_WeightsScaled_GivesSameLine() =>
        Prop.ForAll(
            Cases(CalibrationModel.Linear, noisy: true)
                .SelectMany(c => Gen.ArrayOf(Gen.Choose(1, 1000), c.X.Length)
                    .SelectMany(w => Gen.Choose(-30, 30).Select(k => (Case: c, Weights: w.Select(v => (double)v).ToArray(), Power: k))))
                .ToArbitrary(),
            t =>
            {
                LineFit line = RegressionFit.FitLine(t.Case.X, t.Case.Y, Weighting.Custom(t.Weights));
                LineFit bySeven = RegressionFit.FitLine(t.Case.X, t.Case.Y, Weighting.Custom(t.Weights.Select(w => w * 7).ToArray()));

                // A power of 2 scales every weighted sum exactly: the numbers are identical.
                LineFit byPowerOfTwo = RegressionFit.FitLine(t.Case.X, t.Case.Y, Weighting.Custom(t.Weights.Select(w => w * Math.Pow(2, t.Power)).ToArray()));
                double scale = t.Case.Y.Max(Math.Abs);
                return t.Case.X.All(x => Math.Abs(line.Predict(x) - bySeven.Predict(x)) <= 1e-12 * scale)
                    && line.Intercept.Equals(byPowerOfTwo.Intercept) && line.Slope.Equals(byPowerOfTwo.Slope)
                    && line.WeightedSumOfSquaresX.Equals(byPowerOfTwo.WeightedSumOfSquaresX)
                    && line.ResidualStandardDeviation(t.Case.X, t.Case.Y).Equals(byPowerOfTwo.ResidualStandardDeviation(t.Case.X, t.Case.Y));
            });

    [Fact]
    public void FitLine_WeightedFluorescence_MatchesMathNetWeightedRegression()
    {
        // Reference: MathNet.Numerics WeightedRegression.Weighted (normal equations) on the same 1/x² data.
        double[] x = FluorescenceX.Skip(1).ToArray(), y = FluorescenceY.Skip(1).ToArray();
        double[] w = x.Select(v => 1 / (v * v)).ToArray();
        var design = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(x.Length, 2, (i, j) => j == 0 ? 1 : x[i]);
        var expected = MathNet.Numerics.LinearRegression.WeightedRegression.Weighted(
            design, MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense(y), MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Diagonal(w));

        LineFit line = RegressionFit.FitLine(x, y, Weighting.InverseXSquared);

        Assert.Equal(expected[0], line.Intercept, 1e-12);
        Assert.Equal(expected[1], line.Slope, 1e-12);
    }

    [Fact]
    public void FitLine_TypicalCalibrationData_NeedsNoRefinementButLargeOffsetDoes()
    {
        // Invented data: y ≈ 0.002 + 0.0198·x, |b·x̄w|/|a| ≈ 15 — the closed form alone meets the bound.
        double[] x = { 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4 };
        double[] y = x.Select((v, i) => 0.002 + (0.0198 * v) + (((i % 3) - 1) * 1e-5)).ToArray();
        Assert.False(RegressionFit.FitLine(x, y, Weighting.InverseX).IsRefined);

        // Intercept ≈ 1e-6 of b·x̄: the bound fails and the refinement pass runs.
        double[] far = x.Select(v => v + 1000).ToArray();
        double[] yFar = far.Select((v, i) => 0.002 + (0.0198 * v) + (((i % 3) - 1) * 1e-5)).ToArray();
        Assert.True(RegressionFit.FitLine(far, yFar).IsRefined);
    }

    [Fact]
    public void FitLine_SumsOutsideSafeRange_FallsBackAndEqualsClassPath()
    {
        // Invented: x near 1e160 (Σw·dx² overflows) and weights near 1e-150 (Σw below 1e-100).
        double[] x = { 1e160, 2e160, 3e160, 4e160, 5e160 };
        double[] y = { 1, 2.1, 2.9, 4.2, 5 };
        LineFit huge = RegressionFit.FitLine(x, y);
        RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear);
        Assert.Equal(fit.Slope, huge.Slope);
        Assert.Equal(fit.Intercept, huge.Intercept);
        Assert.Equal(1.01e-160, huge.Slope, 1e-172);

        double[] tiny = { 1e-150, 2e-150, 1e-150, 3e-150, 2e-150 };
        LineFit small = RegressionFit.FitLine(y, x.Select(v => v / 1e160).ToArray(), Weighting.Custom(tiny));
        LineFit plain = RegressionFit.FitLine(y, x.Select(v => v / 1e160).ToArray(), Weighting.Custom(tiny.Select(v => v * 1e150).ToArray()));
        Assert.Equal(plain.Slope, small.Slope, 1e-14);
    }

    [Fact]
    public void FitLine_LengthsDiffer_ThrowsNamingBothLengths()
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 1, 2, 3 }, new double[] { 1, 2 }));
        Assert.Equal("y", e.ParamName);
        Assert.Contains("2 elements", e.Message, StringComparison.Ordinal);
        Assert.Contains("(3)", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void FitLine_NonFiniteValue_ThrowsNamingParameterIndexAndValue(double bad, string shown)
    {
        var ex = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new[] { 1, 2, bad, 4 }, new double[] { 1, 2, 3, 4 }, Weighting.InverseX));
        Assert.Equal("x", ex.ParamName);
        Assert.Contains("index 2", ex.Message, StringComparison.Ordinal);
        Assert.Contains(shown, ex.Message, StringComparison.Ordinal);
        Assert.Contains("finite", ex.Message, StringComparison.Ordinal);

        var ey = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 1, 2, 3, 4 }, new[] { bad, 2, 3, 4 }));
        Assert.Equal("y", ey.ParamName);
        Assert.Contains("index 0", ey.Message, StringComparison.Ordinal);
        Assert.Contains(shown, ey.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FitLine_TooFewPointsOrOneDistinctX_ThrowsNamingCountAndMinimum()
    {
        var few = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 1, 2 }, new double[] { 1, 2 }));
        Assert.Equal("x", few.ParamName);
        Assert.Contains("2 points", few.Message, StringComparison.Ordinal);
        Assert.Contains("at least 3", few.Message, StringComparison.Ordinal);

        var same = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 5, 5, 5, 5 }, new double[] { 1, 2, 3, 4 }));
        Assert.Equal("x", same.ParamName);
        Assert.Contains("1 distinct", same.Message, StringComparison.Ordinal);
        Assert.Contains("at least 2", same.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0, "x = 0", "1/x needs x > 0")]
    [InlineData(-1.0, "x = -1", "1/x needs x > 0")]
    public void FitLine_InverseXAtNonPositiveX_ThrowsNamingPointValueAndRange(double bad, string value, string range)
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new[] { bad, 1, 2, 3 }, new double[] { 1, 2, 3, 4 }, Weighting.InverseX));
        Assert.Equal("x", e.ParamName);
        Assert.Contains("point 0", e.Message, StringComparison.Ordinal);
        Assert.Contains(value, e.Message, StringComparison.Ordinal);
        Assert.Contains(range, e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FitLine_InverseYSquaredAtNegativeY_ThrowsNamingPointValueAndRange()
    {
        var e = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 1, 2, 3, 4 }, new double[] { 1, -2, 3, 4 }, Weighting.InverseYSquared));
        Assert.Equal("y", e.ParamName);
        Assert.Contains("point 1", e.Message, StringComparison.Ordinal);
        Assert.Contains("y = -2", e.Message, StringComparison.Ordinal);
        Assert.Contains("y > 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FitLine_PerPointWeightingWrongCountOrNonPositive_ThrowsNamingWeighting()
    {
        var count = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(FluorescenceX, FluorescenceY, Weighting.Custom(new double[] { 1, 2, 3 })));
        Assert.Equal("weighting", count.ParamName);
        Assert.Contains("3 values", count.Message, StringComparison.Ordinal);
        Assert.Contains("7 points", count.Message, StringComparison.Ordinal);

        // 1/s² with s = 1e-200 overflows: weight +∞ at point 1.
        var huge = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(new double[] { 1, 2, 3 }, new double[] { 1, 2, 4 }, Weighting.InverseVariance(new[] { 1, 1e-200, 1 })));
        Assert.Contains("point 1", huge.Message, StringComparison.Ordinal);
        Assert.Contains("Infinity", huge.Message, StringComparison.Ordinal);
        Assert.Contains("finite and > 0", huge.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void LineFit_ResidualStandardDeviationOfOtherLengthOrDefault_Throws()
    {
        LineFit line = RegressionFit.FitLine(FluorescenceX, FluorescenceY);
        var e = Assert.Throws<ArgumentException>(() => line.ResidualStandardDeviation(FluorescenceX.Take(5).ToArray(), FluorescenceY));
        Assert.Equal("x", e.ParamName);
        Assert.Contains("5 elements", e.Message, StringComparison.Ordinal);
        Assert.Contains("(7)", e.Message, StringComparison.Ordinal);

        Assert.Throws<InvalidOperationException>(() => default(LineFit).ResidualStandardDeviation(FluorescenceX, FluorescenceY));
        var p = Assert.Throws<ArgumentOutOfRangeException>(() => line.Predict(double.NaN));
        Assert.Equal("x", p.ParamName);
        Assert.Contains("NaN", p.Message, StringComparison.Ordinal);
    }
}
