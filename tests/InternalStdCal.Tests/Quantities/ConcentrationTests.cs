using System;
using System.Linq;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.TestSupport;
using Xunit;

namespace InternalStdCal.Tests.Quantities;

public class ConcentrationTests
{
    private static readonly ConcentrationUnit[] AllUnits = Enum.GetValues<ConcentrationUnit>();

    public static TheoryData<ConcentrationUnit, string, ConcentrationKind> UnitTable() => new()
    {
        // Symbols and kinds: ISO 80000-9 quantity names; SI prefixes (SI Brochure, 9th ed.).
        { ConcentrationUnit.GramPerLitre, "g/L", ConcentrationKind.MassConcentration },
        { ConcentrationUnit.MilligramPerLitre, "mg/L", ConcentrationKind.MassConcentration },
        { ConcentrationUnit.MicrogramPerLitre, "µg/L", ConcentrationKind.MassConcentration },
        { ConcentrationUnit.NanogramPerLitre, "ng/L", ConcentrationKind.MassConcentration },
        { ConcentrationUnit.MolePerLitre, "mol/L", ConcentrationKind.AmountConcentration },
        { ConcentrationUnit.MillimolePerLitre, "mmol/L", ConcentrationKind.AmountConcentration },
        { ConcentrationUnit.MicromolePerLitre, "µmol/L", ConcentrationKind.AmountConcentration },
        { ConcentrationUnit.NanomolePerLitre, "nmol/L", ConcentrationKind.AmountConcentration },
        { ConcentrationUnit.GramPerKilogram, "g/kg", ConcentrationKind.MassFraction },
        { ConcentrationUnit.MilligramPerKilogram, "mg/kg", ConcentrationKind.MassFraction },
        { ConcentrationUnit.MicrogramPerKilogram, "µg/kg", ConcentrationKind.MassFraction },
        { ConcentrationUnit.NanogramPerKilogram, "ng/kg", ConcentrationKind.MassFraction },
        { ConcentrationUnit.Percent, "%", ConcentrationKind.MassFraction },
    };

    [Theory]
    [MemberData(nameof(UnitTable))]
    public void SymbolOfAndKindOf_EachUnit_MatchTable(ConcentrationUnit unit, string symbol, ConcentrationKind kind)
    {
        Assert.Equal(symbol, Concentration.SymbolOf(unit));
        Assert.Equal(kind, Concentration.KindOf(unit));
        Assert.Equal(kind, Concentration.From(1, unit).Kind);
    }

    [Fact]
    public void UnitTable_CoversEveryDefinedUnit() => Assert.Equal(AllUnits.Length, UnitTable().Count);

    // Exact conversions: when the true result is representable, a correctly rounded product or quotient
    // returns it exactly (IEEE 754 basic operations).
    [Theory]
    [InlineData(1.5, ConcentrationUnit.GramPerLitre, ConcentrationUnit.MilligramPerLitre, 1500)]
    [InlineData(1500, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.GramPerLitre, 1.5)]
    [InlineData(2, ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.NanogramPerLitre, 2000)]
    [InlineData(250, ConcentrationUnit.MillimolePerLitre, ConcentrationUnit.MolePerLitre, 0.25)]
    [InlineData(3, ConcentrationUnit.MilligramPerKilogram, ConcentrationUnit.MicrogramPerKilogram, 3000)]
    [InlineData(12.5, ConcentrationUnit.Percent, ConcentrationUnit.GramPerKilogram, 125)] // 1 % = 10 g/kg (g/100 g)
    [InlineData(4, ConcentrationUnit.Percent, ConcentrationUnit.MilligramPerKilogram, 40000)]
    public void In_RepresentableResult_IsExact(double value, ConcentrationUnit from, ConcentrationUnit to, double expected) =>
        Numeric.AssertIdentical(expected, Concentration.From(value, from).In(to));

    [Property(MaxTest = 300)]
    public Property In_SameUnit_IsExact() =>
        Prop.ForAll(QuantityGenerators.Concentrations.ToArbitrary(), c =>
        {
            Numeric.AssertIdentical(c.Value, c.In(c.Unit));
        });

