using System;

namespace InternalStdCal.Benchmarks;

/// <summary>
/// Invented calibration data from a fixed seed, identical on every runtime: SplitMix64 (Steele, Lea &amp;
/// Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014) instead of System.Random, whose
/// sequence is not specified across .NET versions.
/// </summary>
internal static class FixedSeedData
{
    /// <summary>Seed shared by all groups.</summary>
    internal const ulong Seed = 20261202;

    /// <summary>
    /// n standards of an invented ratio calibration, x = 0.5, 1.0, …, 0.5·n (concentration ratio) and
    /// y = 0.002 + 0.0198·x + c·x² (response ratio) with ±0.5 % relative noise.
    /// </summary>
    internal static (double[] X, double[] Y) Standards(int n, double curvature = 0)
    {
        var state = Seed;
        var x = new double[n];
        var y = new double[n];
        for (int i = 0; i < n; i++)
        {
            x[i] = 0.5 * (i + 1);
            y[i] = (0.002 + (0.0198 * x[i]) + (curvature * x[i] * x[i])) * (1 + (0.01 * (NextUnit(ref state) - 0.5)));
        }

        return (x, y);
    }

    /// <summary>Next value in [0, 1) with 53 random bits.</summary>
    internal static double NextUnit(ref ulong state)
    {
        unchecked
        {
            state += 0x9E3779B97F4A7C15UL;
            ulong z = state;
            z = (z ^ (z >> 30)) * 0xBF58476D1CE4E5B9UL;
            z = (z ^ (z >> 27)) * 0x94D049BB133111EBUL;
            z ^= z >> 31;
            return (z >> 11) * (1.0 / (1UL << 53));
        }
    }
}
