namespace InternalStdCal.Limits;

/// <summary>How a result is reported against <see cref="ReportingLimits"/>, ordered from lowest to highest estimate.</summary>
public enum ReportedStatus
{
    /// <summary>Estimate below the detection limit: reported as "&lt; LOD" (not detected).</summary>
    NotDetected = 0,

    /// <summary>Estimate at or above the detection limit (or no LOD given) but below the quantification limit: reported
    /// as "&lt; LOQ".</summary>
    BelowQuantificationLimit = 1,

    /// <summary>Estimate at or above the quantification limit: reported as a number.</summary>
    Quantified = 2,
}
