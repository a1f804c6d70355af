using System;

namespace InternalStdCal.Tests.TestSupport;

/// <summary>
/// Log relative error, ≈ number of correct significant digits (McCullough 1998; NIST StRD README):
/// −log10(|q − c|/|c|), or −log10|q − c| when c = 0; capped at 15, the digits NIST certifies.
/// </summary>
internal static class Lre
{
    internal const double Cap = 15;

    internal static double Of(double computed, double certified)
    {
        double error = Math.Abs(computed - certified);
        if (error == 0)
        {
            return Cap;
        }

        double lre = certified == 0 ? -Math.Log10(error) : -Math.Log10(error / Math.Abs(certified));
        return Math.Min(Cap, lre);
    }
}
