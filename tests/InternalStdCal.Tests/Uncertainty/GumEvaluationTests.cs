using System;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using InternalStdCal.Uncertainty;
using Xunit;

namespace InternalStdCal.Tests.Uncertainty;

public class GumEvaluationTests
{
    private static MeasurementModel Sum(params UncertainInput[] inputs) =>
        MeasurementModel.Create("y", "mg/L", inputs, x =>
        {
            double s = 0;
            foreach (double v in x)
            {
                s += v;
            }

            return s;
        });

    // Field reference §7.1, Welch–Satterthwaite example (COMPUTED; formula VERIFIED, JCGM 100:2008 eq. G.2b):
    // contributions 0.5 (ν = 4), 0.3 (ν = ∞), 0.2 (ν = 9) → u_c = 0.616441, ν_eff = 9.13763, truncated to 9 →
    // k = 2.26216, U = 1.3945.
    private static MeasurementModel WelchSatterthwaiteCase() => Sum(
        UncertainInput.StudentT("a", 10, 0.5, 4),
        UncertainInput.Normal("b", 5, 0.3),
        UncertainInput.StudentT("c", 1, 0.2, 9));

    [Fact]
    public void EvaluateGum_Section71Example_MatchesCheckValues()
    {
        GumEvaluation gum = WelchSatterthwaiteCase().EvaluateGum();
        Assert.Equal(16, gum.Value, 12);
        Assert.Equal(0.616441, gum.StandardUncertainty, 6);
        Assert.Equal(9.13763, gum.EffectiveDegreesOfFreedom, 5);
        Assert.Equal(2.26216, gum.CoverageFactor, 5);
        Assert.Equal(1.3945, gum.ExpandedUncertainty, 4);
        Assert.Equal(16 - gum.ExpandedUncertainty, gum.Interval.Lower, 12);
    }

    [Fact]
    public void EvaluateGum_NumericSensitivitiesOfLinearModel_AreOne()
    {
        GumEvaluation gum = WelchSatterthwaiteCase().EvaluateGum();
        Assert.False(gum.Model.HasAnalyticSensitivities);
        foreach (InputContribution row in gum.Contributions)
        {
            Assert.Equal(1, row.SensitivityCoefficient, 12);
        }

        // Shares sum to 1 without correlation: 0.25 + 0.09 + 0.04 over 0.38.
        Assert.Equal(0.25 / 0.38, gum.Contributions[0].VarianceShare, 10);
        Assert.Equal(1, gum.Contributions[0].VarianceShare + gum.Contributions[1].VarianceShare + gum.Contributions[2].VarianceShare, 12);
    }

    [Fact]
    public void EvaluateGum_AllInfiniteDegreesOfFreedom_UsesNormalQuantile()
    {
        GumEvaluation gum = Sum(UncertainInput.Normal("a", 1, 0.3), UncertainInput.Normal("b", 2, 0.4)).EvaluateGum();
        Assert.True(double.IsPositiveInfinity(gum.EffectiveDegreesOfFreedom));
        Assert.Equal(1.95996398, gum.CoverageFactor, 8); // field reference §6, ∞ row (COMPUTED)
        Assert.Equal(0.5, gum.StandardUncertainty, 14);
    }

    [Theory]
    [InlineData(0.99, 9, 3.24983554)] // field reference §6 (COMPUTED): t(0.995, 9)
    [InlineData(0.95, 2, 4.30265273)] // t(0.975, 2)
    public void EvaluateGum_ChosenCoverageProbability_UsesTQuantile(double p, double nu, double expectedK)
    {
        GumEvaluation gum = Sum(UncertainInput.StudentT("a", 1, 0.3, nu)).EvaluateGum(p);
        Assert.Equal(expectedK, gum.CoverageFactor, 7);
    }