    // Round trip a → b → a: two roundings by an exact power of ten (the scale factor 10^k is exact for |k| ≤ 22),
    // so the relative error is at most (1 + u)² − 1 ≈ 2u; not always zero, hence no exact comparison.
    [Property(MaxTest = 500)]
    public Property ConvertTo_RoundTripWithinKind_WithinTwoRoundings() =>
        Prop.ForAll(QuantityGenerators.SameKindUnitPairs.ToArbitrary(), QuantityGenerators.Finite.ToArbitrary(), (units, value) =>
        {
            Concentration c = Concentration.From(value, units.From);
            Concentration back = c.ConvertTo(units.To).ConvertTo(units.From);
            Assert.Equal(units.From, back.Unit);
            Numeric.AssertWithinRoundings(value, back.Value, 2);
        });

    // Integers of mg/L up to 2^53/10^6 stay exact in ng/L and back (every intermediate is representable).
    [Property(MaxTest = 200)]
    public Property ConvertTo_IntegerMilligramsToNanogramsAndBack_IsExact() =>
        Prop.ForAll(Gen.Choose(-1_000_000_000, 1_000_000_000).ToArbitrary(), n =>
        {
            Concentration c = Concentration.FromMilligramsPerLitre(n);
            Concentration ng = c.ConvertTo(ConcentrationUnit.NanogramPerLitre);
            Numeric.AssertIdentical(n * 1e6, ng.Value);
            Numeric.AssertIdentical(n, ng.In(ConcentrationUnit.MilligramPerLitre));
            Assert.True(c == ng);
        });

