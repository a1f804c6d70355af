using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Quantitation;

public class UnknownSampleTests
{
    [Fact]
    public void ToString_NamesLabelInjectionsMeanRatioAndIsWithUnit()
    {
        // Mean ratio (1000/50000 + 1100/50000)/2 = 0.021, arithmetic.
        var sample = UnknownSample.Create("S-1", Concentration.FromMicrogramsPerLitre(10), new Injection(1_000, 50_000), new Injection(1_100, 50_000));
        Assert.Equal("S-1: 2 injections, mean ratio 0.021, IS 10 µg/L", sample.ToString());
    }

    [Fact]
    public void ToString_OneInjection_Singular()
    {
        var sample = UnknownSample.Create("S-2", Concentration.FromMicrogramsPerLitre(5), new Injection(250, 1_000));
        Assert.Equal("S-2: 1 injection, mean ratio 0.25, IS 5 µg/L", sample.ToString());
    }
}
