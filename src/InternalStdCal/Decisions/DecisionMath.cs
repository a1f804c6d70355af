using System;
using InternalStdCal.Internal;
using MathNet.Numerics;
using MathNet.Numerics.Distributions;

namespace InternalStdCal.Decisions;

/// <summary>Tail probabilities and quantiles shared by the decision rules and the planner.</summary>
internal static class DecisionMath
{
    /// <summary>⌊ν⌋ for quantiles and probabilities (JCGM 100:2008 G.6.4 truncates ν_eff).</summary>
    internal static int WholeDegreesOfFreedom(double nu, string paramName)
    {
        if (!(nu >= 1) || double.IsInfinity(nu) || nu > int.MaxValue)
        {
            throw Guard.OutOfRange(paramName, nu, "a finite number >= 1");
        }

        return (int)Math.Floor(nu);
    }

    /// <summary>P(X &gt; x) for a standard normal (df null) or Student t (df) variable, without cancellation.</summary>
    internal static double UpperTail(double x, int? df)
    {
        if (df is int nu)
        {
            return x >= 0 ? StudentTQuantile.UpperTail(x, nu) : 1 - StudentTQuantile.UpperTail(-x, nu);
        }

        return 0.5 * SpecialFunctions.Erfc(x / Constants.Sqrt2);
    }

    /// <summary>Quantile at cumulative probability p of a standard normal (df null) or Student t (df) variable.</summary>
    internal static double Quantile(double p, int? df) =>
        df is int nu ? StudentTQuantile.OneSided(p, nu) : Normal.InvCDF(0, 1, p);
}
