namespace InternalStdCal.Run;

/// <summary>Which evidence a <see cref="DriftRule"/> needs before it flags a drift.</summary>
public enum DriftCriterion
{
    /// <summary>Flag when |drift over the run| exceeds the limit (in % of the series mean), whatever the interval says.</summary>
    Magnitude = 0,

    /// <summary>Flag when the confidence interval of the slope excludes 0 (the trend is statistically significant), whatever its size.</summary>
    Significance = 1,

    /// <summary>Flag only when both hold: the drift exceeds the limit and the slope interval excludes 0.</summary>
    MagnitudeAndSignificance = 2,

    /// <summary>Flag when either holds.</summary>
    MagnitudeOrSignificance = 3,
}
