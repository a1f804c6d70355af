using System.Linq;
using FsCheck;
using FsCheck.Fluent;

namespace InternalStdCal.Tests.Limits;

/// <summary>Invented data for property tests: small integer samples (exact in binary64) and affine maps a + b·x, b &gt; 0.</summary>
internal static class OutlierGenerators
{
    /// <summary>Between <paramref name="min"/> and <paramref name="max"/> integers in [−1000, 1000], not all equal.</summary>
    internal static Gen<double[]> Sample(int min, int max) =>
        from n in Gen.Choose(min, max)
        from x in Gen.ArrayOf(Gen.Choose(-1000, 1000), n)
        where x.Distinct().Count() > 1
        select x.Select(v => (double)v).ToArray();

    /// <summary>Offsets a and scales b &gt; 0 that keep integer data exact: a integer, b = k/8.</summary>
    internal static readonly Gen<(double A, double B)> ExactAffine =
        from a in Gen.Choose(-100_000, 100_000)
        from k in Gen.Choose(1, 800)
        select ((double)a, k / 8.0);

    /// <summary>Decimal offsets and scales (a + b·x rounds), for tests with a tolerance.</summary>
    internal static readonly Gen<(double A, double B)> DecimalAffine =
        from a in Gen.Choose(-1_000_000, 1_000_000)
        from b in Gen.Choose(1, 100_000)
        select (a / 1000.0, b / 997.0);
}
