using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Quantities;

/// <summary>
/// A concentration: a finite number in a <see cref="ConcentrationUnit"/> that fixes its
/// <see cref="ConcentrationKind"/> (mass concentration, amount concentration or mass fraction).
/// </summary>
/// <remarks>
/// <para>Immutable. The value is kept in the unit it was created in, so printing and parsing round-trip exactly.
/// Conversions within a kind use exact powers of ten (one rounding per conversion); conversions across kinds
/// need the fact that links them: a <see cref="MolarMass"/> (mass ↔ amount concentration) or a
/// <see cref="Density"/> of the solution (mass fraction ↔ mass concentration).</para>
/// <para>Negative values are allowed because they are legitimate estimates (a blank read off a calibration line
/// can fall below zero); NaN and ±∞ are rejected at creation.</para>
/// <para>Equality is exact: two concentrations are equal when they are of the same kind and their values in the
/// base unit of the kind (g/L, mol/L, g/kg) are the same double (+0 and −0 are equal). Values created in
/// different units may therefore differ in the last bit; use <see cref="IsCloseTo"/> for a tolerant comparison.
/// Ordering is defined only within a kind. <c>default</c> is 0 g/L.</para>
/// </remarks>
public readonly struct Concentration : IQuantity<Concentration>, IComparable
{
    private Concentration(double value, ConcentrationUnit unit)
    {
        Value = value;
        Unit = unit;
    }

    /// <summary>The number in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The unit the value is expressed in.</summary>
    public ConcentrationUnit Unit { get; }

    /// <summary>The kind of concentration, fixed by <see cref="Unit"/>.</summary>
    public ConcentrationKind Kind => UnitTable.Of(Unit).Kind;

    /// <summary>The value in the base unit of the kind: g/L, mol/L or g/kg.</summary>
    public double BaseValue => Normalize(PowerOfTen.Scale(Value, UnitTable.Of(Unit).Exponent));

    /// <summary>Creates a concentration.</summary>
    /// <param name="value">The number; any finite value (negative estimates are allowed).</param>
    /// <param name="unit">A defined <see cref="ConcentrationUnit"/>.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or ±∞ (or so large that its value in
    /// the base unit of the kind overflows), or <paramref name="unit"/> is not defined.</exception>
    public static Concentration From(double value, ConcentrationUnit unit)
    {
        UnitTable.Entry entry = UnitTable.Of(unit);
        Guard.Finite(value, nameof(value));
        PowerOfTen.ScaleChecked(value, entry.Exponent, entry.Symbol, BaseSymbol(entry.Kind), nameof(value));
        return new Concentration(value, unit);
    }

    /// <summary>Creates a mass concentration in mg/L.</summary>
    /// <param name="value">Finite number of mg/L.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or ±∞.</exception>
    public static Concentration FromMilligramsPerLitre(double value) => From(value, ConcentrationUnit.MilligramPerLitre);

    /// <summary>Creates a mass concentration in µg/L.</summary>
    /// <param name="value">Finite number of µg/L.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or ±∞.</exception>
    public static Concentration FromMicrogramsPerLitre(double value) => From(value, ConcentrationUnit.MicrogramPerLitre);

    /// <summary>Creates a mass fraction in mg/kg.</summary>
    /// <param name="value">Finite number of mg/kg.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or ±∞.</exception>
    public static Concentration FromMilligramsPerKilogram(double value) => From(value, ConcentrationUnit.MilligramPerKilogram);

    /// <summary>Creates an amount concentration in µmol/L.</summary>
    /// <param name="value">Finite number of µmol/L.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is NaN or ±∞.</exception>
    public static Concentration FromMicromolesPerLitre(double value) => From(value, ConcentrationUnit.MicromolePerLitre);

    /// <summary>Creates a concentration from a "ppm" figure, with the kind the caller means.</summary>
    /// <param name="value">Finite number of parts per million.</param>
    /// <param name="kind"><see cref="ConcentrationKind.MassConcentration"/> (ppm = mg/L, dilute aqueous solutions) or
    /// <see cref="ConcentrationKind.MassFraction"/> (ppm = mg/kg).</param>
    /// <returns>The concentration in mg/L or mg/kg.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is not finite, or <paramref name="kind"/> is
    /// <see cref="ConcentrationKind.AmountConcentration"/> (ppm has no amount-concentration meaning).</exception>
    public static Concentration FromPartsPerMillion(double value, ConcentrationKind kind) =>
        From(value, PartsPerUnit(kind, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.MilligramPerKilogram, nameof(kind)));

    /// <summary>Creates a concentration from a "ppb" figure, with the kind the caller means.</summary>
    /// <param name="value">Finite number of parts per billion (10⁻⁹).</param>
    /// <param name="kind"><see cref="ConcentrationKind.MassConcentration"/> (ppb = µg/L) or <see cref="ConcentrationKind.MassFraction"/> (ppb = µg/kg).</param>
    /// <returns>The concentration in µg/L or µg/kg.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="value"/> is not finite, or <paramref name="kind"/> is amount concentration.</exception>
    public static Concentration FromPartsPerBillion(double value, ConcentrationKind kind) =>
        From(value, PartsPerUnit(kind, ConcentrationUnit.MicrogramPerLitre, ConcentrationUnit.MicrogramPerKilogram, nameof(kind)));

    /// <summary>The unit symbol, e.g. "µg/L".</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The symbol used when printing and parsing.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined.</exception>
    public static string SymbolOf(ConcentrationUnit unit) => UnitTable.Of(unit).Symbol;

    /// <summary>The kind a unit belongs to.</summary>
    /// <param name="unit">A defined unit.</param>
    /// <returns>The kind.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined.</exception>
    public static ConcentrationKind KindOf(ConcentrationUnit unit) => UnitTable.Of(unit).Kind;

    /// <summary>The number expressed in another unit of the same kind (exact power-of-ten factor, one rounding).</summary>
    /// <param name="unit">A unit of the same kind.</param>
    /// <returns>The value in <paramref name="unit"/>.</returns>
    /// <exception cref="ArgumentException"><paramref name="unit"/> is of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when
    /// expressed in it.</exception>
    public double In(ConcentrationUnit unit)
    {
        UnitTable.Entry target = UnitTable.Of(unit);
        UnitTable.Entry source = UnitTable.Of(Unit);
        if (target.Kind != source.Kind)
        {
            throw KindMismatch(nameof(unit), UnitDescription(unit), "Use ConvertTo with a MolarMass or a Density to change kind.");
        }

        return PowerOfTen.ScaleChecked(Value, source.Exponent - target.Exponent, source.Symbol, target.Symbol, nameof(unit));
    }

    /// <summary>The same concentration expressed in another unit of the same kind.</summary>
    /// <param name="unit">A unit of the same kind.</param>
    /// <returns>The converted concentration.</returns>
    /// <exception cref="ArgumentException"><paramref name="unit"/> is of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined, or the value overflows when
    /// expressed in it.</exception>
    public Concentration ConvertTo(ConcentrationUnit unit) => new(In(unit), unit);

    /// <summary>Converts between mass and amount concentration with the analyte's molar mass
    /// (γ = c·M, ISO 80000-9).</summary>
    /// <param name="unit">The target unit: an amount unit if this is a mass concentration, or the reverse; a unit of
    /// the same kind is converted directly.</param>
    /// <param name="molarMass">The molar mass of the analyte (not <c>default</c>).</param>
    /// <returns>The converted concentration.</returns>
    /// <exception cref="ArgumentException">The conversion would involve a mass fraction, which needs a density.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="molarMass"/> is <c>default</c> (0 g/mol), or the
    /// converted value overflows.</exception>
    public Concentration ConvertTo(ConcentrationUnit unit, MolarMass molarMass)
    {
        Guard.Positive(molarMass.GramsPerMole, nameof(molarMass));
        ConcentrationKind from = Kind;
        ConcentrationKind to = KindOf(unit);
        if (from == to)
        {
            return ConvertTo(unit);
        }

        if (from == ConcentrationKind.MassConcentration && to == ConcentrationKind.AmountConcentration)
        {
            return From(Guard.FiniteResult(BaseValue / molarMass.GramsPerMole, molarMass, nameof(molarMass), "the converted concentration"), ConcentrationUnit.MolePerLitre).ConvertTo(unit);
        }

        if (from == ConcentrationKind.AmountConcentration && to == ConcentrationKind.MassConcentration)
        {
            return From(Guard.FiniteResult(BaseValue * molarMass.GramsPerMole, molarMass, nameof(molarMass), "the converted concentration"), ConcentrationUnit.GramPerLitre).ConvertTo(unit);
        }

        throw KindMismatch(nameof(unit), UnitDescription(unit), "A molar mass links mass and amount concentration only; mass fractions need a Density.");
    }

    /// <summary>Converts between mass fraction and mass concentration with the density of the solution
    /// (γ = w·ρ).</summary>
    /// <param name="unit">The target unit: a mass-concentration unit if this is a mass fraction, or the reverse.</param>
    /// <param name="density">The density of the solution or sample (not <c>default</c>).</param>
    /// <returns>The converted concentration.</returns>
    /// <exception cref="ArgumentException">The conversion involves an amount concentration.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="density"/> is <c>default</c> (0 g/mL), or the
    /// converted value overflows.</exception>
    public Concentration ConvertTo(ConcentrationUnit unit, Density density)
    {
        Guard.Positive(density.GramsPerMillilitre, nameof(density));
        ConcentrationKind from = Kind;
        ConcentrationKind to = KindOf(unit);
        if (from == to)
        {
            return ConvertTo(unit);
        }

        // Base units: g/kg · kg/L = g/L.
        if (from == ConcentrationKind.MassFraction && to == ConcentrationKind.MassConcentration)
        {
            return From(Guard.FiniteResult(BaseValue * density.KilogramsPerLitre, density, nameof(density), "the converted concentration"), ConcentrationUnit.GramPerLitre).ConvertTo(unit);
        }

        if (from == ConcentrationKind.MassConcentration && to == ConcentrationKind.MassFraction)
        {
            return From(Guard.FiniteResult(BaseValue / density.KilogramsPerLitre, density, nameof(density), "the converted concentration"), ConcentrationUnit.GramPerKilogram).ConvertTo(unit);
        }

        throw KindMismatch(nameof(unit), UnitDescription(unit), "A density links mass fraction and mass concentration only; amount concentrations need a MolarMass.");
    }

    /// <inheritdoc />
    public Concentration InUnitOf(Concentration reference)
    {
        RequireSameKind(reference, nameof(reference));
        return ConvertTo(reference.Unit);
    }

    /// <inheritdoc />
    public double RatioTo(Concentration denominator)
    {
        RequireSameKind(denominator, nameof(denominator));
        double d = denominator.BaseValue;
        if (d == 0)
        {
            throw new ArgumentException("Parameter 'denominator' is zero; a ratio needs a non-zero denominator.", nameof(denominator));
        }

        return Guard.FiniteResult(Value / denominator.In(Unit), denominator, nameof(denominator), "the ratio");
    }

    /// <inheritdoc />
    public Concentration Scale(double factor) => From(Value * Guard.FiniteProduct(Guard.Finite(factor, nameof(factor)), Math.Max(Math.Abs(Value), Math.Abs(BaseValue)), nameof(factor)), Unit);

    /// <summary>True when both are of the same kind and differ by no more than
    /// <paramref name="relativeTolerance"/> · max(|a|, |b|).</summary>
    /// <param name="other">The concentration to compare with.</param>
    /// <param name="relativeTolerance">Tolerance, ≥ 0 (e.g. 1e-12).</param>
    /// <returns>Whether the two are close.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="relativeTolerance"/> is negative or not finite.</exception>
    public bool IsCloseTo(Concentration other, double relativeTolerance)
    {
        Guard.NonNegative(relativeTolerance, nameof(relativeTolerance));
        if (Kind != other.Kind)
        {
            return false;
        }

        double a = BaseValue;
        double b = other.BaseValue;
        return Math.Abs(a - b) <= relativeTolerance * Math.Max(Math.Abs(a), Math.Abs(b));
    }

    /// <summary>Parses the printed form "&lt;number&gt; &lt;unit&gt;" (invariant culture), e.g. "12.5 mg/L" or "3 ug/kg".</summary>
    /// <param name="text">The text. "ppm"/"ppb" are refused here; use <see cref="Parse(string, ConcentrationKind)"/>.</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="FormatException">The text is not a finite number followed by a known unit symbol, or the number
    /// overflows in the base unit of the kind.</exception>
    public static Concentration Parse(string text)
    {
        UnitTable.SplitValueAndUnit(text, nameof(text), out double value, out string symbol);
        if (symbol == "ppm" || symbol == "ppb")
        {
            throw new FormatException($"'{text}' uses '{symbol}', which is ambiguous (mass concentration or mass fraction); call Parse(text, kind) to say which is meant.");
        }

        return Create(value, ParseUnit(symbol, text), text);
    }

    /// <summary>Parses "&lt;number&gt; &lt;unit&gt;", accepting "ppm"/"ppb" as the given kind.</summary>
    /// <param name="text">The text.</param>
    /// <param name="partsPerKind">What "ppm"/"ppb" mean: mass concentration (mg/L, µg/L) or mass fraction (mg/kg, µg/kg).</param>
    /// <returns>The concentration.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="text"/> is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="partsPerKind"/> is amount concentration.</exception>
    /// <exception cref="FormatException">The text is not a finite number followed by a known unit symbol, or the number
    /// overflows in the base unit of the kind.</exception>
    public static Concentration Parse(string text, ConcentrationKind partsPerKind)
    {
        UnitTable.SplitValueAndUnit(text, nameof(text), out double value, out string symbol);
        _ = PartsPerUnit(partsPerKind, ConcentrationUnit.MilligramPerLitre, ConcentrationUnit.MilligramPerKilogram, nameof(partsPerKind));
        return symbol switch
        {
            "ppm" => FromPartsPerMillion(value, partsPerKind),
            "ppb" => FromPartsPerBillion(value, partsPerKind),
            _ => Create(value, ParseUnit(symbol, text), text),
        };
    }

    /// <summary>Tries to parse the printed form; never throws.</summary>
    /// <param name="text">The text, or null.</param>
    /// <param name="result">The concentration, or default when parsing fails.</param>
    /// <returns>Whether parsing succeeded.</returns>
    public static bool TryParse(string? text, out Concentration result)
    {
        result = default;
        if (text is null)
        {
            return false;
        }

        try
        {
            result = Parse(text);
            return true;
        }
        catch (FormatException)
        {
            return false;
        }
    }

    /// <summary>Prints "&lt;value&gt; &lt;unit&gt;" with the invariant culture and round-trip precision, e.g. "12.5 mg/L".</summary>
    /// <returns>The text; <see cref="Parse(string)"/> reads it back exactly.</returns>
    public override string ToString() => ToString(null, null);

    /// <summary>Prints the value with a numeric format followed by the unit symbol.</summary>
    /// <param name="format">A standard or custom numeric format for the value (e.g. "F3", "G6"); null for round-trip.</param>
    /// <param name="formatProvider">Culture for the number; null means the invariant culture.</param>
    /// <returns>The text.</returns>
    public string ToString(string? format, IFormatProvider? formatProvider) =>
        QuantityText.Format(Value, SymbolOf(Unit), format, formatProvider);

    /// <inheritdoc />
    public bool Equals(Concentration other) => Kind == other.Kind && BaseValue.Equals(other.BaseValue);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is Concentration other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (Kind, BaseValue).GetHashCode();

    /// <summary>Orders two concentrations of the same kind by amount.</summary>
    /// <param name="other">A concentration of the same kind.</param>
    /// <returns>Negative, zero or positive.</returns>
    /// <exception cref="ArgumentException"><paramref name="other"/> is of another kind.</exception>
    public int CompareTo(Concentration other)
    {
        RequireSameKind(other, nameof(other));
        return BaseValue.CompareTo(other.BaseValue);
    }

    int IComparable.CompareTo(object? obj) => obj switch
    {
        null => 1,
        Concentration other => CompareTo(other),
        _ => throw new ArgumentException($"Parameter 'obj' is a {obj.GetType().Name}; it must be a Concentration.", nameof(obj)),
    };

    /// <summary>Exact equality (see remarks of the type).</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(Concentration left, Concentration right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(Concentration left, Concentration right) => !left.Equals(right);

    /// <summary>Less than, within one kind.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand of the same kind.</param>
    /// <returns>Whether left &lt; right.</returns>
    /// <exception cref="ArgumentException">The kinds differ.</exception>
    public static bool operator <(Concentration left, Concentration right) => left.CompareTo(right) < 0;

    /// <summary>Greater than, within one kind.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand of the same kind.</param>
    /// <returns>Whether left &gt; right.</returns>
    /// <exception cref="ArgumentException">The kinds differ.</exception>
    public static bool operator >(Concentration left, Concentration right) => left.CompareTo(right) > 0;

    /// <summary>Less than or equal, within one kind.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand of the same kind.</param>
    /// <returns>Whether left ≤ right.</returns>
    /// <exception cref="ArgumentException">The kinds differ.</exception>
    public static bool operator <=(Concentration left, Concentration right) => left.CompareTo(right) <= 0;

    /// <summary>Greater than or equal, within one kind.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand of the same kind.</param>
    /// <returns>Whether left ≥ right.</returns>
    /// <exception cref="ArgumentException">The kinds differ.</exception>
    public static bool operator >=(Concentration left, Concentration right) => left.CompareTo(right) >= 0;

    private void RequireSameKind(Concentration other, string paramName)
    {
        if (Kind != other.Kind)
        {
            throw KindMismatch(paramName, $"{other} ({other.Kind})", string.Empty);
        }
    }

    private ArgumentException KindMismatch(string paramName, string offending, string hint) =>
        new($"Parameter '{paramName}' was {offending} but this concentration is {ToString()} ({Kind}); the kinds must match. {hint}".TrimEnd(), paramName);

    private static string UnitDescription(ConcentrationUnit unit) => $"{SymbolOf(unit)} ({KindOf(unit)})";

    private static string BaseSymbol(ConcentrationKind kind) => kind switch
    {
        ConcentrationKind.MassConcentration => "g/L",
        ConcentrationKind.AmountConcentration => "mol/L",
        _ => "g/kg",
    };

    private static Concentration Create(double value, ConcentrationUnit unit, string text)
    {
        UnitTable.Entry entry = UnitTable.Of(unit);
        if (double.IsInfinity(PowerOfTen.Scale(value, entry.Exponent)))
        {
            throw new FormatException($"'{text}' is out of range: expressed in {BaseSymbol(entry.Kind)} it overflows the range of a double.");
        }

        return new Concentration(value, unit);
    }

    private static ConcentrationUnit PartsPerUnit(ConcentrationKind kind, ConcentrationUnit massConcentration, ConcentrationUnit massFraction, string paramName) => kind switch
    {
        ConcentrationKind.MassConcentration => massConcentration,
        ConcentrationKind.MassFraction => massFraction,
        _ => throw new ArgumentOutOfRangeException(paramName, kind, $"Parameter '{paramName}' was {kind}; 'parts per' figures must be MassConcentration or MassFraction."),
    };

    private static ConcentrationUnit ParseUnit(string symbol, string text)
    {
        if (!UnitTable.TryParseConcentrationUnit(symbol, out ConcentrationUnit unit))
        {
            throw new FormatException($"'{symbol}' in '{text}' is not a concentration unit; known units: {string.Join(", ", UnitTable.ConcentrationSymbols())}.");
        }

        return unit;
    }

    // +0 and -0 compare equal; make them hash equal too.
    private static double Normalize(double value) => value == 0 ? 0 : value;
}
