using System;
using System.Collections.Generic;
using InternalStdCal.Quantities;
using Xunit;
using static InternalStdCal.Tests.Hardening.BadInput.BadInput;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>Bad input to every entry point of <c>Quantities</c>: a documented argument exception naming the
/// parameter, the value and the allowed range (common practice; the project's Guard convention).</summary>
public class QuantitiesBadInputTests
{
    private static readonly Concentration MgL = Concentration.FromMilligramsPerLitre(1);
    private static readonly Concentration UmolL = Concentration.FromMicromolesPerLitre(1);
    private static readonly Type Range = typeof(ArgumentOutOfRangeException);
    private static readonly Type Arg = typeof(ArgumentException);
    private static readonly Type Null = typeof(ArgumentNullException);
    private static readonly Type Format = typeof(FormatException);

    public static IEnumerable<object[]> Cases => Rows(new BadInputCase[]
    {
        // Concentrations: any finite number (negative estimates allowed), a defined unit (common practice).
        new("Quantities.Concentration.From", "NaN", () => Concentration.From(double.NaN, ConcentrationUnit.MilligramPerLitre), Range, "value", "NaN", Finite),
        new("Quantities.Concentration.From", "+inf", () => Concentration.From(double.PositiveInfinity, ConcentrationUnit.MilligramPerLitre), Range, "value", "Infinity", Finite),
        new("Quantities.Concentration.From", "1e308 % overflows g/kg", () => Concentration.From(1e308, ConcentrationUnit.Percent), Range, "value", "1E+308", "overflows", "at most"),
        new("Quantities.Concentration.From", "undefined unit", () => Concentration.From(1, (ConcentrationUnit)999), Range, "unit", "999", "defined unit"),
        new("Quantities.Concentration.FromMilligramsPerLitre", "-inf", () => Concentration.FromMilligramsPerLitre(double.NegativeInfinity), Range, "value", "-Infinity", Finite),
        new("Quantities.Concentration.FromMicrogramsPerLitre", "NaN", () => Concentration.FromMicrogramsPerLitre(double.NaN), Range, "value", "NaN", Finite),
        new("Quantities.Concentration.FromMilligramsPerKilogram", "+inf", () => Concentration.FromMilligramsPerKilogram(double.PositiveInfinity), Range, "value", "Infinity", Finite),
        new("Quantities.Concentration.FromMicromolesPerLitre", "NaN", () => Concentration.FromMicromolesPerLitre(double.NaN), Range, "value", "NaN", Finite),
        new("Quantities.Concentration.FromPartsPerMillion", "NaN", () => Concentration.FromPartsPerMillion(double.NaN, ConcentrationKind.MassFraction), Range, "value", "NaN", Finite),
        new("Quantities.Concentration.FromPartsPerMillion", "amount kind", () => Concentration.FromPartsPerMillion(1, ConcentrationKind.AmountConcentration), Range, "kind", "AmountConcentration", "MassConcentration or MassFraction"),
        new("Quantities.Concentration.FromPartsPerBillion", "-inf", () => Concentration.FromPartsPerBillion(double.NegativeInfinity, ConcentrationKind.MassConcentration), Range, "value", "-Infinity", Finite),
        new("Quantities.Concentration.FromPartsPerBillion", "amount kind", () => Concentration.FromPartsPerBillion(1, ConcentrationKind.AmountConcentration), Range, "kind", "AmountConcentration", "MassConcentration or MassFraction"),
        new("Quantities.Concentration.SymbolOf", "undefined unit", () => Concentration.SymbolOf((ConcentrationUnit)(-1)), Range, "unit", "-1", "defined unit"),
        new("Quantities.Concentration.KindOf", "undefined unit", () => Concentration.KindOf((ConcentrationUnit)999), Range, "unit", "999", "defined unit"),
        // Wrong unit kind: mass vs amount concentration is not convertible without a molar mass.
        new("Quantities.Concentration.In", "amount unit for a mass concentration", () => MgL.In(ConcentrationUnit.MicromolePerLitre), Arg, "unit", "µmol/L", "kinds must match"),
        new("Quantities.Concentration.ConvertTo", "amount unit for a mass concentration", () => MgL.ConvertTo(ConcentrationUnit.MolePerLitre), Arg, "unit", "mol/L", "kinds must match"),
        new("Quantities.Concentration.ConvertTo", "default molar mass", () => MgL.ConvertTo(ConcentrationUnit.MicromolePerLitre, default(MolarMass)), Range, "molarMass", "0", "> 0"),
        new("Quantities.Concentration.ConvertTo", "molar mass to a mass fraction", () => MgL.ConvertTo(ConcentrationUnit.MilligramPerKilogram, MolarMass.FromGramsPerMole(207.2)), Arg, "unit", "mg/kg", "kinds must match"),
        new("Quantities.Concentration.ConvertTo", "default density", () => MgL.ConvertTo(ConcentrationUnit.MilligramPerKilogram, default(Density)), Range, "density", "0", "> 0"),
        new("Quantities.Concentration.ConvertTo", "density to an amount concentration", () => MgL.ConvertTo(ConcentrationUnit.MicromolePerLitre, Density.FromGramsPerMillilitre(1)), Arg, "unit", "µmol/L", "kinds must match"),
        new("Quantities.Concentration.InUnitOf", "amount reference", () => MgL.InUnitOf(UmolL), Arg, "reference", "µmol/L", "kinds must match"),
        new("Quantities.Concentration.RatioTo", "amount denominator", () => MgL.RatioTo(UmolL), Arg, "denominator", "µmol/L", "kinds must match"),
        new("Quantities.Concentration.RatioTo", "zero denominator", () => MgL.RatioTo(Concentration.FromMilligramsPerLitre(0)), Arg, "denominator", "zero", "non-zero"),
        new("Quantities.Concentration.Scale", "NaN", () => MgL.Scale(double.NaN), Range, "factor", "NaN", Finite),
        new("Quantities.Concentration.Scale", "1e300 x 1e300 overflows", () => Concentration.FromMilligramsPerLitre(1e300).Scale(1e300), Range, "factor", "1E+300", "stays finite"),
        new("Quantities.Concentration.IsCloseTo", "negative tolerance", () => MgL.IsCloseTo(MgL, -1e-12), Range, "relativeTolerance", "-1E-12", FiniteNonNegative),
        new("Quantities.Concentration.IsCloseTo", "NaN tolerance", () => MgL.IsCloseTo(MgL, double.NaN), Range, "relativeTolerance", "NaN", FiniteNonNegative),
        new("Quantities.Concentration.CompareTo", "other kind", () => MgL.CompareTo(UmolL), Arg, "other", "µmol/L", "kinds must match"),
        new("Quantities.Concentration.op_LessThan", "other kind", () => _ = MgL < UmolL, Arg, "other", "kinds must match"),
        new("Quantities.Concentration.Parse", "null", () => Concentration.Parse(null!), Null, "text", "text"),
        new("Quantities.Concentration.Parse", "NaN", () => Concentration.Parse("NaN mg/L"), Format, null, "NaN", "finite number"),
        new("Quantities.Concentration.Parse", "unknown unit", () => Concentration.Parse("1 mL"), Format, null, "mL", "known units"),
        new("Quantities.Concentration.Parse", "amount kind for ppm", () => Concentration.Parse("1 ppm", ConcentrationKind.AmountConcentration), Range, "partsPerKind", "AmountConcentration", "MassConcentration or MassFraction"),

        // Density and molar mass: finite and > 0 (a physical property; common practice).
        new("Quantities.Density.FromGramsPerMillilitre", "zero", () => Density.FromGramsPerMillilitre(0), Range, "value", "0", FinitePositive),
        new("Quantities.Density.FromGramsPerMillilitre", "negative", () => Density.FromGramsPerMillilitre(-1), Range, "value", "-1", FinitePositive),
        new("Quantities.Density.FromGramsPerMillilitre", "+inf", () => Density.FromGramsPerMillilitre(double.PositiveInfinity), Range, "value", "Infinity", FinitePositive),
        new("Quantities.Density.VolumeOf", "default density", () => default(Density).VolumeOf(Mass.FromGrams(1)), typeof(InvalidOperationException), null, "zero", "FromGramsPerMillilitre"),
        new("Quantities.MolarMass.FromGramsPerMole", "zero", () => MolarMass.FromGramsPerMole(0), Range, "value", "0", FinitePositive),
        new("Quantities.MolarMass.FromGramsPerMole", "NaN", () => MolarMass.FromGramsPerMole(double.NaN), Range, "value", "NaN", FinitePositive),

        // Mass and volume: finite and >= 0 (a negative mass or volume does not exist).
        new("Quantities.Mass.From", "negative", () => Mass.From(-1, MassUnit.Gram), Range, "value", "-1", FiniteNonNegative),
        new("Quantities.Mass.From", "undefined unit", () => Mass.From(1, (MassUnit)99), Range, "unit", "99", "defined unit"),
        new("Quantities.Mass.FromKilograms", "1e306 kg overflows g", () => Mass.FromKilograms(1e306), Range, "value", "1E+306", "overflows", "at most"),
        new("Quantities.Mass.FromGrams", "NaN", () => Mass.FromGrams(double.NaN), Range, "value", "NaN", FiniteNonNegative),
        new("Quantities.Mass.FromMilligrams", "-inf", () => Mass.FromMilligrams(double.NegativeInfinity), Range, "value", "-Infinity", FiniteNonNegative),
        new("Quantities.Mass.FromMicrograms", "+inf", () => Mass.FromMicrograms(double.PositiveInfinity), Range, "value", "Infinity", FiniteNonNegative),
        new("Quantities.Mass.In", "undefined unit", () => Mass.FromGrams(1).In((MassUnit)99), Range, "unit", "99", "defined unit"),
        new("Quantities.Mass.ConvertTo", "1e300 kg in µg overflows", () => Mass.FromKilograms(1e300).ConvertTo(MassUnit.Microgram), Range, "unit", "1E+300", "overflows"),
        new("Quantities.Mass.RatioTo", "zero denominator", () => Mass.FromGrams(1).RatioTo(Mass.FromGrams(0)), Arg, "denominator", "zero", "non-zero"),
        new("Quantities.Mass.Scale", "negative", () => Mass.FromGrams(1).Scale(-2), Range, "factor", "-2", FiniteNonNegative),
        new("Quantities.Mass.Scale", "1e300 x 1e300 overflows", () => Mass.FromGrams(1e300).Scale(1e300), Range, "factor", "1E+300", "stays finite"),
        new("Quantities.Mass.Parse", "null", () => Mass.Parse(null!), Null, "text", "text"),
        new("Quantities.Mass.Parse", "negative", () => Mass.Parse("-1 g"), Format, null, "-1 g", ">= 0"),
        new("Quantities.Volume.From", "negative", () => Volume.From(-0.5, VolumeUnit.Millilitre), Range, "value", "-0.5", FiniteNonNegative),
        new("Quantities.Volume.From", "undefined unit", () => Volume.From(1, (VolumeUnit)7), Range, "unit", "7", "defined unit"),
        new("Quantities.Volume.FromLitres", "NaN", () => Volume.FromLitres(double.NaN), Range, "value", "NaN", FiniteNonNegative),
        new("Quantities.Volume.FromMillilitres", "+inf", () => Volume.FromMillilitres(double.PositiveInfinity), Range, "value", "Infinity", FiniteNonNegative),
        new("Quantities.Volume.FromMicrolitres", "negative", () => Volume.FromMicrolitres(-1), Range, "value", "-1", FiniteNonNegative),
        new("Quantities.Volume.In", "1e300 L in µL overflows", () => Volume.FromLitres(1e305).In(VolumeUnit.Microlitre), Range, "unit", "1E+305", "overflows"),
        new("Quantities.Volume.ConvertTo", "undefined unit", () => Volume.FromLitres(1).ConvertTo((VolumeUnit)7), Range, "unit", "7", "defined unit"),
        new("Quantities.Volume.RatioTo", "zero denominator", () => Volume.FromLitres(1).RatioTo(Volume.FromLitres(0)), Arg, "denominator", "zero", "non-zero"),
        new("Quantities.Volume.Scale", "NaN", () => Volume.FromLitres(1).Scale(double.NaN), Range, "factor", "NaN", FiniteNonNegative),
        new("Quantities.Volume.Scale", "1e300 x 1e300 overflows", () => Volume.FromLitres(1e300).Scale(1e300), Range, "factor", "1E+300", "stays finite"),
        new("Quantities.Volume.Parse", "null", () => Volume.Parse(null!), Null, "text", "text"),
        new("Quantities.Volume.Parse", "not a volume unit (Mass where Volume expected)", () => Volume.Parse("5 g"), Format, null, "'g'", "known units"),

        // Measured: u >= 0 of the same kind, ν >= 1 (JCGM 100 §G: ν ≥ 1), k > 0 (JCGM 100 §3.3.7).
        new("Quantities.Measured.WithStandardUncertainty", "negative u", () => Measured.WithStandardUncertainty(MgL, Concentration.FromMilligramsPerLitre(-0.1)), Range, "standardUncertainty", "-0.1", ">= 0"),
        new("Quantities.Measured.WithStandardUncertainty", "u of another kind", () => Measured.WithStandardUncertainty(MgL, UmolL), Arg, "standardUncertainty", "µmol/L", "same kind"),
        new("Quantities.Measured.WithStandardUncertainty", "nu = 0.5", () => Measured.WithStandardUncertainty(MgL, MgL, 0.5), Range, "degreesOfFreedom", "0.5", ">= 1"),
        new("Quantities.Measured.WithStandardUncertainty", "nu = +inf", () => Measured.WithStandardUncertainty(MgL, MgL, double.PositiveInfinity), Range, "degreesOfFreedom", "Infinity", ">= 1"),
        new("Quantities.Measured.WithStandardUncertainty", "undefined evaluation", () => Measured.WithStandardUncertainty(MgL, MgL, null, (UncertaintyEvaluation)42), Range, "evaluation", "42", "defined UncertaintyEvaluation"),
        new("Quantities.Measured.TypeA", "nu = 0", () => Measured.TypeA(MgL, MgL, 0), Range, "degreesOfFreedom", "0", ">= 1"),
        new("Quantities.Measured.TypeA", "nu = NaN", () => Measured.TypeA(MgL, MgL, double.NaN), Range, "degreesOfFreedom", "NaN", ">= 1"),
        new("Quantities.Measured.FromTolerance", "negative half-width", () => Measured.FromTolerance(MgL, Concentration.FromMilligramsPerLitre(-1), ToleranceDistribution.Rectangular), Range, "halfWidth", "-1", ">= 0"),
        new("Quantities.Measured.FromTolerance", "half-width of another kind", () => Measured.FromTolerance(MgL, UmolL, ToleranceDistribution.Triangular), Arg, "halfWidth", "µmol/L", "same kind"),
        new("Quantities.Measured.FromTolerance", "undefined distribution", () => Measured.FromTolerance(MgL, MgL, (ToleranceDistribution)5), Range, "distribution", "5"),
        new("Quantities.Measured.FromExpandedUncertainty", "k = 0", () => Measured.FromExpandedUncertainty(MgL, MgL, 0), Range, "coverageFactor", "0", FinitePositive),
        new("Quantities.Measured.FromExpandedUncertainty", "k = NaN", () => Measured.FromExpandedUncertainty(MgL, MgL, double.NaN), Range, "coverageFactor", "NaN", FinitePositive),
        new("Quantities.Measured.FromExpandedUncertainty", "U/k overflows", () => Measured.FromExpandedUncertainty(MgL, Concentration.FromMilligramsPerLitre(1e300), 1e-300), Range, "coverageFactor", "1E-300", "stays finite"),
        new("Quantities.Measured.FromExpandedUncertainty", "negative U", () => Measured.FromExpandedUncertainty(MgL, Concentration.FromMilligramsPerLitre(-1), 2), Range, "expandedUncertainty", "-1", ">= 0"),
        new("Quantities.Measured`1.ExpandedUncertainty", "k = -1", () => Measured.Exact(MgL).ExpandedUncertainty(-1), Range, "coverageFactor", "-1", FinitePositive),
        new("Quantities.Measured`1.RelativeStandardUncertainty", "zero value", () => _ = Measured.Exact(Concentration.FromMilligramsPerLitre(0)).RelativeStandardUncertainty, typeof(InvalidOperationException), null, "zero", "undefined"),
    });

