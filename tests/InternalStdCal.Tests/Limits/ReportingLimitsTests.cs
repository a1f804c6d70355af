using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class ReportingLimitsTests
{
    private static readonly ReportingLimits Limits = new(LimitsData.Ug(0.15), LimitsData.Ug(0.5));

    // Censored reporting ("< LOQ", "< LOD" = not detected), common practice; a value at a limit is not below it.
    [Theory]
    [InlineData(-0.02, ReportedStatus.NotDetected)]
    [InlineData(0.1499, ReportedStatus.NotDetected)]
    [InlineData(0.15, ReportedStatus.BelowQuantificationLimit)]
    [InlineData(0.4999, ReportedStatus.BelowQuantificationLimit)]
    [InlineData(0.5, ReportedStatus.Quantified)]
    [InlineData(12.0, ReportedStatus.Quantified)]
    public void Apply_Estimate_GivesStatusAndKeepsTheEstimate(double estimate, ReportedStatus expected)
    {
        ReportedValue r = Limits.Apply(LimitsData.Ug(estimate));
        Assert.Equal(expected, r.Status);
        Assert.Equal(LimitsData.Ug(estimate), r.Estimate);
        Assert.Equal(expected != ReportedStatus.Quantified, r.IsCensored);
        Assert.Equal(expected == ReportedStatus.NotDetected, r.IsNotDetected);
        Assert.Equal(
            expected switch
            {
                ReportedStatus.NotDetected => LimitsData.Ug(0.15),
                ReportedStatus.BelowQuantificationLimit => LimitsData.Ug(0.5),
                _ => (Concentration?)null,
            },
            r.Limit);
    }

    [Fact]
    public void Apply_OtherUnitOfTheSameKind_ComparesTheAmounts()
    {
        ReportedValue r = Limits.Apply(LimitsData.Ng(300)); // 300 ng/L = 0.3 µg/L
        Assert.Equal(ReportedStatus.BelowQuantificationLimit, r.Status);
        Assert.Equal(LimitsData.Ng(300), r.Estimate);
        Assert.Equal("< 0.50 µg/L (LOQ)", r.ToString());
    }

    [Fact]
    public void QuantificationOnly_NeverNotDetected()
    {
        ReportingLimits loqOnly = ReportingLimits.QuantificationOnly(LimitsData.Ug(0.5));
        Assert.Null(loqOnly.DetectionLimit);
        Assert.Equal(ReportedStatus.BelowQuantificationLimit, loqOnly.Apply(LimitsData.Ug(-1)).Status);
        Assert.Equal("LOQ 0.5 µg/L", loqOnly.ToString());
        Assert.Equal("LOD 0.15 µg/L, LOQ 0.5 µg/L", Limits.ToString());
    }

    [Fact]
    public void Apply_QuantitationResult_UsesItsConcentration()
    {
        // Fluorescence line (field-reference §1.2, COMPUTED): ȳ0 = 2.9 → x0 = 0.7160037 pg/mL, below the §3.1 LOD 0.739965;
        // ȳ0 = 13.5 → x0 = 6.2072155, above the LOQ 2.24232.
        RegressionCalibration cal = LimitsData.Fluorescence();
        ReportingLimits limits = IchLimits.Compute(ResponseSigma.FromResidual(cal), cal).ToReportingLimits();
        QuantitationResult low = SampleQuantitation.Quantify(cal, UnknownSample.Create("U-low", LimitsData.Ng(1), new Injection(2.9, 1)));
        QuantitationResult mid = SampleQuantitation.Quantify(cal, UnknownSample.Create("U-mid", LimitsData.Ng(1), new Injection(13.5, 1)));

        ReportedValue lowReported = limits.Apply(low);
        Assert.Equal(ReportedStatus.NotDetected, lowReported.Status);
        Assert.Equal(low.Concentration, lowReported.Estimate);
        Assert.Equal("< 0.74 ng/L (LOD)", lowReported.ToString());
        ReportedValue midReported = limits.Apply(mid);
        Assert.Equal(ReportedStatus.Quantified, midReported.Status);
        Assert.Equal("6.21 ng/L", midReported.ToString());
    }

    [Fact]
    public void Constructor_BadInput_Throws()
    {
        Assert.Equal("detectionLimit", Assert.Throws<ArgumentOutOfRangeException>(() => new ReportingLimits(LimitsData.Ug(0), LimitsData.Ug(1))).ParamName);
        Assert.Equal("quantificationLimit", Assert.Throws<ArgumentOutOfRangeException>(() => new ReportingLimits(LimitsData.Ug(0.1), LimitsData.Ug(-1))).ParamName);
        Assert.Equal("quantificationLimit", Assert.Throws<ArgumentException>(() => new ReportingLimits(LimitsData.Ug(1), LimitsData.Ug(0.5))).ParamName);
        Assert.Equal("quantificationLimit", Assert.Throws<ArgumentException>(() => new ReportingLimits(LimitsData.Ug(0.1), Concentration.FromMilligramsPerKilogram(1))).ParamName);
        Assert.Equal("quantificationLimit", Assert.Throws<ArgumentOutOfRangeException>(() => ReportingLimits.QuantificationOnly(LimitsData.Ug(0))).ParamName);
    }

    [Fact]
    public void Apply_BadInput_Throws()
    {
        Assert.Equal("estimate", Assert.Throws<ArgumentException>(() => Limits.Apply(Concentration.FromMicromolesPerLitre(1))).ParamName);
        Assert.Equal("result", Assert.Throws<ArgumentNullException>(() => Limits.Apply((QuantitationResult)null!)).ParamName);
        ReportingLimits molar = new(Concentration.FromMicromolesPerLitre(0.1), Concentration.FromMicromolesPerLitre(0.3));
        RegressionCalibration cal = LimitsData.Fluorescence();
        QuantitationResult q = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", LimitsData.Ng(1), new Injection(13.5, 1)));
        Assert.Equal("result", Assert.Throws<ArgumentException>(() => molar.Apply(q)).ParamName);
    }

    [Fact]
    public void Equals_IsExact()
    {
        Assert.Equal(new ReportingLimits(LimitsData.Ug(0.15), LimitsData.Ug(0.5)), Limits);
        Assert.Equal(new ReportingLimits(LimitsData.Ug(0.15), LimitsData.Ug(0.5)).GetHashCode(), Limits.GetHashCode());
        Assert.Equal(new ReportingLimits(LimitsData.Ng(150), LimitsData.Ng(500)), Limits); // same amounts (Concentration equality)
        Assert.NotEqual(new ReportingLimits(LimitsData.Ug(0.15), LimitsData.Ug(0.5000000000000001)), Limits);
        Assert.NotEqual(ReportingLimits.QuantificationOnly(LimitsData.Ug(0.5)), Limits);
    }

    // Property (definition of censoring against ordered limits): raising the estimate never lowers the status, so a
    // quantified result never turns censored and "not detected" never follows "< LOQ".
    [Property(MaxTest = 300)]
    public Property Apply_RaisingTheEstimate_NeverLowersTheStatus() =>
        Prop.ForAll(
            Gen.Choose(1, 1000).SelectMany(lod => Gen.Choose(100, 1000).Select(ratio => (Lod: lod / 100.0, Ratio: ratio / 100.0))).ToArbitrary(),
            Gen.Choose(-2000, 20_000).Select(i => i / 1000.0).ToArbitrary(),
            Gen.Choose(0, 20_000).Select(i => i / 1000.0).ToArbitrary(),
            (l, estimate, raise) =>
            {
                var limits = new ReportingLimits(LimitsData.Ug(l.Lod), LimitsData.Ug(l.Lod * l.Ratio));
                ReportedStatus before = limits.Apply(LimitsData.Ug(estimate)).Status;
                ReportedStatus after = limits.Apply(LimitsData.Ug(estimate + raise)).Status;
                return after >= before;
            });
}
