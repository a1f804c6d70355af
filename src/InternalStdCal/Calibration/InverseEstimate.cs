using System;
using System.Globalization;

namespace InternalStdCal.Calibration;

/// <summary>
/// Allocation-free result of an inverse prediction (see <see cref="RegressionFit.EstimateInverse"/>): the x
/// (concentration) of an unknown from the mean of its replicate responses, with its standard error and
/// confidence interval. Holds the same numbers as <see cref="InversePrediction"/>, without the method text.
/// </summary>
/// <remarks>
/// Units: <see cref="Value"/>, <see cref="StandardError"/> and the interval are in x units; <see cref="MeanResponse"/>
/// in y units. Equality is exact on every field. <c>default</c> (all zero, interval [0, 0] at level 0) is never
/// produced by this library.
/// </remarks>
public readonly struct InverseEstimate : IEquatable<InverseEstimate>
{
    internal InverseEstimate(
        double value,
        double standardError,
        ConfidenceInterval interval,
        int degreesOfFreedom,
        int replicates,
        double meanResponse,
        double unknownWeight,
        ExtrapolationStatus extrapolation)
    {
        Value = value;
        StandardError = standardError;
        Interval = interval;
        DegreesOfFreedom = degreesOfFreedom;
        Replicates = replicates;
        MeanResponse = meanResponse;
        UnknownWeight = unknownWeight;
        Extrapolation = extrapolation;
    }

    /// <summary>Predicted x0 (x units).</summary>
    public double Value { get; }

    /// <summary>Standard error s_x0 of <see cref="Value"/> (x units; ≥ 0, 0 for a perfect fit).</summary>
    public double StandardError { get; }

    /// <summary>Symmetric interval x0 ± t((1 + P)/2, n − p)·s_x0 (x units).</summary>
    public ConfidenceInterval Interval { get; }

    /// <summary>Degrees of freedom of the t quantile, n − p (points minus fitted parameters).</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>Number m of replicate responses averaged into <see cref="MeanResponse"/> (≥ 1).</summary>
    public int Replicates { get; }

    /// <summary>Mean response ȳ0 of the unknown (y units).</summary>
    public double MeanResponse { get; }

    /// <summary>Weight w0 of the unknown on the fit's normalised scale (Σw = n); 1 for an unweighted fit.</summary>
    public double UnknownWeight { get; }

    /// <summary>Position of x0 relative to the standards.</summary>
    public ExtrapolationStatus Extrapolation { get; }

    /// <summary>True unless <see cref="Extrapolation"/> is <see cref="ExtrapolationStatus.WithinRange"/>.</summary>
    public bool IsExtrapolated => Extrapolation != ExtrapolationStatus.WithinRange;

    /// <summary>Equality operator (exact).</summary>
    /// <param name="left">First estimate.</param>
    /// <param name="right">Second estimate.</param>
    /// <returns>True when every field is identical.</returns>
    public static bool operator ==(InverseEstimate left, InverseEstimate right) => left.Equals(right);

    /// <summary>Inequality operator (exact).</summary>
    /// <param name="left">First estimate.</param>
    /// <param name="right">Second estimate.</param>
    /// <returns>True when any field differs.</returns>
    public static bool operator !=(InverseEstimate left, InverseEstimate right) => !left.Equals(right);

    /// <inheritdoc/>
    public bool Equals(InverseEstimate other) =>
        Value.Equals(other.Value) && StandardError.Equals(other.StandardError) && Interval.Equals(other.Interval)
        && DegreesOfFreedom == other.DegreesOfFreedom && Replicates == other.Replicates
        && MeanResponse.Equals(other.MeanResponse) && UnknownWeight.Equals(other.UnknownWeight)
        && Extrapolation == other.Extrapolation;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is InverseEstimate other && Equals(other);

    /// <inheritdoc/>
    public override int GetHashCode() =>
        (Value, StandardError, Interval, DegreesOfFreedom, Replicates, MeanResponse, UnknownWeight, Extrapolation).GetHashCode();

    /// <summary>Invariant text such as <c>6.2072 ± 0.6163 (95%)</c>, shortest round-trip digits (as <see cref="InversePrediction.ToString"/>).</summary>
    /// <returns>Text for display.</returns>
    public override string ToString() =>
        string.Format(
            CultureInfo.InvariantCulture,
            "{0} ± {1} ({2})",
            Value.ToString("R", CultureInfo.InvariantCulture),
            Interval.HalfWidth.ToString("R", CultureInfo.InvariantCulture),
            Interval.ConfidenceLevel.ToString("0.######%", CultureInfo.InvariantCulture));
}
