using System;
using System.Linq;
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

    [Fact]
    public void Quantify_OlsLine_MatchesFieldReferenceUnknown()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.ConstructedRf(), CalibrationModel.Linear);

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U-1", FieldReferenceStandards.Ug(5), new Injection(30000, 48000)));

        // Unknown A_x = 30000, A_is = 48000 → 3.059656 with the OLS ratio line (computed, field-reference §0).
        Assert.Equal(3.059656, r.Concentration.Value, 6);
        Assert.Equal(RatioModel.Linear, r.Model);
        Assert.Equal(3, r.DegreesOfFreedom);
    }

    [Theory]
    [InlineData(2.9, 1, 0.7160037, 0.26457, 0.680098)]
    [InlineData(13.5, 1, 6.2072155, 0.239754, 0.616308)]
    [InlineData(23.0, 1, 11.128585, 0.263193, 0.676560)]
    [InlineData(2.9, 3, 0.7160037, 0.19099, null)]
    [InlineData(13.5, 4, 6.2072155, 0.140613, null)]
    public void Quantify_FluorescenceLine_MatchesFieldReferenceInversePrediction(double y0, int m, double x0, double sx0, double? halfWidth)
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);
        Injection[] injections = Enumerable.Repeat(new Injection(y0, 1), m).ToArray();

        QuantitationResult r = SampleQuantitation.Quantify(cal, new UnknownSample("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), injections));

        // x0 = (ȳ0 − a)/b, s_x0 = (s/b)·sqrt(1/m + 1/n + (ȳ0 − ȳ)²/(b²Sxx)) (VERIFIED formula; values computed, field-reference §1.2).
        Assert.Equal(x0, r.Concentration.Value, 6);
        Assert.Equal(ConcentrationUnit.NanogramPerLitre, r.Concentration.Unit);
        Assert.Equal(sx0, r.StandardError!.Value.Value, 5);
        if (halfWidth is double h)
        {
            Assert.Equal(h, (r.Upper!.Value.Value - r.Lower!.Value.Value) / 2, 5);
        }

        Assert.Equal(x0 < 2 ? ExtrapolationStatus.BelowLowestStandard : ExtrapolationStatus.WithinRange, r.Extrapolation);
    }

    [Theory]
    [InlineData(2.9, 0.018992, 1.381573)]
    [InlineData(13.5, 5.590608, 6.825056)]
    [InlineData(23.0, 10.46611, 11.82158)]
    public void Quantify_FiellerOption_MatchesFieldReferenceLimits(double y0, double lower, double upper)
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        QuantitationResult r = SampleQuantitation.Quantify(
            cal, UnknownSample.Create("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), new Injection(y0, 1)), 0.95, InverseIntervalMethod.Fieller);

        // Fieller limits, m = 1: computed (field-reference §1.1/§1.2; Fieller formula FROM MEMORY).
        Assert.Equal(lower, r.Lower!.Value.Value, 5);
        Assert.Equal(upper, r.Upper!.Value.Value, 5);
        Assert.Contains("Fieller interval", r.Method, StringComparison.Ordinal);
    }

    [Fact]
    public void Quantify_InverseVarianceWeighting_InterpolatesTheUnknownsWeightAsTheFieldReference()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(
            FieldReferenceStandards.Absorbance(), CalibrationModel.Linear, Weighting.InverseVariance(FieldReferenceStandards.AbsorbanceSds));

        QuantitationResult low = SampleQuantitation.Quantify(cal, UnknownSample.Create("U1", FieldReferenceStandards.Ug(1), new Injection(0.100, 1)));
        QuantitationResult high = SampleQuantitation.Quantify(cal, UnknownSample.Create("U2", FieldReferenceStandards.Ug(1), new Injection(0.600, 1)));

        // w0 from linear interpolation of s_i at x0: x0 = 6.16297, s_x0,w = 0.22795, ±0.63288 and
        // x0 = 40.0567, s_x0,w = 1.3486, ±3.7443 (computed, field-reference §2.2).
        Assert.Equal(6.16297, low.Concentration.Value, 5);
        Assert.Equal(0.22795, low.StandardError!.Value.Value, 5);
        Assert.Equal(0.63288, (low.Upper!.Value.Value - low.Lower!.Value.Value) / 2, 5);
        Assert.Equal(40.0567, high.Concentration.Value, 4);
        Assert.Equal(1.3486, high.StandardError!.Value.Value, 4);
        Assert.Equal(3.7443, (high.Upper!.Value.Value - high.Lower!.Value.Value) / 2, 4);
        Assert.Contains(low.Notes, n => n.Contains("interpolated linearly (in s)", StringComparison.Ordinal));
    }

    [Theory]
    [InlineData(2.9, 0.62239001, 0.790674)]
    [InlineData(13.5, 6.3224043, 0.678085)]
    [InlineData(23.0, 11.059062, 0.659966)]
    public void Quantify_FluorescenceQuadratic_MatchesIso84662CheckValues(double y0, double x0, double halfWidth)
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);

        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), new Injection(y0, 1)));

        // ISO 8466-2 closed form (FROM MEMORY), values computed (field-reference §1.4), N̂ = 1.
        Assert.Equal(x0, r.Concentration.Value, 6);
        Assert.Equal(halfWidth, (r.Upper!.Value.Value - r.Lower!.Value.Value) / 2, 5);
    }

    [Fact]
    public void Quantify_OneInjectionBeyondTheParabola_IsNotedAndLeftOutOfThePerInjectionList()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);

        // Minimum of the fitted parabola y ≈ −53.7 (field-reference §1.4): the mean ratio −25 is read off, the
        // second injection's −100 is not.
        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), new Injection(50, 1), new Injection(-100, 1)));

        Assert.Single(r.InjectionConcentrations);
        Assert.Null(r.InjectionStandardDeviation);
        Assert.Contains("Injection #2 (ratio -100) cannot be read off the calibration function; left out of the per-injection list.", r.Notes);
    }

    [Fact]
    public void Quantify_QuadraticNeverReachingTheResponse_IsRefusedNamingTheSample()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);

        // The fitted parabola (c > 0, field-reference §1.4) has its minimum at x ≈ −63, y ≈ −53.7: −100 is never reached.
        var ex = Assert.Throws<ArgumentException>(() => SampleQuantitation.Quantify(cal, UnknownSample.Create("LOWEST", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), new Injection(-100, 1))));

        Assert.Equal("sample", ex.ParamName);
        Assert.Contains("mean ratio of 'LOWEST' cannot be read off", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Estimate_QuadraticNeverReachingTheResponse_ThrowsWhatQuantifyThrows()
    {
        // The batch path (used by run processing) must refuse the same mean ratio with the same message.
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Quadratic);
        Concentration cIs = Concentration.From(1, ConcentrationUnit.NanogramPerLitre);
        var quantify = Assert.Throws<ArgumentException>(() => SampleQuantitation.Quantify(cal, UnknownSample.Create("LOWEST", cIs, new Injection(-100, 1))));

        var estimate = Assert.Throws<ArgumentException>(() => SampleQuantitation.Estimate(cal, "LOWEST", cIs, -100, 1, 0.95, InverseIntervalMethod.Symmetric));

        Assert.Equal("sample", estimate.ParamName);
        Assert.Equal(quantify.Message, estimate.Message);
        Assert.IsType<ArgumentOutOfRangeException>(estimate.InnerException);
    }

    [Fact]
    public void Quantify_BetweenBlankAndLowestStandard_IsFlaggedBelowLowestStandard()
    {
        RegressionCalibration cal = RegressionCalibration.Fit(FieldReferenceStandards.Fluorescence(), CalibrationModel.Linear);

        // x0 = 0.716 pg/mL (field-reference §1.2) lies above the blank (0) but below the lowest non-blank standard (2).
        QuantitationResult r = SampleQuantitation.Quantify(cal, UnknownSample.Create("U", Concentration.From(1, ConcentrationUnit.NanogramPerLitre), new Injection(2.9, 1)));

        Assert.Equal(ExtrapolationStatus.BelowLowestStandard, r.Extrapolation);
        Assert.Equal(0, cal.Standards[0].X);
        Assert.Equal(2, cal.LowestX);
    }
}
