using System;
using System.Globalization;

namespace InternalStdCal.Internal;

/// <summary>Shared printing of "number unit" text.</summary>
internal static class QuantityText
{
    internal static string Format(double value, string symbol, string? format, IFormatProvider? provider) =>
        value.ToString(string.IsNullOrEmpty(format) ? "R" : format, provider ?? CultureInfo.InvariantCulture) + " " + symbol;
}
