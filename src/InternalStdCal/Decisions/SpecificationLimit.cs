using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>
/// A specification (tolerance) limit for a concentration: a maximum (<see cref="LimitDirection.Upper"/>) or a
/// minimum (<see cref="LimitDirection.Lower"/>) that the true value must respect.
/// </summary>
/// <remarks>
/// <para>Immutable. Results assessed against the limit must be concentrations of the same kind (mass concentration,
/// amount concentration or mass fraction); they are converted to the limit's unit before comparison.</para>
/// <para>Equality is exact: same direction, same name and equal <see cref="Concentration"/> values.</para>
/// <para>The limit itself comes from the specification, regulation or contract; the library does not judge it.
/// Decisions against it support, never replace, the responsible analyst's decision: the laboratory's validated
/// method, its quality system, local regulations and licensed practice decide.</para>
/// </remarks>
public sealed class SpecificationLimit : IEquatable<SpecificationLimit>
{
    private SpecificationLimit(Concentration value, LimitDirection direction, string? name)
    {
        Value = value;
        Direction = direction;
        Name = name;
    }

    /// <summary>The limit value.</summary>
    public Concentration Value { get; }

    /// <summary>Whether the limit is a maximum or a minimum.</summary>
    public LimitDirection Direction { get; }

    /// <summary>An optional name printed in reports (e.g. "maximum permitted value"); null when none was given.</summary>
    public string? Name { get; }

    /// <summary>An upper limit (maximum): the true value must not exceed it.</summary>
    /// <param name="value">The limit; any finite concentration.</param>
    /// <returns>The limit.</returns>
    public static SpecificationLimit Upper(Concentration value) => new(value, LimitDirection.Upper, null);

    /// <summary>A named upper limit (maximum).</summary>
    /// <param name="value">The limit; any finite concentration.</param>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <returns>The limit.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is empty or white space.</exception>
    public static SpecificationLimit Upper(Concentration value, string name) => new(value, LimitDirection.Upper, Guard.NotBlank(name, nameof(name)));

    /// <summary>A lower limit (minimum): the true value must not fall below it.</summary>
    /// <param name="value">The limit; any finite concentration.</param>
    /// <returns>The limit.</returns>
    public static SpecificationLimit Lower(Concentration value) => new(value, LimitDirection.Lower, null);

    /// <summary>A named lower limit (minimum).</summary>
    /// <param name="value">The limit; any finite concentration.</param>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <returns>The limit.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is empty or white space.</exception>
    public static SpecificationLimit Lower(Concentration value, string name) => new(value, LimitDirection.Lower, Guard.NotBlank(name, nameof(name)));

    /// <summary>Prints e.g. "upper limit 10 µg/L" or "upper limit 10 µg/L (maximum permitted value)".</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString()
    {
        string text = (Direction == LimitDirection.Upper ? "upper limit " : "lower limit ") + Value.ToString("G6", CultureInfo.InvariantCulture);
        return Name is null ? text : text + " (" + Name + ")";
    }

    /// <inheritdoc />
    public bool Equals(SpecificationLimit? other) =>
        other is not null && Direction == other.Direction && Value.Equals(other.Value) && string.Equals(Name, other.Name, StringComparison.Ordinal);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as SpecificationLimit);

    /// <inheritdoc />
    public override int GetHashCode() => (Value, Direction, Name).GetHashCode();

    /// <summary>Converts a result to the limit's unit; a result of another kind is refused.</summary>
    internal double ValueOf(Concentration result, string paramName)
    {
        if (result.Kind != Value.Kind)
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' was {result} ({result.Kind}) but the limit is {Value} ({Value.Kind}); results must be of the same kind as the limit.",
                paramName);
        }

        return result.In(Value.Unit);
    }

    internal Concentration InUnit(double value) => Concentration.From(value, Value.Unit);
}
