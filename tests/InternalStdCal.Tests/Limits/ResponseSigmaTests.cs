using System;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class ResponseSigmaTests
{
    [Fact]
    public void FromResidual_Fluorescence_IsSyx()
    {
        // s_y/x = 0.4328477132 with ν = 5 (COMPUTED, field-reference §1.2).
        ResponseSigma s = ResponseSigma.FromResidual(LimitsData.Fluorescence());
        Printed.Equal("0.4328477132", s.Value);
        Assert.Equal(5, s.DegreesOfFreedom);
        Assert.Equal(SigmaSource.ResidualStandardDeviation, s.Source);
    }

    [Fact]
    public void FromInterceptStandardError_Fluorescence_IsSa()
    {
        // s_a = 0.2949360014 (COMPUTED, field-reference §1.2).
        ResponseSigma s = ResponseSigma.FromInterceptStandardError(LimitsData.Fluorescence());
        Printed.Equal("0.2949360014", s.Value);
        Assert.Equal(SigmaSource.InterceptStandardError, s.Source);
    }

    [Fact]
    public void FromBlankResponses_Values_IsSampleSd()
    {
        // Worked blanks of field-reference §3.2: S_b = 0.0264575 (COMPUTED).
        ResponseSigma s = ResponseSigma.FromBlankResponses(new[] { 0.05, 0.02, 0.08, 0.00, 0.04, 0.06, 0.03 });
        Printed.Equal("0.0264575", s.Value);
        Assert.Equal(6, s.DegreesOfFreedom);
        Assert.Equal(SigmaSource.BlankResponses, s.Source);
        Assert.Contains("7 blank responses", s.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void FromInterceptsOfLines_Values_IsSampleSd()
    {
        // Same numbers as above, read as intercepts of seven lines (sample SD, n − 1).
        ResponseSigma s = ResponseSigma.FromInterceptsOfLines(new[] { 0.05, 0.02, 0.08, 0.00, 0.04, 0.06, 0.03 });
        Printed.Equal("0.0264575", s.Value);
        Assert.Equal(SigmaSource.InterceptsOfSeveralLines, s.Source);
    }

    [Fact]
    public void Factories_BadInput_Throw()
    {
        Assert.Equal("responses", Assert.Throws<ArgumentNullException>(() => ResponseSigma.FromBlankResponses(null!)).ParamName);
        Assert.Equal("responses", Assert.Throws<ArgumentException>(() => ResponseSigma.FromBlankResponses(new[] { 1.0 })).ParamName);
        Assert.Equal("responses", Assert.Throws<ArgumentException>(() => ResponseSigma.FromBlankResponses(new[] { 1.0, double.NaN })).ParamName);
        Assert.Equal("responses", Assert.Throws<ArgumentException>(() => ResponseSigma.FromBlankResponses(new[] { 1.0, 1.0, 1.0 })).ParamName);
        Assert.Equal("intercepts", Assert.Throws<ArgumentException>(() => ResponseSigma.FromInterceptsOfLines(Array.Empty<double>())).ParamName);
        Assert.Equal("standardDeviation", Assert.Throws<ArgumentOutOfRangeException>(() => ResponseSigma.FromBlankStandardDeviation(0)).ParamName);
        Assert.Equal("standardDeviation", Assert.Throws<ArgumentOutOfRangeException>(() => ResponseSigma.FromBlankStandardDeviation(double.PositiveInfinity)).ParamName);
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => ResponseSigma.FromResidual(null!)).ParamName);
    }

    [Fact]
    public void FromResidual_WeightedFit_Throws()
    {
        RegressionCalibration weighted = RegressionCalibration.Fit(FieldReferenceStandards.Absorbance(), CalibrationModel.Linear, Weighting.InverseVariance(FieldReferenceStandards.AbsorbanceSds));
        ArgumentException e = Assert.Throws<ArgumentException>(() => ResponseSigma.FromResidual(weighted));
        Assert.Equal("calibration", e.ParamName);
        Assert.Contains("weighted", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromInterceptStandardError_ThroughOrigin_Throws()
    {
        RegressionCalibration origin = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.LinearThroughOrigin);
        Assert.Equal("calibration", Assert.Throws<ArgumentException>(() => ResponseSigma.FromInterceptStandardError(origin)).ParamName);
    }
}
