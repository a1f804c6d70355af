using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>Readable text for preparation results (invariant culture).</summary>
internal static class ResultText
{
    /// <summary>"1002.700 mg/L, u = 0.864 mg/L (0.0861 %)": u to three significant digits and the value to the same
    /// decimal place; round-trip digits when u is zero.</summary>
    internal static string Format(Measured<Concentration> m)
    {
        double value = m.Value.Value;
        double u = m.StandardUncertainty.Value;
        string symbol = Concentration.SymbolOf(m.Value.Unit);
        if (u == 0)
        {
            return FormattableString.Invariant($"{value.ToString("R", CultureInfo.InvariantCulture)} {symbol}, u = 0 {symbol}");
        }

        int decimals = Math.Min(15, Math.Max(0, 2 - (int)Math.Floor(Math.Log10(u))));
        string format = "F" + decimals.ToString(CultureInfo.InvariantCulture);
        string relative = value != 0
            ? " (" + (100 * u / Math.Abs(value)).ToString("G3", CultureInfo.InvariantCulture) + " %)"
            : string.Empty;
        return $"{value.ToString(format, CultureInfo.InvariantCulture)} {symbol}, u = {u.ToString(format, CultureInfo.InvariantCulture)} {symbol}{relative}";
    }

    /// <summary>Appends rows as aligned columns separated by two spaces, with a rule under the header row.</summary>
    internal static void AppendTable(StringBuilder text, IReadOnlyList<string[]> rows, IReadOnlyList<bool> rightAligned)
    {
        int columns = rows[0].Length;
        var widths = new int[columns];
        foreach (string[] row in rows)
        {
            for (int c = 0; c < columns; c++)
            {
                widths[c] = Math.Max(widths[c], row[c].Length);
            }
        }

        for (int r = 0; r < rows.Count; r++)
        {
            var line = new StringBuilder();
            for (int c = 0; c < columns; c++)
            {
                string cell = rows[r][c];
                line.Append(rightAligned[c] && r > 0 ? cell.PadLeft(widths[c]) : cell.PadRight(widths[c]));
                if (c < columns - 1)
                {
                    line.Append("  ");
                }
            }

            text.AppendLine(line.ToString().TrimEnd());
            if (r == 0)
            {
                int total = 2 * (columns - 1);
                foreach (int w in widths)
                {
                    total += w;
                }

                text.AppendLine(new string('-', total));
            }
        }
    }
}
