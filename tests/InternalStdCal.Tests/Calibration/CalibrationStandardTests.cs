using System;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Calibration;

public class CalibrationStandardTests
{
    [Fact]
    public void Injection_RatioIsAnalyteOverIs()
    {
        // y = A_x/A_is (SW-846 8000C §11.4.3 response form); 10250/50000 = 0.205 (field-reference §0).
        Assert.Equal(0.205, new Injection(10250, 50000).Ratio);
    }

    [Fact]
    public void Injection_NegativeAnalyteSignal_IsAllowed()
    {
        // Blank-corrected signals may be negative (documented on Injection).
        Assert.Equal(-0.01, new Injection(-10, 1000).Ratio);
    }

    [Theory]
    [InlineData(1.0, 0.0, "internalStandardSignal", "was 0; it must be a finite number > 0")]
    [InlineData(1.0, -5.0, "internalStandardSignal", "was -5; it must be a finite number > 0")]
    [InlineData(1.0, double.PositiveInfinity, "internalStandardSignal", "was Infinity; it must be a finite number > 0")]
    [InlineData(double.NaN, 1.0, "analyteSignal", "was NaN; it must be a finite number")]
    [InlineData(1e300, 1e-300, "internalStandardSignal", "is finite")]
    public void Injection_BadSignals_AreRefusedWithNameAndRange(double analyte, double internalStandard, string param, string message)
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => new Injection(analyte, internalStandard));

        Assert.Equal(param, ex.ParamName);
        Assert.Contains(message, ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Injection_Equality_IsExact()
    {
        Assert.Equal(new Injection(1, 2), new Injection(1, 2));
        Assert.NotEqual(new Injection(1, 2), new Injection(1, 2.0000000000000004));
        Assert.Equal(new Injection(0.0, 2).GetHashCode(), new Injection(-0.0, 2).GetHashCode());
    }

    [Fact]
    public void Standard_BadInput_IsRefusedWithNameAndValue()
    {
        Concentration one = Concentration.FromMilligramsPerLitre(1);
        var inj = new Injection(1, 1);

        var e1 = Assert.Throws<ArgumentOutOfRangeException>(() => CalibrationStandard.Create("S", Concentration.FromMilligramsPerLitre(-1), one, inj));
        Assert.Equal("analyteConcentration", e1.ParamName);
        Assert.Contains("of standard 'S' was -1 mg/L; it must be >= 0", e1.Message, StringComparison.Ordinal);
        var e2 = Assert.Throws<ArgumentOutOfRangeException>(() => CalibrationStandard.Create("S", one, Concentration.FromMilligramsPerLitre(0), inj));
        Assert.Equal("internalStandardConcentration", e2.ParamName);
        var e3 = Assert.Throws<ArgumentException>(() => CalibrationStandard.Create("S", one, one));
        Assert.Equal("injections", e3.ParamName);
        var e4 = Assert.Throws<ArgumentException>(() => CalibrationStandard.Create("", one, one, inj));
        Assert.Equal("label", e4.ParamName);
        Assert.Throws<ArgumentNullException>(() => CalibrationStandard.Create(null!, one, one, inj));
        Assert.Throws<ArgumentNullException>(() => CalibrationStandard.Create("S", one, one, inj, null!));
    }

    [Fact]
    public void Standard_Equality_ComparesLabelConcentrationsAndInjections()
    {
        Concentration one = Concentration.FromMilligramsPerLitre(1);
        CalibrationStandard a = CalibrationStandard.Create("S", one, one, new Injection(1, 2));

        Assert.Equal(a, CalibrationStandard.Create("S", one, one, new Injection(1, 2)));
        Assert.NotEqual(a, CalibrationStandard.Create("S", one, one, new Injection(1, 3)));
        Assert.NotEqual(a, CalibrationStandard.Create("T", one, one, new Injection(1, 2)));
        Assert.Equal("S: 1 mg/L analyte, 1 mg/L IS, 1 injection", a.ToString());
    }
}
