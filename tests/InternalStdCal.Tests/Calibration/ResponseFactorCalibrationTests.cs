using System;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class ResponseFactorCalibrationTests
{
    [Fact]
    public void Fit_ConstructedDataSet_ResponseFactorsMatchFieldReference()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        // RF_i = (A_x·C_is)/(A_is·C_x), SW-846 8000C §11.4.3; values computed (field-reference §0).
        double[] expected = { 1.025000, 1.020508, 1.012121, 1.018701, 0.998996 };
        for (int i = 0; i < expected.Length; i++)
        {
            Assert.Equal(expected[i], cal.Standards[i].ResponseFactor!.Value, 6);
            Assert.Equal(expected[i], cal.Standards[i].Injections[0].ResponseFactor!.Value, 6);
        }

        Assert.Equal(RatioModel.AverageResponseFactor, cal.Model);
        Assert.Equal(5, cal.ResponseFactorCount);
    }

    [Fact]
    public void Fit_ConstructedDataSet_MeanSdRsdMatchFieldReference()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        // mean RF = 1.015065, SD = 0.0101048, RSD = 0.99548 %: computed (field-reference §0).
        Assert.Equal(1.015065, cal.MeanResponseFactor, 6);
        Assert.Equal(0.0101048, cal.ResponseFactorStandardDeviation!.Value, 7);
        Assert.Equal(0.99548, cal.ResponseFactorRsdPercent!.Value, 5);
    }

    [Fact]
    public void Fit_ConstructedDataSet_BackCalculatedAndRseMatchFieldReference()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        // Back-calculated with mean RF: computed (field-reference §0).
        double[] back = { 1.00979, 2.01072, 4.98550, 10.0358, 19.6834 };
        for (int i = 0; i < back.Length; i++)
        {
            Concentration b = cal.Standards[i].BackCalculated!.Value;
            Assert.Equal(ConcentrationUnit.MicrogramPerLitre, b.Unit);
            Assert.Equal(back[i], b.Value, back[i] * 5e-6);
        }

        // RSE (p = 1) = 0.99548 % = RSD: US EPA 8000D formula, computed (field-reference §0/§4.1).
        Assert.Equal(1, cal.ParameterCount);
        Assert.Equal(0.99548, cal.RelativeStandardErrorPercent!.Value, 5);
        Assert.Equal(cal.ResponseFactorRsdPercent!.Value, cal.RelativeStandardErrorPercent!.Value, 12);
    }

    [Fact]
    public void Fit_RelativeErrorOfEachStandard_IsBackCalculatedMinusNominalOverNominal()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf());

        // %RE = 100·(x' − x)/x (US EPA 8000D RSE term); first standard: 100·(1.00979 − 1)/1, computed (field-reference §0).
        Assert.Equal(0.979, cal.Standards[0].RelativeErrorPercent!.Value, 3);
        foreach (StandardResult s in cal.Standards)
        {
            double nominal = s.Standard.AnalyteConcentration.Value;
            Assert.Equal(100 * (s.BackCalculated!.Value.Value - nominal) / nominal, s.RelativeErrorPercent!.Value, 10);
        }
    }

    [Fact]
    public void FitSinglePoint_OneStandard_GivesItsResponseFactorAndNoSpread()
    {
        CalibrationStandard s = FieldReferenceStandards.ConstructedRf()[2];

        ResponseFactorCalibration cal = ResponseFactorCalibration.FitSinglePoint(s);

        // RF of the 5-unit standard = 1.012121 (field-reference §0, computed).
        Assert.True(cal.IsSinglePoint);
        Assert.Equal(1.012121, cal.MeanResponseFactor, 6);
        Assert.Null(cal.ResponseFactorStandardDeviation);
        Assert.Null(cal.ResponseFactorRsdPercent);
        Assert.Null(cal.RelativeStandardErrorPercent);
        Assert.Contains(cal.Notes, n => n.Contains("RSE not computed", StringComparison.Ordinal));
    }

    [Fact]
    public void Fit_IncludedBlank_IsRefusedWithReason()
    {
        var standards = FieldReferenceStandards.ConstructedRf().ToList();
        standards.Add(CalibrationStandard.Create("BLANK", FieldReferenceStandards.Ug(0), FieldReferenceStandards.Ug(5), new Injection(12, 50000)));

        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(standards));

        Assert.Equal("standards", ex.ParamName);
        Assert.Contains("'BLANK' is a blank", ex.Message, StringComparison.Ordinal);
        Assert.Contains("BlankHandling.Exclude", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_ExcludedBlank_IsListedAndRecordedButNotAveraged()
    {
        var standards = FieldReferenceStandards.ConstructedRf().ToList();
        standards.Insert(0, CalibrationStandard.Create("BLANK", FieldReferenceStandards.Ug(0), FieldReferenceStandards.Ug(5), new Injection(12, 50000)));

        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(standards, new CalibrationOptions { Blanks = BlankHandling.Exclude });

        // Same mean RF as without the blank (field-reference §0, computed).
        Assert.Equal(1.015065, cal.MeanResponseFactor, 6);
        Assert.False(cal.Standards[0].Included);
        Assert.Null(cal.Standards[0].RelativeErrorPercent);
        Assert.Null(cal.Standards[0].ResponseFactor);
        Assert.Contains(cal.Notes, n => n.Contains("Blank 'BLANK' excluded", StringComparison.Ordinal));
    }

    [Fact]
    public void Fit_LevelMeans_AveragesOneFactorPerLevel()
    {
        // Two injections per level whose ratios average to the §0 ratios: level RFs and mean RF as in §0 (computed).
        var standards = FieldReferenceStandards.ConstructedRf().Select(s => CalibrationStandard.Create(
            s.Label,
            s.AnalyteConcentration,
            s.InternalStandardConcentration,
            new Injection(s.Injections[0].AnalyteSignal * 0.99, s.Injections[0].InternalStandardSignal),
            new Injection(s.Injections[0].AnalyteSignal * 1.01, s.Injections[0].InternalStandardSignal))).ToList();

        ResponseFactorCalibration levels = ResponseFactorCalibration.Fit(standards, new CalibrationOptions { Replicates = ReplicateHandling.LevelMeans });
        ResponseFactorCalibration every = ResponseFactorCalibration.Fit(standards);

        Assert.Equal(5, levels.ResponseFactorCount);
        Assert.Equal(10, every.ResponseFactorCount);
        Assert.Equal(1.015065, levels.MeanResponseFactor, 6);
        Assert.Equal(1.015065, every.MeanResponseFactor, 6);
        Assert.NotNull(levels.Standards[0].StandardizedResidual);
        Assert.Null(levels.Standards[0].Injections[0].StandardizedResidual);
        Assert.NotNull(every.Standards[0].Injections[0].StandardizedResidual);
    }

    [Fact]
    public void Summary_ListsModelRfStatisticsAndUnits()
    {
        string text = ResponseFactorCalibration.Fit(FieldReferenceStandards.ConstructedRf()).Summary();

        Assert.Contains("average response factor", text, StringComparison.Ordinal);
        Assert.Contains("mean = 1.01507", text, StringComparison.Ordinal);
        Assert.Contains("RSD = 0.995 %", text, StringComparison.Ordinal);
        Assert.Contains("µg/L", text, StringComparison.Ordinal);
        Assert.Contains("CAL-5", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_NegativeMeanResponseFactor_IsRefused()
    {
        var standards = new[]
        {
            CalibrationStandard.Create("N1", FieldReferenceStandards.Ug(1), FieldReferenceStandards.Ug(5), new Injection(-100, 50000)),
            CalibrationStandard.Create("N2", FieldReferenceStandards.Ug(2), FieldReferenceStandards.Ug(5), new Injection(-150, 50000)),
        };

        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(standards));

        Assert.Contains("the mean response factor is -0.00875; it must be > 0", ex.Message, StringComparison.Ordinal);
    }
}
