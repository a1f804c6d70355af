using System;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

public class MolarMassAndDensityTests
{
    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(-1.0, "-1")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    public void MolarMass_FromGramsPerMole_NonPositiveOrNonFinite_ThrowsNamingValue(double value, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => MolarMass.FromGramsPerMole(value));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith($"Parameter 'value' was {printed}; it must be a finite number > 0.", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0, "0")]
    [InlineData(-0.5, "-0.5")]
    [InlineData(double.NaN, "NaN")]
    public void Density_FromGramsPerMillilitre_NonPositive_ThrowsNamingValue(double value, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Density.FromGramsPerMillilitre(value));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith($"Parameter 'value' was {printed}; it must be a finite number > 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void MolarMass_EqualityAndText()
    {
        MolarMass a = MolarMass.FromGramsPerMole(112.414);
        Assert.Equal(a, MolarMass.FromGramsPerMole(112.414));
        Assert.True(a != MolarMass.FromGramsPerMole(112.41));
        Assert.Equal(a.GetHashCode(), MolarMass.FromGramsPerMole(112.414).GetHashCode());
        Assert.Equal("112.414 g/mol", a.ToString());
        Assert.Equal("112.4 g/mol", a.ToString("F1", null));
    }

    [Fact]
    public void Density_EqualityTextAndKilogramsPerLitre()
    {
        Density d = Density.FromGramsPerMillilitre(0.9982);
        Assert.Equal(d, Density.FromGramsPerMillilitre(0.9982));
        Assert.True(d != Density.FromGramsPerMillilitre(1));
        Assert.Equal(0.9982, d.KilogramsPerLitre); // 1 g/mL = 1 kg/L (SI)
        Assert.Equal("0.9982 g/mL", d.ToString());
    }

    [Fact]
    public void Density_VolumeOf_IsMassOverDensity()
    {
        // V = m/ρ: 12.5 g at 1.25 g/mL = 10 mL (exact in binary).
        Volume v = Density.FromGramsPerMillilitre(1.25).VolumeOf(Mass.FromGrams(12.5));
        Assert.Equal(VolumeUnit.Millilitre, v.Unit);
        Assert.Equal(10, v.Millilitres);
    }

    [Fact]
    public void Density_VolumeOfWithDefault_ThrowsInvalidOperation()
    {
        var ex = Assert.Throws<InvalidOperationException>(() => default(Density).VolumeOf(Mass.FromGrams(1)));
        Assert.Contains("FromGramsPerMillilitre", ex.Message, StringComparison.Ordinal);
    }
}
