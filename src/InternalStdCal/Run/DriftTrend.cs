using System;
using System.Collections.Generic;
using System.Text;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// Linear trend of a series across injection order (e.g. an internal-standard signal or a QC recovery in %):
/// the ordinary least-squares slope with its confidence interval, the slope in % of the series mean, the drift
/// over the whole run, and a flag set by a caller's <see cref="DriftRule"/>.
/// </summary>
/// <remarks>
/// <para><b>Formulas.</b> OLS line y = a + b·x with x the injection position (field reference §1.1:
/// b = Sxy/Sxx, s_b = s_y/x/√Sxx, interval b ± t((1 + P)/2, n − 2)·s_b), fitted by <see cref="RegressionFit"/>
/// (reproduces the NIST StRD Norris certified slope). Relative slope = 100·b/ȳ (% of the series mean per unit
/// of x); drift over the run = b·(x_max − x_min), also as 100·b·(x_max − x_min)/ȳ. The relative intervals scale
/// the slope interval by the same factors, treating ȳ as a fixed normaliser.</para>
/// <para>The series is assumed to come from one solution type (e.g. every injection's IS signal, or the
/// recoveries of one check standard), so that a trend reflects the instrument rather than the samples.</para>
/// <para>Caution: the library computes; the lab's validated method, its QA system, local regulations and licensed
/// practice decide.</para>
/// <para>Immutable. No member returns NaN or infinity.</para>
/// </remarks>
public sealed class DriftTrend
{
    // A change over the run below this fraction of max|y| is arithmetic noise (constant data give slopes ~1e-28).
    private const double RoundingLevel = 1e-12;

    private DriftTrend(double[] positions, double[] values, RegressionFit fit, DriftRule rule)
    {
        Positions = Array.AsReadOnly(positions);
        Values = Array.AsReadOnly(values);
        Rule = rule;
        Count = values.Length;
        DegreesOfFreedom = fit.DegreesOfFreedom;
        Mean = fit.WeightedMeanY;
        Intercept = fit.Intercept;
        Slope = fit.Slope;
        SlopeStandardError = fit.StandardErrors[1];
        SlopeInterval = fit.CoefficientInterval(1, rule.ConfidenceLevel);
        Span = fit.MaxX - fit.MinX;
        double percentPerUnit = 100 / Mean;
        RelativeSlopePercent = Slope * percentPerUnit;
        RelativeSlopeInterval = new ConfidenceInterval(SlopeInterval.Lower * percentPerUnit, SlopeInterval.Upper * percentPerUnit, rule.ConfidenceLevel);
        DriftOverRun = Slope * Span;
        DriftOverRunPercent = RelativeSlopePercent * Span;
        DriftOverRunPercentInterval = new ConfidenceInterval(RelativeSlopeInterval.Lower * Span, RelativeSlopeInterval.Upper * Span, rule.ConfidenceLevel);
        double maxAbs = 0;
        foreach (double v in values)
        {
            maxAbs = Math.Max(maxAbs, Math.Abs(v));
        }

        IsSlopeSignificant = !SlopeInterval.Contains(0) && Math.Abs(DriftOverRun) > RoundingLevel * maxAbs;
        IsFlagged = rule.Flags(DriftOverRunPercent, IsSlopeSignificant);
    }

    /// <summary>Injection positions x (order number or time, any consistent unit).</summary>
    public IReadOnlyList<double> Positions { get; }

    /// <summary>Series values y (the series' own unit: counts, %, ...).</summary>
    public IReadOnlyList<double> Values { get; }

    /// <summary>The rule applied.</summary>
    public DriftRule Rule { get; }

    /// <summary>Number of points n (≥ 3).</summary>
    public int Count { get; }

    /// <summary>Degrees of freedom of the slope interval, n − 2.</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>Mean of the series ȳ (&gt; 0; series unit).</summary>
    public double Mean { get; }

    /// <summary>Intercept a of the line (series unit; the fitted value at x = 0).</summary>
    public double Intercept { get; }

    /// <summary>Slope b (series unit per unit of x).</summary>
    public double Slope { get; }

    /// <summary>Standard error of the slope, s_y/x/√Sxx (0 when the points lie exactly on a line).</summary>
    public double SlopeStandardError { get; }

    /// <summary>Confidence interval of the slope, b ± t((1 + P)/2, n − 2)·s_b, at the rule's confidence level.</summary>
    public ConfidenceInterval SlopeInterval { get; }

    /// <summary>Slope in % of the series mean per unit of x, 100·b/ȳ.</summary>
    public double RelativeSlopePercent { get; }

    /// <summary>Interval of <see cref="RelativeSlopePercent"/>: the slope interval times 100/ȳ.</summary>
    public ConfidenceInterval RelativeSlopeInterval { get; }

    /// <summary>Span of the run x_max − x_min (unit of x).</summary>
    public double Span { get; }

    /// <summary>Change of the fitted line over the run, b·(x_max − x_min) (series unit).</summary>
    public double DriftOverRun { get; }

    /// <summary>Change of the fitted line over the run in % of the series mean, 100·b·(x_max − x_min)/ȳ.</summary>
    public double DriftOverRunPercent { get; }

    /// <summary>Interval of <see cref="DriftOverRunPercent"/>: the slope interval times 100·(x_max − x_min)/ȳ.</summary>
    public ConfidenceInterval DriftOverRunPercentInterval { get; }

