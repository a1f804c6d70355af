using System;
using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using InternalStdCal.Tests.Calibration;
using Xunit;

namespace InternalStdCal.Tests.Quantitation;

public class SampleQuantitationTests
{
    [Fact]
    public void Quantify_MeanRfModel_MatchesFieldReferenceUnknown()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var sample = UnknownSample.Create("U-1", FieldReferenceStandards.Ug(5), new Injection(30000, 48000));

        QuantitationResult r = SampleQuantitation.Quantify(cal, sample);

        // C_x = A_x·C_is/(A_is·mean RF) = 3.07862 (SW-846 8000C §11.4.3; computed, field-reference §0).
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, r.Concentration.Unit);
        Assert.Equal(3.07862, r.Concentration.Value, 5);
        Assert.Equal(ExtrapolationStatus.WithinRange, r.Extrapolation);
        Assert.Equal(RatioModel.AverageResponseFactor, r.Model);
    }

    [Fact]
    public void Quantify_MeanRfModel_SpreadFollowsTheDocumentedRelativeModel()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var sample = UnknownSample.Create("U-1", FieldReferenceStandards.Ug(5), new Injection(30000, 48000), new Injection(30300, 48100));

        QuantitationResult r = SampleQuantitation.Quantify(cal, sample);

        // s = C·RSD·sqrt(1/m + 1/n), ν = n − 1 (ResponseFactorCalibration remarks; common practice);
        // t(0.975, 4) = 2.77644511 (field-reference §6, computed).
        double c = r.Concentration.Value;
        double s = c * cal.ResponseFactorRsdPercent!.Value / 100 * Math.Sqrt((1.0 / 2) + (1.0 / 5));
        Assert.Equal(s, r.StandardError!.Value.Value, 12);
        Assert.Equal(4, r.DegreesOfFreedom);
        Assert.Equal(c - (2.77644511 * s), r.Lower!.Value.Value, 7);
        Assert.Equal(c + (2.77644511 * s), r.Upper!.Value.Value, 7);
        Assert.Equal(2, r.InjectionConcentrations.Count);
        Assert.NotNull(r.InjectionStandardDeviation);
        Assert.NotNull(r.AsMeasured());
    }

    [Fact]
    public void Quantify_SinglePoint_HasNoIntervalAndSaysWhy()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.FitSinglePoint(FieldReferenceStandards.ConstructedRf()[2]);

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", FieldReferenceStandards.Ug(5), new Injection(50100, 49500)));

        // The standard's own signals read back its nominal 5 µg/L exactly (RF definition, SW-846 8000C §11.4.3).
        Assert.Equal(5, r.Concentration.Value, 12);
        Assert.Null(r.StandardError);
        Assert.Null(r.Lower);
        Assert.Null(r.AsMeasured());
        Assert.Contains(r.Notes, n => n.Contains("no standard error", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(0.01, ExtrapolationStatus.BelowLowestStandard)]
    [InlineData(5.0, ExtrapolationStatus.AboveHighestStandard)]
    public void Quantify_OutsideStandards_IsFlaggedNeverSilent(double ratio, ExtrapolationStatus expected)
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", FieldReferenceStandards.Ug(5), new Injection(ratio * 1000, 1000)));

        // Range of the standards 1–20 µg/L (field-reference §0): ratio 0.01 → ~0.05 µg/L, ratio 5 → ~24.6 µg/L.
        Assert.Equal(expected, r.Extrapolation);
        Assert.True(r.IsExtrapolated);
        Assert.Contains("EXTRAPOLATED", r.ToString(), StringComparison.Ordinal);
        Assert.Contains(r.Notes, n => n.Contains("outside the calibrated range", StringComparison.Ordinal));
    }

    [Fact]
    public void Quantify_SampleWithDifferentIsConcentration_ScalesAndNotes()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", FieldReferenceStandards.Ug(10), new Injection(30000, 48000)));

        // C_x = A_x·C_is/(A_is·mean RF) with C_is = 10: twice 3.07862 (SW-846 8000C §11.4.3; field-reference §0).
        Assert.Equal(2 * 3.07862, r.Concentration.Value, 4);
        Assert.Contains(r.Notes, n => n.Contains("differs from the calibration's", StringComparison.Ordinal));
    }

    [Fact]
    public void Quantify_IsInAnotherUnitOfTheSameKind_IsConverted()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", Concentration.FromMilligramsPerLitre(0.005), new Injection(30000, 48000)));

        // 0.005 mg/L = 5 µg/L, so the §0 unknown: 3.07862 µg/L (computed, field-reference §0).
        Assert.Equal(3.07862, r.Concentration.Value, 5);
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, r.Concentration.Unit);
    }

    [Fact]
    public void Quantify_IsOfAnotherKind_IsRefused()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());
        var sample = UnknownSample.Create("U-9", Concentration.FromMicromolesPerLitre(5), new Injection(30000, 48000));

        var ex = Assert.Throws<ArgumentException>(() => SampleQuantitation.Quantify(cal, sample));

        Assert.Equal("sample", ex.ParamName);
        Assert.Contains("'U-9' is 5 µmol/L (AmountConcentration)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Quantify_BadConfidenceLevel_IsRefused()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => SampleQuantitation.Quantify(cal, UnknownSample.Create("U", FieldReferenceStandards.Ug(5), new Injection(1, 1)), 1.0));

        Assert.Equal("confidenceLevel", ex.ParamName);
        Assert.Contains("was 1; it must be a number in the open interval (0, 1)", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void UnknownSample_BadInput_IsRefused()
    {
        var e1 = Assert.Throws<ArgumentOutOfRangeException>(() => UnknownSample.Create("U", FieldReferenceStandards.Ug(0), new Injection(1, 1)));
        Assert.Contains("was 0 µg/L; it must be > 0", e1.Message, StringComparison.Ordinal);
        var e2 = Assert.Throws<ArgumentException>(() => UnknownSample.Create("U", FieldReferenceStandards.Ug(1)));
        Assert.Equal("injections", e2.ParamName);
        Assert.Throws<ArgumentNullException>(() => UnknownSample.Create("U", FieldReferenceStandards.Ug(1), new Injection[] { null! }));
        Assert.Equal(2.5, UnknownSample.Create("U", FieldReferenceStandards.Ug(1), new Injection(2, 1), new Injection(3, 1)).MeanResponse);
    }
}
