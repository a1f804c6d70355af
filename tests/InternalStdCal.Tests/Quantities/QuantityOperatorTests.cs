using System;
using System.Globalization;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

/// <summary>
/// Boundaries of the ordering operators (equal operands), hash codes, tolerance comparison, zero volume and the
/// printed forms — the edges where a flipped comparison or a dropped text would otherwise go unnoticed.
/// Expected values are the .NET comparison contract (IComparable&lt;T&gt;, Object.GetHashCode) and plain arithmetic.
/// </summary>
public class QuantityOperatorTests
{
    [Fact]
    public void ConcentrationOperators_EqualSmallerLarger_FollowCompareTo()
    {
        Concentration one = Concentration.FromMilligramsPerLitre(1), same = Concentration.FromMicrogramsPerLitre(1000),
            two = Concentration.FromMilligramsPerLitre(2);
        AssertOrdering(one, same, two, (a, b) => a < b, (a, b) => a > b, (a, b) => a <= b, (a, b) => a >= b);
    }

    [Fact]
    public void MassOperators_EqualSmallerLarger_FollowCompareTo()
    {
        Mass one = Mass.FromMilligrams(1), same = Mass.FromMicrograms(1000), two = Mass.FromMilligrams(2);
        AssertOrdering(one, same, two, (a, b) => a < b, (a, b) => a > b, (a, b) => a <= b, (a, b) => a >= b);
    }

    [Fact]
    public void VolumeOperators_EqualSmallerLarger_FollowCompareTo()
    {
        Volume one = Volume.FromMillilitres(1), same = Volume.FromMicrolitres(1000), two = Volume.FromMillilitres(2);
        AssertOrdering(one, same, two, (a, b) => a < b, (a, b) => a > b, (a, b) => a <= b, (a, b) => a >= b);
    }