    /// <summary>
    /// True when the slope interval excludes 0 and the change over the run, |b|·(x_max − x_min), exceeds 1e-12·max|y|
    /// (below that the slope is arithmetic rounding, e.g. for a constant series, and its interval is meaningless).
    /// </summary>
    public bool IsSlopeSignificant { get; }

    /// <summary>True when <see cref="Rule"/> flags the trend as drift.</summary>
    public bool IsFlagged { get; }

    /// <summary>Fits the trend of a series taken at injection positions 1, 2, …, n.</summary>
    /// <param name="values">Series in injection order; at least 3 finite values with a mean &gt; 0.</param>
    /// <param name="rule">When to flag.</param>
    /// <returns>The trend.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 3 values, a value not finite (the message names the index), or
    /// a mean ≤ 0 (the percentages need a positive mean).</exception>
    /// <exception cref="InvalidOperationException">The slope interval overflows (absurd magnitudes).</exception>
    public static DriftTrend Fit(IReadOnlyList<double> values, DriftRule rule)
    {
        Guard.NotNull(values, nameof(values));
        var positions = new double[values.Count];
        for (int i = 0; i < positions.Length; i++)
        {
            positions[i] = i + 1;
        }

        return Fit(positions, values, rule);
    }

    /// <summary>Fits the trend of a series taken at the given injection positions (order numbers or times).</summary>
    /// <param name="positions">Injection positions x; finite, at least 2 distinct values, same count as
    /// <paramref name="values"/>; any order.</param>
    /// <param name="values">Series values; at least 3, finite, with a mean &gt; 0.</param>
    /// <param name="rule">When to flag.</param>
    /// <returns>The trend.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 3 values, counts differ, a value or position not finite (the
    /// message names the index), fewer than 2 distinct positions, positions numerically degenerate, or a mean ≤ 0.</exception>
    /// <exception cref="InvalidOperationException">The slope interval overflows (absurd magnitudes).</exception>
    public static DriftTrend Fit(IReadOnlyList<double> positions, IReadOnlyList<double> values, DriftRule rule)
    {
        Guard.NotNull(rule, nameof(rule));
        double[] y = CopyFinite(values, nameof(values));
        double[] x = CopyFinite(positions, nameof(positions));
        if (y.Length < 3)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(values)}' has {y.Length} values; a trend with a slope interval needs at least 3 (n − 2 ≥ 1 degrees of freedom)."),
                nameof(values));
        }

        Guard.SameLength(y.Length, x.Length, nameof(values), nameof(positions));
        if (Array.TrueForAll(x, p => p == x[0]))
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(positions)}' holds only the value {Guard.Format(x[0])}; a slope needs at least 2 distinct positions."),
                nameof(positions));
        }

        var sum = default(CompensatedSum);
        foreach (double v in y)
        {
            sum.Add(v);
        }

        double mean = sum.Value / y.Length;
        if (!(mean > 0))
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(values)}' has mean {Guard.Format(mean)}; it must be > 0 so that the drift can be expressed in % of the mean."),
                nameof(values));
        }

        RegressionFit fit;
        try
        {
            fit = RegressionFit.Fit(x, y, CalibrationModel.Linear);
        }
        catch (ArgumentException e) when (e.ParamName == "x")
        {
            throw new ArgumentException(e.Message, nameof(positions), e);
        }

        return new DriftTrend(x, y, fit, rule);
    }

    /// <summary>Readable summary: slope with interval, relative slope, drift over the run and the verdict with its rule.</summary>
    /// <returns>Multi-line text (invariant culture).</returns>
    public override string ToString()
    {
        string level = Text.F(100 * Rule.ConfidenceLevel, 0) + " %";
        var sb = new StringBuilder();
        sb.Append("Drift over ").Append(Text.I(Count)).Append(" injections (span ").Append(Text.G(Span)).Append(", mean ").Append(Text.G(Mean)).AppendLine("):");
        sb.Append("  slope = ").Append(Text.G(Slope)).Append(" per unit of x (SE ").Append(Text.G(SlopeStandardError)).Append(", ").Append(level)
            .Append(" CI [").Append(Text.G(SlopeInterval.Lower)).Append(", ").Append(Text.G(SlopeInterval.Upper)).Append("], ")
            .Append(Text.I(DegreesOfFreedom)).AppendLine(" df)");
        sb.Append("  relative slope = ").Append(Text.G(RelativeSlopePercent)).AppendLine(" % of mean per unit of x");
        sb.Append("  drift over run = ").Append(Text.G(DriftOverRunPercent)).Append(" % of mean (").Append(level).Append(" CI [")
            .Append(Text.G(DriftOverRunPercentInterval.Lower)).Append(", ").Append(Text.G(DriftOverRunPercentInterval.Upper)).AppendLine("] %)");
        sb.Append("  slope ").Append(IsSlopeSignificant ? "significant" : "not significant").Append(" (").Append(level).Append(" interval ")
            .Append(IsSlopeSignificant ? "excludes" : "includes").AppendLine(" 0)");
        sb.Append("  ").Append(IsFlagged ? "FLAGGED as drift" : "not flagged").Append(" — rule: ").Append(Rule.ToString());
        return sb.ToString();
    }

    private static double[] CopyFinite(IReadOnlyList<double> values, string paramName)
    {
        Guard.NotNull(values, paramName);
        var copy = new double[values.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            double v = values[i];
            if (double.IsNaN(v) || double.IsInfinity(v))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter '{paramName}' has {Guard.Format(v)} at index {i}; every value must be a finite number."),
                    paramName);
            }

            copy[i] = v;
        }

        return copy;
    }
}