    [Fact]
    public void EvaluateGum_FractionalEffectiveDegreesOfFreedom_IsTruncated()
    {
        // ν_eff = 9.13763 → k = t(0.975, 9) = 2.26215716 (field reference §6; truncation per JCGM 100:2008 §G.6.4).
        Assert.Equal(2.26215716, WelchSatterthwaiteCase().EvaluateGum().CoverageFactor, 8);
    }

    [Fact]
    public void EvaluateGum_QuamA1ThroughProductModel_MatchesCheckValues()
    {
        // EURACHEM/CITAC QUAM Example A1 (VERIFIED, field reference §7.4): c = 1000·m·P/V with P = 0.9999
        // (u 0.000058), m = 100.28 mg (u 0.05 mg), V = 100.0 mL (u 0.07 mL) → c = 1002.6997 mg/L,
        // u_c = 0.8637 mg/L, u_rel = 0.0008614, U(k = 2) = 1.73 mg/L (COMPUTED recomputation).
        var purity = UncertainInput.Normal("P", 0.9999, 0.000058);
        var mass = UncertainInput.From("m", Measured.WithStandardUncertainty(Mass.FromMilligrams(100.28), Mass.FromMilligrams(0.05)));
        var volume = UncertainInput.From("V", Measured.WithStandardUncertainty(Volume.FromMillilitres(100.0), Volume.FromMillilitres(0.07)));
        var model = MeasurementModel.Product("c(Cd)", "mg/L", 1000, new[] { purity, mass, volume }, new[] { 1.0, 1, -1 });
        GumEvaluation gum = model.EvaluateGum();
        Assert.Equal("mg", mass.Unit);
        Assert.Equal(1002.6997, gum.Value, 4);
        Assert.Equal(0.8637, gum.StandardUncertainty, 4);
        Assert.Equal(0.0008614, gum.RelativeStandardUncertainty, 7);
        Assert.Equal(1.73, Math.Round(gum.ToMeasuredConcentration(ConcentrationUnit.MilligramPerLitre).ExpandedUncertainty(2).Value, 2));

        // Sensitivities: c_P = y/P, c_m = y/m, c_V = −y/V.
        Numeric.AssertRelative(gum.Value / 0.9999, gum.Contributions[0].SensitivityCoefficient, 1e-14);
        Numeric.AssertRelative(-gum.Value / 100.0, gum.Contributions[2].SensitivityCoefficient, 1e-14);
    }

    [Fact]
    public void EvaluateGum_QuamA1WithVolumeComponents_MatchesCheckValue()
    {
        // Field reference §7.4 (COMPUTED): with u(V) = 0.06647 mL → u_c = 0.8352 mg/L.
        var model = MeasurementModel.Product(
            "c(Cd)", "mg/L", 1000,
            new[] { UncertainInput.Normal("P", 0.9999, 0.000058), UncertainInput.Normal("m", 100.28, 0.05, unit: "mg"), UncertainInput.Normal("V", 100.0, 0.06647, unit: "mL") },
            new[] { 1.0, 1, -1 });
        Assert.Equal(0.8352, model.EvaluateGum().StandardUncertainty, 4);
    }

    [Fact]
    public void EvaluateGum_ProductModelAndSameFunctionWithNumericSensitivities_Agree()
    {
        UncertainInput[] inputs = { UncertainInput.Normal("a", 3.2, 0.05), UncertainInput.Rectangular("b", 0.8, 0.01), UncertainInput.Triangular("c", 12.5, 0.2) };
        GumEvaluation analytic = MeasurementModel.Product("y", null, 2.5, inputs, new[] { 1.0, -1, 0.5 }).EvaluateGum();
        GumEvaluation numeric = MeasurementModel.Create("y", null, inputs, x => 2.5 * x[0] / x[1] * Math.Sqrt(x[2])).EvaluateGum();
        for (int i = 0; i < inputs.Length; i++)
        {
            Numeric.AssertRelative(analytic.Contributions[i].SensitivityCoefficient, numeric.Contributions[i].SensitivityCoefficient, 1e-9);
        }

        Numeric.AssertRelative(analytic.StandardUncertainty, numeric.StandardUncertainty, 1e-9);
    }

