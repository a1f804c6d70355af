using System;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class BalanceTests
{
    // One reading: u² = (L/√3)² + s_r² + (d/(2√3))² (JCGM 100:2008 §4.3.7 and §F.2.2.1).
    private static readonly Balance Analytical = new(Mass.FromMilligrams(0.2), Mass.FromMilligrams(0.05), Mass.FromMilligrams(0.1));

    private static readonly double SingleMilligrams = Math.Sqrt((0.04 / 3) + 0.0025 + (0.01 / 12));

    [Fact]
    public void Weigh_SingleReading()
    {
        Measured<Mass> m = Analytical.Weigh(Mass.FromMilligrams(100.28));
        Assert.Equal(MassUnit.Milligram, m.Value.Unit);
        Assert.Equal(SingleMilligrams, m.StandardUncertainty.Milligrams, 14);
        Assert.Equal(SingleMilligrams, Analytical.SingleReadingStandardUncertainty.Milligrams, 14);
    }

    [Fact]
    public void ToString_NamesFiguresAndSingleReadingUncertaintyWithUnits()
    {
        // u of one reading from the formula above: √(0.04/3 + 0.0025 + 0.01/12) mg = 0.1291 mg (4 significant digits).
        Assert.Equal(
            "Balance: linearity ±0.2 mg, repeatability s_r = 0.05 mg, readability 0.1 mg; one reading u = 0.1291 mg",
            Analytical.ToString());
    }

    [Fact]
    public void WeighByDifference_TwoReadings()
    {
        // Gross and tare are independent readings: every term twice (common practice).
        Measured<Mass> m = Analytical.WeighByDifference(Mass.FromGrams(0.5));
        Assert.Equal(MassUnit.Gram, m.Value.Unit);
        Assert.Equal(Math.Sqrt(2) * SingleMilligrams, m.StandardUncertainty.Milligrams, 13);
    }

    [Fact]
    public void Weigh_ZeroReading_ThrowsNamingReading()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => Analytical.Weigh(Mass.FromGrams(0)));
        Assert.Equal("reading", ex.ParamName);
        Assert.StartsWith("Parameter 'reading' was 0 g; it must be a mass > 0.", ex.Message, StringComparison.Ordinal);
        Assert.Equal("netMass", Assert.Throws<ArgumentOutOfRangeException>(() => Analytical.WeighByDifference(Mass.FromGrams(0))).ParamName);
    }
}
