using System.Globalization;
using System.IO;
using System.Linq;
using InternalStdCal.IO;
using InternalStdCal.Quantities;
using Sylvan.Data.Csv;
using Xunit;

namespace InternalStdCal.Tests.IO;

// The check is the read-back of what was written (invented demo run), through the CSV library itself.
public class RunResultsCsvTests
{
    [Fact]
    public void Write_ProcessedRun_EveryResultReadsBackExactly()
    {
        RunResults results = RunResults.From(RunResultsJsonTests.ProcessDemo());
        var text = new StringWriter();

        RunResultsCsv.Write(results, text);
        using CsvDataReader csv = CsvDataReader.Create(new StringReader(text.ToString()), new CsvDataReaderOptions { Delimiter = ',' });

        Assert.Equal(RunResultsCsv.Columns, Enumerable.Range(0, csv.FieldCount).Select(csv.GetName));
        int row = 0;
        while (csv.Read())
        {
            SampleAnalyteResult r = results.Results[row++];
            Assert.Equal(r.SampleId, csv.GetString(0));
            Assert.Equal(r.Analyte, csv.GetString(2));
            Assert.Equal(string.Join(" ", r.InjectionOrders), csv.GetString(3));
            Same(r.Measured, csv.GetString(4), csv.GetString(7));
            Same(r.MeasuredUpper, csv.GetString(6), csv.GetString(7));
            Same(r.InSample, csv.GetString(8), csv.GetString(12));
            Same(r.SampleLower, csv.GetString(10), csv.GetString(12));
            Assert.Equal(r.Qualifiers.ToString(), csv.GetString(14));
            Assert.Equal(string.Join(" | ", r.Notes), csv.GetString(15));
        }

        Assert.Equal(results.Results.Count, row);
    }

    private static void Same(Concentration? expected, string number, string unit)
    {
        if (expected is null)
        {
            Assert.Equal(string.Empty, number);
            return;
        }

        Concentration back = Concentration.Parse(number + " " + unit);
        Assert.Equal(expected.Value.Unit, back.Unit);
        Assert.Equal(expected.Value.Value, back.Value);
    }
}
