using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to <see cref="RunMethod"/>: argument exceptions naming the parameter (project rule).</summary>
public class RunMethodTests
{
    private static readonly Dictionary<string, Concentration> Is = new() { ["Bi"] = RunScenario.Ug(10) };

    [Fact]
    public void RunMethod_MissingIsConcentration_ThrowsNamingTheIs()
    {
        ArgumentException e = Assert.Throws<ArgumentException>("internalStandardConcentrations", () =>
            new RunMethod("m", new[] { new AnalyteMethod("Pb", "In", RatioModel.Linear) }, Is, InternalStandardRecoveryWindow.UsEpa200Point8));
        Assert.Contains("'In'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RunMethod_AnalyteTwiceOrZeroIs_Throws()
    {
        var pb = new AnalyteMethod("Pb", "Bi", RatioModel.Linear);
        Assert.Throws<ArgumentException>("analytes", () => new RunMethod("m", new[] { pb, pb }, Is, InternalStandardRecoveryWindow.UsEpa200Point8));
        Assert.Throws<ArgumentOutOfRangeException>("internalStandardConcentrations", () =>
            new RunMethod("m", new[] { pb }, new Dictionary<string, Concentration> { ["Bi"] = RunScenario.Ug(0) }, InternalStandardRecoveryWindow.UsEpa200Point8));
        Assert.Throws<ArgumentOutOfRangeException>("ConfidenceLevel", () => new RunMethod("m", new[] { pb }, Is, InternalStandardRecoveryWindow.UsEpa200Point8) { ConfidenceLevel = 1 });
    }

    [Fact]
    public void RunMethod_ReplicateOutlierSignificanceOutsideOpenZeroToHalf_Throws()
    {
        var pb = new AnalyteMethod("Pb", "Bi", RatioModel.Linear);
        Assert.Throws<ArgumentOutOfRangeException>("ReplicateOutlierSignificance", () => new RunMethod("m", new[] { pb }, Is, InternalStandardRecoveryWindow.UsEpa200Point8) { ReplicateOutlierSignificance = 0.5 });
        Assert.Throws<ArgumentOutOfRangeException>("ReplicateOutlierSignificance", () => new RunMethod("m", new[] { pb }, Is, InternalStandardRecoveryWindow.UsEpa200Point8) { ReplicateOutlierSignificance = 0 });
    }

    [Fact]
    public void RunMethod_Defaults_NoDriftRuleAndGrubbsAtFivePercent()
    {
        var method = new RunMethod("m", new[] { new AnalyteMethod("Pb", "Bi", RatioModel.Linear) }, Is, InternalStandardRecoveryWindow.UsEpa200Point8);
        Assert.Null(method.Drift);
        Assert.Equal(0.05, method.ReplicateOutlierSignificance);
        Assert.Null(method.Analytes[0].Limits);
    }
}
