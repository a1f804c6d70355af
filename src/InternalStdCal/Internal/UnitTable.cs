using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Quantities;

namespace InternalStdCal.Internal;

/// <summary>Symbols and power-of-ten exponents of every unit, relative to the base unit of its kind.</summary>
internal static class UnitTable
{
    internal readonly struct Entry
    {
        internal Entry(string symbol, int exponent, ConcentrationKind kind)
        {
            Symbol = symbol;
            Exponent = exponent;
            Kind = kind;
        }

        internal string Symbol { get; }

        internal int Exponent { get; }

        internal ConcentrationKind Kind { get; }
    }

    // Base units: g/L, mol/L and g/kg. Exponent e means 1 unit = 10^e base units.
    private static readonly Entry[] Concentrations =
    {
        new("g/L", 0, ConcentrationKind.MassConcentration),
        new("mg/L", -3, ConcentrationKind.MassConcentration),
        new("µg/L", -6, ConcentrationKind.MassConcentration),
        new("ng/L", -9, ConcentrationKind.MassConcentration),
        new("mol/L", 0, ConcentrationKind.AmountConcentration),
        new("mmol/L", -3, ConcentrationKind.AmountConcentration),
        new("µmol/L", -6, ConcentrationKind.AmountConcentration),
        new("nmol/L", -9, ConcentrationKind.AmountConcentration),
        new("g/kg", 0, ConcentrationKind.MassFraction),
        new("mg/kg", -3, ConcentrationKind.MassFraction),
        new("µg/kg", -6, ConcentrationKind.MassFraction),
        new("ng/kg", -9, ConcentrationKind.MassFraction),
        new("%", 1, ConcentrationKind.MassFraction),
    };

    // Volume base unit L; mass base unit g.
    private static readonly string[] VolumeSymbols = { "L", "mL", "µL" };
    private static readonly int[] VolumeExponents = { 0, -3, -6 };
    private static readonly string[] MassSymbols = { "kg", "g", "mg", "µg" };
    private static readonly int[] MassExponents = { 3, 0, -3, -6 };

    internal static Entry Of(ConcentrationUnit unit) => Concentrations[CheckDefined((int)unit, Concentrations.Length, nameof(unit))];

    internal static string Symbol(VolumeUnit unit) => VolumeSymbols[CheckDefined((int)unit, VolumeSymbols.Length, nameof(unit))];

    internal static int Exponent(VolumeUnit unit) => VolumeExponents[CheckDefined((int)unit, VolumeExponents.Length, nameof(unit))];

    internal static string Symbol(MassUnit unit) => MassSymbols[CheckDefined((int)unit, MassSymbols.Length, nameof(unit))];

    internal static int Exponent(MassUnit unit) => MassExponents[CheckDefined((int)unit, MassExponents.Length, nameof(unit))];

    internal static int CheckDefined(int value, int count, string paramName)
    {
        if (value < 0 || value >= count)
        {
            throw new ArgumentOutOfRangeException(
                paramName,
                value,
                FormattableString.Invariant($"Parameter '{paramName}' was {value}; it must be a defined unit (0 to {count - 1})."));
        }

        return value;
    }

    /// <summary>Unit symbols accepted by the parsers, including ASCII spellings of µ.</summary>
    internal static bool TryParseConcentrationUnit(string symbol, out ConcentrationUnit unit)
    {
        string normalized = NormalizeMicro(symbol);
        for (int i = 0; i < Concentrations.Length; i++)
        {
            if (string.Equals(Concentrations[i].Symbol, normalized, StringComparison.Ordinal))
            {
                unit = (ConcentrationUnit)i;
                return true;
            }
        }

        unit = default;
        return false;
    }

    internal static bool TryParseVolumeUnit(string symbol, out VolumeUnit unit) =>
        TryFind(VolumeSymbols, NormalizeMicro(symbol), out unit);

    internal static bool TryParseMassUnit(string symbol, out MassUnit unit) =>
        TryFind(MassSymbols, NormalizeMicro(symbol), out unit);

    private static bool TryFind<TUnit>(string[] symbols, string symbol, out TUnit unit)
        where TUnit : struct, Enum
    {
        int index = Array.IndexOf(symbols, symbol);
        unit = (TUnit)Enum.ToObject(typeof(TUnit), Math.Max(index, 0));
        return index >= 0;
    }

    // Accepts "u" and the micro sign U+00B5 / Greek mu U+03BC as the micro prefix.
    private static string NormalizeMicro(string symbol)
    {
        if (symbol.Length > 1 && (symbol[0] == 'u' || symbol[0] == '\u03BC'))
        {
            return "µ" + symbol.Substring(1);
        }

        return symbol;
    }

    /// <summary>Splits "number unit" text; the number is parsed with the invariant culture.</summary>
    internal static void SplitValueAndUnit(string text, string paramName, out double value, out string symbol)
    {
        Guard.NotNull(text, paramName);
        string trimmed = text.Trim();
        int space = trimmed.LastIndexOf(' ');
        if (space <= 0)
        {
            throw new FormatException($"'{text}' is not '<number> <unit>' (for example '12.5 mg/L').");
        }

        string number = trimmed.Substring(0, space).Trim();
        symbol = trimmed.Substring(space + 1);
        if (!double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out value)
            || double.IsNaN(value) || double.IsInfinity(value))
        {
            throw new FormatException($"'{number}' in '{text}' is not a finite number in invariant-culture notation.");
        }
    }

    internal static IReadOnlyList<string> ConcentrationSymbols()
    {
        var list = new List<string>(Concentrations.Length);
        foreach (Entry e in Concentrations)
        {
            list.Add(e.Symbol);
        }

        return list;
    }
}