    [Fact]
    public void EvaluateGum_SuppliedDerivatives_AreUsed()
    {
        var x = UncertainInput.Normal("x", 2, 0.01);
        var model = MeasurementModel.Create("y", null, new[] { x }, v => Math.Log(v[0]), v => new[] { 1 / v[0] });
        GumEvaluation gum = model.EvaluateGum();
        Assert.True(model.HasAnalyticSensitivities);
        Assert.Equal(0.5, gum.Contributions[0].SensitivityCoefficient);
        Assert.Equal(0.005, gum.StandardUncertainty, 15);
    }

    [Theory]
    [InlineData(1.0, 2.0)]
    [InlineData(-1.0, 0.0)]
    [InlineData(0.5, 1.7320508075688772)] // √3
    public void EvaluateGum_CorrelatedSum_AddsCorrelationTerm(double r, double expected)
    {
        // JCGM 100:2008 eq. 16: u_c² = u₁² + u₂² + 2r·u₁u₂ for y = x₁ + x₂ with u₁ = u₂ = 1.
        var model = MeasurementModel.Create(
            "y", null, new[] { UncertainInput.Normal("x1", 1, 1), UncertainInput.Normal("x2", 1, 1) }, x => x[0] + x[1],
            correlations: new[] { new InputCorrelation("x1", "x2", r) });
        GumEvaluation gum = model.EvaluateGum();
        Assert.Equal(expected, gum.StandardUncertainty, 7);
        Assert.Equal(2 * r, gum.CorrelationVariance, 7);
        Assert.Equal(r, model.Correlation("x2", "x1"));
    }

    [Fact]
    public void ToMeasuredConcentration_CarriesValueUncertaintyAndDegreesOfFreedom()
    {
        GumEvaluation gum = WelchSatterthwaiteCase().EvaluateGum();
        Measured<Concentration> m = gum.ToMeasuredConcentration(ConcentrationUnit.MilligramPerLitre);
        Assert.Equal(gum.Value, m.Value.Value);
        Assert.Equal(gum.StandardUncertainty, m.StandardUncertainty.Value);
        Assert.Equal(gum.EffectiveDegreesOfFreedom, m.DegreesOfFreedom);
        Assert.Equal(UncertaintyEvaluation.Combined, m.Evaluation);
    }

    [Fact]
    public void ToString_ListsEveryInputAndTheResult()
    {
        string text = WelchSatterthwaiteCase().EvaluateGum().ToString();
        Assert.Contains("u_c = 0.6164 mg/L", text, StringComparison.Ordinal);
        Assert.Contains("k = 2.262", text, StringComparison.Ordinal);
        Assert.Contains("65.8 %", text, StringComparison.Ordinal); // 0.25/0.38
        Assert.Contains("StudentT", text, StringComparison.Ordinal);
    }

    [Fact]
    public void EvaluateGum_ModelNotFiniteNearInputs_Throws()
    {
        var model = MeasurementModel.Create("y", null, new[] { UncertainInput.Normal("x", 0.001, 0.01) }, x => Math.Sqrt(x[0]));
        InvalidOperationException e = Assert.Throws<InvalidOperationException>(() => model.EvaluateGum());
        Assert.Contains("NaN at x = ", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void EvaluateGum_BadCoverageProbability_Throws()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => WelchSatterthwaiteCase().EvaluateGum(1));
        Assert.Equal("coverageProbability", e.ParamName);
    }

    [Fact]
    public void EvaluateGum_DerivativesOfWrongLength_Throw()
    {
        var model = MeasurementModel.Create("y", null, new[] { UncertainInput.Normal("x", 2, 0.1) }, v => v[0], v => new[] { 1.0, 2.0 });
        Assert.Throws<InvalidOperationException>(() => model.EvaluateGum());
    }
}
