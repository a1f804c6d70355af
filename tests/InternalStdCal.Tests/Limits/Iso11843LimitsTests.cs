using System;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class Iso11843LimitsTests
{
    // ISO 11843-2 x_c (formula from memory) equals DIN 32645 x_NG for K = m = 1, I·J = 7: 0.546759 / 0.913033 (COMPUTED,
    // field-reference §3.4–3.5).
    [Theory]
    [InlineData(0.05, "0.546759")]
    [InlineData(0.01, "0.913033")]
    public void Compute_FluorescenceK1_CriticalValueMatchesFieldReference(double alpha, string expected)
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        Iso11843Result r = Iso11843Limits.Compute(cal, 1, alpha, alpha);
        Printed.Equal(expected, r.CriticalValue.Value);
        Assert.Equal(7, r.Levels);
        Assert.Equal(1, r.ReplicatesPerLevel);
        Assert.Equal(5, r.DegreesOfFreedom);
        double xNg = Din32645Limits.Compute(cal, 1, alpha).DecisionLimit.Value;
        Assert.Equal(xNg, r.CriticalValue.Value, 12);
    }

    [Fact]
    public void Compute_FluorescenceK1_MinimumDetectableValueUsesExactDelta()
    {
        // x_d = δ(ν, α, β)·(σ̂/b)·√(…) = x_c·δ/t; ν = 5: δ = 3.86994, t(0.95, 5) = 2.01505 (COMPUTED, field-reference §3.3).
        Iso11843Result r = Iso11843Limits.Compute(LimitsData.Fluorescence());
        Printed.Equal("3.86994", r.Noncentrality);
        Printed.Equal("2.01505", r.TQuantile);
        Assert.Equal(0.546759 * 3.86994 / 2.01505, r.MinimumDetectableValue.Value, 5);
        Assert.Contains("ISO 11843-2", r.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_MoreTestReplicates_LowersTheCriticalValue()
    {
        // The 1/K term shrinks with K (formula, field-reference §3.4).
        RegressionCalibration cal = LimitsData.Fluorescence();
        Assert.True(Iso11843Limits.Compute(cal, 3).CriticalValue < Iso11843Limits.Compute(cal, 1).CriticalValue);
    }

    [Fact]
    public void Compute_BalancedReplicates_CountsLevelsAndReplicates()
    {
        var standards = FieldReferenceStandards.Fluorescence()
            .Select(s => CalibrationStandard.Create(s.Label, s.AnalyteConcentration, s.InternalStandardConcentration, s.Injections[0], new Injection(s.Injections[0].AnalyteSignal * 1.01, 1)))
            .ToList();
        Iso11843Result r = Iso11843Limits.Compute(RegressionCalibration.Fit(standards, CalibrationModel.Linear));
        Assert.Equal(7, r.Levels);
        Assert.Equal(2, r.ReplicatesPerLevel);
        Assert.Equal(12, r.DegreesOfFreedom);
    }

    [Fact]
    public void Compute_BadInput_Throws()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => Iso11843Limits.Compute(null!)).ParamName);
        Assert.Equal("testSampleReplicates", Assert.Throws<ArgumentOutOfRangeException>(() => Iso11843Limits.Compute(cal, 0)).ParamName);
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => Iso11843Limits.Compute(cal, 1, 0)).ParamName);
        Assert.Equal("beta", Assert.Throws<ArgumentOutOfRangeException>(() => Iso11843Limits.Compute(cal, 1, 0.05, 0.7)).ParamName);
        RegressionCalibration quad = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);
        Assert.Equal("calibration", Assert.Throws<ArgumentException>(() => Iso11843Limits.Compute(quad)).ParamName);
        var ratio = LimitsData.Fluorescence(new CalibrationOptions { Axis = CalibrationAxis.ConcentrationRatio });
        Assert.Equal("internalStandardConcentration", Assert.Throws<ArgumentException>(() => Iso11843Limits.Compute(ratio)).ParamName);

        var unbalanced = FieldReferenceStandards.Fluorescence().ToList();
        CalibrationStandard first = unbalanced[1];
        unbalanced[1] = CalibrationStandard.Create(first.Label, first.AnalyteConcentration, first.InternalStandardConcentration, first.Injections[0], new Injection(5.1, 1));
        ArgumentException e = Assert.Throws<ArgumentException>(() => Iso11843Limits.Compute(RegressionCalibration.Fit(unbalanced, CalibrationModel.Linear)));
        Assert.Contains("unbalanced", e.Message, StringComparison.Ordinal);
    }
}
