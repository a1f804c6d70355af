using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

// Coverage interval [low, high] with its probability p (JCGM 101:2008 §3.12), printed in the model's output unit.
public class CoverageIntervalTests
{
    [Fact]
    public void ToString_WithUnit_PrintsTheUnitAfterTheInterval()
    {
        Assert.Equal("[9.8, 10.2] mg/L (95 %)", new CoverageInterval(9.8, 10.2, 0.95, "mg/L").ToString());
    }

    [Fact]
    public void ToString_WithoutUnit_PrintsTheBareInterval()
    {
        Assert.Equal("[9.8, 10.2] (95 %)", new CoverageInterval(9.8, 10.2, 0.95, string.Empty).ToString());
        Assert.Equal(string.Empty, default(CoverageInterval).Unit);
    }

    [Fact]
    public void Equals_DifferentUnit_NotEqual()
    {
        Assert.NotEqual(new CoverageInterval(1, 2, 0.95, "mg/L"), new CoverageInterval(1, 2, 0.95, "µg/L"));
        Assert.Equal(new CoverageInterval(1, 2, 0.95, "mg/L"), new CoverageInterval(1, 2, 0.95, "mg/L"));
    }

    [Fact]
    public void EvaluateMonteCarlo_Intervals_CarryTheModelsOutputUnit()
    {
        MeasurementModel model = MeasurementModel.Product(
            "y", "mg/L", 1, new[] { UncertainInput.Rectangular("a", 1, 0.1), UncertainInput.Normal("b", 2, 0.05) }, new[] { 1.0, -1.0 });
        MonteCarloEvaluation mc = model.EvaluateMonteCarlo(10_000, 7);

        Assert.Equal("mg/L", mc.SymmetricInterval.Unit);
        Assert.Equal("mg/L", mc.ShortestInterval.Unit);
        Assert.EndsWith("] mg/L (95 %)", mc.SymmetricInterval.ToString(), System.StringComparison.Ordinal);
    }
}
