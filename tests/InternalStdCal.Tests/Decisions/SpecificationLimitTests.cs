using System;
using InternalStdCal.Decisions;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Decisions;

public class SpecificationLimitTests
{
    [Fact]
    public void Upper_Value_KeepsValueAndDirection()
    {
        var limit = SpecificationLimit.Upper(Concentration.FromMicrogramsPerLitre(10), "maximum permitted value");
        Assert.Equal(LimitDirection.Upper, limit.Direction);
        Assert.Equal(Concentration.FromMicrogramsPerLitre(10), limit.Value);
        Assert.Equal("upper limit 10 µg/L (maximum permitted value)", limit.ToString());
    }

    [Fact]
    public void Equals_SameParts_AreEqualAndDifferentDirectionsAreNot()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(5);
        Assert.Equal(SpecificationLimit.Lower(c), SpecificationLimit.Lower(c));
        Assert.Equal(SpecificationLimit.Lower(c).GetHashCode(), SpecificationLimit.Lower(c).GetHashCode());
        Assert.NotEqual(SpecificationLimit.Lower(c), SpecificationLimit.Upper(c));
        Assert.NotEqual(SpecificationLimit.Lower(c), SpecificationLimit.Lower(c, "minimum"));
    }

    [Fact]
    public void Upper_BlankName_Throws()
    {
        var ex = Assert.Throws<ArgumentException>(() => SpecificationLimit.Upper(Concentration.FromMilligramsPerLitre(5), "  "));
        Assert.Equal("name", ex.ParamName);
        Assert.Throws<ArgumentNullException>(() => SpecificationLimit.Lower(Concentration.FromMilligramsPerLitre(5), null!));
    }
}
