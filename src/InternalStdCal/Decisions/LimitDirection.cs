namespace InternalStdCal.Decisions;

/// <summary>Which side of a <see cref="SpecificationLimit"/> is permitted.</summary>
public enum LimitDirection
{
    /// <summary>A maximum: the true value must not exceed the limit (e.g. a maximum permitted concentration).</summary>
    Upper = 0,

    /// <summary>A minimum: the true value must not fall below the limit (e.g. a minimum content).</summary>
    Lower,
}
