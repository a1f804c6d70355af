using System.Collections.Generic;
using InternalStdCal.Calibration;

namespace InternalStdCal.Run;

/// <summary>The calibration of one analyte in a run, with its acceptance verdict, or the reason it could not be made.</summary>
public sealed class AnalyteCalibration
{
    internal AnalyteCalibration(AnalyteMethod method, RatioCalibration? calibration, AcceptanceVerdict? verdict, string? failure, IReadOnlyList<int> injectionOrders)
    {
        Method = method;
        Calibration = calibration;
        Verdict = verdict;
        Failure = failure;
        InjectionOrders = injectionOrders;
    }

    /// <summary>Analyte name.</summary>
    public string Analyte => Method.Analyte;

    /// <summary>The analyte's method.</summary>
    public AnalyteMethod Method { get; }

    /// <summary>The calibration; null when it could not be made (see <see cref="Failure"/>).</summary>
    public RatioCalibration? Calibration { get; }

    /// <summary>Verdict of the method's acceptance rule set; null without a rule set or without a calibration.</summary>
    public AcceptanceVerdict? Verdict { get; }

    /// <summary>Why no calibration was made; null when it was.</summary>
    public string? Failure { get; }

    /// <summary>Injection orders of the rows given to the calibration.</summary>
    public IReadOnlyList<int> InjectionOrders { get; }

    /// <summary>True when a calibration exists and no rule set rejected it.</summary>
    public bool IsAccepted => Calibration is not null && (Verdict?.Accepted ?? true);
}
