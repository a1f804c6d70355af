using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to the recovery windows and the RPD limit: argument exceptions naming the parameter (project rule).</summary>
public class RecoveryWindowTests
{
    [Fact]
    public void Constructors_BadLimits_Throw()
    {
        Assert.Throws<ArgumentOutOfRangeException>("upperPercent", () => new RecoveryWindow("w", "s", 110, 90));
        Assert.Throws<ArgumentOutOfRangeException>("lowerPercent", () => new RecoveryWindow("w", "s", double.NaN, 90));
        Assert.Throws<ArgumentException>("source", () => new RecoveryWindow("w", " ", 90, 110));
        Assert.Throws<ArgumentOutOfRangeException>("maxPercent", () => new RpdLimit("l", "s", 0));
        Assert.Throws<ArgumentOutOfRangeException>("upperPercent", () => InternalStandardRecoveryWindow.Custom("w", "s", 80, 80, RecoveryReference.CalibrationStandardsMean));
        Assert.Throws<ArgumentOutOfRangeException>("reference", () => InternalStandardRecoveryWindow.Custom("w", "s", 80, 120, (RecoveryReference)9));
    }
}
