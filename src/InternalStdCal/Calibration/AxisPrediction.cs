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
