using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class RatioCalibrationTests
{
    [Fact]
    public void Fit_MixedUnitsOfOneKind_AreConvertedToTheFirstStandardsUnit()
    {
        List<CalibrationStandard> standards = FieldReferenceStandards.ConstructedRf().ToList();
        CalibrationStandard s = standards[4];
        standards[4] = new CalibrationStandard(s.Label, Concentration.FromMilligramsPerLitre(0.020), Concentration.FromMilligramsPerLitre(0.005), s.Injections);

        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(standards);

        // 0.020 mg/L = 20 µg/L: same mean RF as field-reference §0 (computed 1.015065).
        Assert.Equal(ConcentrationUnit.MicrogramPerLitre, cal.Unit);
        Assert.Equal(1.015065, cal.MeanResponseFactor, 6);
        Assert.Equal(20, cal.HighestX, 12);
    }

    [Fact]
    public void Fit_RequestedUnit_ReportsEverythingInIt()
    {
        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(
            FieldReferenceStandards.ConstructedRf(),
            new CalibrationOptions { Unit = ConcentrationUnit.NanogramPerLitre });

        // Back-calculated 1.00979 µg/L = 1009.79 ng/L (field-reference §0, computed).
        Assert.Equal(ConcentrationUnit.NanogramPerLitre, cal.Standards[0].BackCalculated!.Value.Unit);
        Assert.Equal(1009.79, cal.Standards[0].BackCalculated!.Value.Value, 2);
    }

    [Fact]
    public void Fit_KindMismatch_IsRefused()
    {
        List<CalibrationStandard> standards = FieldReferenceStandards.ConstructedRf().ToList();
        standards[1] = CalibrationStandard.Create("MOLAR", Concentration.FromMicromolesPerLitre(2), FieldReferenceStandards.Ug(5), new Injection(1, 1));

        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(standards));

        Assert.Equal("standards", ex.ParamName);
        Assert.Contains("analyte concentration of standard 'MOLAR' is 2 µmol/L (AmountConcentration)", ex.Message, StringComparison.Ordinal);
        Assert.Contains("must be of one kind", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_RequestedUnitOfAnotherKind_IsRefused()
    {
        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(
            FieldReferenceStandards.ConstructedRf(),
            new CalibrationOptions { Unit = ConcentrationUnit.MilligramPerKilogram }));

        Assert.Contains("mg/kg is a MassFraction", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_VaryingIsOnConcentrationAxis_IsRefusedWithAdvice()
    {
        List<CalibrationStandard> standards = FieldReferenceStandards.ConstructedRf().ToList();
        CalibrationStandard s = standards[2];
        standards[2] = new CalibrationStandard(s.Label, s.AnalyteConcentration, FieldReferenceStandards.Ug(6), s.Injections);

        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(standards));

        Assert.Contains("'CAL-3' has IS concentration 6 µg/L but 'CAL-1' has 5 µg/L", ex.Message, StringComparison.Ordinal);
        Assert.Contains("CalibrationAxis.ConcentrationRatio", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_VaryingIsOnRatioAxis_UsesConcentrationRatios()
    {
        // Doubling C_is and A_is of one standard leaves RF = (A_x·C_is)/(A_is·C_x) unchanged (SW-846 8000C §11.4.3).
        List<CalibrationStandard> standards = FieldReferenceStandards.ConstructedRf().ToList();
        CalibrationStandard s = standards[2];
        standards[2] = CalibrationStandard.Create(s.Label, s.AnalyteConcentration, FieldReferenceStandards.Ug(10), new Injection(s.Injections[0].AnalyteSignal, 2 * s.Injections[0].InternalStandardSignal));

        ResponseFactorCalibration cal = ResponseFactorCalibration.Fit(standards, new CalibrationOptions { Axis = CalibrationAxis.ConcentrationRatio });

        Assert.Equal(1.015065, cal.MeanResponseFactor, 6);
        Assert.Equal(0.5, cal.Standards[2].X);
        Assert.Equal("1", cal.AxisUnitSymbol);
        Assert.Null(cal.InternalStandardConcentration);
    }

    [Fact]
    public void Fit_DuplicateLabelsNullsAndEmpty_AreRefused()
    {
        List<CalibrationStandard> standards = FieldReferenceStandards.ConstructedRf().ToList();
        standards.Add(standards[0]);

        var dup = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(standards));
        Assert.Contains("two standards labelled 'CAL-1'", dup.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentNullException>(() => ResponseFactorCalibration.Fit(null!));
        Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(Array.Empty<CalibrationStandard>()));
        Assert.Throws<ArgumentNullException>(() => ResponseFactorCalibration.Fit(new CalibrationStandard[] { null! }));
    }

    [Fact]
    public void Fit_OnlyBlanksExcluded_IsRefused()
    {
        var blank = CalibrationStandard.Create("B", FieldReferenceStandards.Ug(0), FieldReferenceStandards.Ug(5), new Injection(1, 100));

        var ex = Assert.Throws<ArgumentException>(() => ResponseFactorCalibration.Fit(new[] { blank }, new CalibrationOptions { Blanks = BlankHandling.Exclude }));

        Assert.Contains("only blanks", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Options_BadValues_AreRefusedWithNameAndRange()
    {
        var e1 = Assert.Throws<ArgumentOutOfRangeException>(() => new CalibrationOptions { ConfidenceLevel = 0 });
        Assert.Equal("ConfidenceLevel", e1.ParamName);
        Assert.Contains("was 0; it must be a number in the open interval (0, 1)", e1.Message, StringComparison.Ordinal);
        var e2 = Assert.Throws<ArgumentOutOfRangeException>(() => new CalibrationOptions { SignificanceLevel = 0.7 });
        Assert.Contains("(0, 0.5)", e2.Message, StringComparison.Ordinal);
        var e3 = Assert.Throws<ArgumentOutOfRangeException>(() => new CalibrationOptions { Axis = (CalibrationAxis)7 });
        Assert.Contains("was 7; it must be one of AnalyteConcentration, ConcentrationRatio", e3.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>(() => new CalibrationOptions { Unit = (ConcentrationUnit)99 });
    }
}
