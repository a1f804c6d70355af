using System;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

public class MeasuredTests
{
    // Rectangular ±a → u = a/√3 (JCGM 100:2008 §4.3.7; VERIFIED in NIST/SEMATECH e-Handbook §2.5.4.1,
    // field-reference §7.1). QUAM Appendix E example: range 7–10, a = 1.5 → u = 0.87 (VERIFIED, field-reference §7.1).
    [Fact]
    public void FromTolerance_Rectangular_IsHalfWidthOverRootThree()
    {
        Measured<Concentration> m = Measured.FromTolerance(
            Concentration.FromMilligramsPerLitre(8.5), Concentration.FromMilligramsPerLitre(1.5), ToleranceDistribution.Rectangular);
        Assert.Equal(0.87, m.StandardUncertainty.Value, 2);
        Numeric.AssertWithinRoundings(1.5 / Math.Sqrt(3), m.StandardUncertainty.Value, 2);
        Assert.Equal(UncertaintyEvaluation.TypeBRectangular, m.Evaluation);
        Assert.Null(m.DegreesOfFreedom);
    }

    // Triangular ±a → u = a/√6 (JCGM 100:2008 §4.3.9; VERIFIED, NIST/SEMATECH e-Handbook, field-reference §7.1).
    // QUAM A1 flask calibration ±0.1 mL triangular → 0.04082 mL (from memory, field-reference §7.4).
    [Fact]
    public void FromTolerance_Triangular_QuamFlaskCalibration()
    {
        Measured<Volume> v = Measured.FromTolerance(Volume.FromMillilitres(100), Volume.FromMillilitres(0.1), ToleranceDistribution.Triangular);
        Assert.Equal(0.04082, v.StandardUncertainty.Millilitres, 5);
        Assert.Equal(UncertaintyEvaluation.TypeBTriangular, v.Evaluation);
        Assert.Equal(VolumeUnit.Millilitre, v.StandardUncertainty.Unit);
    }

    // QUAM A1 temperature effect: ±4 °C × 2.1e-4 °C⁻¹ × 100 mL = ±0.084 mL, rectangular → 0.04850 mL
    // (from memory, field-reference §7.4; the product is computed here, the division is the rectangular rule).
    [Fact]
    public void FromTolerance_Rectangular_QuamTemperatureEffect()
    {
        Measured<Volume> v = Measured.FromTolerance(Volume.FromMillilitres(100), Volume.FromMillilitres(4 * 2.1e-4 * 100), ToleranceDistribution.Rectangular);
        Assert.Equal(0.04850, v.StandardUncertainty.Millilitres, 5);
    }

    // Expanded uncertainty with coverage factor k → u = U/k (JCGM 100:2008 §4.3.3). A certificate stating
    // 1000 ± 2 mg/L (k = 2) gives u = 1 mg/L; the halving is exact in binary.
    [Fact]
    public void FromExpandedUncertainty_DividesByCoverageFactor()
    {
        Measured<Concentration> m = Measured.FromExpandedUncertainty(
            Concentration.FromMilligramsPerLitre(1000), Concentration.FromMilligramsPerLitre(2), 2);
        Assert.Equal(1, m.StandardUncertainty.Value);
        Assert.Equal(UncertaintyEvaluation.TypeBExpanded, m.Evaluation);
        Assert.Equal(0.001, m.RelativeStandardUncertainty);
        Assert.Equal(Concentration.FromMilligramsPerLitre(2), m.ExpandedUncertainty(2));
    }

