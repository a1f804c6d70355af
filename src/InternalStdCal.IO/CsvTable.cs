using System.Collections.Generic;
using System.Data;
using System.IO;
using Sylvan.Data.Csv;

namespace InternalStdCal.IO;

/// <summary>Writes rows of text cells through the CSV library (comma-separated, quoted where needed, "\n" line ends).</summary>
internal static class CsvTable
{
    internal static void Write(TextWriter writer, IReadOnlyList<string> header, IEnumerable<string?[]> rows)
    {
        using var table = new DataTable { Locale = System.Globalization.CultureInfo.InvariantCulture };
        foreach (string h in header)
        {
            table.Columns.Add(new DataColumn { DataType = typeof(string), AllowDBNull = true, ColumnName = h });
        }

        foreach (string?[] r in rows)
        {
            DataRow row = table.NewRow();
            for (int i = 0; i < r.Length; i++)
            {
                row[i] = string.IsNullOrEmpty(r[i]) ? System.DBNull.Value : r[i];
            }

            table.Rows.Add(row);
        }

        using var text = new StringWriter(System.Globalization.CultureInfo.InvariantCulture);
        using (DataTableReader reader = table.CreateDataReader())
        using (CsvDataWriter csv = CsvDataWriter.Create(text, new CsvDataWriterOptions { Delimiter = ',', NewLine = "\n" }))
        {
            csv.Write(reader);
        }

        writer.Write(text.ToString());
    }
}