    [Fact]
    public void MassCompareTo_NonGenericOtherType_ThrowsArgumentExceptionNamingObj()
    {
        var ex = Assert.Throws<ArgumentException>(() => ((IComparable)Mass.FromGrams(1)).CompareTo(Volume.FromLitres(1)));
        Assert.Equal("obj", ex.ParamName);
        Assert.Contains("is a Volume; it must be a Mass", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ConcentrationHashCode_SameBaseValueDifferentKind_Differ()
    {
        // 1 g/L, 1 mol/L and 1 g/kg share the base value 1: the kind must enter the hash (else they collide).
        int massConcentration = Concentration.From(1, ConcentrationUnit.GramPerLitre).GetHashCode();
        int amount = Concentration.From(1, ConcentrationUnit.MolePerLitre).GetHashCode();
        int fraction = Concentration.From(1, ConcentrationUnit.GramPerKilogram).GetHashCode();
        Assert.NotEqual(massConcentration, amount);
        Assert.NotEqual(massConcentration, fraction);
        Assert.NotEqual(amount, fraction);
        Assert.Equal(massConcentration, Concentration.FromMilligramsPerLitre(1000).GetHashCode());
    }

    [Fact]
    public void MeasuredHashCode_ValueAndUncertaintySwapped_Differ()
    {
        // Value and u must not enter the hash symmetrically (a ^ b == b ^ a would collide).
        var a = Measured.WithStandardUncertainty(Volume.FromMillilitres(2), Volume.FromMillilitres(3));
        var b = Measured.WithStandardUncertainty(Volume.FromMillilitres(3), Volume.FromMillilitres(2));
        Assert.NotEqual(a.GetHashCode(), b.GetHashCode());
        Assert.Equal(a.GetHashCode(), Measured.WithStandardUncertainty(Volume.FromMillilitres(2), Volume.FromMillilitres(3)).GetHashCode());

        // Values one ulp apart (hashes of the value differing in the last bit) still hash differently.
        var c = Measured.WithStandardUncertainty(Volume.FromLitres(1.0), Volume.FromLitres(0.5));
        var d = Measured.WithStandardUncertainty(Volume.FromLitres(Math.BitIncrement(1.0)), Volume.FromLitres(0.5));
        Assert.NotEqual(c.GetHashCode(), d.GetHashCode());
    }

    [Theory]
    [InlineData(100.0, 101.0, 0.01, true)] // 0.01 · 101 = 1.01 ≥ |a − b| = 1
    [InlineData(100.0, 101.0, 0.0099, false)] // 0.0099 · 101 = 0.9999 < 1
    [InlineData(100.0, 102.0, 0.0199, true)] // 0.0199 · 102 = 2.0298 ≥ 2: the larger magnitude scales the tolerance
    [InlineData(100.0, 102.0, 0.0195, false)] // 0.0195 · 102 = 1.989 < 2
    [InlineData(1.0, 2.0, 0.5, true)] // |a − b| = 0.5 · 2 exactly: the boundary counts as close
    [InlineData(0.0, 0.0, 0.0, true)] // identical values are close at zero tolerance
    public void ConcentrationIsCloseTo_RelativeToLargerMagnitude(double a, double b, double tolerance, bool expected)
    {
        Concentration x = Concentration.From(a, ConcentrationUnit.GramPerLitre), y = Concentration.From(b, ConcentrationUnit.GramPerLitre);
        Assert.Equal(expected, x.IsCloseTo(y, tolerance));
        Assert.Equal(expected, y.IsCloseTo(x, tolerance));
    }

    [Fact]
    public void VolumeParse_Zero_IsAccepted()
    {
        Assert.Equal(Volume.FromLitres(0), Volume.Parse("0 mL"));
        var ex = Assert.Throws<FormatException>(() => Volume.Parse("-1 mL"));
        Assert.Contains("must be >= 0", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ConvertTo_OverflowThroughMolarMassOrDensity_MessageSaysWhatOverflows()
    {
        var big = Concentration.From(1e300, ConcentrationUnit.MolePerLitre);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => big.ConvertTo(ConcentrationUnit.GramPerLitre, MolarMass.FromGramsPerMole(1e10)));
        Assert.Equal("molarMass", ex.ParamName);
        Assert.Contains("it must keep the converted concentration finite", ex.Message, StringComparison.Ordinal);

        var fraction = Concentration.From(1e300, ConcentrationUnit.GramPerKilogram);
        var ex2 = Assert.Throws<ArgumentOutOfRangeException>(() => fraction.ConvertTo(ConcentrationUnit.GramPerLitre, Density.FromGramsPerMillilitre(1e10)));
        Assert.Equal("density", ex2.ParamName);
        Assert.Contains("it must keep the converted concentration finite", ex2.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MeasuredToString_DegreesOfFreedomAndCulture_Printed()
    {
        Measured<Concentration> typeA = Measured.TypeA(Concentration.FromMilligramsPerLitre(10), Concentration.FromMilligramsPerLitre(0.05), 9);
        string text = typeA.ToString("G4", null);
        Assert.Contains(", ν = 9)", text, StringComparison.Ordinal);
        Assert.StartsWith("10 mg/L, u = 0.05 mg/L", text, StringComparison.Ordinal);

        // A culture given is used; null means invariant (decimal point).
        Measured<Volume> v = Measured.WithStandardUncertainty(Volume.FromMillilitres(1.5), Volume.FromMillilitres(0.25));
        Assert.Contains("1,5", v.ToString("G4", new NumberFormatInfo { NumberDecimalSeparator = "," }), StringComparison.Ordinal);
        Assert.Contains("1.5", v.ToString("G4", null), StringComparison.Ordinal);
    }

    private static void AssertOrdering<T>(T one, T same, T two, Func<T, T, bool> lt, Func<T, T, bool> gt, Func<T, T, bool> le, Func<T, T, bool> ge)
    {
        Assert.False(lt(one, same));
        Assert.False(gt(one, same));
        Assert.True(le(one, same));
        Assert.True(ge(one, same));
        Assert.True(lt(one, two));
        Assert.False(lt(two, one));
        Assert.True(gt(two, one));
        Assert.False(gt(one, two));
        Assert.True(le(one, two));
        Assert.False(le(two, one));
        Assert.True(ge(two, one));
        Assert.False(ge(one, two));
    }
}
