using System;
using System.Collections.Generic;
using System.IO;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Tests.TestSupport;
using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearRegression;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

/// <summary>
/// The four-lane accumulation of <see cref="LineFitKernel"/>: the 256-bit, 128-bit and scalar paths give the same
/// bits for every length 3…20 (every tail of the blocks of four) and every weighting, the span and class entry
/// points agree bit for bit, and the results stay those of an independent least-squares solver. On hardware
/// without vectors (and in the netstandard2.0 build) every path is the scalar one and the checks still hold.
/// Invented, seeded data.
/// </summary>
public class LineFitKernelTests
{
    private static readonly SumPath[] Paths = { SumPath.Widest, SumPath.Vector128, SumPath.Scalar };

    public static TheoryData<int> Lengths()
    {
        var data = new TheoryData<int>();
        for (int n = 3; n <= 20; n++)
        {
            data.Add(n);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void Fit_EveryPathEveryWeighting_SameBits(int n)
    {
        int refined = 0;
        foreach ((double[] x, double[] y) in DataSets(n))
        {
            foreach (Weighting weighting in Weightings(n))
            {
                LineFit widest = LineFitKernel.Fit(x, y, weighting, 1.0, SumPath.Widest);
                Assert.Equal(n, widest.Count);
                refined += widest.IsRefined ? 1 : 0;
                foreach (SumPath path in Paths)
                {
                    LineFit other = LineFitKernel.Fit(x, y, weighting, 1.0, path);
                    Assert.True(Bits(widest) == Bits(other), $"n = {n}, {weighting}, {path}: {Bits(other)} differs from {Bits(widest)}");
                }

                // A power-of-2 weight scale (the checked path's) on every path too.
                LineFit scaled = LineFitKernel.Fit(x, y, weighting, 0.25, SumPath.Widest);
                foreach (SumPath path in Paths)
                {
                    Assert.Equal(Bits(scaled), Bits(LineFitKernel.Fit(x, y, weighting, 0.25, path)));
                }
            }
        }

        // The data offset by 1000 take the refinement pass (its lanes compared too).
        Assert.True(refined >= 7, $"n = {n}: {refined} refined fits");
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void FitLine_EveryLengthAndWeighting_EqualsClassPathBitForBit(int n)
    {
        foreach ((double[] x, double[] y) in DataSets(n))
        {
            foreach (Weighting weighting in Weightings(n))
            {
                LineFit line = RegressionFit.FitLine(x, y, weighting);
                RegressionFit fit = RegressionFit.Fit(x, y, CalibrationModel.Linear, weighting);
                RegressionFit listed = RegressionFit.Fit(x.ToList(), y.ToList(), CalibrationModel.Linear, weighting);
                Assert.Equal(Bits(line), Bits(fit.ToLineFit()));

                // A list takes the checked path, whose weights are scaled by a power of 2: the same numbers.
                Assert.Equal(Bits(line), Bits(listed.ToLineFit()));
                Assert.Equal(fit.ResidualStandardDeviation, line.ResidualStandardDeviation(x, y));
            }
        }
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void FitLine_EveryLengthAndWeighting_MatchesMathNetQr(int n)
    {
        foreach ((double[] x, double[] y) in DataSets(n))
        {
            foreach (Weighting weighting in Weightings(n))
            {
                // Reference: MathNet.Numerics MultipleRegression.QR on rows scaled by √w (an independent solver; QR,
                // not the normal equations, which lose ~12 digits on the data offset by 1000).
                double[] w = weighting.ComputeWeights(x, y);
                Matrix<double> design = Matrix<double>.Build.Dense(n, 2, (i, j) => Math.Sqrt(w[i]) * (j == 0 ? 1 : x[i]));
                Vector<double> expected = MultipleRegression.QR(design, Vector<double>.Build.Dense(n, i => Math.Sqrt(w[i]) * y[i]));

                LineFit line = RegressionFit.FitLine(x, y, weighting);

                double size = y.Max(Math.Abs);
                double xMax = x.Max(Math.Abs);
                Assert.True(Math.Abs(line.Intercept - expected[0]) <= 1e-9 * size, $"n = {n}, {weighting}: a {line.Intercept} vs {expected[0]}");
                Assert.True(Math.Abs(line.Slope - expected[1]) * xMax <= 1e-9 * size, $"n = {n}, {weighting}: b {line.Slope} vs {expected[1]}");
                Assert.Equal(x.Min(), line.MinX);
                Assert.Equal(x.Max(), line.MaxX);
            }
        }
    }

    [Theory]
    [MemberData(nameof(Lengths))]
    public void FitLine_ExtremeXOrBadValueAtEveryPosition_FoundOnEveryPath(int n)
    {
        (double[] x, double[] y) = DataSets(n).First();
        for (int i = 0; i < n; i++)
        {
            // The lowest and highest x at position i: the lane or tail that holds it still counts it.
            double[] low = (double[])x.Clone(), high = (double[])x.Clone();
            low[i] = 0.01;
            high[i] = 1000;
            foreach (SumPath path in Paths)
            {
                Assert.Equal(0.01, LineFitKernel.Fit(low, y, Weighting.InverseX, 1.0, path).MinX);
                Assert.Equal(1000, LineFitKernel.Fit(high, y, Weighting.InverseX, 1.0, path).MaxX);
            }

            // A non-finite y or an undefined weight at position i: every path declines, the checked path names it.
            double[] nan = (double[])y.Clone(), zero = (double[])x.Clone();
            nan[i] = double.NaN;
            zero[i] = 0;
            foreach (SumPath path in Paths)
            {
                Assert.Equal(0, LineFitKernel.Fit(x, nan, Weighting.None, 1.0, path).Count);
                Assert.Equal(0, LineFitKernel.Fit(zero, y, Weighting.InverseX, 1.0, path).Count);
            }

            var ey = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(x, nan));
            Assert.Equal("y", ey.ParamName);
            Assert.Contains($"index {i}", ey.Message, StringComparison.Ordinal);
            var ex = Assert.Throws<ArgumentException>(() => RegressionFit.FitLine(zero, y, Weighting.InverseX));
            Assert.Equal("x", ex.ParamName);
            Assert.Contains($"point {i}", ex.Message, StringComparison.Ordinal);
        }
    }

    [SkippableFact]
    public void Fit_NistNorris_SameBitsOnEveryPathAndCertifiedToTwelveDigits()
    {
        string folder = RepositoryPaths.NistStrdFolder;
        Skip.IfNot(Directory.Exists(folder), $"NIST StRD folder not found: {folder}");
        NistStrdDataset data = NistStrdDataset.Load(folder, "Norris");

        LineFit widest = LineFitKernel.Fit(data.X, data.Y, Weighting.None, 1.0, SumPath.Widest);
        foreach (SumPath path in Paths)
        {
            Assert.Equal(Bits(widest), Bits(LineFitKernel.Fit(data.X, data.Y, Weighting.None, 1.0, path)));
        }

        // Source: NIST StRD certified values for Norris (B0, B1).
        Assert.True(Lre.Of(widest.Intercept, data.Estimates[0]) >= 12, $"B0 {widest.Intercept}");
        Assert.True(Lre.Of(widest.Slope, data.Estimates[1]) >= 12, $"B1 {widest.Slope}");
    }

    /// <summary>Every field of the result as bit patterns (the weights' scale and normaliser as their product, the
    /// factor of a raw weight).</summary>
    private static string Bits(LineFit f) => string.Join(
        " ",
        new[] { f.Intercept, f.Slope, f.WeightedMeanX, f.WeightedMeanY, f.WeightedSumOfSquaresX, f.MinX, f.MaxX, f.WeightScale * f.WeightNormaliser }
            .Select(v => BitConverter.DoubleToInt64Bits(v).ToString("X16", System.Globalization.CultureInfo.InvariantCulture)))
        + $" n={f.Count} refined={f.IsRefined}";

    /// <summary>Every weighting scheme; the per-point ones with n seeded values.</summary>
    private static Weighting[] Weightings(int n)
    {
        var random = new Xoshiro256StarStar(7 + (ulong)n);
        double[] values = Enumerable.Range(0, n).Select(_ => 0.5 + random.NextOpenUnit()).ToArray();
        return new[]
        {
            Weighting.None, Weighting.InverseX, Weighting.InverseXSquared, Weighting.InverseY, Weighting.InverseYSquared,
            Weighting.InverseVariance(values), Weighting.Custom(values),
        };
    }

    /// <summary>
    /// Invented calibrations y ≈ 0.002 + 0.0198·x with 1 % noise: x in rising order, in a rotated order (lowest
    /// and highest x in other lanes), offset by 1000 (recentred at the means), and offset by 1000 with 1e-6 noise
    /// (|a| ≪ |b·x̄w|: the bound fails and the refinement pass runs).
    /// </summary>
    private static IEnumerable<(double[] X, double[] Y)> DataSets(int n)
    {
        var random = new Xoshiro256StarStar(20261202 + (ulong)n);
        double[] x = Enumerable.Range(0, n).Select(i => 0.5 * (i + 1) * (1 + (0.01 * random.NextOpenUnit()))).ToArray();
        double[] rotated = x.Skip(n / 2).Concat(x.Take(n / 2)).ToArray();
        double[] offset = x.Select(v => v + 1000).ToArray();
        foreach ((double[] xs, double noise) in new[] { (x, 0.01), (rotated, 0.01), (offset, 0.01), (offset, 1e-6) })
        {
            double[] ys = xs.Select(v => (0.002 + (0.0198 * v)) * (1 + (noise * (random.NextOpenUnit() - 0.5)))).ToArray();
            yield return (xs, ys);
        }
    }
}
