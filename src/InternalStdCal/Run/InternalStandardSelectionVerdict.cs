namespace InternalStdCal.Run;

/// <summary>Verdict on one internal-standard candidate in an <see cref="InternalStandardSelection"/>.</summary>
public enum InternalStandardSelectionVerdict
{
    /// <summary>The ratio analyte/candidate scatters significantly less than the raw analyte signal (one-sided Pitman–Morgan test).</summary>
    Improves = 0,

    /// <summary>Neither a significant reduction nor a significant increase of the scatter.</summary>
    NoSignificantImprovement = 1,

    /// <summary>The ratio scatters significantly more than the raw analyte signal (one-sided Pitman–Morgan test, other direction).</summary>
    Worsens = 2,

    /// <summary>Not assessed: the candidate is the analyte itself, or its signal does not vary (see the refusal reason).</summary>
    Refused = 3,
}
