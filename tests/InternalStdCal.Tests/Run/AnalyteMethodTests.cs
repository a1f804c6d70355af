using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to <see cref="AnalyteMethod"/>: argument exceptions naming the parameter (project rule).</summary>
public class AnalyteMethodTests
{
    [Fact]
    public void AnalyteMethod_WeightingWithResponseFactorModel_Throws() =>
        Assert.Throws<ArgumentException>("weighting", () => new AnalyteMethod("Pb", "Bi", RatioModel.AverageResponseFactor, Weighting.InverseX));

    [Fact]
    public void AnalyteMethod_PerPointWeighting_Throws() =>
        Assert.Throws<ArgumentException>("weighting", () => new AnalyteMethod("Pb", "Bi", RatioModel.Linear, Weighting.Custom(new[] { 1.0, 2.0 })));

    [Fact]
    public void AnalyteMethod_UndefinedModel_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>("model", () => new AnalyteMethod("Pb", "Bi", (RatioModel)42));
}
