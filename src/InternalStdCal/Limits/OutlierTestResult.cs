using System.Collections.Generic;
using System.Text;
using InternalStdCal.Calibration;

namespace InternalStdCal.Limits;

/// <summary>
/// The outcome of a single-outlier test on one set of values (<see cref="GrubbsTest"/>, <see cref="DixonQTest"/>).
/// The test only flags the suspect value; <see cref="Values"/> is the input, unchanged and complete.
/// </summary>
/// <remarks>
/// Caution: the library computes; the laboratory's validated method, its QA system, local regulations and licensed
/// practice decide whether a flagged value is excluded, re-measured or kept.
/// </remarks>
public sealed class OutlierTestResult
{
    internal OutlierTestResult(
        string test,
        IReadOnlyList<double> values,
        double statistic,
        double criticalValue,
        double significanceLevel,
        OutlierSide alternative,
        string alphaConvention,
        int suspectIndex,
        OutlierSide suspectEnd,
        string source,
        IReadOnlyList<string> notes)
    {
        Test = test;
        Values = values;
        Statistic = statistic;
        CriticalValue = criticalValue;
        SignificanceLevel = significanceLevel;
        Alternative = alternative;
        AlphaConvention = alphaConvention;
        SuspectIndex = suspectIndex;
        SuspectEnd = suspectEnd;
        Source = source;
        Notes = notes;
    }

    /// <summary>Name of the test, e.g. "Grubbs" or "Dixon Q (r10)".</summary>
    public string Test { get; }

    /// <summary>The tested values in input order, unchanged (nothing is removed).</summary>
    public IReadOnlyList<double> Values { get; }

    /// <summary>The test statistic (dimensionless, ≥ 0).</summary>
    public double Statistic { get; }

    /// <summary>The critical value at <see cref="SignificanceLevel"/> for this number of values.</summary>
    public double CriticalValue { get; }

    /// <summary>Significance level α, read as stated in <see cref="AlphaConvention"/>.</summary>
    public double SignificanceLevel { get; }

    /// <summary>What was tested: both ends (<see cref="OutlierSide.TwoSided"/>) or one end chosen in advance.</summary>
    public OutlierSide Alternative { get; }

    /// <summary>How α is to be read (two-sided or one-sided, and how the critical value was obtained).</summary>
    public string AlphaConvention { get; }

    /// <summary>Zero-based index in <see cref="Values"/> of the suspect value (first occurrence when tied).</summary>
    public int SuspectIndex { get; }

    /// <summary>The suspect value, <c>Values[SuspectIndex]</c>.</summary>
    public double SuspectValue => Values[SuspectIndex];

    /// <summary>End of the data at which the suspect lies: <see cref="OutlierSide.High"/> or <see cref="OutlierSide.Low"/>.</summary>
    public OutlierSide SuspectEnd { get; }

    /// <summary>True when the statistic exceeds the critical value (strictly): the suspect is flagged as an outlier.</summary>
    public bool IsOutlier => Statistic > CriticalValue;

    /// <summary>Published source of the statistic and the critical values.</summary>
    public string Source { get; }

    /// <summary>Remarks on degenerate data (e.g. all values equal) and ties; empty when there are none.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <summary>Readable result, e.g. "Grubbs (two-sided, α = 0.05): G = 2.46876 vs critical 2.12664, n = 8 → value
    /// 245.57 at index 7 (high end) flagged as outlier (not removed)", then notes and the source.</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(Test).Append(" (").Append(Alternative switch
        {
            OutlierSide.High => "one-sided, high end",
            OutlierSide.Low => "one-sided, low end",
            _ => "two-sided",
        }).Append(", α = ").Append(Text.G(SignificanceLevel)).Append("): statistic ").Append(Text.G(Statistic))
            .Append(" vs critical ").Append(Text.G(CriticalValue)).Append(", n = ").Append(Text.I(Values.Count))
            .Append(" → value ").Append(Text.Signal(SuspectValue)).Append(" at index ").Append(Text.I(SuspectIndex))
            .Append(SuspectEnd == OutlierSide.High ? " (high end) " : " (low end) ")
            .AppendLine(IsOutlier ? "flagged as outlier (not removed)" : "not flagged");
        foreach (string note in Notes)
        {
            sb.Append("  note: ").AppendLine(note);
        }

        sb.Append("  α convention: ").AppendLine(AlphaConvention);
        sb.Append("  source: ").AppendLine(Source);
        return sb.ToString();
    }
}
