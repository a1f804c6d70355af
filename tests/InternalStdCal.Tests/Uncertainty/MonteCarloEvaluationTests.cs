using System;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

public class MonteCarloEvaluationTests
{
    private const int Million = 1_000_000;

    private static MeasurementModel Sum(params UncertainInput[] inputs) =>
        MeasurementModel.Create("y", null, inputs, x =>
        {
            double s = 0;
            for (int i = 0; i < x.Length; i++)
            {
                s += x[i];
            }

            return s;
        });

    // Field reference §7.2, analytic Monte Carlo check values (COMPUTED exactly); tolerance 0.5 % (the Monte Carlo
    // standard error of a 2.5 % quantile with M = 10⁶ is below 0.05 %).
    [Fact]
    public void EvaluateMonteCarlo_OneRectangular_HalfWidthIs095()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Rectangular("x", 0, 1)).EvaluateMonteCarlo(Million, 1);
        Numeric.AssertRelative(0.577350, mc.StandardUncertainty, 0.005);
        Numeric.AssertRelative(0.95, mc.SymmetricInterval.HalfWidth, 0.005);
        Numeric.AssertRelative(1.9, mc.ShortestInterval.Length, 0.005);
        Assert.Equal(0, mc.Value, 2);
    }

    [Fact]
    public void EvaluateMonteCarlo_SumOfTwoRectangulars_HalfWidthIs155279()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Rectangular("x1", 0, 1), UncertainInput.Rectangular("x2", 0, 1)).EvaluateMonteCarlo(Million, 2);
        Numeric.AssertRelative(0.816497, mc.StandardUncertainty, 0.005);
        Numeric.AssertRelative(1.55279, mc.SymmetricInterval.HalfWidth, 0.005);
        Numeric.AssertRelative(2 * 1.55279, mc.ShortestInterval.Length, 0.005);
    }

    [Fact]
    public void EvaluateMonteCarlo_SumOfFourRectangularsWithUnitUncertainty_HalfWidthIs387941()
    {
        double a = Math.Sqrt(3); // u = a/√3 = 1
        MonteCarloEvaluation mc = Sum(
            UncertainInput.Rectangular("x1", 0, a), UncertainInput.Rectangular("x2", 0, a),
            UncertainInput.Rectangular("x3", 0, a), UncertainInput.Rectangular("x4", 0, a)).EvaluateMonteCarlo(Million, 3);
        Numeric.AssertRelative(2, mc.StandardUncertainty, 0.005);
        Numeric.AssertRelative(3.87941, mc.SymmetricInterval.HalfWidth, 0.005);
    }

    [Fact]
    public void EvaluateMonteCarlo_Triangular_HalfWidthIsOneMinusRootOf005()
    {
        // Triangular on [−1, 1]: P(|X| > w) = (1 − w)², so the 95 % half-width is 1 − √0.05 = 0.776393 (half the
        // field reference §7.2 value for the sum of two rectangulars); u = 1/√6 (JCGM 100:2008 §4.3.9).
        MonteCarloEvaluation mc = Sum(UncertainInput.Triangular("x", 0, 1)).EvaluateMonteCarlo(Million, 4);
        Numeric.AssertRelative(1 / Math.Sqrt(6), mc.StandardUncertainty, 0.005);
        Numeric.AssertRelative(1 - Math.Sqrt(0.05), mc.SymmetricInterval.HalfWidth, 0.005);
    }

    [Fact]
    public void EvaluateMonteCarlo_StudentT_MatchesTQuantileAndVariance()
    {
        // x + u·t₅: 95 % half-width t(0.975, 5) = 2.57058184 (field reference §6, COMPUTED); SD √(5/3) (Student t variance ν/(ν − 2)).
        MonteCarloEvaluation mc = Sum(UncertainInput.StudentT("x", 0, 1, 5)).EvaluateMonteCarlo(Million, 5);
        Numeric.AssertRelative(2.57058184, mc.SymmetricInterval.HalfWidth, 0.01);
        Numeric.AssertRelative(Math.Sqrt(5.0 / 3), mc.StandardUncertainty, 0.02);
    }

    [Fact]
    public void EvaluateMonteCarlo_Normal_MatchesZQuantile()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Normal("x", 10, 2)).EvaluateMonteCarlo(Million, 6);
        Numeric.AssertRelative(2 * 1.95996398, mc.SymmetricInterval.HalfWidth, 0.005); // field reference §6, ∞ row
        Numeric.AssertRelative(2, mc.StandardUncertainty, 0.005);
        Assert.Equal(10, mc.Value, 2);
    }

    [Fact]
    public void EvaluateMonteCarlo_CorrelatedNormals_ReproduceCorrelatedVariance()
    {
        // y = x₁ + x₂, u = 1 each, r = 0.5 → u(y) = √3 (JCGM 100:2008 eq. 16).
        var model = MeasurementModel.Create(
            "y", null, new[] { UncertainInput.Normal("x1", 0, 1), UncertainInput.Normal("x2", 0, 1) }, x => x[0] + x[1],
            correlations: new[] { new InputCorrelation("x1", "x2", 0.5) });
        Numeric.AssertRelative(Math.Sqrt(3), model.EvaluateMonteCarlo(Million, 7).StandardUncertainty, 0.005);
    }

    [Fact]
    public void EvaluateMonteCarlo_FullyCorrelatedNormals_AreSampledThroughSemiDefiniteFactor()
    {
        var model = MeasurementModel.Create(
            "y", null, new[] { UncertainInput.Normal("x1", 0, 1), UncertainInput.Normal("x2", 0, 1) }, x => x[0] - x[1],
            correlations: new[] { new InputCorrelation("x1", "x2", 1) });
        Assert.Equal(0, model.EvaluateMonteCarlo(100_000, 8).StandardUncertainty, 12);
    }

    [Fact]
    public void EvaluateMonteCarloAdaptive_LinearNormalModel_ValidatesGum()
    {
        // For a linear model with normal inputs the GUM interval is exact, so the GUF must be validated
        // (JCGM 101:2008 §8; common practice as a check of the implementation).
        var model = MeasurementModel.Create(
            "y", "mg/L",
            new[] { UncertainInput.Normal("a", 5, 0.2), UncertainInput.Normal("b", 2, 0.1), UncertainInput.Normal("c", 1, 0.3) },
            x => (2 * x[0]) - x[1] + (0.5 * x[2]));
        GumEvaluation gum = model.EvaluateGum();
        MonteCarloEvaluation mc = model.EvaluateMonteCarloAdaptive(2024);
        Assert.True(mc.IsAdaptive);
        Assert.Equal(true, mc.Converged);
        Assert.True(mc.Batches >= 2);
        Assert.Equal(10_000L * mc.Batches, mc.Trials);
        GufValidation v = mc.ValidateGum(gum);
        Assert.True(v.IsValidated, v.ToString());
        Assert.True(Math.Abs(mc.Value - gum.Value) <= mc.NumericalTolerance(2));
        Assert.True(Math.Abs(mc.StandardUncertainty - gum.StandardUncertainty) <= mc.NumericalTolerance(2));
    }

    [Fact]
    public void ValidateGum_SingleRectangular_IsNotValidated()
    {
        // Field reference §7.2: GUF 1.96·u = 1.13159 against the exact 0.95 for one rectangular ±1.
        MeasurementModel model = Sum(UncertainInput.Rectangular("x", 0, 1));
        GufValidation v = model.EvaluateMonteCarloAdaptive(9).ValidateGum(model.EvaluateGum());
        Assert.False(v.IsValidated);
        Assert.Equal(1.13159 - 0.95, v.UpperDifference, 2);
        Assert.Contains("NOT validated", v.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void ToString_WithOutputUnit_PrintsUnitAfterEveryIntervalAndDifference()
    {
        MeasurementModel model = MeasurementModel.Create("y", "mg/kg", new[] { UncertainInput.Rectangular("x", 0, 1) }, x => x[0]);
        MonteCarloEvaluation mc = model.EvaluateMonteCarlo(10_000, 3);
        Assert.Matches(@"symmetric \[[^\]]+\] mg/kg \(95 %\), shortest \[[^\]]+\] mg/kg \(95 %\)", mc.ToString());
        string validation = mc.ValidateGum(model.EvaluateGum()).ToString();
        Assert.Matches(@"d_low = \S+ mg/kg, d_high = \S+ mg/kg, δ = \S+ mg/kg", validation);
        Assert.Matches(@"GUM \[[^\]]+\] mg/kg \(95 %\), Monte Carlo \[[^\]]+\] mg/kg \(95 %\)$", validation);
    }

    [Fact]
    public void ToString_WithoutOutputUnit_PrintsBareIntervals()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Rectangular("x", 0, 1)).EvaluateMonteCarlo(10_000, 3);
        Assert.Matches(@"symmetric \[[^\]]+\] \(95 %\), shortest \[[^\]]+\] \(95 %\)", mc.ToString());
    }

    [Fact]
    public void EvaluateMonteCarloAdaptive_OneRectangular_HalfWidthWithinTolerance()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Rectangular("x", 0, 1)).EvaluateMonteCarloAdaptive(10, significantDigits: 2);
        Assert.Equal(true, mc.Converged);
        Assert.True(Math.Abs(mc.SymmetricInterval.Upper - 0.95) <= 2 * mc.NumericalTolerance(2), mc.ToString());
    }

    [Fact]
    public void EvaluateMonteCarloAdaptive_CapReached_ReportsNotConverged()
    {
        MonteCarloEvaluation mc = Sum(UncertainInput.Normal("x", 0, 1)).EvaluateMonteCarloAdaptive(11, significantDigits: 4, maxTrials: 20_000);
        Assert.Equal(false, mc.Converged);
        Assert.Equal(20_000, mc.Trials);
        Assert.Contains("NOT converged", mc.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void EvaluateMonteCarlo_SameSeed_IsIdenticalBitForBit()
    {
        MeasurementModel model = MixedModel();
        MonteCarloEvaluation a = model.EvaluateMonteCarlo(50_000, 123456789);
        MonteCarloEvaluation b = model.EvaluateMonteCarlo(50_000, 123456789);
        Numeric.AssertIdentical(a.Value, b.Value);
        Numeric.AssertIdentical(a.StandardUncertainty, b.StandardUncertainty);
        Assert.Equal(a.SymmetricInterval, b.SymmetricInterval);
        Assert.Equal(a.ShortestInterval, b.ShortestInterval);
        Assert.Equal(123456789, a.Seed);
        Assert.NotEqual(a.Value, model.EvaluateMonteCarlo(50_000, 123456790).Value);
    }

    [Fact]
    public void EvaluateMonteCarloAdaptive_SameSeed_IsIdenticalBitForBit()
    {
        MeasurementModel model = MixedModel();
        MonteCarloEvaluation a = model.EvaluateMonteCarloAdaptive(-5);
        MonteCarloEvaluation b = model.EvaluateMonteCarloAdaptive(-5);
        Assert.Equal(a.Trials, b.Trials);
        Numeric.AssertIdentical(a.Value, b.Value);
        Numeric.AssertIdentical(a.StandardUncertainty, b.StandardUncertainty);
        Assert.Equal(a.SymmetricInterval, b.SymmetricInterval);
    }

    [Fact]
    public void EvaluateMonteCarlo_PinnedSeed_GivesRecordedResult()
    {
        // Regression pin, not an external reference: these numbers were produced by this implementation
        // (xoshiro256** + AS 241 + portable log/exp), and must not change across runtimes or target frameworks.
        MonteCarloEvaluation mc = MixedModel().EvaluateMonteCarlo(20_000, 42);
        Assert.Equal(PinnedValue, BitConverter.DoubleToInt64Bits(mc.Value));
        Assert.Equal(PinnedUncertainty, BitConverter.DoubleToInt64Bits(mc.StandardUncertainty));
    }

    [Fact]
    public void EvaluateMonteCarlo_CorrelatedRectangular_IsNotSupported()
    {
        var model = MeasurementModel.Create(
            "y", null, new[] { UncertainInput.Rectangular("x1", 0, 1), UncertainInput.Normal("x2", 0, 1) }, x => x[0] + x[1],
            correlations: new[] { new InputCorrelation("x1", "x2", 0.3) });
        NotSupportedException e = Assert.Throws<NotSupportedException>(() => model.EvaluateMonteCarlo(10_000, 1));
        Assert.Contains("'x1'", e.Message, StringComparison.Ordinal);
        Assert.NotNull(model.EvaluateGum()); // the GUM evaluation still works
    }

    [Fact]
    public void EvaluateMonteCarlo_ModelNotFiniteForATrial_Throws()
    {
        var model = MeasurementModel.Product("y", null, 1, new[] { UncertainInput.Rectangular("d", 0.5, 1) }, new[] { 0.5 });
        InvalidOperationException e = Assert.Throws<InvalidOperationException>(() => model.EvaluateMonteCarlo(10_000, 1));
        Assert.Contains("d = -", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(1999)] // J = ⌈100/0.05⌉ = 2000 (JCGM 101:2008 §7.9.4)
    [InlineData(0)]
    public void EvaluateMonteCarlo_TooFewTrials_Throws(int trials)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => MixedModel().EvaluateMonteCarlo(trials, 1));
        Assert.Equal("trials", e.ParamName);
    }

    [Fact]
    public void EvaluateMonteCarloAdaptive_CapBelowTwoBatches_Throws()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => MixedModel().EvaluateMonteCarloAdaptive(1, maxTrials: 19_999));
        Assert.Equal("maxTrials", e.ParamName);
        Assert.Throws<ArgumentOutOfRangeException>(() => MixedModel().EvaluateMonteCarloAdaptive(1, significantDigits: 0));
    }

    [Fact]
    public void NumericalTolerance_Jcgm101Example()
    {
        // JCGM 101:2008 §7.9.2 example (field reference §7.2, FROM MEMORY): u = 0.0236, n_dig = 2 → δ = 0.0005.
        Assert.Equal(0.0005, InternalStdCal.Uncertainty.MonteCarlo.NumericalTolerance(0.0236, 2), 15);
        Assert.Equal(0.005, InternalStdCal.Uncertainty.MonteCarlo.NumericalTolerance(0.0236, 1), 15);
        Assert.Equal(0.5, InternalStdCal.Uncertainty.MonteCarlo.NumericalTolerance(10, 2), 15);
        Assert.Equal(0.05, InternalStdCal.Uncertainty.MonteCarlo.NumericalTolerance(0.996, 2), 15); // rounds to 1.0 = 10·10⁻¹
    }

    [Fact]
    public void ValidateGum_OtherModelOrProbability_Throws()
    {
        MeasurementModel model = MixedModel();
        MonteCarloEvaluation mc = model.EvaluateMonteCarlo(10_000, 1);
        Assert.Throws<ArgumentException>(() => mc.ValidateGum(MixedModel().EvaluateGum()));
        Assert.Throws<ArgumentException>(() => mc.ValidateGum(model.EvaluateGum(0.99)));
    }

    [Fact]
    public void ToMeasuredConcentration_CarriesMonteCarloValueAndUncertainty()
    {
        MonteCarloEvaluation mc = MixedModel().EvaluateMonteCarlo(10_000, 1);
        Measured<Concentration> m = mc.ToMeasuredConcentration(ConcentrationUnit.MicrogramPerLitre);
        Assert.Equal(mc.Value, m.Value.Value);
        Assert.Equal(mc.StandardUncertainty, m.StandardUncertainty.Value);
        Assert.Null(m.DegreesOfFreedom);
    }

    private const long PinnedValue = 4622100723450120083;
    private const long PinnedUncertainty = 4592379178356422227;

    // Every distribution kind, a correlated normal pair and a product.
    private static MeasurementModel MixedModel() => MeasurementModel.Create(
        "y", "µg/L",
        new[]
        {
            UncertainInput.Normal("n1", 10, 0.1), UncertainInput.Normal("n2", 5, 0.05), UncertainInput.Rectangular("r", 1, 0.02),
            UncertainInput.Triangular("t", 2, 0.03), UncertainInput.StudentT("s", 0.5, 0.01, 4),
        },
        x => (x[0] * x[2] / x[3]) + x[1] + x[4],
        correlations: new[] { new InputCorrelation("n1", "n2", 0.4) });
}