    [Fact]
    public void In_OtherKind_ThrowsArgumentExceptionNamingUnit()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(5);
        var ex = Assert.Throws<ArgumentException>(() => c.In(ConcentrationUnit.MilligramPerKilogram));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was mg/kg (MassFraction) but this concentration is 5 mg/L (MassConcentration); the kinds must match.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void In_OverflowingUnit_ThrowsNamingUnitAndValue()
    {
        Concentration c = Concentration.From(1e300, ConcentrationUnit.GramPerLitre);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => c.In(ConcentrationUnit.NanogramPerLitre));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was 1E+300 g/L; expressed in ng/L it overflows the range of a double", ex.Message, StringComparison.Ordinal);
    }

    // Cadmium: standard atomic weight 112.414 (IUPAC CIAAW 2013, from memory; any positive molar mass tests the algebra).
    [Fact]
    public void ConvertTo_MassToAmountWithMolarMass_UsesGammaEqualsCTimesM()
    {
        MolarMass cd = MolarMass.FromGramsPerMole(112.414);
        Concentration c = Concentration.FromMilligramsPerLitre(112.414).ConvertTo(ConcentrationUnit.MillimolePerLitre, cd);
        Assert.Equal(ConcentrationUnit.MillimolePerLitre, c.Unit);
        // 0.112414 g/L ÷ 112.414 g/mol = 1e-3 mol/L; three roundings (to g/L, ÷M, to mmol/L).
        Numeric.AssertWithinRoundings(1.0, c.Value, 3);
    }

    // γ = c·M and back: forward three roundings (to base unit, ÷M, to target), backward three (to base, ×M, to unit).
    [Property(MaxTest = 300)]
    public Property ConvertTo_MassAmountRoundTripWithMolarMass_WithinSixRoundings()
    {
        Gen<(ConcentrationUnit Mass, ConcentrationUnit Amount)> units =
            from m in Gen.Elements(ConcentrationUnit.GramPerLitre, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.NanogramPerLitre)
            from a in Gen.Elements(ConcentrationUnit.MolePerLitre, ConcentrationUnit.MillimolePerLitre, ConcentrationUnit.MicromolePerLitre, ConcentrationUnit.NanomolePerLitre)
            select (m, a);
        Gen<double> molarMass = Gen.Choose(1, 300_000).Select(i => i / 1000.0);
        return Prop.ForAll(units.ToArbitrary(), QuantityGenerators.DecimalLike.ToArbitrary(), molarMass.ToArbitrary(), (u, value, m) =>
        {
            MolarMass mm = MolarMass.FromGramsPerMole(m);
            Concentration start = Concentration.From(value, u.Mass);
            Concentration amount = start.ConvertTo(u.Amount, mm);
            Assert.Equal(ConcentrationKind.AmountConcentration, amount.Kind);
            Concentration back = amount.ConvertTo(u.Mass, mm);
            Numeric.AssertWithinRoundings(value, back.Value, 6);
        });
    }

    [Fact]
    public void ConvertTo_MassFractionToMassConcentrationWithDensity_UsesGammaEqualsWTimesRho()
    {
        // γ = w·ρ: 10 mg/kg in a solution of 1.25 g/mL = 12.5 mg/L (exact in binary: 0.01·1.25 rounds once, ×1000 once).
        Concentration gamma = Concentration.FromMilligramsPerKilogram(10)
            .ConvertTo(ConcentrationUnit.MilligramPerLitre, Density.FromGramsPerMillilitre(1.25));
        Assert.Equal(ConcentrationUnit.MilligramPerLitre, gamma.Unit);
        Numeric.AssertWithinRoundings(12.5, gamma.Value, 3);
    }

    [Property(MaxTest = 300)]
    public Property ConvertTo_FractionConcentrationRoundTripWithDensity_WithinSixRoundings()
    {
        Gen<double> density = Gen.Choose(500, 3000).Select(i => i / 1000.0);
        Gen<ConcentrationUnit> fractionUnits = Gen.Elements(ConcentrationUnit.GramPerKilogram, ConcentrationUnit.MilligramPerKilogram, ConcentrationUnit.MicrogramPerKilogram, ConcentrationUnit.NanogramPerKilogram, ConcentrationUnit.Percent);
        Gen<ConcentrationUnit> massUnits = Gen.Elements(ConcentrationUnit.GramPerLitre, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.NanogramPerLitre);
        Gen<(ConcentrationUnit Fraction, ConcentrationUnit Mass)> units =
            from f in fractionUnits
            from m in massUnits
            select (f, m);
        return Prop.ForAll(units.ToArbitrary(), QuantityGenerators.DecimalLike.ToArbitrary(), density.ToArbitrary(), (u, value, rho) =>
        {
            (ConcentrationUnit wu, ConcentrationUnit gu) = u;
            Density d = Density.FromGramsPerMillilitre(rho);
            Concentration w = Concentration.From(value, wu);
            Concentration back = w.ConvertTo(gu, d).ConvertTo(wu, d);
            Assert.Equal(wu, back.Unit);
            Numeric.AssertWithinRoundings(value, back.Value, 6);
        });
    }

    [Fact]
    public void ConvertTo_SameKindWithMolarMassOrDensity_IsPlainUnitConversion()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(2);
        Assert.Equal(c.ConvertTo(ConcentrationUnit.MicrogramPerLitre), c.ConvertTo(ConcentrationUnit.MicrogramPerLitre, MolarMass.FromGramsPerMole(50)));
        Assert.Equal(c.ConvertTo(ConcentrationUnit.MicrogramPerLitre), c.ConvertTo(ConcentrationUnit.MicrogramPerLitre, Density.FromGramsPerMillilitre(1)));
    }

    [Fact]
    public void ConvertTo_MassFractionWithMolarMass_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentException>(() =>
            Concentration.FromMilligramsPerKilogram(3).ConvertTo(ConcentrationUnit.MillimolePerLitre, MolarMass.FromGramsPerMole(100)));
        Assert.Equal("unit", ex.ParamName);
        Assert.Contains("Parameter 'unit' was mmol/L (AmountConcentration) but this concentration is 3 mg/kg (MassFraction)", ex.Message, StringComparison.Ordinal);
        Assert.Contains("mass fractions need a Density", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ConvertTo_AmountWithDensity_ThrowsNamingUnit()
    {
        var ex = Assert.Throws<ArgumentException>(() =>
            Concentration.FromMicromolesPerLitre(3).ConvertTo(ConcentrationUnit.MilligramPerKilogram, Density.FromGramsPerMillilitre(1)));
        Assert.Equal("unit", ex.ParamName);
        Assert.Contains("Parameter 'unit' was mg/kg (MassFraction) but this concentration is 3 µmol/L (AmountConcentration)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ConvertTo_DefaultMolarMass_ThrowsNamingMolarMass()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Concentration.FromMicromolesPerLitre(3).ConvertTo(ConcentrationUnit.MilligramPerLitre, default(MolarMass)));
        Assert.Equal("molarMass", ex.ParamName);
        Assert.StartsWith("Parameter 'molarMass' was 0; it must be a finite number > 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ConvertTo_DefaultDensity_ThrowsNamingDensity()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() =>
            Concentration.FromMilligramsPerKilogram(3).ConvertTo(ConcentrationUnit.MilligramPerLitre, default(Density)));
        Assert.Equal("density", ex.ParamName);
        Assert.StartsWith("Parameter 'density' was 0; it must be a finite number > 0.", ex.Message, StringComparison.Ordinal);
    }

    // "ppm"/"ppb" mean mg/L or mg/kg depending on the matrix (common practice), so the kind must be stated.
    [Theory]
    [InlineData("5 ppm")]
    [InlineData("5 ppb")]
    public void Parse_PartsPerWithoutKind_ThrowsFormatException(string text)
    {
        var ex = Assert.Throws<FormatException>(() => Concentration.Parse(text));
        Assert.Contains("ambiguous", ex.Message, StringComparison.Ordinal);
        Assert.Contains("Parse(text, kind)", ex.Message, StringComparison.Ordinal);
        Assert.False(Concentration.TryParse(text, out _));
    }

    [Theory]
    [InlineData("5 ppm", ConcentrationKind.MassConcentration, 5, ConcentrationUnit.MilligramPerLitre)]
    [InlineData("5 ppm", ConcentrationKind.MassFraction, 5, ConcentrationUnit.MilligramPerKilogram)]
    [InlineData("7 ppb", ConcentrationKind.MassConcentration, 7, ConcentrationUnit.MicrogramPerLitre)]
    [InlineData("7 ppb", ConcentrationKind.MassFraction, 7, ConcentrationUnit.MicrogramPerKilogram)]
    [InlineData("7 mg/L", ConcentrationKind.MassFraction, 7, ConcentrationUnit.MilligramPerLitre)]
    public void Parse_PartsPerWithKind_GivesThatKind(string text, ConcentrationKind kind, double value, ConcentrationUnit unit)
    {
        Concentration c = Concentration.Parse(text, kind);
        Assert.Equal(value, c.Value);
        Assert.Equal(unit, c.Unit);
    }

    [Fact]
    public void FromPartsPerMillion_AmountKind_ThrowsNamingKind()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromPartsPerMillion(1, ConcentrationKind.AmountConcentration));
        Assert.Equal("kind", ex.ParamName);
        Assert.StartsWith("Parameter 'kind' was AmountConcentration; 'parts per' figures must be MassConcentration or MassFraction.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromPartsPerBillion(1, ConcentrationKind.AmountConcentration));
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.Parse("1 ppm", ConcentrationKind.AmountConcentration));
    }

    [Fact]
    public void ConcentrationUnit_HasNoPartsPerMember() =>
        Assert.DoesNotContain(Enum.GetNames<ConcentrationUnit>(), n => n.Contains("Part", StringComparison.OrdinalIgnoreCase));

    // Print/parse: "R" formatting gives the shortest text that parses back to the same double, so the round trip
    // is exact (bitwise, including −0).
    [Property(MaxTest = 500)]
    public Property Parse_ToString_IsExactForAllUnits() =>
        Prop.ForAll(QuantityGenerators.Concentrations.ToArbitrary(), c =>
        {
            Concentration back = Concentration.Parse(c.ToString());
            Assert.Equal(c.Unit, back.Unit);
            Numeric.AssertIdentical(c.Value, back.Value);
        });

    [Theory]
    [MemberData(nameof(UnitTable))]
    public void Parse_ToString_NegativeZeroAndExtremes_AreExact(ConcentrationUnit unit, string symbol, ConcentrationKind kind)
    {
        _ = kind;
        foreach (double v in new[] { -0.0, 0.0, double.Epsilon, -1e-300, 0.1, 1.0 / 3, 1e17 })
        {
            Concentration c = Concentration.From(v, unit);
            Assert.EndsWith(" " + symbol, c.ToString(), StringComparison.Ordinal);
            Numeric.AssertIdentical(v, Concentration.Parse(c.ToString()).Value);
        }
    }

    [Theory]
    [InlineData("3 ug/kg", 3, ConcentrationUnit.MicrogramPerKilogram)]
    [InlineData("3 \u03BCg/L", 3, ConcentrationUnit.MicrogramPerLitre)] // Greek small mu
    [InlineData("3 \u00B5mol/L", 3, ConcentrationUnit.MicromolePerLitre)] // micro sign
    [InlineData("  -1.25e-3   mg/L ", -0.00125, ConcentrationUnit.MilligramPerLitre)]
    public void Parse_MicroSpellingsAndWhitespace_Accepted(string text, double value, ConcentrationUnit unit)
    {
        Concentration c = Concentration.Parse(text);
        Assert.Equal(value, c.Value);
        Assert.Equal(unit, c.Unit);
    }

    [Theory]
    [InlineData("12.5mg/L", "is not '<number> <unit>'")]
    [InlineData("", "is not '<number> <unit>'")]
    [InlineData("NaN mg/L", "is not a finite number")]
    [InlineData("Infinity mg/L", "is not a finite number")]
    [InlineData("1,5 mg/L", "is not a finite number")]
    [InlineData("1.5 mg/dL", "'mg/dL' in '1.5 mg/dL' is not a concentration unit; known units: g/L, mg/L, µg/L, ng/L, mol/L")]
    [InlineData("1e308 %", "is out of range: expressed in g/kg it overflows")]
    public void Parse_BadText_ThrowsFormatExceptionSayingWhy(string text, string expected)
    {
        var ex = Assert.Throws<FormatException>(() => Concentration.Parse(text));
        Assert.Contains(expected, ex.Message, StringComparison.Ordinal);
        Assert.False(Concentration.TryParse(text, out Concentration result));
        Assert.Equal(default, result);
    }

    [Fact]
    public void Parse_Null_ThrowsArgumentNullExceptionNamingText()
    {
        var ex = Assert.Throws<ArgumentNullException>(() => Concentration.Parse(null!));
        Assert.Equal("text", ex.ParamName);
        Assert.False(Concentration.TryParse(null, out _));
    }

    [Fact]
    public void ToString_WithFormatAndCulture_FormatsNumberOnly()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(1002.6997);
        Assert.Equal("1002.6997 mg/L", c.ToString());
        Assert.Equal("1002.70 mg/L", c.ToString("F2", null));
        var comma = new System.Globalization.NumberFormatInfo { NumberDecimalSeparator = "," };
        Assert.Equal("1002,70 mg/L", c.ToString("F2", comma));
    }

    [Theory]
    [InlineData(double.NaN, "NaN")]
    [InlineData(double.PositiveInfinity, "Infinity")]
    [InlineData(double.NegativeInfinity, "-Infinity")]
    public void From_NonFinite_ThrowsNamingValue(double value, string printed)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.From(value, ConcentrationUnit.MilligramPerLitre));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith($"Parameter 'value' was {printed}; it must be a finite number (not NaN or infinity).", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromMicrogramsPerLitre(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromMilligramsPerKilogram(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromMicromolesPerLitre(value));
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.FromPartsPerMillion(value, ConcentrationKind.MassFraction));
    }

    [Fact]
    public void From_UndefinedUnit_ThrowsNamingUnitAndRange()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.From(1, (ConcentrationUnit)99));
        Assert.Equal("unit", ex.ParamName);
        Assert.StartsWith("Parameter 'unit' was 99; it must be a defined unit (0 to 12).", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.SymbolOf((ConcentrationUnit)(-1)));
        Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.KindOf((ConcentrationUnit)13));
    }

    [Fact]
    public void From_PercentWhoseBaseValueOverflows_ThrowsNamingValue()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Concentration.From(1e308, ConcentrationUnit.Percent));
        Assert.Equal("value", ex.ParamName);
        Assert.StartsWith("Parameter 'value' was 1E+308 %; expressed in g/kg it overflows the range of a double", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void From_NegativeEstimate_IsAllowed() => Assert.Equal(-0.002, Concentration.FromMilligramsPerLitre(-0.002).Value);

    [Fact]
    public void Default_IsZeroGramsPerLitre()
    {
        Concentration d = default;
        Assert.Equal(ConcentrationUnit.GramPerLitre, d.Unit);
        Assert.Equal(ConcentrationKind.MassConcentration, d.Kind);
        Assert.Equal(Concentration.FromMilligramsPerLitre(0), d);
    }

    // Equality contract: reflexive, symmetric, consistent with ==, !=, object.Equals and the hash code.
    [Property(MaxTest = 500)]
    public Property Equals_AndHashCode_Contract() =>
        Prop.ForAll(QuantityGenerators.Concentrations.ToArbitrary(), QuantityGenerators.Concentrations.ToArbitrary(), (a, b) =>
        {
            Assert.True(a.Equals(a));
            Assert.Equal(a.Equals(b), b.Equals(a));
            Assert.Equal(a.Equals(b), a == b);
            Assert.Equal(!a.Equals(b), a != b);
            Assert.Equal(a.Equals(b), a.Equals((object)b));
            if (a.Equals(b))
            {
                Assert.Equal(a.GetHashCode(), b.GetHashCode());
            }

            // The same amount in another unit of the kind is equal when the base values agree exactly.
            Concentration inBase = Concentration.From(a.BaseValue, BaseUnit(a.Kind));
            Assert.Equal(a, inBase);
            Assert.Equal(a.GetHashCode(), inBase.GetHashCode());
        });

    [Fact]
    public void Equals_PositiveAndNegativeZero_AreEqualWithSameHash()
    {
        Concentration plus = Concentration.From(0.0, ConcentrationUnit.MilligramPerLitre);
        Concentration minus = Concentration.From(-0.0, ConcentrationUnit.GramPerLitre);
        Assert.True(plus == minus);
        Assert.Equal(plus.GetHashCode(), minus.GetHashCode());
        Assert.Equal(0, plus.CompareTo(minus));
    }

    [Fact]
    public void Equals_SameNumberDifferentKind_AreNotEqual()
    {
        Assert.NotEqual(Concentration.From(1, ConcentrationUnit.GramPerLitre), Concentration.From(1, ConcentrationUnit.GramPerKilogram));
        Assert.NotEqual(Concentration.From(1, ConcentrationUnit.GramPerLitre), Concentration.From(1, ConcentrationUnit.MolePerLitre));
        Assert.False(Concentration.FromMilligramsPerLitre(1).Equals("1 mg/L"));
    }

    [Fact]
    public void Equals_IsExactNotTolerant()
    {
        Concentration a = Concentration.FromMilligramsPerLitre(1);
        Concentration b = Concentration.FromMilligramsPerLitre(1 + 2.220446049250313e-16);
        Assert.NotEqual(a, b);
        Assert.True(a.IsCloseTo(b, 1e-15));
        Assert.False(a.IsCloseTo(b, 0));
        Assert.False(a.IsCloseTo(Concentration.FromMilligramsPerKilogram(1), 1));
    }

    [Property(MaxTest = 300)]
    public Property CompareTo_WithinKind_OrdersByBaseValue() =>
        Prop.ForAll(QuantityGenerators.SameKindUnitPairs.ToArbitrary(), QuantityGenerators.Finite.ToArbitrary(), QuantityGenerators.Finite.ToArbitrary(), (units, x, y) =>
        {
            Concentration a = Concentration.From(x, units.From);
            Concentration b = Concentration.From(y, units.To);
            int sign = Math.Sign(a.BaseValue.CompareTo(b.BaseValue));
            Assert.Equal(sign, Math.Sign(a.CompareTo(b)));
            Assert.Equal(-sign, Math.Sign(b.CompareTo(a)));
            Assert.Equal(sign < 0, a < b);
            Assert.Equal(sign > 0, a > b);
            Assert.Equal(sign <= 0, a <= b);
            Assert.Equal(sign >= 0, a >= b);
            Assert.Equal(sign == 0, a == b);
            Assert.Equal(sign, Math.Sign(((IComparable)a).CompareTo(b)));
        });

    [Fact]
    public void CompareTo_AcrossKinds_ThrowsArgumentExceptionNamingOther()
    {
        Concentration a = Concentration.FromMilligramsPerLitre(1);
        Concentration b = Concentration.FromMilligramsPerKilogram(1);
        var ex = Assert.Throws<ArgumentException>(() => a.CompareTo(b));
        Assert.Equal("other", ex.ParamName);
        Assert.StartsWith("Parameter 'other' was 1 mg/kg (MassFraction) but this concentration is 1 mg/L (MassConcentration); the kinds must match.", ex.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentException>(() => a < b);
        Assert.Throws<ArgumentException>(() => a >= b);
        Assert.Throws<ArgumentException>(() => ((IComparable)a).CompareTo(b));
    }

    [Fact]
    public void CompareTo_NonGeneric_NullIsSmallerAndOtherTypeThrows()
    {
        IComparable a = Concentration.FromMilligramsPerLitre(1);
        Assert.Equal(1, a.CompareTo(null));
        var ex = Assert.Throws<ArgumentException>(() => a.CompareTo(1.0));
        Assert.Equal("obj", ex.ParamName);
        Assert.StartsWith("Parameter 'obj' is a Double; it must be a Concentration.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void RatioTo_SameKindDifferentUnits_IsUnitFree()
    {
        // 500 µg/L / 2 mg/L = 0.25 (exact: 2 mg/L = 2000 µg/L).
        Assert.Equal(0.25, Concentration.FromMicrogramsPerLitre(500).RatioTo(Concentration.FromMilligramsPerLitre(2)));
    }

    [Fact]
    public void RatioTo_ZeroOrOtherKind_ThrowsNamingDenominator()
    {
        Concentration a = Concentration.FromMilligramsPerLitre(1);
        var zero = Assert.Throws<ArgumentException>(() => a.RatioTo(Concentration.FromMicrogramsPerLitre(0)));
        Assert.Equal("denominator", zero.ParamName);
        Assert.StartsWith("Parameter 'denominator' is zero", zero.Message, StringComparison.Ordinal);
        var kind = Assert.Throws<ArgumentException>(() => a.RatioTo(Concentration.FromMilligramsPerKilogram(1)));
        Assert.Equal("denominator", kind.ParamName);
    }

    [Fact]
    public void Scale_MultipliesInSameUnitAndRejectsNonFinite()
    {
        Concentration c = Concentration.FromMicrogramsPerLitre(4).Scale(-0.5);
        Assert.Equal(Concentration.FromMicrogramsPerLitre(-2), c);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, c.Unit);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => c.Scale(double.NaN));
        Assert.Equal("factor", ex.ParamName);
        Assert.StartsWith("Parameter 'factor' was NaN; it must be a finite number", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void InUnitOf_UsesReferenceUnit()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(3).InUnitOf(Concentration.FromMicrogramsPerLitre(1));
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, c.Unit);
        Assert.Equal(3000, c.Value);
    }

    private static ConcentrationUnit BaseUnit(ConcentrationKind kind) => kind switch
    {
        ConcentrationKind.MassConcentration => ConcentrationUnit.GramPerLitre,
        ConcentrationKind.AmountConcentration => ConcentrationUnit.MolePerLitre,
        _ => ConcentrationUnit.GramPerKilogram,
    };
}
