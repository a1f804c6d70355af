using System;
using InternalStdCal.Decisions;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

public class CoverageTests
{
    // Field-reference §6 (COMPUTED): z(0.975) = 1.95996398, t(0.975, 4) = 2.77644511; a stated factor is used as given.
    [Fact]
    public void FactorFor_ProbabilityAndFactor_GiveTheExpectedK()
    {
        Printed.Equal("1.95996398", Coverage.WithProbability(0.95).FactorFor(null));
        Printed.Equal("2.77644511", Coverage.WithProbability(0.95).FactorFor(4));
        Assert.Equal(2, Coverage.WithFactor(2).FactorFor(4));
        Assert.Equal("k = 2", Coverage.WithFactor(2).ToString());
        Assert.Equal("p = 0.95", Coverage.WithProbability(0.95).ToString());
        Assert.Equal(Coverage.WithFactor(2), Coverage.WithFactor(2));
        Assert.NotEqual(Coverage.WithFactor(2), Coverage.WithProbability(0.95));
    }

    [Fact]
    public void Factories_BadArguments_Throw()
    {
        Assert.Equal("k", Assert.Throws<ArgumentOutOfRangeException>(() => Coverage.WithFactor(0)).ParamName);
        Assert.Equal("probability", Assert.Throws<ArgumentOutOfRangeException>(() => Coverage.WithProbability(1)).ParamName);
        Assert.Equal("degreesOfFreedom", Assert.Throws<ArgumentOutOfRangeException>(() => Coverage.WithProbability(0.95).FactorFor(0.5)).ParamName);
    }

    // Equality by the stated factor or probability (JCGM 100:2008 §6.2: U = k·u, k stated or from a coverage probability).
    [Fact]
    public void Equals_FactorAndProbability_AreCompared()
    {
        Assert.False(Coverage.WithFactor(2).Equals(Coverage.WithFactor(3)));
        Assert.False(Coverage.WithProbability(0.95).Equals(Coverage.WithProbability(0.99)));
        Assert.True(Coverage.WithProbability(0.95).Equals((object)Coverage.WithProbability(0.95)));
        Assert.Equal(Coverage.WithProbability(0.95).GetHashCode(), Coverage.WithProbability(0.95).GetHashCode());
        Assert.False(Coverage.WithFactor(2).Equals((Coverage?)null));
        Assert.False(Coverage.WithFactor(2).Equals((object)2.0));
    }

    // Field-reference §6 (COMPUTED): z(0.995) = 2.57582930, t(0.995, 10) = 3.16927267; ν is rounded down to a whole number.
    [Fact]
    public void FactorFor_OtherProbability_UsesTheTwoSidedQuantile()
    {
        Printed.Equal("2.57582930", Coverage.WithProbability(0.99).FactorFor(null));
        Printed.Equal("3.16927267", Coverage.WithProbability(0.99).FactorFor(10.7));
    }

    // Printed with six significant digits (the library's text convention).
    [Fact]
    public void ToString_ManyDigits_PrintsSixSignificantDigits()
    {
        Assert.Equal("k = 2.12346", Coverage.WithFactor(2.1234567).ToString());
        Assert.Equal("p = 0.987654", Coverage.WithProbability(0.9876543).ToString());
    }
}
