using System.Collections.Generic;

namespace InternalStdCal.Run;

/// <summary>One candidate's place in an <see cref="InternalStandardSelection"/>: rank, verdict, numbers, refusal reason and warnings.</summary>
public sealed class InternalStandardSelectionAssessment
{
    internal InternalStandardSelectionAssessment(
        string name,
        int? rank,
        InternalStandardSelectionVerdict verdict,
        InternalStandardSelectionStatistics? statistics,
        string? refusal,
        IReadOnlyList<string> warnings)
    {
        Name = name;
        Rank = rank;
        Verdict = verdict;
        Statistics = statistics;
        Refusal = refusal;
        Warnings = warnings;
    }

    /// <summary>Candidate name.</summary>
    public string Name { get; }

    /// <summary>Rank by the RSD of the ratio (1 = least scatter); null when refused.</summary>
    public int? Rank { get; }

    /// <summary>Verdict.</summary>
    public InternalStandardSelectionVerdict Verdict { get; }

    /// <summary>The numbers; null when refused.</summary>
    public InternalStandardSelectionStatistics? Statistics { get; }

    /// <summary>Why the candidate was not assessed; null unless <see cref="Verdict"/> is Refused.</summary>
    public string? Refusal { get; }

    /// <summary>Warnings that do not change the verdict (signal in method blanks; a ratio that does not vary at all).</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>True when refused.</summary>
    public bool IsRefused => Refusal is not null;
}
