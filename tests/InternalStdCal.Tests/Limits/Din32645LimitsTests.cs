using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Calibration;
using InternalStdCal.Limits;
using InternalStdCal.Tests.Calibration;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Limits;

public class Din32645LimitsTests
{
    // DIN 32645 calibration-curve method (formulas from memory); fluorescence data, m = 1, values COMPUTED,
    // field-reference §3.5.
    [Theory]
    [InlineData(0.05, "0.546759", "1.09352", "1.96279", "1.64028")]
    [InlineData(0.01, "0.913033", "1.82607", "2.99990", "2.73910")]
    public void Compute_Fluorescence_MatchesFieldReference(double alpha, string ng, string eg, string bg, string quick)
    {
        Din32645Result r = Din32645Limits.Compute(LimitsData.Fluorescence(), 1, alpha);
        Printed.Equal(ng, r.DecisionLimit.Value);
        Printed.Equal(eg, r.DetectionCapability.Value);
        Printed.Equal(bg, r.QuantificationLimit.Value);
        Printed.Equal(quick, r.QuickQuantificationEstimate.Value);
        Assert.Equal(InternalStdCal.Quantities.ConcentrationUnit.NanogramPerLitre, r.QuantificationLimit.Unit);
        Assert.InRange(r.Iterations, 2, 200);
        Assert.Contains("DIN 32645", r.Source, StringComparison.Ordinal);
        Assert.Contains("s_y/x", r.SigmaSource, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_Fluorescence_IteratedXbgSolvesItsEquation()
    {
        // x_BG = k·s_x0·t(1−α/2, n−2)·√(1/m + 1/n + (x_BG − x̄)²/Q_x) (DIN 32645, from memory), with s_x0 = s_y/x/b,
        // x̄ = 6, Q_x = 112, n = 7, t(0.975, 5) = 2.57058184 (COMPUTED, field-reference §1.2, §6).
        Din32645Result r = Din32645Limits.Compute(LimitsData.Fluorescence());
        double x = r.QuantificationLimit.Value;
        double sx0 = 0.4328477132 / 1.930357143;
        double rhs = 3 * sx0 * 2.57058184 * Math.Sqrt(1 + (1.0 / 7) + ((x - 6) * (x - 6) / 112));
        Assert.Equal(rhs, x, 7);
        Printed.Equal("0.224232", r.ProcedureStandardDeviation.Value);
    }

    [Fact]
    public void Compute_BadInput_Throws()
    {
        RegressionCalibration cal = LimitsData.Fluorescence();
        Assert.Equal("calibration", Assert.Throws<ArgumentNullException>(() => Din32645Limits.Compute(null!)).ParamName);
        Assert.Equal("sampleReplicates", Assert.Throws<ArgumentOutOfRangeException>(() => Din32645Limits.Compute(cal, 0)).ParamName);
        Assert.Equal("alpha", Assert.Throws<ArgumentOutOfRangeException>(() => Din32645Limits.Compute(cal, 1, 0.5)).ParamName);
        Assert.Equal("k", Assert.Throws<ArgumentOutOfRangeException>(() => Din32645Limits.Compute(cal, 1, 0.05, 0)).ParamName);

        RegressionCalibration origin = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.LinearThroughOrigin);
        Assert.Equal("calibration", Assert.Throws<ArgumentException>(() => Din32645Limits.Compute(origin)).ParamName);
        RegressionCalibration means = LimitsData.Fluorescence(new CalibrationOptions { Replicates = ReplicateHandling.LevelMeans });
        Assert.Contains("EveryInjection", Assert.Throws<ArgumentException>(() => Din32645Limits.Compute(means)).Message, StringComparison.Ordinal);
        RegressionCalibration weighted = RegressionCalibration.Fit(FieldReferenceStandards.Absorbance(), CalibrationModel.Linear, Weighting.InverseVariance(FieldReferenceStandards.AbsorbanceSds));
        Assert.Contains("weighted", Assert.Throws<ArgumentException>(() => Din32645Limits.Compute(weighted)).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Compute_VeryImpreciseLine_ThrowsInsteadOfDiverging()
    {
        // x = 0, 1, 2; y = 0, 2, 0.5: b = 0.25, s_y/x ≈ 1.46, so k²·s_x0²·t²/Q_x ≫ 1 and x_BG has no solution.
        var standards = new[] { (0.0, 0.0), (1.0, 2.0), (2.0, 0.5) }
            .Select((p, i) => CalibrationStandard.Create("P" + i, LimitsData.Ug(p.Item1), LimitsData.Ug(1), new Injection(p.Item2, 1))).ToList();
        RegressionCalibration cal = RegressionCalibration.Fit(standards, CalibrationModel.Linear);
        ArgumentException e = Assert.Throws<ArgumentException>(() => Din32645Limits.Compute(cal));
        Assert.Equal("calibration", e.ParamName);
        Assert.Contains("no solution", e.Message, StringComparison.Ordinal);
    }

    // Property (x_NG, x_BG ∝ s_y/x / b, DIN 32645 and ISO 11843-2 formulas): multiplying every response by c scales s_y/x
    // and b alike, so the limits on the concentration axis do not change.
    [Property(MaxTest = 50)]
    public Property Compute_ScalingAllResponses_LeavesTheLimitsUnchanged() =>
        Prop.ForAll(Gen.Choose(1, 100_000).Select(i => i / 1000.0).ToArbitrary(), c =>
        {
            var scaled = FieldReferenceStandards.Fluorescence()
                .Select(s => CalibrationStandard.Create(s.Label, s.AnalyteConcentration, s.InternalStandardConcentration, new Injection(c * s.Injections[0].AnalyteSignal, 1)))
                .ToList();
            RegressionCalibration cal = RegressionCalibration.Fit(scaled, CalibrationModel.Linear);
            Din32645Result r = Din32645Limits.Compute(cal);
            Iso11843Result iso = Iso11843Limits.Compute(cal);
            return Math.Abs(r.QuantificationLimit.Value - 1.96279) < 5e-6
                && Math.Abs(r.DecisionLimit.Value - 0.546759) < 5e-7
                && Math.Abs(iso.MinimumDetectableValue.Value - (0.546759 * 3.86994 / 2.01505)) < 1e-5;
        });
}
