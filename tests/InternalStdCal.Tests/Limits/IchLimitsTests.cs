using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class IchLimitsTests
{
    [Fact]
    public void Compute_FluorescenceResidualSd_MatchesFieldReference()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        IchLimitResult r = IchLimits.Compute(ResponseSigma.FromResidual(cal), cal);

        // ICH Q2(R2) LOD = 3.3σ/S, LOQ = 10σ/S, VERIFIED (secondary); values COMPUTED, field-reference §3.1
        // (fluorescence data of §1.2, σ = s_y/x): LOD 0.739965 pg/mL, LOQ 2.24232 pg/mL (pg/mL = ng/L).
        Printed.Equal("0.739965", r.DetectionLimit.Value);
        Printed.Equal("2.24232", r.QuantificationLimit.Value);
        Assert.Equal(ConcentrationUnit.NanogramPerLitre, r.DetectionLimit.Unit);
        Assert.Equal(SigmaSource.ResidualStandardDeviation, r.SigmaSource);
        Printed.Equal("0.4328477132", r.Sigma.Value);
        Printed.Equal("1.930357143", r.Slope);
        Assert.Contains("LOD = 3.3·σ/S", r.Formula, StringComparison.Ordinal);
        Assert.Contains("ICH Q2(R2)", r.Source, StringComparison.Ordinal);
        Assert.Contains("s_y/x", r.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_BlankPlusThreeS_MatchesFieldReference()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        IchLimitResult r = IchLimits.Compute(ResponseSigma.FromResidual(cal), cal, detectionFactor: 3);

        // "Blank + 3s" (Miller & Miller; y_LOD = a + 3·s_y/x → x = 3·s_y/x/b): 0.672696 pg/mL COMPUTED, field-reference §3.1
        // (textbook value 0.67, from memory).
        Printed.Equal("0.672696", r.DetectionLimit.Value);
        Assert.Contains("not the ICH defaults", r.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_InterceptStandardError_UsesSaOverB()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        IchLimitResult r = IchLimits.Compute(ResponseSigma.FromInterceptStandardError(cal), cal);

        // σ = s_a = 0.2949360014, S = b = 1.930357143 (COMPUTED, field-reference §1.2); LOD = 3.3·s_a/b (ICH Q2(R2)).
        Assert.Equal(SigmaSource.InterceptStandardError, r.SigmaSource);
        Assert.Equal(3.3 * 0.2949360014 / 1.930357143, r.DetectionLimit.Value, 9);
        Assert.Equal(10 * 0.2949360014 / 1.930357143, r.QuantificationLimit.Value, 9);
    }

    [Fact]
    public void ComputeForSlope_GivenBlankSd_IsTheFormula()
    {
        // ICH Q2(R2): LOD = 3.3σ/S, LOQ = 10σ/S (VERIFIED (secondary), field-reference §3.1).
        IchLimitResult r = IchLimits.ComputeForSlope(ResponseSigma.FromBlankStandardDeviation(0.02), 0.5, ConcentrationUnit.MicrogramPerLitre);
        Assert.Equal(0.132, r.DetectionLimit.Value, 14);
        Assert.Equal(0.4, r.QuantificationLimit.Value, 14);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, r.QuantificationLimit.Unit);
        Assert.Equal(SigmaSource.BlankResponses, r.SigmaSource);
        Assert.Equal(new ReportingLimits(r.DetectionLimit, r.QuantificationLimit), r.ToReportingLimits());
    }

    [Fact]
    public void Compute_RatioAxis_NeedsAndUsesTheSamplesIsConcentration()
    {
        // On the ratio axis x = C_x/C_is (field-reference §0), so the limit in concentration is x_LOD·C_is.
        var options = new CalibrationOptions { Axis = CalibrationAxis.ConcentrationRatio };
        RegressionCalibration cal = LimitsData.Fluorescence(options);
        ResponseSigma sigma = ResponseSigma.FromResidual(cal);
        ArgumentException e = Assert.Throws<ArgumentException>(() => IchLimits.Compute(sigma, cal));
        Assert.Equal("internalStandardConcentration", e.ParamName);

        IchLimitResult r = IchLimits.Compute(sigma, cal, LimitsData.Ng(2));
        Printed.Equal("1.47993", r.DetectionLimit.Value); // 2 × 0.739965 (§3.1, computed)
    }

    [Fact]
    public void Compute_ConcentrationAxisWithOtherIs_ScalesByTheIsRatio()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        ResponseSigma sigma = ResponseSigma.FromResidual(cal);
        double plain = IchLimits.Compute(sigma, cal).DetectionLimit.Value;
        double scaled = IchLimits.Compute(sigma, cal, Concentration.From(0.003, ConcentrationUnit.MicrogramPerLitre)).DetectionLimit.Value;
        Assert.Equal(3 * plain, scaled, 12); // C_x = x·C_is/C_is,cal (SampleQuantitation convention): 3 ng/L vs 1 ng/L
    }

    [Fact]
    public void Compute_QuadraticCalibration_Throws()
    {
        RegressionCalibration quad = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);
        ResponseSigma sigma = ResponseSigma.FromBlankStandardDeviation(0.1);
        ArgumentException e = Assert.Throws<ArgumentException>(() => IchLimits.Compute(sigma, quad));
        Assert.Equal("calibration", e.ParamName);
        Assert.Contains("straight line", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_BadArguments_Throw()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        ResponseSigma sigma = ResponseSigma.FromBlankStandardDeviation(0.1);
        Assert.Equal("sigma", Assert.Throws<ArgumentNullException>(() => IchLimits.Compute(null!, cal)).ParamName);
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => IchLimits.Compute(sigma, null!)).ParamName);
        Assert.Equal("detectionFactor", Assert.Throws<ArgumentOutOfRangeException>(() => IchLimits.Compute(sigma, cal, null, 0)).ParamName);
        Assert.Equal("quantificationFactor", Assert.Throws<ArgumentOutOfRangeException>(() => IchLimits.Compute(sigma, cal, null, 3.3, 3)).ParamName);
        Assert.Equal("slope", Assert.Throws<ArgumentOutOfRangeException>(() => IchLimits.ComputeForSlope(sigma, 0, ConcentrationUnit.MicrogramPerLitre)).ParamName);
        Assert.Equal("slope", Assert.Throws<ArgumentOutOfRangeException>(() => IchLimits.ComputeForSlope(sigma, double.NaN, ConcentrationUnit.MicrogramPerLitre)).ParamName);
        Assert.Equal("internalStandardConcentration", Assert.Throws<ArgumentException>(() => IchLimits.Compute(sigma, cal, Concentration.FromMilligramsPerKilogram(1))).ParamName);
        Assert.Equal("internalStandardConcentration", Assert.Throws<ArgumentOutOfRangeException>(() => IchLimits.Compute(sigma, cal, LimitsData.Ng(0))).ParamName);
    }

    [Fact]
    public void Compute_NegativeSlope_Throws()
    {
        var standards = new[] { 0.0, 1, 2, 3 }.Select((x, i) => CalibrationStandard.Create("S" + i, LimitsData.Ug(x), LimitsData.Ug(1), new Injection(10 - (2 * x) + (i == 1 ? 0.1 : 0), 1))).ToList();
        RegressionCalibration cal = RegressionCalibration.Fit(standards, CalibrationModel.Linear);
        ArgumentException e = Assert.Throws<ArgumentException>(() => IchLimits.Compute(ResponseSigma.FromBlankStandardDeviation(0.1), cal));
        Assert.Contains("positive slope", e.Message, StringComparison.Ordinal);
    }

    // Property (ICH Q2(R2) formula LOD = 3.3σ/S): limits scale linearly with σ and inversely with the slope.
    [Property(MaxTest = 200)]
    public Property ComputeForSlope_ScalingSigmaAndSlope_ScalesTheLimits() =>
        Prop.ForAll(
            Gen.Choose(1, 10_000).Select(i => i / 1000.0).ToArbitrary(),
            Gen.Choose(1, 10_000).Select(i => i / 100.0).ToArbitrary(),
            Gen.Choose(1, 1000).Select(i => i / 10.0).ToArbitrary(),
            (sigma, slope, k) =>
            {
                IchLimitResult r = IchLimits.ComputeForSlope(ResponseSigma.FromBlankStandardDeviation(sigma), slope, ConcentrationUnit.MicrogramPerLitre);
                IchLimitResult rs = IchLimits.ComputeForSlope(ResponseSigma.FromBlankStandardDeviation(k * sigma), slope, ConcentrationUnit.MicrogramPerLitre);
                IchLimitResult rb = IchLimits.ComputeForSlope(ResponseSigma.FromBlankStandardDeviation(sigma), k * slope, ConcentrationUnit.MicrogramPerLitre);
                return Close(rs.DetectionLimit.Value, k * r.DetectionLimit.Value)
                    && Close(rs.QuantificationLimit.Value, k * r.QuantificationLimit.Value)
                    && Close(rb.DetectionLimit.Value, r.DetectionLimit.Value / k)
                    && Close(rb.QuantificationLimit.Value, r.QuantificationLimit.Value / k);
            });

    private static bool Close(double a, double b) => Math.Abs(a - b) <= 1e-12 * Math.Max(Math.Abs(a), Math.Abs(b));
}
