using System;
using System.Collections.Generic;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Signals of one injection: bad input names the signal; a missing signal reads as null.</summary>
public class InjectionSignalsTests
{
    [Fact]
    public void Constructor_NonFiniteSignal_ThrowsNamingTheSignal()
    {
        ArgumentOutOfRangeException e = Assert.Throws<ArgumentOutOfRangeException>("analytes", () =>
            new InjectionSignals(new Dictionary<string, double> { ["Pb"] = double.NaN }, new Dictionary<string, double>()));
        Assert.Contains("'Pb'", e.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentOutOfRangeException>("signal", () => InjectionSignals.Empty.WithInternalStandard("Bi", double.PositiveInfinity));
        Assert.Throws<ArgumentException>("name", () => InjectionSignals.Empty.WithAnalyte(" ", 1));
    }

    [Fact]
    public void Analyte_MissingSignal_IsNull()
    {
        InjectionSignals s = InjectionSignals.Empty.WithAnalyte("Pb", -3);
        Assert.Equal(-3, s.Analyte("Pb"));
        Assert.Null(s.Analyte("Cd"));
        Assert.Null(s.InternalStandard("Bi"));
        Assert.Equal(s, InjectionSignals.Empty.WithAnalyte("Pb", -3));
    }
}
