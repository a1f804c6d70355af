using System;
using System.Globalization;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The comparison of a GUM coverage interval with a Monte Carlo one (JCGM 101:2008 §8): the GUM uncertainty
/// framework (GUF) is validated when d_low = |y − U_p − y_low| ≤ δ and d_high = |y + U_p − y_high| ≤ δ.
/// </summary>
/// <remarks>Immutable; reference equality. The library computes; which evaluation a report uses is decided by the
/// lab's validated method and QA system.</remarks>
public sealed class GufValidation
{
    internal GufValidation(CoverageInterval gum, CoverageInterval monteCarlo, double tolerance, int digits)
    {
        GumInterval = gum;
        MonteCarloInterval = monteCarlo;
        Tolerance = tolerance;
        SignificantDigits = digits;
    }

    /// <summary>y ± U_p from the GUM evaluation.</summary>
    public CoverageInterval GumInterval { get; }

    /// <summary>The probabilistically symmetric Monte Carlo interval [y_low, y_high].</summary>
    public CoverageInterval MonteCarloInterval { get; }

    /// <summary>d_low = |y − U_p − y_low|, in the output unit.</summary>
    public double LowerDifference => Math.Abs(GumInterval.Lower - MonteCarloInterval.Lower);

    /// <summary>d_high = |y + U_p − y_high|, in the output unit.</summary>
    public double UpperDifference => Math.Abs(GumInterval.Upper - MonteCarloInterval.Upper);

    /// <summary>δ, the numerical tolerance of the Monte Carlo u(y) for <see cref="SignificantDigits"/> digits.</summary>
    public double Tolerance { get; }

    /// <summary>n_dig used for δ.</summary>
    public int SignificantDigits { get; }

    /// <summary>True when both differences are ≤ δ.</summary>
    public bool IsValidated => LowerDifference <= Tolerance && UpperDifference <= Tolerance;

    /// <summary>Prints the verdict with its numbers in the output unit (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        string unit = GumInterval.Unit.Length > 0 ? " " + GumInterval.Unit : string.Empty;
        return (IsValidated ? "GUF validated" : "GUF NOT validated") + " (JCGM 101:2008 §8): d_low = " + G(LowerDifference) + unit
            + ", d_high = " + G(UpperDifference) + unit + ", δ = " + G(Tolerance) + unit + " (" + SignificantDigits.ToString(CultureInfo.InvariantCulture)
            + " significant digits); GUM " + GumInterval + ", Monte Carlo " + MonteCarloInterval;
    }

    private static string G(double x) => x.ToString("G4", CultureInfo.InvariantCulture);
}
