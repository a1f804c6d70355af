using InternalStdCal.Calibration;

namespace InternalStdCal.Limits;

/// <summary>ISO 5725-2 classification of the largest variance by Cochran's test at 5 % and 1 % (from memory):
/// correct, straggler or statistical outlier. Only classifies; nothing is removed.</summary>
/// <remarks>Caution: the library computes; the laboratory's validated method, its QA system, local regulations and
/// licensed practice decide what happens to a straggler or outlier.</remarks>
public sealed class CochranClassification
{
    internal CochranClassification(CochranTestResult atFivePercent, CochranTestResult atOnePercent)
    {
        AtFivePercent = atFivePercent;
        AtOnePercent = atOnePercent;
    }

    /// <summary>The test at α = 0.05.</summary>
    public CochranTestResult AtFivePercent { get; }

    /// <summary>The test at α = 0.01.</summary>
    public CochranTestResult AtOnePercent { get; }

    /// <summary>Zero-based index of the group with the largest variance.</summary>
    public int SuspectIndex => AtFivePercent.SuspectIndex;

    /// <summary>StatisticalOutlier above the 1 % critical value, Straggler above the 5 % one, else Correct.</summary>
    public OutlierCategory Category =>
        AtOnePercent.IsOutlier ? OutlierCategory.StatisticalOutlier
        : AtFivePercent.IsOutlier ? OutlierCategory.Straggler
        : OutlierCategory.Correct;

    /// <summary>Readable classification, e.g. "ISO 5725-2 Cochran: group 2, C = 0.9 (5 %: 0.684, 1 %: 0.789) → straggler".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "ISO 5725-2 Cochran: group " + Text.I(SuspectIndex) + ", C = " + Text.G(AtFivePercent.Statistic) + " (5 %: " + Text.G(AtFivePercent.CriticalValue)
        + ", 1 %: " + Text.G(AtOnePercent.CriticalValue) + ") → " + Category switch
        {
            OutlierCategory.StatisticalOutlier => "statistical outlier",
            OutlierCategory.Straggler => "straggler",
            _ => "correct",
        } + "; source: " + AtFivePercent.Source;
}
