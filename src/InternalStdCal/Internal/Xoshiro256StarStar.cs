namespace InternalStdCal.Internal;

/// <summary>
/// The xoshiro256** pseudo-random generator (Blackman &amp; Vigna, "Scrambled linear pseudorandom number generators",
/// ACM TOMS 47 (2021); period 2²⁵⁶ − 1), seeded by expanding a 64-bit seed with SplitMix64 as its authors
/// recommend. Integer arithmetic only, so a seed gives the same stream on every platform and target framework.
/// A mutable value type: pass it by reference.
/// </summary>
internal struct Xoshiro256StarStar
{
    private const double TwoToMinus53 = 1.0 / 9007199254740992.0;
    private ulong s0;
    private ulong s1;
    private ulong s2;
    private ulong s3;

    internal Xoshiro256StarStar(ulong seed)
    {
        ulong x = seed;
        s0 = SplitMix64(ref x);
        s1 = SplitMix64(ref x);
        s2 = SplitMix64(ref x);
        s3 = SplitMix64(ref x);
    }

    /// <summary>A generator in a given state (not all zero), for checking against published output.</summary>
    internal static Xoshiro256StarStar FromState(ulong a, ulong b, ulong c, ulong d) =>
        new() { s0 = a, s1 = b, s2 = c, s3 = d };

    /// <summary>The next 64 random bits.</summary>
    internal ulong NextUInt64()
    {
        ulong result = RotateLeft(s1 * 5, 7) * 9;
        ulong t = s1 << 17;
        s2 ^= s0;
        s3 ^= s1;
        s1 ^= s2;
        s0 ^= s3;
        s2 ^= t;
        s3 = RotateLeft(s3, 45);
        return result;
    }

    /// <summary>A uniform double on the open interval (0, 1): (k + ½)·2⁻⁵³ for a random 53-bit k (never 0 or 1).</summary>
    internal double NextOpenUnit() => ((NextUInt64() >> 11) + 0.5) * TwoToMinus53;

    /// <summary>SplitMix64 step (Steele, Lea &amp; Flood, OOPSLA 2014), used only for seeding.</summary>
    internal static ulong SplitMix64(ref ulong state)
    {
        state += 0x9E3779B97F4A7C15UL;
        ulong z = state;
        z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
        z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
        return z ^ (z >> 31);
    }

    private static ulong RotateLeft(ulong x, int k) => (x << k) | (x >> (64 - k));
}