    [Fact]
    public void FromExpandedUncertainty_UncertaintyInOtherUnitOfKind_IsHeldInValueUnit()
    {
        Measured<Concentration> m = Measured.FromExpandedUncertainty(
            Concentration.FromMilligramsPerLitre(10), Concentration.FromMicrogramsPerLitre(40), 2);
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, m.StandardUncertainty.Unit);
        Assert.Equal(0.02, m.StandardUncertainty.Value);
    }

    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(-2.0, "-2")]
    [InlineData(double.NaN, "NaN")]
    public void FromExpandedUncertainty_BadCoverageFactor_ThrowsNamingIt(double k, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Measured.FromExpandedUncertainty(Concentration.FromMilligramsPerLitre(1), Concentration.FromMilligramsPerLitre(0.1), k));
        Assert.Equal("coverageFactor", ex.ParamName);
        Assert.StartsWith($"Parameter 'coverageFactor' was {printed}; it must be a finite number > 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromTolerance_UndefinedDistribution_ThrowsNamingIt()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Measured.FromTolerance(Volume.FromMillilitres(1), Volume.FromMillilitres(0.01), (ToleranceDistribution)7));
        Assert.Equal("distribution", ex.ParamName);
        Assert.StartsWith("Parameter 'distribution' was 7; it must be Rectangular or Triangular.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FromTolerance_NegativeHalfWidth_ThrowsNamingIt()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Measured.FromTolerance(Concentration.FromMilligramsPerLitre(1), Concentration.FromMilligramsPerLitre(-0.1), ToleranceDistribution.Rectangular));
        Assert.Equal("halfWidth", ex.ParamName);
        Assert.StartsWith("Parameter 'halfWidth' was -0.1 mg/L; an uncertainty must be >= 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void WithStandardUncertainty_OtherKind_ThrowsNamingIt()
    {
        var ex = Assert.Throws<ArgumentException>(() =>
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(1), Concentration.FromMilligramsPerKilogram(0.1)));
        Assert.Equal("standardUncertainty", ex.ParamName);
        Assert.Equal("Parameter 'standardUncertainty' (0.1 mg/kg) must be of the same kind as the value (1 mg/L). (Parameter 'standardUncertainty')", ex.Message);
    }

    [Fact]
    public void WithStandardUncertainty_UndefinedEvaluation_ThrowsNamingIt()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Measured.WithStandardUncertainty(Volume.FromMillilitres(1), Volume.FromMillilitres(0.01), null, (UncertaintyEvaluation)42));
        Assert.Equal("evaluation", ex.ParamName);
        Assert.StartsWith("Parameter 'evaluation' was 42; it must be a defined UncertaintyEvaluation (0 to 6).", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.5, "0.5")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void TypeA_BadDegreesOfFreedom_ThrowsNamingIt(double nu, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Measured.TypeA(Concentration.FromMilligramsPerLitre(1), Concentration.FromMilligramsPerLitre(0.1), nu));
        Assert.Equal("degreesOfFreedom", ex.ParamName);
        Assert.StartsWith($"Parameter 'degreesOfFreedom' was {printed}; it must be a finite number >= 1 (use null for infinite degrees of freedom).", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void TypeA_KeepsDegreesOfFreedomAndPrints()
    {
        Measured<Concentration> m = Measured.TypeA(Concentration.FromMilligramsPerLitre(10), Concentration.FromMilligramsPerLitre(0.05), 9);
        Assert.Equal(9, m.DegreesOfFreedom);
        Assert.Equal(UncertaintyEvaluation.TypeA, m.Evaluation);
        Assert.Equal("10 mg/L, u = 0.05 mg/L (TypeA, ν = 9)", m.ToString());
        Assert.Equal("10.0 mg/L, u = 0.1 mg/L (TypeA, ν = 9)", m.ToString("F1", null));
    }

    // ν is printed with six significant digits (Welch–Satterthwaite gives fractional ν); no ν, no ν part.
    [Fact]
    public void ToString_FractionalOrNoDegreesOfFreedom_PrintsSixDigitsOrNothing()
    {
        Concentration value = Concentration.FromMilligramsPerLitre(10);
        Concentration u = Concentration.FromMilligramsPerLitre(0.05);

        Assert.Equal("10 mg/L, u = 0.05 mg/L (TypeA, ν = 12.3457)", Measured.TypeA(value, u, 12.3456789).ToString());
        Assert.Equal("10 mg/L, u = 0.05 mg/L (TypeBStandard)", Measured.WithStandardUncertainty(value, u).ToString());
    }

    [Fact]
    public void Exact_HasZeroUncertainty()
    {
        Measured<Mass> m = Measured.Exact(Mass.FromMilligrams(5));
        Assert.Equal(0, m.StandardUncertainty.Value);
        Assert.Equal(0, m.RelativeStandardUncertainty);
        Assert.Equal(UncertaintyEvaluation.Exact, m.Evaluation);
    }

    [Fact]
    public void RelativeStandardUncertainty_ZeroValue_ThrowsInvalidOperation()
    {
        Measured<Concentration> m = Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0), Concentration.FromMilligramsPerLitre(0.1));
        Assert.Throws<InvalidOperationException>(() => m.RelativeStandardUncertainty);
    }

    [Fact]
    public void RelativeStandardUncertainty_NegativeValue_UsesMagnitude()
    {
        Measured<Concentration> m = Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(-2), Concentration.FromMilligramsPerLitre(0.5));
        Assert.Equal(0.25, m.RelativeStandardUncertainty);
    }

    [Fact]
    public void ExpandedUncertainty_BadCoverageFactor_Throws()
    {
        Measured<Volume> v = Measured.Exact(Volume.FromMillilitres(1));
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => v.ExpandedUncertainty(-1));
        Assert.Equal("coverageFactor", ex.ParamName);
    }

    [Fact]
    public void Equality_IsExactOnAllParts()
    {
        Measured<Volume> a = Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02));
        Measured<Volume> b = Measured.WithStandardUncertainty(Volume.FromLitres(0.01), Volume.FromMillilitres(0.02));
        Assert.True(a == b);
        Assert.Equal(a.GetHashCode(), b.GetHashCode());
        Assert.True(a != Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02), 5));
        Assert.True(a != Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.02), null, UncertaintyEvaluation.TypeA));
        Assert.True(a != Measured.WithStandardUncertainty(Volume.FromMillilitres(10), Volume.FromMillilitres(0.021)));
        Assert.False(a.Equals((object)Volume.FromMillilitres(10)));
    }
}
