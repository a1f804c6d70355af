using System.Collections.Generic;

namespace InternalStdCal.Calibration;

/// <summary>An inverse prediction on the calibration axis (before conversion to a sample concentration).</summary>
internal sealed class AxisPrediction
{
    internal AxisPrediction(double x, double? standardError, double? lower, double? upper, double? degreesOfFreedom, string method, IReadOnlyList<string> notes)
    {
        X = x;
        StandardError = standardError;
        Lower = lower;
        Upper = upper;
        DegreesOfFreedom = degreesOfFreedom;
        Method = method;
        Notes = notes;
    }

    internal double X { get; }

    internal double? StandardError { get; }

    internal double? Lower { get; }

    internal double? Upper { get; }

    internal double? DegreesOfFreedom { get; }

    internal string Method { get; }

    internal IReadOnlyList<string> Notes { get; }
}

/// <summary>The numbers of an <see cref="AxisPrediction"/> without its notes and method text (nothing formatted).</summary>
internal readonly struct AxisEstimate
{
    internal AxisEstimate(double x, double? standardError, double? lower, double? upper, double? degreesOfFreedom, double? unknownWeight)
    {
        X = x;
        StandardError = standardError;
        Lower = lower;
        Upper = upper;
        DegreesOfFreedom = degreesOfFreedom;
        UnknownWeight = unknownWeight;
    }

    internal double X { get; }

    internal double? StandardError { get; }

    /// <summary>Lower limit; null without a standard error or when the interval is unbounded.</summary>
    internal double? Lower { get; }

    internal double? Upper { get; }

    internal double? DegreesOfFreedom { get; }

    /// <summary>Raw weight of the unknown passed to the regression (per-point weightings only).</summary>
    internal double? UnknownWeight { get; }
}
