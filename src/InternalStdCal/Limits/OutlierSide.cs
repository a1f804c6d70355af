namespace InternalStdCal.Limits;

/// <summary>Which end of the data an outlier test looks at, or at which end a suspect value lies.</summary>
public enum OutlierSide
{
    /// <summary>Two-sided: the more extreme of the lowest and the highest value is tested.</summary>
    TwoSided = 0,

    /// <summary>The highest value (one-sided test of the upper end).</summary>
    High,

    /// <summary>The lowest value (one-sided test of the lower end).</summary>
    Low,
}
