using System;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

public class MeasurementModelTests
{
    private static readonly UncertainInput A = UncertainInput.Normal("a", 1, 0.1);
    private static readonly UncertainInput B = UncertainInput.Normal("b", 2, 0.1);
    private static readonly UncertainInput C = UncertainInput.Normal("c", 3, 0.1);

    private static MeasurementModel Linear(params InputCorrelation[] r) =>
        MeasurementModel.Create("y", null, new[] { A, B, C }, x => x[0] + x[1] + x[2], correlations: r);

    [Fact]
    public void Product_EvaluatesKTimesPowers()
    {
        var model = MeasurementModel.Product("y", "mg/kg", 4, new[] { A, B, C }, new[] { 1.0, -2, 0.5 });
        Assert.Equal(4 * 1 / 4.0 * Math.Sqrt(3), model.Value, 14);
        Assert.True(model.IsProduct);
        Assert.Equal(new[] { 1.0, -2, 0.5 }, model.Exponents);
        Assert.Contains("y = 4 · a · b^-2 · c^0.5", model.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Correlation_UnsetPairIsZeroAndSelfIsOne()
    {
        MeasurementModel model = Linear(new InputCorrelation("a", "b", 0.3));
        Assert.Equal(0.3, model.Correlation("b", "a"));
        Assert.Equal(0, model.Correlation("a", "c"));
        Assert.Equal(1, model.Correlation("c", "c"));
        Assert.Single(model.Correlations);
        Assert.Equal("firstInput", Assert.Throws<ArgumentException>(() => model.Correlation("z", "a")).ParamName);
    }

    [Fact]
    public void Create_CorrelationMatrixNotPositiveSemiDefinite_Throws()
    {
        // r(a,b) = r(b,c) = 0.9 with r(a,c) = −0.9 cannot occur together (smallest eigenvalue −0.8).
        ArgumentException e = Assert.Throws<ArgumentException>(() => Linear(
            new InputCorrelation("a", "b", 0.9), new InputCorrelation("b", "c", 0.9), new InputCorrelation("a", "c", -0.9)));
        Assert.Equal("correlations", e.ParamName);
        Assert.Contains("positive semi-definite", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Create_SemiDefiniteCorrelationMatrix_IsAccepted()
    {
        MeasurementModel model = Linear(new InputCorrelation("a", "b", 1), new InputCorrelation("b", "c", 1), new InputCorrelation("a", "c", 1));
        Assert.Equal(0.3, model.EvaluateGum().StandardUncertainty, 12);
    }

    [Fact]
    public void InputCorrelation_BadArguments_Throw()
    {
        Assert.Equal("coefficient", Assert.Throws<ArgumentOutOfRangeException>(() => new InputCorrelation("a", "b", 1.01)).ParamName);
        Assert.Equal("coefficient", Assert.Throws<ArgumentOutOfRangeException>(() => new InputCorrelation("a", "b", double.NaN)).ParamName);
        Assert.Equal("secondInput", Assert.Throws<ArgumentException>(() => new InputCorrelation("a", "a", 0.5)).ParamName);
        Assert.Equal("firstInput", Assert.Throws<ArgumentNullException>(() => new InputCorrelation(null!, "a", 0.5)).ParamName);
    }

    [Fact]
    public void Create_BadCorrelations_Throw()
    {
        Assert.Contains("'z'", Assert.Throws<ArgumentException>(() => Linear(new InputCorrelation("a", "z", 0.5))).Message, StringComparison.Ordinal);
        Assert.Contains("more than once", Assert.Throws<ArgumentException>(() => Linear(new InputCorrelation("a", "b", 0.5), new InputCorrelation("b", "a", 0.5))).Message, StringComparison.Ordinal);
        Assert.Equal("correlations", Assert.Throws<ArgumentException>(() => Linear(default(InputCorrelation))).ParamName);
    }

    [Fact]
    public void Create_BadInputs_Throw()
    {
        Assert.Equal("inputs", Assert.Throws<ArgumentException>(() => MeasurementModel.Create("y", null, Array.Empty<UncertainInput>(), x => 0)).ParamName);
        Assert.Contains("twice", Assert.Throws<ArgumentException>(() => MeasurementModel.Create("y", null, new[] { A, A }, x => 0)).Message, StringComparison.Ordinal);
        Assert.Equal("inputs", Assert.Throws<ArgumentNullException>(() => MeasurementModel.Create("y", null, new UncertainInput[] { A, null! }, x => 0)).ParamName);
        Assert.Equal("function", Assert.Throws<ArgumentNullException>(() => MeasurementModel.Create("y", null, new[] { A }, null!)).ParamName);
        Assert.Equal("outputName", Assert.Throws<ArgumentException>(() => MeasurementModel.Create("", null, new[] { A }, x => 0)).ParamName);
        Assert.Equal("function", Assert.Throws<ArgumentException>(() => MeasurementModel.Create("y", null, new[] { A }, x => double.NaN)).ParamName);
    }

    [Fact]
    public void Product_BadArguments_Throw()
    {
        Assert.Equal("constant", Assert.Throws<ArgumentOutOfRangeException>(() => MeasurementModel.Product("y", null, 0, new[] { A }, new[] { 1.0 })).ParamName);
        Assert.Equal("exponents[0]", Assert.Throws<ArgumentOutOfRangeException>(() => MeasurementModel.Product("y", null, 1, new[] { A }, new[] { 0.0 })).ParamName);
        Assert.Equal("exponents", Assert.Throws<ArgumentException>(() => MeasurementModel.Product("y", null, 1, new[] { A, B }, new[] { 1.0 })).ParamName);
        var zero = UncertainInput.Normal("z", 0, 0.1);
        Assert.Contains("'z'", Assert.Throws<ArgumentException>(() => MeasurementModel.Product("y", null, 1, new[] { zero }, new[] { -1.0 })).Message, StringComparison.Ordinal);
        var negative = UncertainInput.Normal("n", -1, 0.1);
        Assert.Equal("inputs", Assert.Throws<ArgumentException>(() => MeasurementModel.Product("y", null, 1, new[] { negative }, new[] { 0.5 })).ParamName);
        Assert.Equal(-1, MeasurementModel.Product("y", null, 1, new[] { negative }, new[] { 1.0 }).Value);
    }
}
