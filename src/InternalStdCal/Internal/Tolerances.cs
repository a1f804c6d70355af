using System;
using InternalStdCal.Quantities;

namespace InternalStdCal.Internal;

/// <summary>Divisors that turn a ± tolerance into a standard uncertainty.</summary>
internal static class Tolerances
{
    internal static readonly double RootThree = Math.Sqrt(3);
    private static readonly double RootSix = Math.Sqrt(6);

    /// <summary>√3 for rectangular (JCGM 100:2008 §4.3.7), √6 for triangular (§4.3.9).</summary>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="distribution"/> is not defined.</exception>
    internal static (double Divisor, UncertaintyEvaluation Evaluation) Divisor(ToleranceDistribution distribution, string paramName) => distribution switch
    {
        ToleranceDistribution.Rectangular => (RootThree, UncertaintyEvaluation.TypeBRectangular),
        ToleranceDistribution.Triangular => (RootSix, UncertaintyEvaluation.TypeBTriangular),
        _ => throw new ArgumentOutOfRangeException(paramName, distribution, $"Parameter '{paramName}' was {distribution}; it must be Rectangular or Triangular."),
    };
}
