using System;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Uncertainty;

/// <summary>The probability distribution assigned to an input quantity for Monte Carlo propagation (JCGM 101:2008 §6.4).</summary>
public enum InputDistribution
{
    /// <summary>Gaussian N(x, u²) (JCGM 101:2008 §6.4.7).</summary>
    Normal = 0,

    /// <summary>Rectangular on [x − a, x + a], u = a/√3 (JCGM 101:2008 §6.4.2; JCGM 100:2008 §4.3.7).</summary>
    Rectangular,

    /// <summary>Symmetric triangular on [x − a, x + a], u = a/√6 (JCGM 101:2008 §6.4.5; JCGM 100:2008 §4.3.9).</summary>
    Triangular,

    /// <summary>Scaled and shifted Student t: x + u·t_ν, the distribution of a Type A input from ν + 1 observations
    /// (JCGM 101:2008 §6.4.9). Its standard deviation is u·√(ν/(ν − 2)) for ν &gt; 2 and infinite otherwise.</summary>
    StudentT,
}

/// <summary>
/// A named input quantity xᵢ of a measurement model: value, standard uncertainty u(xᵢ), degrees of freedom νᵢ,
/// unit text, and the distribution used by Monte Carlo propagation.
/// </summary>
/// <remarks>
/// Immutable; validated at creation; reference equality (inputs are identified by <see cref="Name"/> inside a
/// <see cref="MeasurementModel"/>). The GUM evaluation uses only value, u and ν; the distribution matters only for
/// Monte Carlo.
/// </remarks>
public sealed class UncertainInput
{
    private UncertainInput(string name, double value, double standardUncertainty, double degreesOfFreedom, string unit, InputDistribution distribution)
    {
        Name = name;
        Value = value;
        StandardUncertainty = standardUncertainty;
        DegreesOfFreedom = degreesOfFreedom;
        Unit = unit;
        Distribution = distribution;
    }

    /// <summary>The name, unique within a model (compared ordinally).</summary>
    public string Name { get; }

    /// <summary>The best estimate xᵢ, finite, in <see cref="Unit"/>.</summary>
    public double Value { get; }

    /// <summary>The standard uncertainty u(xᵢ) ≥ 0, in <see cref="Unit"/> (the scale factor for a Student-t input).</summary>
    public double StandardUncertainty { get; }

    /// <summary>Degrees of freedom νᵢ ≥ 1 of u(xᵢ), or <see cref="double.PositiveInfinity"/> for a well-known value.</summary>
    public double DegreesOfFreedom { get; }

    /// <summary>Unit text, free form (may be empty for a dimensionless factor).</summary>
    public string Unit { get; }

    /// <summary>The distribution for Monte Carlo sampling.</summary>
    public InputDistribution Distribution { get; }

    /// <summary>The half-width a of a rectangular (u·√3) or triangular (u·√6) input; null for the other distributions.</summary>
    public double? HalfWidth => Distribution switch
    {
        InputDistribution.Rectangular => StandardUncertainty * Math.Sqrt(3),
        InputDistribution.Triangular => StandardUncertainty * Math.Sqrt(6),
        _ => null,
    };

    /// <summary>A normally distributed input.</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="value">Finite value.</param>
    /// <param name="standardUncertainty">u ≥ 0, finite.</param>
    /// <param name="degreesOfFreedom">ν ≥ 1, or +∞ (default) for a well-known value.</param>
    /// <param name="unit">Unit text; null means empty.</param>
    /// <returns>The input.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A number is outside its range.</exception>
    public static UncertainInput Normal(string name, double value, double standardUncertainty, double degreesOfFreedom = double.PositiveInfinity, string? unit = null) =>
        Create(name, value, standardUncertainty, degreesOfFreedom, unit, InputDistribution.Normal);

    /// <summary>A rectangular input on [value − a, value + a]: u = a/√3, ν = ∞ (JCGM 100:2008 §4.3.7).</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="value">Finite centre.</param>
    /// <param name="halfWidth">a ≥ 0, finite.</param>
    /// <param name="unit">Unit text; null means empty.</param>
    /// <returns>The input.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A number is outside its range.</exception>
    public static UncertainInput Rectangular(string name, double value, double halfWidth, string? unit = null) =>
        Create(name, value, Guard.NonNegative(halfWidth, nameof(halfWidth)) / Math.Sqrt(3), double.PositiveInfinity, unit, InputDistribution.Rectangular);

    /// <summary>A symmetric triangular input on [value − a, value + a]: u = a/√6, ν = ∞ (JCGM 100:2008 §4.3.9).</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="value">Finite centre.</param>
    /// <param name="halfWidth">a ≥ 0, finite.</param>
    /// <param name="unit">Unit text; null means empty.</param>
    /// <returns>The input.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A number is outside its range.</exception>
    public static UncertainInput Triangular(string name, double value, double halfWidth, string? unit = null) =>
        Create(name, value, Guard.NonNegative(halfWidth, nameof(halfWidth)) / Math.Sqrt(6), double.PositiveInfinity, unit, InputDistribution.Triangular);

