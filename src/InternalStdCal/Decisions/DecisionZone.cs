namespace InternalStdCal.Decisions;

/// <summary>The zones of a non-binary statement of conformity (ILAC G8:09/2019), for an upper limit L and guard band w;
/// a lower limit is the mirror image.</summary>
public enum DecisionZone
{
    /// <summary>x ≤ L − w: compliant.</summary>
    Pass = 0,

    /// <summary>L − w &lt; x ≤ L: below the limit but within the guard band; inconclusive.</summary>
    ConditionalPass,

    /// <summary>L &lt; x ≤ L + w: above the limit but within the guard band; inconclusive.</summary>
    ConditionalFail,

    /// <summary>x &gt; L + w: non-compliant.</summary>
    Fail,
}
