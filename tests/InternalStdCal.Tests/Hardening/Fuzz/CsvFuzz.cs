using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text;

namespace InternalStdCal.Tests.Hardening.Fuzz;

/// <summary>
/// A valid invented CSV run file, one text per row, and row mutations for the reader fuzz tests. Rows carry no
/// parent, so a row stands or falls on its own; each row knows the values it should read back as.
/// </summary>
internal sealed class CsvFuzz
{
    internal const string Header = "order,role,id,parent,time,dilution,analyte:Cd,analyte:Pb,is:Rh [10 µg/L],nominal:Cd [µg/L],nominal:Pb";

    private static readonly string[] Roles = { "cal", "cal-blank", "qc", "sample", "method-blank" };

    private CsvFuzz(Row[] rows) => Rows = rows;

    internal Row[] Rows { get; }

    /// <summary>Random valid rows: unique orders and ids, roles without parents.</summary>
    internal static CsvFuzz Generate(Random rnd)
    {
        int count = rnd.Next(1, 12);
        var rows = new Row[count];
        for (int i = 0; i < count; i++)
        {
            string role = Roles[rnd.Next(Roles.Length)];
            int order = 10 * i + rnd.Next(1, 10);
            string id = "R" + i.ToString(CultureInfo.InvariantCulture) + (char)('a' + rnd.Next(26));
            double? cd = rnd.Next(5) == 0 ? null : Math.Round(rnd.NextDouble() * 1e5, rnd.Next(0, 4));
            double pb = rnd.Next(1, 1_000_000);
            double rh = Math.Round(5e4 + rnd.NextDouble() * 1e4, 2);
            bool nominal = role is "cal" or "qc";
            bool prep = role is "sample" or "method-blank" && rnd.Next(2) == 0;
            string[] cells =
            {
                order.ToString(CultureInfo.InvariantCulture),
                role,
                id,
                string.Empty,
                rnd.Next(2) == 0 ? string.Empty : "2026-05-0" + rnd.Next(1, 9).ToString(CultureInfo.InvariantCulture) + "T10:00:00+01:00",
                prep ? "1 mL into " + rnd.Next(2, 100).ToString(CultureInfo.InvariantCulture) + " mL" : string.Empty,
                cd?.ToString("R", CultureInfo.InvariantCulture) ?? string.Empty,
                pb.ToString("R", CultureInfo.InvariantCulture),
                rh.ToString("R", CultureInfo.InvariantCulture),
                nominal ? (rnd.Next(1, 50) / 2.0).ToString("R", CultureInfo.InvariantCulture) : string.Empty,
                nominal ? rnd.Next(1, 9).ToString(CultureInfo.InvariantCulture) + " µg/L" : string.Empty,
            };
            rows[i] = new Row(order, id, cd, pb, rh, string.Join(",", cells), rnd.Next(3) == 0 ? "\r\n" : "\n");
        }

        return new CsvFuzz(rows);
    }

    /// <summary>The file text and the 1-based physical line each row starts on.</summary>
    internal (string Text, int[] Lines) Text(Dictionary<int, string> replaced, bool comment)
    {
        var text = new StringBuilder(comment ? "# invented fuzz run\n" : string.Empty);
        text.Append(Header).Append('\n');
        int line = comment ? 3 : 2;
        var lines = new int[Rows.Length];
        for (int i = 0; i < Rows.Length; i++)
        {
            string row = replaced.TryGetValue(i, out string? r) ? r : Rows[i].Text;
            lines[i] = line;
            text.Append(row).Append(Rows[i].Ending);
            line += 1 + row.Count(ch => ch == '\n');
        }

        return (text.ToString(), lines);
    }

    /// <summary>A mutated copy of a row's text; the row keeps its place (no bare line break is added).</summary>
    internal static string Mutate(Random rnd, string row, int kind)
    {
        string[] f = row.Split(',');
        switch (kind)
        {
            case 0: // truncated line
                return row.Substring(0, rnd.Next(row.Length));
            case 1: // wrong separator
                return row.Replace(',', rnd.Next(2) == 0 ? ';' : '\t');
            case 2: // quoted id with embedded separator, doubled quote and line break (valid RFC 4180)
                f[2] = "\"" + f[2] + ", \"\"x\"\"" + (rnd.Next(2) == 0 ? "\n" : "\r\n") + "y\"";
                return string.Join(",", f);
            case 3: // huge or non-finite numbers in a numeric cell
                string[] bad = { "1e400", "-1e400", "123456789012345678901234567890", "NaN", "Infinity", "-Infinity", "∞", "1e-400", "0x10", "1,5" };
                int[] numeric = { 0, 6, 7, 8, 9 };
                f[numeric[rnd.Next(numeric.Length)]] = bad[rnd.Next(bad.Length)];
                return string.Join(",", f);
            case 4: // missing column
                int drop = rnd.Next(f.Length);
                return string.Join(",", f.Where((_, i) => i != drop));
            case 5: // extra column
                return row + ",extra";
            case 6: // a stray quote: at the start of a field or inside one
                int at = rnd.Next(f.Length);
                f[at] = rnd.Next(2) == 0 ? "\"" + f[at] : f[at] + "\"x";
                return string.Join(",", f);
            default: // random character flips (no line breaks)
                char[] chars = row.ToCharArray();
                const string Pool = "0123456789.,-+eE;\t \"#µ\u00ff\ufffd\u0000aZ:[]";
                for (int n = rnd.Next(1, 4); n > 0 && chars.Length > 0; n--)
                {
                    chars[rnd.Next(chars.Length)] = Pool[rnd.Next(Pool.Length)];
                }

                return new string(chars);
        }
    }

    internal sealed record Row(int Order, string Id, double? Cd, double Pb, double Rh, string Text, string Ending);
}
