using System;
using InternalStdCal.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class WeightingTests
{
    private static readonly double[] X = { 1, 2, 4 };
    private static readonly double[] Y = { 0.5, 2, 8 };

    [Fact]
    public void ComputeWeights_EmpiricalSchemes_AreRawReciprocals()
    {
        // Definitions (field-reference §2.1): 1/x, 1/x², 1/y, 1/y².
        Assert.Equal(new[] { 1.0, 1.0, 1.0 }, Weighting.None.ComputeWeights(X, Y));
        Assert.Equal(new[] { 1.0, 0.5, 0.25 }, Weighting.InverseX.ComputeWeights(X, Y));
        Assert.Equal(new[] { 1.0, 0.25, 0.0625 }, Weighting.InverseXSquared.ComputeWeights(X, Y));
        Assert.Equal(new[] { 2.0, 0.5, 0.125 }, Weighting.InverseY.ComputeWeights(X, Y));
        Assert.Equal(new[] { 4.0, 0.25, 0.015625 }, Weighting.InverseYSquared.ComputeWeights(X, Y));
    }

    [Fact]
    public void ComputeWeights_InverseVarianceAndCustom_UsePerPointValues()
    {
        Assert.Equal(new[] { 4.0, 16.0, 0.25 }, Weighting.InverseVariance(new[] { 0.5, 0.25, 2.0 }).ComputeWeights(X, Y));
        Assert.Equal(new[] { 3.0, 2.0, 1.0 }, Weighting.Custom(new[] { 3.0, 2.0, 1.0 }).ComputeWeights(X, Y));
    }

    [Theory]
    [InlineData(0.0, "x = 0")]
    [InlineData(-2.0, "x = -2")]
    public void ComputeWeights_InverseXAtNonPositiveX_ThrowsNamingPointValueAndReason(double bad, string shown)
    {
        var e = Assert.Throws<ArgumentException>(() => Weighting.InverseX.ComputeWeights(new[] { 1, bad, 3 }, Y));
        Assert.Equal("x", e.ParamName);
        Assert.Contains("point 1", e.Message, StringComparison.Ordinal);
        Assert.Contains(shown, e.Message, StringComparison.Ordinal);
        Assert.Contains("1/x needs x > 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ComputeWeights_InverseXSquaredNegativeX_IsAllowed() =>
        Assert.Equal(0.25, Weighting.InverseXSquared.ComputeWeights(new[] { -2.0, 1, 3 }, Y)[0]);

    [Fact]
    public void ComputeWeights_InverseXSquaredAtZero_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => Weighting.InverseXSquared.ComputeWeights(new[] { 0.0, 1, 3 }, Y));
        Assert.Contains("point 0", e.Message, StringComparison.Ordinal);
        Assert.Contains("x = 0", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(WeightingScheme.InverseY)]
    [InlineData(WeightingScheme.InverseYSquared)]
    public void ComputeWeights_InverseYAtNonPositiveY_Throws(WeightingScheme scheme)
    {
        Weighting weighting = scheme == WeightingScheme.InverseY ? Weighting.InverseY : Weighting.InverseYSquared;
        var e = Assert.Throws<ArgumentException>(() => weighting.ComputeWeights(X, new[] { 1, 2, -0.25 }));
        Assert.Equal("y", e.ParamName);
        Assert.Contains("point 2", e.Message, StringComparison.Ordinal);
        Assert.Contains("y = -0.25", e.Message, StringComparison.Ordinal);
        Assert.Contains("needs y > 0", e.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(-1.0)]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    public void InverseVariance_NonPositiveOrNonFiniteSd_ThrowsNamingIndexAndValue(double bad)
    {
        var e = Assert.Throws<ArgumentException>(() => Weighting.InverseVariance(new[] { 0.1, bad }));
        Assert.Equal("standardDeviations", e.ParamName);
        Assert.Contains("index 1", e.Message, StringComparison.Ordinal);
        Assert.Contains("> 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Custom_EmptyOrNull_Throws()
    {
        Assert.Equal("weights", Assert.Throws<ArgumentException>(() => Weighting.Custom(Array.Empty<double>())).ParamName);
        Assert.Equal("weights", Assert.Throws<ArgumentNullException>(() => Weighting.Custom(null!)).ParamName);
    }

    [Fact]
    public void ComputeWeights_PerPointCountMismatch_Throws()
    {
        var e = Assert.Throws<ArgumentException>(() => Weighting.Custom(new[] { 1.0, 2.0 }).ComputeWeights(X, Y));
        Assert.Contains("2 values", e.Message, StringComparison.Ordinal);
        Assert.Contains("3 points", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ComputeWeights_SquaredSdUnderflows_ThrowsInsteadOfInfiniteWeight()
    {
        var e = Assert.Throws<ArgumentException>(() => Weighting.InverseVariance(new[] { 1e-200, 1, 1 }).ComputeWeights(X, Y));
        Assert.Contains("point 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Equality_IsExactOnSchemeAndValues()
    {
        Assert.Equal(Weighting.Custom(new[] { 1.0, 2.0 }), Weighting.Custom(new[] { 1.0, 2.0 }));
        Assert.Equal(Weighting.Custom(new[] { 1.0, 2.0 }).GetHashCode(), Weighting.Custom(new[] { 1.0, 2.0 }).GetHashCode());
        Assert.NotEqual(Weighting.Custom(new[] { 1.0, 2.0 }), Weighting.Custom(new[] { 1.0, 2.0000000000000004 }));
        Assert.NotEqual(Weighting.Custom(new[] { 1.0, 2.0 }), Weighting.InverseVariance(new[] { 1.0, 2.0 }));
        Assert.False(Weighting.None.Equals(null));
        Assert.Same(Weighting.InverseX, Weighting.InverseX);
    }

    [Fact]
    public void Custom_SourceChangedAfterCreation_WeightingUnaffected()
    {
        double[] source = { 1, 2, 3 };
        Weighting w = Weighting.Custom(source);
        source[0] = 99;
        Assert.Equal(1.0, w.PointValues[0]);
    }

    [Fact]
    public void NameAndToString_UseConventionalNotation()
    {
        Assert.Equal("none", Weighting.None.Name);
        Assert.Equal("1/x", Weighting.InverseX.ToString());
        Assert.Equal("1/x²", Weighting.InverseXSquared.Name);
        Assert.Equal("1/y", Weighting.InverseY.Name);
        Assert.Equal("1/y²", Weighting.InverseYSquared.Name);
        Assert.Equal("1/s² (2 values)", Weighting.InverseVariance(new[] { 1.0, 2.0 }).ToString());
        Assert.Equal("custom", Weighting.Custom(new[] { 1.0 }).Name);
        Assert.True(Weighting.Custom(new[] { 1.0 }).IsPerPoint);
        Assert.False(Weighting.InverseX.IsPerPoint);
    }
}
