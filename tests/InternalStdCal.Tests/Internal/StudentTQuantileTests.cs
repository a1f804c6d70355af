using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Tests.TestSupport;
using Xunit;
using Xunit.Abstractions;

namespace InternalStdCal.Tests.Internal;

public class StudentTQuantileTests
{
    private readonly ITestOutputHelper _output;

    public StudentTQuantileTests(ITestOutputHelper output) => _output = output;

    // Computed (field-reference §6, t table; agrees with the 40 CFR Part 136 App. B MDL t table).
    // Columns: df, t(0.975), t(0.995), t(0.95), t(0.99).
    public static TheoryData<int, string, string, string, string> Table => new()
    {
        { 1, "12.7062047", "63.6567412", "6.31375151", "31.8205160" },
        { 2, "4.30265273", "9.92484320", "2.91998558", "6.96455673" },
        { 3, "3.18244631", "5.84090931", "2.35336343", "4.54070286" },
        { 4, "2.77644511", "4.60409487", "2.13184679", "3.74694739" },
        { 5, "2.57058184", "4.03214298", "2.01504837", "3.36493000" },
        { 6, "2.44691185", "3.70742802", "1.94318028", "3.14266840" },
        { 7, "2.36462425", "3.49948330", "1.89457861", "2.99795157" },
        { 8, "2.30600414", "3.35538733", "1.85954804", "2.89645945" },
        { 9, "2.26215716", "3.24983554", "1.83311293", "2.82143793" },
        { 10, "2.22813885", "3.16927267", "1.81246112", "2.76376946" },
        { 11, "2.20098516", "3.10580652", "1.79588482", "2.71807918" },
        { 12, "2.17881283", "3.05453959", "1.78228756", "2.68099799" },
        { 13, "2.16036866", "3.01227584", "1.77093340", "2.65030884" },
        { 14, "2.14478669", "2.97684273", "1.76131014", "2.62449407" },
        { 15, "2.13144955", "2.94671288", "1.75305036", "2.60248030" },
        { 16, "2.11990530", "2.92078162", "1.74588368", "2.58348719" },
        { 17, "2.10981558", "2.89823052", "1.73960673", "2.56693398" },
        { 18, "2.10092204", "2.87844047", "1.73406361", "2.55237963" },
        { 19, "2.09302405", "2.86093461", "1.72913281", "2.53948319" },
        { 20, "2.08596345", "2.84533971", "1.72471824", "2.52797700" },
        { 25, "2.05953855", "2.78743581", "1.70814076", "2.48510718" },
        { 30, "2.04227246", "2.74999565", "1.69726089", "2.45726154" },
        { 60, "2.00029782", "2.66028303", "1.67064886", "2.39011947" },
        { 120, "1.97993041", "2.61742115", "1.65765090", "2.35782461" },
    };

    [Theory]
    [MemberData(nameof(Table))]
    public void TwoSidedAndOneSided_TableDegreesOfFreedom_MatchPrintedDigits(int df, string t975, string t995, string t95, string t99)
    {
        Printed.Equal(t975, StudentTQuantile.TwoSided(0.95, df));
        Printed.Equal(t995, StudentTQuantile.TwoSided(0.99, df));
        Printed.Equal(t95, StudentTQuantile.OneSided(0.95, df));
        Printed.Equal(t99, StudentTQuantile.OneSided(0.99, df));
    }

    // Closed forms (field-reference §6): ν = 1: tan(π(p − ½)); ν = 2: (2p − 1)/√(2p(1 − p)).
    [Theory]
    [InlineData(0.6)]
    [InlineData(0.95)]
    [InlineData(0.975)]
    [InlineData(0.999)]
    public void OneSided_OneAndTwoDegreesOfFreedom_MatchClosedForms(double p)
    {
        Assert.Equal(Math.Tan(Math.PI * (p - 0.5)), StudentTQuantile.OneSided(p, 1), 1e-12 * Math.Tan(Math.PI * (p - 0.5)));
        double t2 = ((2 * p) - 1) / Math.Sqrt(2 * p * (1 - p));
        Assert.Equal(t2, StudentTQuantile.OneSided(p, 2), 1e-13 * t2);
    }

    // Reference: MathNet.Numerics StudentT.CDF (regularised incomplete beta) as an independent inverse check.
    [Theory]
    [InlineData(3, 0.9)]
    [InlineData(4, 0.975)]
    [InlineData(7, 0.995)]
    [InlineData(13, 0.9995)]
    [InlineData(40, 0.975)]
    [InlineData(250, 0.99)]
    [InlineData(10000, 0.975)]
    [InlineData(5, 0.3)]
    public void OneSided_AnyDegreesOfFreedom_InvertsMathNetCdf(int df, double p)
    {
        double t = StudentTQuantile.OneSided(p, df);
        double back = MathNet.Numerics.Distributions.StudentT.CDF(0, 1, df, t);
        double mathNet = MathNet.Numerics.Distributions.StudentT.InvCDF(0, 1, df, p);
        _output.WriteLine(string.Format(CultureInfo.InvariantCulture, "df {0} p {1}: t {2:R}, MathNet InvCDF {3:R} (rel. diff {4:E1})", df, p, t, mathNet, Math.Abs(mathNet - t) / Math.Abs(t)));
        Assert.Equal(p, back, 1e-13);
    }

    [Fact]
    public void OneSided_LargeDegreesOfFreedom_ApproachesNormalQuantile()
    {
        // Normal quantile z(0.975) = 1.95996398 (field-reference §6, ∞ row); t − z ≈ z(1 + z²)/(4ν).
        double z = MathNet.Numerics.Distributions.Normal.InvCDF(0, 1, 0.975);
        double t = StudentTQuantile.OneSided(0.975, 1_000_000);
        Assert.InRange(t - z, 0, 1e-5);
        Printed.Equal("1.95996398", z);
    }

    [Fact]
    public void OneSided_Median_IsZeroAndSymmetric()
    {
        Assert.Equal(0.0, StudentTQuantile.OneSided(0.5, 7));
        Assert.Equal(-StudentTQuantile.OneSided(0.95, 7), StudentTQuantile.OneSided(0.05, 7), 1e-13);
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(1.0)]
    [InlineData(double.NaN)]
    public void TwoSided_ConfidenceOutsideOpenUnitInterval_ThrowsNamingParameter(double confidence)
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => StudentTQuantile.TwoSided(confidence, 5));
        Assert.Equal("confidence", e.ParamName);
        Assert.Contains("(0, 1)", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void OneSided_ZeroDegreesOfFreedom_ThrowsNamingParameter()
    {
        var e = Assert.Throws<ArgumentOutOfRangeException>(() => StudentTQuantile.OneSided(0.95, 0));
        Assert.Equal("df", e.ParamName);
        Assert.Contains(">= 1", e.Message, StringComparison.Ordinal);
    }
}
