namespace InternalStdCal.Limits;

/// <summary>Where the standard deviation σ of the response used by <see cref="IchLimits"/> comes from (ICH Q2(R2),
/// detection and quantitation limit "based on the standard deviation of the response and the slope").</summary>
public enum SigmaSource
{
    /// <summary>Standard deviation of the responses of blank samples (measured by the caller).</summary>
    BlankResponses = 0,

    /// <summary>Residual standard deviation s_y/x of the calibration line.</summary>
    ResidualStandardDeviation,

    /// <summary>Standard error of the intercept of the calibration line.</summary>
    InterceptStandardError,

    /// <summary>Standard deviation of the intercepts of several calibration lines (measured by the caller).</summary>
    InterceptsOfSeveralLines,
}
