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

    // Equality by direction, value and name (documented on SpecificationLimit); printed form without a name.
    [Fact]
    public void Equals_EachComponent_Matters()
    {
        Concentration c = Concentration.FromMilligramsPerLitre(5);
        Assert.Equal("lower limit 5 mg/L", SpecificationLimit.Lower(c).ToString());
        Assert.Equal("upper limit 5 mg/L", SpecificationLimit.Upper(c).ToString());
        Assert.False(SpecificationLimit.Upper(c).Equals(SpecificationLimit.Upper(Concentration.FromMilligramsPerLitre(6))));
        Assert.False(SpecificationLimit.Upper(c, "a").Equals(SpecificationLimit.Upper(c, "b")));
        Assert.True(SpecificationLimit.Upper(c, "a").Equals((object)SpecificationLimit.Upper(c, "a")));
        Assert.Equal(SpecificationLimit.Upper(c, "a").GetHashCode(), SpecificationLimit.Upper(c, "a").GetHashCode());
        Assert.False(SpecificationLimit.Upper(c).Equals((SpecificationLimit?)null));
        Assert.False(SpecificationLimit.Upper(c).Equals((object)c));
    }
}
