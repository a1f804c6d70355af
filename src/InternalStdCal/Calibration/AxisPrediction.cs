using System.Collections.Generic;

namespace InternalStdCal.Calibration;

/// <summary>An inverse prediction on the calibration axis (before conversion to a sample concentration): the
/// numbers of an <see cref="AxisEstimate"/> with the method text and notes.</summary>
internal sealed class AxisPrediction
{
    internal AxisPrediction(AxisEstimate estimate, string method, IReadOnlyList<string> notes)
    {
        Estimate = estimate;
        Method = method;
        Notes = notes;
    }

    internal AxisEstimate Estimate { get; }

    internal double X => Estimate.X;

    internal double? StandardError => Estimate.StandardError;

    internal double? Lower => Estimate.Lower;

    internal double? Upper => Estimate.Upper;

    internal double? DegreesOfFreedom => Estimate.DegreesOfFreedom;

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
