using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>The IS recovery window preset: argument exceptions naming the parameter (project rule).</summary>
public class InternalStandardRecoveryWindowTests
{
    [Fact]
    public void UsEpa200Point8_Window_IsSixtyToOneHundredTwentyFivePercentOfTheCalibrationBlank()
    {
        // US EPA 200.8 Rev. 5.4 IS window — from memory (field-reference §4.3).
        InternalStandardRecoveryWindow w = InternalStandardRecoveryWindow.UsEpa200Point8;
        Assert.Equal(60, w.LowerPercent);
        Assert.Equal(125, w.UpperPercent);
        Assert.Equal(RecoveryReference.CalibrationBlankMean, w.Reference);
        Assert.True(w.Contains(60) && w.Contains(125) && !w.Contains(59.99) && !w.Contains(double.NaN));
        Assert.Contains("from memory", w.Source, StringComparison.Ordinal);
    }
}
