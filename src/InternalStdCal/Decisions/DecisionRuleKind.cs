namespace InternalStdCal.Decisions;

/// <summary>How a <see cref="DecisionRule"/> sets its guard band w.</summary>
public enum DecisionRuleKind
{
    /// <summary>w = 0 (ILAC G8:09/2019 simple acceptance).</summary>
    SimpleAcceptance = 0,

    /// <summary>w = m·U, a multiple of the expanded uncertainty U = k·u (ILAC G8:09/2019, w = U).</summary>
    ExpandedUncertaintyGuardBand,

    /// <summary>g = k·u with k = z(1 − r) (or t(1 − r, ν)) for a chosen maximum risk r (EURACHEM/CITAC 2021).</summary>
    RiskGuardBand,

    /// <summary>One-sided one-sample Student t test of the mean at level α: w = t(1 − α, n − 1)·s/√n.</summary>
    OneSidedTTest,
}
