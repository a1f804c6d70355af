using System.Globalization;

namespace InternalStdCal.Calibration;

/// <summary>Number formatting for reports (invariant culture).</summary>
internal static class Text
{
    internal static string G(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    internal static string Signal(double value) => value.ToString("G10", CultureInfo.InvariantCulture);

    internal static string F(double value, int decimals) => value.ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    internal static string Signed(double value, int decimals) => (value >= 0 ? "+" : string.Empty) + F(value, decimals);

    internal static string I(int value) => value.ToString(CultureInfo.InvariantCulture);

    internal static string Pad(string text, int width) => text.Length >= width ? text + " " : text.PadRight(width);
}
