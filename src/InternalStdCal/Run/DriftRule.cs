using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// When a trend across injection order counts as drift: a limit on the drift over the run (in % of the series mean),
/// a significance requirement on the slope, or a combination — see <see cref="DriftCriterion"/>.
/// </summary>
/// <remarks>
/// <para>The limit and the combination are the caller's: no published source fixes a drift limit for every
/// technique (common practice is to take it from the method's QC acceptance criteria).</para>
/// <para>Caution: the library computes; the lab's validated method, its QA system, local regulations and licensed
/// practice decide.</para>
/// <para>Immutable; equality is exact on all fields.</para>
/// </remarks>
public sealed class DriftRule : IEquatable<DriftRule>
{
    private DriftRule(DriftCriterion criterion, double? limitPercentOverRun, double confidenceLevel)
    {
        Criterion = criterion;
        LimitPercentOverRun = limitPercentOverRun;
        ConfidenceLevel = confidenceLevel;
    }

    /// <summary>Which evidence is needed to flag.</summary>
    public DriftCriterion Criterion { get; }

    /// <summary>Limit on |drift over the run| in % of the series mean (&gt; 0); null for <see cref="DriftCriterion.Significance"/>.</summary>
    public double? LimitPercentOverRun { get; }

    /// <summary>Confidence level of the slope interval, in (0, 1); used for the interval always and for significance when the criterion asks for it.</summary>
    public double ConfidenceLevel { get; }

    /// <summary>Flags when |drift over the run| &gt; <paramref name="limitPercentOverRun"/> % of the series mean.</summary>
    /// <param name="limitPercentOverRun">Limit in % of the mean; finite, &gt; 0 (e.g. 10 for 10 %).</param>
    /// <param name="confidenceLevel">Confidence level of the reported slope interval, in (0, 1).</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A parameter is outside its range.</exception>
    public static DriftRule Magnitude(double limitPercentOverRun, double confidenceLevel = 0.95) =>
        Create(DriftCriterion.Magnitude, limitPercentOverRun, confidenceLevel);

    /// <summary>Flags when the slope's confidence interval excludes 0.</summary>
    /// <param name="confidenceLevel">Confidence level of the slope interval, in (0, 1).</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="confidenceLevel"/> is outside (0, 1).</exception>
    public static DriftRule Significance(double confidenceLevel = 0.95) =>
        new(DriftCriterion.Significance, null, Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel)));

    /// <summary>Flags when the drift exceeds the limit and the slope interval excludes 0.</summary>
    /// <param name="limitPercentOverRun">Limit in % of the mean; finite, &gt; 0.</param>
    /// <param name="confidenceLevel">Confidence level of the slope interval, in (0, 1).</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A parameter is outside its range.</exception>
    public static DriftRule MagnitudeAndSignificance(double limitPercentOverRun, double confidenceLevel = 0.95) =>
        Create(DriftCriterion.MagnitudeAndSignificance, limitPercentOverRun, confidenceLevel);

    /// <summary>Flags when the drift exceeds the limit or the slope interval excludes 0.</summary>
    /// <param name="limitPercentOverRun">Limit in % of the mean; finite, &gt; 0.</param>
    /// <param name="confidenceLevel">Confidence level of the slope interval, in (0, 1).</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A parameter is outside its range.</exception>
    public static DriftRule MagnitudeOrSignificance(double limitPercentOverRun, double confidenceLevel = 0.95) =>
        Create(DriftCriterion.MagnitudeOrSignificance, limitPercentOverRun, confidenceLevel);

    /// <summary>Applies the rule.</summary>
    /// <param name="driftPercentOverRun">Drift over the run in % of the mean (sign ignored).</param>
    /// <param name="slopeSignificant">Whether the slope interval excludes 0.</param>
    /// <returns>True when the rule flags.</returns>
    internal bool Flags(double driftPercentOverRun, bool slopeSignificant)
    {
        bool large = LimitPercentOverRun is double limit && Math.Abs(driftPercentOverRun) > limit;
        return Criterion switch
        {
            DriftCriterion.Magnitude => large,
            DriftCriterion.Significance => slopeSignificant,
            DriftCriterion.MagnitudeAndSignificance => large && slopeSignificant,
            _ => large || slopeSignificant,
        };
    }

    /// <inheritdoc/>
    public bool Equals(DriftRule? other) =>
        other is not null && Criterion == other.Criterion && Nullable.Equals(LimitPercentOverRun, other.LimitPercentOverRun)
        && ConfidenceLevel.Equals(other.ConfidenceLevel);

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as DriftRule);

    /// <inheritdoc/>
    public override int GetHashCode() => (Criterion, LimitPercentOverRun, ConfidenceLevel).GetHashCode();

    /// <summary>Text such as <c>|drift over run| &gt; 10 % of mean and 95 % slope interval excludes 0</c>.</summary>
    /// <returns>The rule as text (invariant culture).</returns>
    public override string ToString()
    {
        string magnitude = "|drift over run| > " + LimitPercentOverRun?.ToString("G6", CultureInfo.InvariantCulture) + " % of mean";
        string significance = (100 * ConfidenceLevel).ToString("0.###", CultureInfo.InvariantCulture) + " % slope interval excludes 0";
        return Criterion switch
        {
            DriftCriterion.Magnitude => magnitude,
            DriftCriterion.Significance => significance,
            DriftCriterion.MagnitudeAndSignificance => magnitude + " and " + significance,
            _ => magnitude + " or " + significance,
        };
    }

    private static DriftRule Create(DriftCriterion criterion, double limitPercentOverRun, double confidenceLevel)
    {
        Guard.Positive(limitPercentOverRun, nameof(limitPercentOverRun));
        Guard.InOpenRange(confidenceLevel, 0, 1, nameof(confidenceLevel));
        return new DriftRule(criterion, limitPercentOverRun, confidenceLevel);
    }
}