    /// <summary>A Type A input: mean x̄ of n observations, u = s/√n, ν = n − 1, sampled by Monte Carlo as
    /// x̄ + u·t_ν (JCGM 101:2008 §6.4.9).</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="value">Finite mean.</param>
    /// <param name="standardUncertainty">u = s/√n ≥ 0, finite.</param>
    /// <param name="degreesOfFreedom">ν ≥ 1, finite.</param>
    /// <param name="unit">Unit text; null means empty.</param>
    /// <returns>The input.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A number is outside its range (ν must be finite here).</exception>
    public static UncertainInput StudentT(string name, double value, double standardUncertainty, double degreesOfFreedom, string? unit = null)
    {
        if (!(degreesOfFreedom >= 1) || double.IsInfinity(degreesOfFreedom))
        {
            throw Guard.OutOfRange(nameof(degreesOfFreedom), degreesOfFreedom, "a finite number >= 1 (use Normal for infinite degrees of freedom)");
        }

        return Create(name, value, standardUncertainty, degreesOfFreedom, unit, InputDistribution.StudentT);
    }

    /// <summary>An input from a measured concentration; the distribution follows how u was obtained (see remarks of
    /// <see cref="From(string, Measured{Volume})"/>).</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="measured">The measured value.</param>
    /// <returns>The input, with the unit symbol of the concentration.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    public static UncertainInput From(string name, Measured<Concentration> measured) =>
        FromMeasured(name, measured.Value.Value, measured.StandardUncertainty.Value, measured.DegreesOfFreedom, measured.Evaluation, Concentration.SymbolOf(measured.Value.Unit));

    /// <summary>An input from a measured volume.</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="measured">The measured value.</param>
    /// <returns>The input, with the unit symbol of the volume.</returns>
    /// <remarks>Distribution (JCGM 101:2008 §6.4, common practice): <see cref="UncertaintyEvaluation.TypeBRectangular"/>
    /// → rectangular; <see cref="UncertaintyEvaluation.TypeBTriangular"/> → triangular; finite degrees of freedom
    /// (Type A) → Student t; otherwise normal. A null ν becomes +∞.</remarks>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    public static UncertainInput From(string name, Measured<Volume> measured) =>
        FromMeasured(name, measured.Value.Value, measured.StandardUncertainty.Value, measured.DegreesOfFreedom, measured.Evaluation, UnitTable.Symbol(measured.Value.Unit));

    /// <summary>An input from a measured mass (distribution as for <see cref="From(string, Measured{Volume})"/>).</summary>
    /// <param name="name">Name, not blank.</param>
    /// <param name="measured">The measured value.</param>
    /// <returns>The input, with the unit symbol of the mass.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    public static UncertainInput From(string name, Measured<Mass> measured) =>
        FromMeasured(name, measured.Value.Value, measured.StandardUncertainty.Value, measured.DegreesOfFreedom, measured.Evaluation, UnitTable.Symbol(measured.Value.Unit));

    /// <summary>Prints e.g. "V = 100 mL, u = 0.07 mL, ν = ∞, Normal" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        Name + " = " + Text(Value) + Suffix(Unit) + ", u = " + Text(StandardUncertainty) + Suffix(Unit) + ", ν = " + Nu(DegreesOfFreedom) + ", " + Distribution;

    internal static UncertainInput FromMeasured(string name, double value, double u, double? nu, UncertaintyEvaluation evaluation, string unit)
    {
        InputDistribution distribution = evaluation switch
        {
            UncertaintyEvaluation.TypeBRectangular => InputDistribution.Rectangular,
            UncertaintyEvaluation.TypeBTriangular => InputDistribution.Triangular,
            _ => nu is null ? InputDistribution.Normal : InputDistribution.StudentT,
        };
        return Create(name, value, u, nu ?? double.PositiveInfinity, unit, distribution);
    }

    internal static string Text(double x) => x.ToString("G6", CultureInfo.InvariantCulture);

    internal static string Nu(double nu) => double.IsPositiveInfinity(nu) ? "∞" : nu.ToString("G4", CultureInfo.InvariantCulture);

    private static string Suffix(string unit) => unit.Length == 0 ? string.Empty : " " + unit;

    private static UncertainInput Create(string name, double value, double standardUncertainty, double degreesOfFreedom, string? unit, InputDistribution distribution)
    {
        Guard.NotBlank(name, nameof(name));
        Guard.Finite(value, nameof(value));
        Guard.NonNegative(standardUncertainty, nameof(standardUncertainty));
        if (!(degreesOfFreedom >= 1))
        {
            throw Guard.OutOfRange(nameof(degreesOfFreedom), degreesOfFreedom, "a number >= 1, or +infinity");
        }

        return new UncertainInput(name, value, standardUncertainty, degreesOfFreedom, unit ?? string.Empty, distribution);
    }
}
