using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// A result as reported against <see cref="ReportingLimits"/>: quantified (the number) or censored ("&lt; LOQ",
/// "&lt; LOD" = not detected) with the limit, always keeping the raw estimate.
/// </summary>
/// <remarks>Immutable. Equality is exact: same status, same estimate and same limit
/// (<see cref="Concentration.Equals(Concentration)"/>).</remarks>
public sealed class ReportedValue : IEquatable<ReportedValue>
{
    internal ReportedValue(Concentration estimate, ReportedStatus status, Concentration? limit)
    {
        Estimate = estimate;
        Status = status;
        Limit = limit;
    }

    /// <summary>The raw estimate, as given (also when censored).</summary>
    public Concentration Estimate { get; }

    /// <summary>Quantified, below the LOQ, or not detected.</summary>
    public ReportedStatus Status { get; }

    /// <summary>The limit the estimate fell below (LOQ or LOD); null when quantified.</summary>
    public Concentration? Limit { get; }

    /// <summary>True unless <see cref="ReportedStatus.Quantified"/>.</summary>
    public bool IsCensored => Status != ReportedStatus.Quantified;

    /// <summary>True for <see cref="ReportedStatus.NotDetected"/>.</summary>
    public bool IsNotDetected => Status == ReportedStatus.NotDetected;

    /// <summary>Prints a censored value as "&lt; 0.50 µg/L (LOQ)" or "&lt; 0.15 µg/L (LOD)" (limit to 2 significant digits) and a
    /// quantified one as "0.732 µg/L" (3 significant digits); invariant culture.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => ToString(IsCensored ? 2 : 3);

    /// <summary>Prints as <see cref="ToString()"/> with the number (limit or estimate) to the given significant digits,
    /// trailing zeros kept; digits before the decimal point are never dropped (1234.56 with 2 digits prints "1235").</summary>
    /// <param name="significantDigits">1 to 15.</param>
    /// <returns>The text.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="significantDigits"/> is outside 1–15.</exception>
    public string ToString(int significantDigits)
    {
        Guard.AtLeast(significantDigits, 1, nameof(significantDigits));
        if (significantDigits > 15)
        {
            throw new ArgumentOutOfRangeException(nameof(significantDigits), significantDigits, FormattableString.Invariant($"Parameter 'significantDigits' was {significantDigits}; it must be <= 15."));
        }

        return Status switch
        {
            ReportedStatus.Quantified => Significant(Estimate, significantDigits),
            ReportedStatus.BelowQuantificationLimit => "< " + Significant(Limit!.Value, significantDigits) + " (LOQ)",
            _ => "< " + Significant(Limit!.Value, significantDigits) + " (LOD)",
        };
    }

    /// <inheritdoc />
    public bool Equals(ReportedValue? other) =>
        other is not null && Status == other.Status && Estimate.Equals(other.Estimate) && Nullable.Equals(Limit, other.Limit);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as ReportedValue);

    /// <inheritdoc />
    public override int GetHashCode() => (Status, Estimate, Limit).GetHashCode();

    private static string Significant(Concentration c, int digits)
    {
        double v = c.Value;
        int decimals = v == 0 ? digits - 1 : Math.Max(0, digits - 1 - (int)Math.Floor(Math.Log10(Math.Abs(v))));
        string number = Math.Round(v, Math.Min(decimals, 15)).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return number + " " + Concentration.SymbolOf(c.Unit);
    }
}
