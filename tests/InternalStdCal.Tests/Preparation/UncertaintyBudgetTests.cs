using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class UncertaintyBudgetTests
{
    // Welch–Satterthwaite check value, computed (field-reference §7.1): contributions 0.5 (ν = 4), 0.3 (ν = ∞),
    // 0.2 (ν = 9) → u_c = 0.616441, ν_eff = 9.13763. Built here as relative contributions 0.5 %, 0.3 %, 0.2 %.
    private static PreparedSolution WelchSatterthwaiteCase()
    {
        PreparedSolution stock = PreparedSolution.FromCertificate(
            "Stock", Measured.TypeA(Concentration.FromMilligramsPerLitre(100), Concentration.FromMilligramsPerLitre(0.5), 4));
        return stock.Dilute(DilutionStep.Volumetric(
            Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.03)),
            Measured.TypeA(Volume.FromMillilitres(100), Volume.FromMillilitres(0.2), 9)));
    }

    [Fact]
    public void EffectiveDegreesOfFreedom_Section71Example()
    {
        PreparedSolution s = WelchSatterthwaiteCase();
        Assert.Equal(10, s.Concentration.Value.Value, 12);
        Assert.Equal(0.0616441, s.Concentration.StandardUncertainty.Value, 7);
        Assert.NotNull(s.Budget.EffectiveDegreesOfFreedom);
        Assert.Equal(9.13763, s.Budget.EffectiveDegreesOfFreedom!.Value, 5);
        Assert.Equal(s.Budget.EffectiveDegreesOfFreedom, s.Concentration.DegreesOfFreedom);
    }

    [Fact]
    public void EffectiveDegreesOfFreedom_NeverBelowSmallestInput()
    {
        // ν_eff ≥ min νᵢ (Welch–Satterthwaite); with ν = 1 everywhere the bound is reached up to rounding.
        PreparedSolution s = PreparedSolution.FromCertificate(
            "Stock", Measured.TypeA(Concentration.FromMilligramsPerLitre(3), Concentration.FromMilligramsPerLitre(0.7), 1))
            .Dilute(DilutionStep.Volumetric(
                Measured.TypeA(Volume.FromMillilitres(1), Volume.FromMillilitres(1e-9), 1),
                Measured.TypeA(Volume.FromMillilitres(7), Volume.FromMillilitres(3e-9), 1)));
        Assert.True(s.Budget.EffectiveDegreesOfFreedom >= 1);
    }

    [Fact]
    public void Rows_CarryInputDetails()
    {
        UncertaintyContribution final = WelchSatterthwaiteCase().Budget.Contributions[^1];
        Assert.Equal("final volume", final.Component);
        Assert.Equal(100, final.Value);
        Assert.Equal(0.2, final.StandardUncertainty);
        Assert.Equal("mL", final.Unit);
        Assert.Equal(UncertaintyEvaluation.TypeA, final.Evaluation);
        Assert.Equal(9, final.DegreesOfFreedom);
        Assert.Equal(-1, final.Sensitivity);
        Assert.Equal(0.002, final.RelativeStandardUncertainty, 15);
        Assert.Equal(0.02, final.ContributionToStandardUncertainty, 15); // |c|·u = 10 mg/L · 0.002
        Assert.Equal(4e-6, final.ContributionToRelativeVariance, 15);
        Assert.Equal(100 * 0.04 / 0.38, final.SharePercent, 10); // 0.2² / (0.5² + 0.3² + 0.2²)
    }

    [Fact]
    public void ToString_PrintsHeadingAndOneLinePerInput()
    {
        string text = WelchSatterthwaiteCase().Budget.ToString();
        string[] lines = text.Split(new[] { "\r\n", "\n" }, StringSplitOptions.RemoveEmptyEntries);
        Assert.Equal("Uncertainty budget: 10.0000 mg/L, u = 0.0616 mg/L (0.616 %), ν_eff = 9.138", lines[0]);
        Assert.StartsWith("Model: product/quotient of uncorrelated inputs", lines[1], StringComparison.Ordinal);
        Assert.StartsWith("Stage", lines[2], StringComparison.Ordinal);
        Assert.Contains("Share", lines[2], StringComparison.Ordinal);
        Assert.Matches("^-+$", lines[3]);
        Assert.Equal(7, lines.Length);
        Assert.Matches(@"^Stock\s+certified value\s+100 mg/L\s+0\.5 mg/L\s+TypeA\s+4\s+0\.5 %\s+\+1\s+2\.500E-05\s+65\.8 %$", lines[4]);
        Assert.Matches(@"^Step 1: 10 mL into 100 mL\s+aliquot volume\s+10 mL\s+0\.03 mL\s+TypeBStandard\s+∞\s+0\.3 %\s+\+1\s+9\.000E-06\s+23\.7 %$", lines[5]);
        Assert.Matches(@"^Step 1: 10 mL into 100 mL\s+final volume\s+100 mL\s+0\.2 mL\s+TypeA\s+9\s+0\.2 %\s+-1\s+4\.000E-06\s+10\.5 %$", lines[6]);
    }

    [Fact]
    public void ExactInputs_ZeroUncertaintyNoDegreesOfFreedomZeroShares()
    {
        PreparedSolution s = PreparedSolution.FromCertificate("Exact", Measured.Exact(Concentration.FromMilligramsPerLitre(5)));
        Assert.Equal(0, s.Concentration.StandardUncertainty.Value);
        Assert.Null(s.Budget.EffectiveDegreesOfFreedom);
        Assert.Equal(0, s.Budget.Contributions[0].Share);
    }

    [Fact]
    public void ToString_UnroundedInput_PrintsSevenAndFourSignificantDigits()
    {
        // Computed: value to 7 significant digits (100.1235), u(x) and ν to 4 (0.1235, 12.35),
        // u(x)/x = 0.123456 / 100.123456789 = 0.1233 % (4 digits), (uᵢ(y)/y)² = 1.520E-06, ν_eff = ν of the only input.
        string text = PreparedSolution.FromCertificate(
            "Stock",
            Measured.TypeA(Concentration.FromMilligramsPerLitre(100.123456789), Concentration.FromMilligramsPerLitre(0.123456), 12.3456)).Budget.ToString();
        string nl = Environment.NewLine;
        Assert.Equal(
            "Uncertainty budget: 100.123 mg/L, u = 0.123 mg/L (0.123 %), ν_eff = 12.35" + nl +
            "Model: product/quotient of uncorrelated inputs; relative terms added in quadrature (JCGM 100:2008 §5.1.6)." + nl +
            "Stage  Component        Value          u(x)         Evaluation  ν      u(x)/x    Sensitivity  (uᵢ(y)/y)²  Share" + nl +
            "-----------------------------------------------------------------------------------------------------------------" + nl +
            "Stock  certified value  100.1235 mg/L  0.1235 mg/L  TypeA       12.35  0.1233 %           +1   1.520E-06  100.0 %" + nl,
            text);
    }

    [Fact]
    public void ToString_ZeroResultWithoutDegreesOfFreedom_PrintsNotApplicableAndInfinity()
    {
        // A measured zero: no relative values ("n/a"); only Type B input without ν → ν_eff infinite ("∞").
        string text = SampleResult.Liquid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0), Concentration.FromMilligramsPerLitre(0.5)),
            Array.Empty<DilutionStep>()).Budget.ToString();
        string nl = Environment.NewLine;
        Assert.Equal(
            "Uncertainty budget: 0.000 mg/L, u = 0.500 mg/L, ν_eff = ∞" + nl +
            "Model: product/quotient of uncorrelated inputs; relative terms added in quadrature (JCGM 100:2008 §5.1.6)." + nl +
            "Stage        Component               Value   u(x)      Evaluation     ν  u(x)/x  Sensitivity  (uᵢ(y)/y)²  Share" + nl +
            "-----------------------------------------------------------------------------------------------------------------" + nl +
            "Measurement  measured concentration  0 mg/L  0.5 mg/L  TypeBStandard  ∞     n/a           +1         n/a  100.0 %" + nl,
            text);
    }
}
