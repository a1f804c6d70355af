using System.Collections.Generic;
using System.Text;
using InternalStdCal.Calibration;

namespace InternalStdCal.Limits;

/// <summary>
/// The outcome of <see cref="CochranTest"/>: C = s²_max/Σs²ᵢ against its upper critical value. Only flags;
/// <see cref="Variances"/> (and <see cref="Groups"/> when given) are the input, unchanged and complete.
/// </summary>
/// <remarks>Caution: the library computes; the laboratory's validated method, its QA system, local regulations and
/// licensed practice decide what happens to a flagged group.</remarks>
public sealed class CochranTestResult
{
    internal CochranTestResult(
        IReadOnlyList<IReadOnlyList<double>>? groups,
        IReadOnlyList<double> variances,
        int replicatesPerGroup,
        double statistic,
        double criticalValue,
        double significanceLevel,
        int suspectIndex,
        IReadOnlyList<string> notes)
    {
        Groups = groups;
        Variances = variances;
        ReplicatesPerGroup = replicatesPerGroup;
        Statistic = statistic;
        CriticalValue = criticalValue;
        SignificanceLevel = significanceLevel;
        SuspectIndex = suspectIndex;
        Notes = notes;
    }

    /// <summary>The replicate groups as given, unchanged; null when variances were given directly.</summary>
    public IReadOnlyList<IReadOnlyList<double>>? Groups { get; }

    /// <summary>Sample variance of each group (n − 1 denominator; unit of the data squared), in input order.</summary>
    public IReadOnlyList<double> Variances { get; }

    /// <summary>Number of groups p.</summary>
    public int GroupCount => Variances.Count;

    /// <summary>Replicates per group n.</summary>
    public int ReplicatesPerGroup { get; }

    /// <summary>C = s²_max/Σs²ᵢ, in [1/p, 1].</summary>
    public double Statistic { get; }

    /// <summary>C_crit = 1/(1 + (p − 1)/F(1 − α/p; n − 1, (p − 1)(n − 1))).</summary>
    public double CriticalValue { get; }

    /// <summary>Significance level α (upper one-sided: only a large variance is tested).</summary>
    public double SignificanceLevel { get; }

    /// <summary>How α is to be read.</summary>
    public string AlphaConvention { get; } = "upper one-sided: α is the probability that the largest of p equal-population variances gives C above the critical value; F(1 − α/p; n − 1, (p − 1)(n − 1))";

    /// <summary>Zero-based index of the group with the largest variance (first when tied).</summary>
    public int SuspectIndex { get; }

    /// <summary>The largest variance, <c>Variances[SuspectIndex]</c>.</summary>
    public double LargestVariance => Variances[SuspectIndex];

    /// <summary>True when C exceeds the critical value (strictly): the group's variance is flagged.</summary>
    public bool IsOutlier => Statistic > CriticalValue;

    /// <summary>Remarks on degenerate data (all variances 0); empty when there are none.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>Published source.</summary>
    public string Source { get; } = "Cochran, Ann. Eugen. 11 (1941) 47–52; as used in ISO 5725-2 for within-laboratory variances";

    /// <summary>Readable result, e.g. "Cochran C (α = 0.05): C = 0.9 vs critical 0.684126, p = 5 groups of n = 3 →
    /// group 2 (s² = 0.09) flagged (not removed)", then notes and the source.</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Cochran C (upper one-sided, α = ").Append(Text.G(SignificanceLevel)).Append("): C = ").Append(Text.G(Statistic))
            .Append(" vs critical ").Append(Text.G(CriticalValue)).Append(", p = ").Append(Text.I(GroupCount)).Append(" groups of n = ")
            .Append(Text.I(ReplicatesPerGroup)).Append(" → group ").Append(Text.I(SuspectIndex)).Append(" (s² = ").Append(Text.G(LargestVariance))
            .AppendLine(IsOutlier ? ") flagged (not removed)" : ") not flagged");
        foreach (string note in Notes)
        {
            sb.Append("  note: ").AppendLine(note);
        }

        sb.Append("  source: ").AppendLine(Source);
        return sb.ToString();
    }
}
