using System;
using System.Globalization;

namespace InternalStdCal.Uncertainty;

/// <summary>A coverage interval [low, high] for the output quantity with its coverage probability p (JCGM 101:2008 §3.12).</summary>
/// <remarks>Immutable; exact equality.</remarks>
public readonly struct CoverageInterval : IEquatable<CoverageInterval>
{
    private readonly string? _unit;

    internal CoverageInterval(double lower, double upper, double probability, string unit)
    {
        Lower = lower;
        Upper = upper;
        Probability = probability;
        _unit = unit;
    }

    /// <summary>Lower end, in the unit of the output.</summary>
    public double Lower { get; }

    /// <summary>Upper end, in the unit of the output.</summary>
    public double Upper { get; }

    /// <summary>Coverage probability p, in (0, 1).</summary>
    public double Probability { get; }

    /// <summary>The output unit as the model states it (<see cref="MeasurementModel.OutputUnit"/>); empty when the
    /// model gives none.</summary>
    public string Unit => _unit ?? string.Empty;

    /// <summary>Upper − Lower.</summary>
    public double Length => Upper - Lower;

    /// <summary>Half the length.</summary>
    public double HalfWidth => (Upper - Lower) / 2;

    /// <summary>Exact equality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether equal.</returns>
    public static bool operator ==(CoverageInterval left, CoverageInterval right) => left.Equals(right);

    /// <summary>Exact inequality.</summary>
    /// <param name="left">First operand.</param>
    /// <param name="right">Second operand.</param>
    /// <returns>Whether not equal.</returns>
    public static bool operator !=(CoverageInterval left, CoverageInterval right) => !left.Equals(right);

    /// <inheritdoc />
    public bool Equals(CoverageInterval other) =>
        Lower.Equals(other.Lower) && Upper.Equals(other.Upper) && Probability.Equals(other.Probability) && string.Equals(Unit, other.Unit, StringComparison.Ordinal);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is CoverageInterval other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => (Lower, Upper, Probability, Unit).GetHashCode();

    /// <summary>Prints e.g. "[9.8, 10.2] mg/L (95 %)", or "[9.8, 10.2] (95 %)" without a unit (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "[" + Lower.ToString("G6", CultureInfo.InvariantCulture) + ", " + Upper.ToString("G6", CultureInfo.InvariantCulture) + "]"
        + (Unit.Length > 0 ? " " + Unit : string.Empty) + " (" + (100 * Probability).ToString("G4", CultureInfo.InvariantCulture) + " %)";
}
