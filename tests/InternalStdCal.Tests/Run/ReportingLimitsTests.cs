using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to <see cref="ReportingLimits"/>: argument exceptions naming the parameter (project rule).</summary>
public class ReportingLimitsTests
{
    [Fact]
    public void ReportingLimits_BadLimits_Throw()
    {
        Assert.Throws<ArgumentException>("limitOfDetection", () => new ReportingLimits(null, null));
        Assert.Throws<ArgumentOutOfRangeException>("limitOfDetection", () => new ReportingLimits(RunScenario.Ug(0), null));
        Assert.Throws<ArgumentOutOfRangeException>("limitOfQuantitation", () => new ReportingLimits(RunScenario.Ug(1), RunScenario.Ug(0.5)));
        Assert.Throws<ArgumentException>("limitOfQuantitation", () => new ReportingLimits(RunScenario.Ug(1), Concentration.FromMilligramsPerKilogram(2)));
    }
}
