namespace InternalStdCal.Decisions;

/// <summary>The statement of conformity a <see cref="DecisionRule"/> gives for one assessment.</summary>
public enum ComplianceOutcome
{
    /// <summary>The result is on the compliant side of the acceptance limit.</summary>
    Compliant = 0,

    /// <summary>The result is beyond the rejection limit.</summary>
    NonCompliant,

    /// <summary>The result lies between the acceptance and rejection limits of a non-binary rule: the data do not
    /// decide (ILAC G8 conditional pass or conditional fail).</summary>
    Inconclusive,
}
