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
            Assert.Equal(r.ReportedText ?? string.Empty, csv.GetString(16));
            Assert.Equal(r.ReportedStatus?.ToString() ?? string.Empty, csv.GetString(17));
            Same(r.ReportingLimit, csv.GetString(18), csv.GetString(19));
        }

        Assert.Equal(results.Results.Count, row);
    }

    [Fact]
    public void Write_ReportingLimits_CensoredRowsCarryStatusLimitAndText()
    {
        RunResults results = RunResults.From(RunResultsJsonTests.ProcessDemo());
        var text = new StringWriter();

        RunResultsCsv.Write(results, text);
        using CsvDataReader csv = CsvDataReader.Create(new StringReader(text.ToString()), new CsvDataReaderOptions { Delimiter = ',' });

        int censored = 0;
        while (csv.Read())
        {
            if (csv.GetString(csv.GetOrdinal("reported-status")) is "NotDetected" or "BelowQuantificationLimit")
            {
                censored++;
                Assert.StartsWith("< ", csv.GetString(csv.GetOrdinal("reported")), System.StringComparison.Ordinal);
                Assert.NotEqual(string.Empty, csv.GetString(csv.GetOrdinal("reporting-limit")));
                Assert.Equal("µg/L", csv.GetString(csv.GetOrdinal("reporting-limit-unit")));
            }
        }

        Assert.Equal(results.Results.Count(r => r.ReportingLimit is not null), censored);
        Assert.True(censored > 0);
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
