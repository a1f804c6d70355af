namespace InternalStdCal.Decisions;

/// <summary>
/// How a guard band of width w is applied around the limit L (ILAC G8:09/2019; EURACHEM/CITAC "Use of uncertainty
/// information in compliance assessment", 2nd ed. 2021, §4.3–4.4). Written here for an upper limit; a lower limit
/// is the mirror image.
/// </summary>
public enum DecisionMode
{
    /// <summary>Binary statement, guard band on the compliant side: compliant when x ≤ L − w, otherwise non-compliant.
    /// Bounds the risk of false acceptance (ILAC G8 "pass if below the acceptance limit AL = TL − w").</summary>
    BinaryGuardedAcceptance = 0,

    /// <summary>Binary statement, guard band on the non-compliant side: non-compliant when x &gt; L + w, otherwise
    /// compliant. Bounds the risk of false rejection (EURACHEM/CITAC rejection zone, decision limit L + g).</summary>
    BinaryGuardedRejection,

    /// <summary>Non-binary statement with the ILAC G8 zones: pass (x ≤ L − w, compliant), conditional pass
    /// (L − w &lt; x ≤ L) and conditional fail (L &lt; x ≤ L + w) (both inconclusive), fail (x &gt; L + w, non-compliant).</summary>
    NonBinary,
}
