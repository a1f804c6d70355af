using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

public class MassTests
{
    [Fact]
    public void Factories_AndUnitProperties_AgreeWithSiPrefixes()
    {
        // SI prefixes: 1 kg = 10^3 g = 10^6 mg = 10^9 µg; representable results are exact.
        Mass m = Mass.FromMilligrams(100.25);
        Assert.Equal(0.10025, m.Grams); // 100.25 / 1000 correctly rounded = the double nearest 0.10025
        Assert.Equal(100.25, m.Milligrams);
        Assert.Equal(100_250, m.Micrograms);
        Assert.Equal(Mass.FromKilograms(2), Mass.FromGrams(2000));
        Assert.Equal(Mass.FromKilograms(2), Mass.FromMicrograms(2e9));
        Assert.Equal(2.5, Mass.FromGrams(2500).Kilograms);
    }

    [Property(MaxTest = 300)]
    public Property ConvertTo_RoundTrip_WithinTwoRoundings() =>
        Prop.ForAll(QuantityGenerators.Masses.ToArbitrary(), QuantityGenerators.MassUnits.ToArbitrary(), (m, unit) =>
        {
            Mass back = m.ConvertTo(unit).ConvertTo(m.Unit);
            Numeric.AssertWithinRoundings(m.Value, back.Value, 2);
        });

    [Property(MaxTest = 300)]
    public Property Parse_ToString_IsExact() =>
        Prop.ForAll(QuantityGenerators.Masses.ToArbitrary(), m =>
        {
            Mass back = Mass.Parse(m.ToString());
            Assert.Equal(m.Unit, back.Unit);
            Numeric.AssertIdentical(m.Value, back.Value);
        });

    [Theory]
    [InlineData("100.28 mg", 100.28, MassUnit.Milligram)]
    [InlineData("5 ug", 5, MassUnit.Microgram)]
    [InlineData("0.5 kg", 0.5, MassUnit.Kilogram)]
    public void Parse_KnownSymbols_Accepted(string text, double value, MassUnit unit)
    {
        Mass m = Mass.Parse(text);
        Assert.Equal(value, m.Value);
        Assert.Equal(unit, m.Unit);
    }

    [Theory]
    [InlineData("-3 g", "'-3 g' is negative; a mass must be >= 0.")]
    [InlineData("3 lb", "'lb' in '3 lb' is not a mass unit; known units: kg, g, mg, µg.")]
    [InlineData("1e307 kg", "'1e307 kg' is out of range: expressed in g it overflows the range of a double.")]
    public void Parse_BadText_ThrowsFormatException(string text, string expected)
    {
        var ex = Assert.Throws<FormatException>(() => Mass.Parse(text));
        Assert.Equal(expected, ex.Message);
    }

    [Theory]
    [InlineData(-0.1, "-0.1")]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void From_Invalid_ThrowsNamingValueAndRange(double value, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromGrams(value));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith($"Parameter 'value' was {printed}; it must be a finite number >= 0.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromKilograms(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromMilligrams(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromMicrograms(value));
    }

    [Fact]
    public void From_KilogramsOverflowingInGrams_ThrowsNamingValue()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromKilograms(1e307));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith("Parameter 'value' was 1E+307 kg; expressed in g it overflows the range of a double", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void From_UndefinedUnit_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Mass.From(1, (MassUnit)(-1)));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was -1; it must be a defined unit (0 to 3).", ex.Message, StringComparison.Ordinal);
    }

    [Property(MaxTest = 300)]
    public Property Equality_Hash_AndOrder_Contract() =>
        Prop.ForAll(QuantityGenerators.Masses.ToArbitrary(), QuantityGenerators.Masses.ToArbitrary(), (a, b) =>
        {
            Assert.Equal(a.Equals(b), b.Equals(a));
            Assert.Equal(a.Equals(b), a == b);
            Assert.Equal(!a.Equals(b), a != b);
            Assert.Equal(a.Equals(b), a.CompareTo(b) == 0);
            Assert.Equal(a.Grams < b.Grams, a < b);
            Assert.Equal(a.Grams > b.Grams, a > b);
            Assert.Equal(a.Grams <= b.Grams, a <= b);
            Assert.Equal(a.Grams >= b.Grams, a >= b);
            if (a == b)
            {
                Assert.Equal(a.GetHashCode(), b.GetHashCode());
            }
        });

    [Fact]
    public void Equals_PositiveAndNegativeZero_EqualWithSameHash()
    {
        Assert.Equal(Mass.FromGrams(0.0), Mass.FromKilograms(-0.0));
        Assert.Equal(Mass.FromGrams(0.0).GetHashCode(), Mass.FromKilograms(-0.0).GetHashCode());
    }

    [Fact]
    public void ScaleAndRatio_BehaveAndValidate()
    {
        Assert.Equal(Mass.FromMilligrams(50), Mass.FromMilligrams(100).Scale(0.5));
        Assert.Equal(0.5, Mass.FromMilligrams(500).RatioTo(Mass.FromGrams(1)));
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Mass.FromGrams(1).Scale(double.PositiveInfinity));
        Assert.Equal("factor", ex.ParamName);
        Assert.Throws<ArgumentException>(() => Mass.FromGrams(1).RatioTo(default));
    }
}
