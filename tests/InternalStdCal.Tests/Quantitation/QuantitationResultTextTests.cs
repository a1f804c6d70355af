using System;
using System.Globalization;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Tests.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Quantitation;

/// <summary>
/// The printed result of <see cref="QuantitationResult.ToString"/>, whole, against the result's own numbers:
/// label, value (6 significant digits), s (4), the interval with its level, ν, replicates and mean ratio, the
/// extrapolation flag, the method line and every note. Data: the constructed response-factor standards of
/// field-reference §0; the layout is this library's own (common practice: value, uncertainty, interval, ν).
/// </summary>
public class QuantitationResultTextTests
{
    private static readonly string Nl = Environment.NewLine;

    [Fact]
    public void ToString_TwoInjectionsWithinRange_PrintsEveryPart()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var sample = UnknownSample.Create("U-1", FieldReferenceStandards.Ug(5), new Injection(30000, 48000), new Injection(30300, 48100));

        QuantitationResult r = SampleQuantitation.Quantify(cal, sample);

        Assert.Empty(r.Notes);
        string expected = "U-1: " + r.Concentration.ToString("G6", null)
            + ", s = " + r.StandardError!.Value.ToString("G4", null)
            + ", 95 % CI [" + r.Lower!.Value.ToString("G6", null) + ", " + r.Upper!.Value.ToString("G6", null) + "]"
            + ", ν = 4 (m = 2, mean ratio " + r.MeanResponse.ToString("G6", CultureInfo.InvariantCulture) + ")"
            + Nl + "  method: " + r.Method;
        Assert.Equal(expected, r.ToString());
        Assert.StartsWith("U-1: 3.0", r.ToString(), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.01, " — EXTRAPOLATED below the lowest standard")]
    [InlineData(5.0, " — EXTRAPOLATED above the highest standard")]
    public void ToString_Extrapolated_PrintsFlagMethodAndEveryNote(double ratio, string flag)
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", FieldReferenceStandards.Ug(5), new Injection(ratio * 1000, 1000)));

        Assert.NotEmpty(r.Notes);
        string text = r.ToString();
        string expectedHead = "(m = 1, mean ratio " + r.MeanResponse.ToString("G6", CultureInfo.InvariantCulture) + ")" + flag + Nl + "  method: " + r.Method;
        Assert.Contains(expectedHead, text, StringComparison.Ordinal);
        string tail = string.Concat(System.Linq.Enumerable.Select(r.Notes, n => Nl + "  note: " + n));
        Assert.EndsWith(r.Method + tail, text, StringComparison.Ordinal);
    }

    [Fact]
    public void ToString_ConfidenceLevel99_PrintsTheLevel()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var sample = UnknownSample.Create("U-1", FieldReferenceStandards.Ug(5), new Injection(30000, 48000), new Injection(30300, 48100));

        QuantitationResult r = SampleQuantitation.Quantify(cal, sample, 0.99);

        Assert.Contains(", 99 % CI [", r.ToString(), StringComparison.Ordinal);
    }
}
