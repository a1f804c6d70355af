using System;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// The result of one method blank for <see cref="MethodDetectionLimit"/>: either a numeric concentration or, explicitly,
/// no numeric result (the method reported nothing it could put a number on, e.g. no peak).
/// </summary>
/// <remarks>Immutable. Equality is exact: two numeric results are equal when their concentrations are equal
/// (<see cref="Concentration.Equals(Concentration)"/>); all "no numeric result" blanks are equal.</remarks>
public sealed class BlankResult : IEquatable<BlankResult>
{
    private BlankResult(Concentration? value) => Value = value;

    /// <summary>A blank without a numeric result.</summary>
    public static BlankResult NoNumericResult { get; } = new(null);

    /// <summary>The concentration; null for <see cref="NoNumericResult"/>.</summary>
    public Concentration? Value { get; }

    /// <summary>True when the blank gave a number.</summary>
    public bool IsNumeric => Value is not null;

    /// <summary>A blank with a numeric result (any finite value, negative included).</summary>
    /// <param name="value">The measured concentration.</param>
    /// <returns>The blank result.</returns>
    public static BlankResult Numeric(Concentration value) => new(value);

    /// <inheritdoc />
    public bool Equals(BlankResult? other) => other is not null && Nullable.Equals(Value, other.Value);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as BlankResult);

    /// <inheritdoc />
    public override int GetHashCode() => Value?.GetHashCode() ?? 0;

    /// <summary>Prints the concentration, or "no numeric result".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Value is Concentration c ? c.ToString() : "no numeric result";
}
