using System;
using System.Collections.Generic;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to the row factories and signal sets: argument exceptions naming the parameter (project rule).</summary>
public class RunInjectionTests
{
    private static readonly InjectionSignals Some = RunScenario.Signals(1, 1, 1, 1);

    [Fact]
    public void CalibrationStandard_NegativeNominal_ThrowsNamingTheAnalyte()
    {
        ArgumentOutOfRangeException e = Assert.Throws<ArgumentOutOfRangeException>("nominal", () =>
            RunInjection.CalibrationStandard(1, "CAL-1", new Dictionary<string, Concentration> { ["Pb"] = RunScenario.Ug(-1) }, Some));
        Assert.Contains("Pb", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void CalibrationStandard_NoNominal_Throws() =>
        Assert.Throws<ArgumentException>("nominal", () => RunInjection.CalibrationStandard(1, "CAL-1", new Dictionary<string, Concentration>(), Some));

    [Fact]
    public void QualityControl_ZeroNominal_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>("nominal", () => RunInjection.QualityControl(1, "QC", new Dictionary<string, Concentration> { ["Pb"] = RunScenario.Ug(0) }, Some));

    [Fact]
    public void SpikedSample_ZeroAdded_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>("added", () => RunInjection.SpikedSample(1, "S-MS", "S", new Dictionary<string, Concentration> { ["Pb"] = RunScenario.Ug(0) }, Some));

    [Fact]
    public void SampleDuplicate_OwnIdAsParent_Throws() =>
        Assert.Throws<ArgumentException>("parentId", () => RunInjection.SampleDuplicate(1, "S", "S", Some));

    [Fact]
    public void Sample_BlankIdOrNullSignals_Throws()
    {
        Assert.Throws<ArgumentException>("id", () => RunInjection.Sample(1, " ", Some));
        Assert.Throws<ArgumentNullException>("signals", () => RunInjection.Sample(1, "S", null!));
    }
}
