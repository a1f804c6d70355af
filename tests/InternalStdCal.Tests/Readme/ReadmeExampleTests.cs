using InternalStdCal.Calibration;
using InternalStdCal.Quantitation;
using InternalStdCal.Samples;
using Xunit;

namespace InternalStdCal.Tests.Readme;

public class ReadmeExampleTests
{
    // Invented demo data (README example): the check is that the example runs and stays within its standards.
    [Fact]
    public void Run_ReadmeExample_QuantifiesWithinRange()
    {
        QuantitationResult result = ReadmeExample.Run();
        Assert.Equal(ExtrapolationStatus.WithinRange, result.Extrapolation);
        Assert.InRange(result.Concentration.Value, 14, 17);
    }
}
