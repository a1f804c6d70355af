using System;
using System.Runtime.CompilerServices;

namespace InternalStdCal.Internal;

/// <summary>
/// Logarithm, exponential and the standard normal quantile from +, −, ×, ÷ and √ only (all correctly rounded
/// under IEEE 754), so results are bit-for-bit identical on every runtime; System.Math.Log/Exp call the platform's
/// C library, which may differ in the last bit. Accuracy a few ulp; used by the Monte Carlo samplers.
/// </summary>
internal static class PortableMath
{
    private const double Ln2Hi = 6.93147180369123816490e-01; // high 32 bits of ln 2 (fdlibm split)
    private const double Ln2Lo = 1.90821492927058770002e-10;
    private const double InvLn2 = 1.44269504088896338700e+00;
    private static readonly double Sqrt2 = Math.Sqrt(2);

    /// <summary>ln x for finite x &gt; 0 (normal or subnormal).</summary>
    internal static double Log(double x)
    {
        // x = m·2^e with m in [√½, √2); ln m = 2·atanh(s), s = (m − 1)/(m + 1), |s| ≤ 0.1716.
        int e = 0;
        if (x < 2.2250738585072014e-308)
        {
            x *= 18014398509481984.0; // 2^54: make subnormals normal
            e = -54;
        }

        long bits = BitConverter.DoubleToInt64Bits(x);
        e += (int)((bits >> 52) & 0x7FF) - 1023;
        double m = BitConverter.Int64BitsToDouble((bits & 0x000FFFFFFFFFFFFFL) | 0x3FF0000000000000L);
        if (m > Sqrt2)
        {
            m *= 0.5;
            e++;
        }

        double s = (m - 1) / (m + 1);
        double s2 = s * s;

        // 2·atanh(s) = 2s·Σ s^(2k)/(2k+1); terms to k = 11 reach 0.1716^24/25 < 1e-19.
        double p = 1.0 / 23;
        p = (p * s2) + (1.0 / 21);
        p = (p * s2) + (1.0 / 19);
        p = (p * s2) + (1.0 / 17);
        p = (p * s2) + (1.0 / 15);
        p = (p * s2) + (1.0 / 13);
        p = (p * s2) + (1.0 / 11);
        p = (p * s2) + (1.0 / 9);
        p = (p * s2) + (1.0 / 7);
        p = (p * s2) + (1.0 / 5);
        p = (p * s2) + (1.0 / 3);
        double lnM = (2 * s) + (2 * s * s2 * p);
        return (e * Ln2Hi) + ((e * Ln2Lo) + lnM);
    }

    /// <summary>eˣ for finite x with |x| ≤ 700.</summary>
    internal static double Exp(double x)
    {
        // x = k·ln 2 + r, |r| ≤ ½ ln 2; e^r by its Taylor series to r¹³/13! (next term &lt; 5e-18).
        double kd = Math.Floor((x * InvLn2) + 0.5);
        double r = (x - (kd * Ln2Hi)) - (kd * Ln2Lo);
        double h = Poly7(r, 1.0 / 720, 1.0 / 5040, 1.0 / 40320, 1.0 / 362880, 1.0 / 3628800, 1.0 / 39916800, 1.0 / 479001600, 1.0 / 6227020800);
        double er = 1 + (r * (1 + (r * (0.5 + (r * ((1.0 / 6) + (r * ((1.0 / 24) + (r * ((1.0 / 120) + (r * h)))))))))));
        int k = (int)kd;
        return er * BitConverter.Int64BitsToDouble((long)(k + 1023) << 52);
    }

    /// <summary>
    /// Standard normal quantile Φ⁻¹(p) for p in (0, 1): Wichura's algorithm AS 241 (PPND16, Applied Statistics 37
    /// (1988) 477–484), about 1e-16 relative, with the portable logarithm.
    /// </summary>
    internal static double NormalQuantile(double p)
    {
        double q = p - 0.5;
        if (Math.Abs(q) <= 0.425)
        {
            double r = 0.180625 - (q * q);
            return q * Poly7(r, 3.3871328727963666080e0, 1.3314166789178437745e2, 1.9715909503065514427e3, 1.3731693765509461125e4, 4.5921953931549871457e4, 6.7265770927008700853e4, 3.3430575583588128105e4, 2.5090809287301226727e3)
                / Poly7(r, 1.0, 4.2313330701600911252e1, 6.8718700749205790830e2, 5.3941960214247511077e3, 2.1213794301586595867e4, 3.9307895800092710610e4, 2.8729085735721942674e4, 5.2264952788528545610e3);
        }

        double t = Math.Sqrt(-Log(q < 0 ? p : 1 - p));
        double value;
        if (t <= 5)
        {
            t -= 1.6;
            value = Poly7(t, 1.42343711074968357734e0, 4.63033784615654529590e0, 5.76949722146069140550e0, 3.64784832476320460504e0, 1.27045825245236838258e0, 2.41780725177450611770e-1, 2.27238449892691845833e-2, 7.74545014278341407640e-4)
                / Poly7(t, 1.0, 2.05319162663775882187e0, 1.67638483018380384940e0, 6.89767334985100004550e-1, 1.48103976427480074590e-1, 1.51986665636164571966e-2, 5.47593808499534494600e-4, 1.05075007164441684324e-9);
        }
        else
        {
            t -= 5;
            value = Poly7(t, 6.65790464350110377720e0, 5.46378491116411436990e0, 1.78482653991729133580e0, 2.96560571828504891230e-1, 2.65321895265761230930e-2, 1.24266094738807843860e-3, 2.71155556874348757815e-5, 2.01033439929228813265e-7)
                / Poly7(t, 1.0, 5.99832206555887937690e-1, 1.36929880922735805310e-1, 1.48753612908506148525e-2, 7.86869131145613259100e-4, 1.84631831751005468180e-5, 1.42151175831644588870e-7, 2.04426310338993978564e-15);
        }

        return q < 0 ? -value : value;
    }

    /// <summary>c₀ + c₁x + … + c₇x⁷ by Horner's rule (inlined so the constants fold).</summary>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private static double Poly7(double x, double c0, double c1, double c2, double c3, double c4, double c5, double c6, double c7) =>
        c0 + (x * (c1 + (x * (c2 + (x * (c3 + (x * (c4 + (x * (c5 + (x * (c6 + (x * c7)))))))))))));
}
