using System;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class UncertaintyContributionTests
{
    private static UncertaintyContribution ZeroMeasuredRow() =>
        SampleResult.Liquid(
            Measured.WithStandardUncertainty(Concentration.FromMilligramsPerLitre(0), Concentration.FromMilligramsPerLitre(0.5)),
            Array.Empty<DilutionStep>()).Budget.Contributions[0];

    [Fact]
    public void RelativeStandardUncertainty_ZeroInput_ThrowsNamingComponent()
    {
        var ex = Assert.Throws<InvalidOperationException>(() => ZeroMeasuredRow().RelativeStandardUncertainty);
        Assert.Equal("The input 'measured concentration' is zero; its relative uncertainty is undefined.", ex.Message);
    }

    [Fact]
    public void ContributionToRelativeVariance_ZeroResult_ThrowsPointingToAbsoluteContribution()
    {
        UncertaintyContribution row = ZeroMeasuredRow();
        var ex = Assert.Throws<InvalidOperationException>(() => row.ContributionToRelativeVariance);
        Assert.Equal("The result is zero; relative variance contributions are undefined (use ContributionToStandardUncertainty).", ex.Message);
        Assert.Equal(0.5, row.ContributionToStandardUncertainty);
    }
}
