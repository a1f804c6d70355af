using System;
using System.Text;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class ResultTextTests
{
    [Fact]
    public void Format_ZeroValueWithUncertainty_HasNoRelativePart()
    {
        // Computed: u = 0.5 → three significant digits of u → 3 decimals; a zero value has no relative uncertainty.
        Measured<Concentration> m = Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0), Concentration.FromMilligramsPerLitre(0.5));
        Assert.Equal("0.000 mg/L, u = 0.500 mg/L", ResultText.Format(m));
    }

    [Fact]
    public void Format_ExactValue_PrintsRoundTripDigits()
    {
        // 0.1 + 0.2 is 0.30000000000000004 in binary64 (IEEE 754); the shortest round-trip text keeps all 17 digits.
        Measured<Concentration> m = Measured.Exact(Concentration.FromMilligramsPerLitre(0.1 + 0.2));
        Assert.Equal("0.30000000000000004 mg/L, u = 0 mg/L", ResultText.Format(m));
    }

    [Fact]
    public void AppendTable_ThreeColumnsOfDifferentWidths_PadsAlignsAndRules()
    {
        // Computed: widths 5, 8, 4; two spaces between columns; the header is never right-aligned; the rule is
        // 5 + 8 + 4 + 2·2 = 21 characters; trailing blanks are trimmed.
        var text = new StringBuilder();
        ResultText.AppendTable(
            text,
            new[] { new[] { "A", "Value", "Note" }, new[] { "alpha", "1", "x" }, new[] { "b", "12345678", "yy" } },
            new[] { false, true, false });
        string nl = Environment.NewLine;
        Assert.Equal(
            "A      Value     Note" + nl +
            "---------------------" + nl +
            "alpha         1  x" + nl +
            "b      12345678  yy" + nl,
            text.ToString());
    }
}
