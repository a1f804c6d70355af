namespace InternalStdCal.Limits;

/// <summary>ISO 5725-2 classification of a tested item by two critical values (5 % and 1 %; from memory).</summary>
public enum OutlierCategory
{
    /// <summary>The statistic does not exceed its 5 % critical value: the item is accepted as correct.</summary>
    Correct = 0,

    /// <summary>The statistic exceeds the 5 % but not the 1 % critical value.</summary>
    Straggler,

    /// <summary>The statistic exceeds the 1 % critical value.</summary>
    StatisticalOutlier,
}
