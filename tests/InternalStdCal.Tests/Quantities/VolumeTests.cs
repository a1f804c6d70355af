using System;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

public class VolumeTests
{
    [Fact]
    public void Factories_AndUnitProperties_AgreeWithSiPrefixes()
    {
        // SI prefixes (SI Brochure, 9th ed.): 1 L = 10^3 mL = 10^6 µL. These products are representable, hence exact.
        Volume v = Volume.FromMillilitres(250);
        Assert.Equal(0.25, v.Litres);
        Assert.Equal(250, v.Millilitres);
        Assert.Equal(250_000, v.Microlitres);
        Assert.Equal(v, Volume.FromLitres(0.25));
        Assert.Equal(v, Volume.FromMicrolitres(250_000));
        Assert.Equal(VolumeUnit.Millilitre, v.Unit);
    }

    [Property(MaxTest = 300)]
    public Property ConvertTo_RoundTrip_WithinTwoRoundings() =>
        Prop.ForAll(QuantityGenerators.Volumes.ToArbitrary(), QuantityGenerators.VolumeUnits.ToArbitrary(), (v, unit) =>
        {
            Volume back = v.ConvertTo(unit).ConvertTo(v.Unit);
            Assert.Equal(v.Unit, back.Unit);
            Numeric.AssertWithinRoundings(v.Value, back.Value, 2);
        });

    [Property(MaxTest = 300)]
    public Property Parse_ToString_IsExact() =>
        Prop.ForAll(QuantityGenerators.Volumes.ToArbitrary(), v =>
        {
            Volume back = Volume.Parse(v.ToString());
            Assert.Equal(v.Unit, back.Unit);
            Numeric.AssertIdentical(v.Value, back.Value);
        });

    [Theory]
    [InlineData("100 uL", 100, VolumeUnit.Microlitre)]
    [InlineData("100 \u03BCL", 100, VolumeUnit.Microlitre)]
    [InlineData("10.00 mL", 10, VolumeUnit.Millilitre)]
    [InlineData("2 L", 2, VolumeUnit.Litre)]
    public void Parse_KnownSymbols_Accepted(string text, double value, VolumeUnit unit)
    {
        Volume v = Volume.Parse(text);
        Assert.Equal(value, v.Value);
        Assert.Equal(unit, v.Unit);
    }

    [Theory]
    [InlineData("-1 mL", "'-1 mL' is negative; a volume must be >= 0.")]
    [InlineData("1 dL", "'dL' in '1 dL' is not a volume unit; known units: L, mL, µL.")]
    [InlineData("x mL", "'x' in 'x mL' is not a finite number")]
    public void Parse_BadText_ThrowsFormatException(string text, string expected)
    {
        var ex = Assert.Throws<FormatException>(() => Volume.Parse(text));
        Assert.StartsWith(expected, ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(-1.0, "-1", "a finite number >= 0")]
    [InlineData(double.NaN, "NaN", "a finite number >= 0")]
    [InlineData(double.PositiveInfinity, "Infinity", "a finite number >= 0")]
    public void From_Invalid_ThrowsNamingValueAndRange(double value, string printed, string range)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Volume.FromMillilitres(value));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith($"Parameter 'value' was {printed}; it must be {range}.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Volume.FromLitres(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Volume.FromMicrolitres(value));
    }

    [Fact]
    public void From_UndefinedUnit_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Volume.From(1, (VolumeUnit)3));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was 3; it must be a defined unit (0 to 2).", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void In_Overflow_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Volume.FromLitres(1e305).Microlitres);
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was 1E+305 L; expressed in µL it overflows the range of a double", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Scale_NegativeFactor_ThrowsNamingFactor()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Volume.FromMillilitres(5).Scale(-2));
        Assert.Equal("factor", ex.ParamName);
        Assert.StartsWith("Parameter 'factor' was -2; it must be a finite number >= 0.", ex.Message, StringComparison.Ordinal);
        Assert.Equal(Volume.FromMillilitres(10), Volume.FromMillilitres(5).Scale(2));
    }

    [Fact]
    public void RatioTo_IsUnitFreeAndRejectsZero()
    {
        Assert.Equal(0.01, Volume.FromMicrolitres(100).RatioTo(Volume.FromMillilitres(10)));
        var ex = Assert.Throws<ArgumentException>(() => Volume.FromMillilitres(1).RatioTo(Volume.FromLitres(0)));
        Assert.Equal("denominator", ex.ParamName);
    }

    [Property(MaxTest = 300)]
    public Property Equality_Hash_AndOrder_Contract() =>
        Prop.ForAll(QuantityGenerators.Volumes.ToArbitrary(), QuantityGenerators.Volumes.ToArbitrary(), (a, b) =>
        {
            Assert.Equal(a.Equals(b), b.Equals(a));
            Assert.Equal(a.Equals(b), a == b);
            Assert.Equal(!a.Equals(b), a != b);
            Assert.Equal(a.Equals(b), a.CompareTo(b) == 0);
            Assert.Equal(Math.Sign(a.CompareTo(b)), -Math.Sign(b.CompareTo(a)));
            Assert.Equal(a.Litres < b.Litres, a < b);
            Assert.Equal(a.Litres >= b.Litres, a >= b);
            Assert.Equal(a.Litres > b.Litres, a > b);
            Assert.Equal(a.Litres <= b.Litres, a <= b);
            if (a == b)
            {
                Assert.Equal(a.GetHashCode(), b.GetHashCode());
            }
        });

    [Fact]
    public void Equals_PositiveAndNegativeZero_EqualWithSameHash()
    {
        Volume plus = Volume.FromMillilitres(0.0);
        Volume minus = Volume.FromLitres(-0.0);
        Assert.Equal(plus, minus);
        Assert.Equal(plus.GetHashCode(), minus.GetHashCode());
        Assert.Equal(default, plus);
    }

    [Fact]
    public void CompareTo_NonGeneric_NullAndWrongType()
    {
        IComparable v = Volume.FromMillilitres(1);
        Assert.Equal(1, v.CompareTo(null));
        var ex = Assert.Throws<ArgumentException>(() => v.CompareTo(Mass.FromGrams(1)));
        Assert.Equal("obj", ex.ParamName);
        Assert.StartsWith("Parameter 'obj' is a Mass; it must be a Volume.", ex.Message, StringComparison.Ordinal);
    }
}
