namespace InternalStdCal.Decisions;

/// <summary>The distribution used for the probability that the true value lies beyond the limit.</summary>
public enum ProbabilityModel
{
    /// <summary>Normal distribution of the true value around the result with standard deviation u (infinite degrees of freedom).</summary>
    Normal = 0,

    /// <summary>Student t with the stated degrees of freedom, scaled by u (finite degrees of freedom, e.g. n − 1 for replicates).</summary>
    StudentT,

    /// <summary>Zero uncertainty: the result is taken as the true value, so the probability is 0 or 1.</summary>
    Exact,
}
