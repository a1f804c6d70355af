using System;
using MathNet.Numerics;

namespace InternalStdCal.Internal;

/// <summary>Quantiles of the F (Fisher–Snedecor) distribution.</summary>
/// <remarks>
/// The upper tail P(F &gt; f) = I_{d2/(d2 + d1·f)}(d2/2, d1/2) (regularised incomplete beta, MathNet.Numerics)
/// is inverted by safeguarded Newton iteration (MathNet's FisherSnedecor.InvCDF is not used: it fails to
/// converge for F(0.99; 1, 1)). Checked against
/// F(0.99; 1, f) and F(0.99; 9, 9) of the field reference §1.3.
/// </remarks>
internal static class FQuantile
{
    // Quantiles by (p, df1, df2): every calibration of a run asks for the same few values.
    private static readonly QuantileCache Cache = new();

    /// <summary>Quantile F(p; df1, df2) at cumulative probability p, e.g. F(0.99; 9, 9) = 5.35113.</summary>
    /// <exception cref="ArgumentOutOfRangeException">p outside (0, 1) or a df &lt; 1.</exception>
    internal static double Quantile(double p, int numeratorDf, int denominatorDf)
    {
        Guard.InOpenRange(p, 0, 1, nameof(p));
        Guard.AtLeast(numeratorDf, 1, nameof(numeratorDf));
        Guard.AtLeast(denominatorDf, 1, nameof(denominatorDf));
        return Cache.GetOrAdd(p, numeratorDf, denominatorDf, static (q, d1, d2) => Solve(q, d1, d2));
    }

    private static double Solve(double p, int numeratorDf, int denominatorDf)
    {
        // Start from the exact value for one numerator df, F(p; 1, ν) = t((1 + p)/2, ν)², else from 1.
        double guess = 1;
        if (numeratorDf == 1)
        {
            double t = StudentTQuantile.TwoSided(p, denominatorDf);
            guess = t * t;
        }

        return TailInversion.Solve(new Distribution(numeratorDf, denominatorDf), 1 - p, guess);
    }

    /// <summary>Upper-tail probability P(F &gt; f) for f ≥ 0.</summary>
    internal static double UpperTail(double f, int numeratorDf, int denominatorDf) =>
        SpecialFunctions.BetaRegularized(denominatorDf / 2.0, numeratorDf / 2.0, denominatorDf / (denominatorDf + (numeratorDf * f)));

    private readonly struct Distribution : ITailDistribution
    {
        private readonly int _numeratorDf;
        private readonly int _denominatorDf;

        internal Distribution(int numeratorDf, int denominatorDf)
        {
            _numeratorDf = numeratorDf;
            _denominatorDf = denominatorDf;
        }

        public double UpperTail(double v) => FQuantile.UpperTail(v, _numeratorDf, _denominatorDf);

        public double Density(double v) => MathNet.Numerics.Distributions.FisherSnedecor.PDF(_numeratorDf, _denominatorDf, v);
    }
}