    public static IEnumerable<object[]> Magnitudes => Rows(new MagnitudeCase[]
    {
        new("Quantities.Concentration.RatioTo", "1e-300 / 1e300", () => new[] { Concentration.FromMilligramsPerLitre(1e-300).RatioTo(Concentration.FromMilligramsPerLitre(1e300)) }),
        new("Quantities.Concentration.RatioTo", "1e300 / 1e-300", () => new[] { Concentration.FromMilligramsPerLitre(1e300).RatioTo(Concentration.FromMilligramsPerLitre(1e-300)) }),
        new("Quantities.Concentration.ConvertTo", "1e300 mg/L to µmol/L with M = 1e-300", () => new[] { Concentration.FromMilligramsPerLitre(1e300).ConvertTo(ConcentrationUnit.MicromolePerLitre, MolarMass.FromGramsPerMole(1e-300)).Value }),
        new("Quantities.Concentration.ConvertTo", "1e300 mg/L to mg/kg with ρ = 1e-300", () => new[] { Concentration.FromMilligramsPerLitre(1e300).ConvertTo(ConcentrationUnit.MilligramPerKilogram, Density.FromGramsPerMillilitre(1e-300)).Value }),
        new("Quantities.Concentration.In", "1e300 g/kg in ng/kg", () => new[] { Concentration.From(1e300, ConcentrationUnit.GramPerKilogram).In(ConcentrationUnit.NanogramPerKilogram) }),
        new("Quantities.Mass.RatioTo", "1e300 kg / 1e-300 µg", () => new[] { Mass.FromKilograms(1e300).RatioTo(Mass.FromMicrograms(1e-300)) }),
        new("Quantities.Volume.RatioTo", "1e300 L / 1e-300 µL", () => new[] { Volume.FromLitres(1e300).RatioTo(Volume.FromMicrolitres(1e-300)) }),
        new("Quantities.Density.VolumeOf", "1e300 g at 1e-300 g/mL", () => new[] { Density.FromGramsPerMillilitre(1e-300).VolumeOf(Mass.FromGrams(1e300)).Value }),
        new("Quantities.Measured`1.RelativeStandardUncertainty", "u = 1e300, value 1e-300", () => new[] { Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(1e-300), Concentration.FromMilligramsPerLitre(1e300)).RelativeStandardUncertainty }),
        new("Quantities.Measured`1.ExpandedUncertainty", "u = 1e300, k = 1e300", () => new[] { Measured.WithStandardUncertainty(MgL, Concentration.FromMilligramsPerLitre(1e300)).ExpandedUncertainty(1e300).Value }),
    });

    [Theory]
    [MemberData(nameof(Cases))]
    public void EntryPoint_BadInput_ThrowsDocumentedExceptionNamingParameterValueAndRange(string name, BadInputCase c)
    {
        Assert.NotNull(name);
        AssertRejected(c);
    }

    [Theory]
    [MemberData(nameof(Magnitudes))]
    public void EntryPoint_AbsurdMagnitude_FiniteOrDocumentedException(string name, MagnitudeCase c)
    {
        Assert.NotNull(name);
        AssertFiniteOrRejected(c);
    }
}
