using System.Collections.Generic;

namespace InternalStdCal.Run;

/// <summary>What a <see cref="DriftCheck"/> follows across injection order.</summary>
public enum DriftSeriesKind
{
    /// <summary>The signal of one internal standard in every injection where it is valid (present and &gt; 0).</summary>
    InternalStandardSignal = 0,

    /// <summary>The recovery (%) of one analyte in the quality-control injections where it could be computed.</summary>
    QualityControlRecovery = 1,
}

/// <summary>
/// The drift trend of one series of a run across injection order (x = injection order number), made with the
/// method's <see cref="RunMethod.Drift"/> rule; or the reason it could not be made (fewer than 3 points, mean ≤ 0).
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide what a flagged drift means for the run. Immutable.</remarks>
public sealed class DriftCheck
{
    internal DriftCheck(DriftSeriesKind kind, string name, IReadOnlyList<int> injectionOrders, DriftTrend? trend, string? failure)
    {
        Kind = kind;
        Name = name;
        InjectionOrders = injectionOrders;
        Trend = trend;
        Failure = failure;
    }

    /// <summary>What the series is.</summary>
    public DriftSeriesKind Kind { get; }

    /// <summary>IS name (<see cref="DriftSeriesKind.InternalStandardSignal"/>) or analyte name
    /// (<see cref="DriftSeriesKind.QualityControlRecovery"/>).</summary>
    public string Name { get; }

    /// <summary>Injection orders of the points of the series, ascending.</summary>
    public IReadOnlyList<int> InjectionOrders { get; }

    /// <summary>The trend (slope per injection-order unit, with its interval and the rule's verdict); null when it could
    /// not be fitted (see <see cref="Failure"/>).</summary>
    public DriftTrend? Trend { get; }

    /// <summary>Why there is no trend; null when there is one.</summary>
    public string? Failure { get; }

    /// <summary>True when the trend exists and the rule flags it.</summary>
    public bool IsFlagged => Trend?.IsFlagged == true;

    /// <summary>"IS Bi signal" or "Pb QC recovery %".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Kind == DriftSeriesKind.InternalStandardSignal ? "IS " + Name + " signal" : Name + " QC recovery %";
}
