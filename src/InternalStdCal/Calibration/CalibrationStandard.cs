using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>
/// A calibration standard (calibrator): a solution with a known (nominal) analyte concentration and a known
/// internal-standard (IS) concentration, measured in one or more injections.
/// </summary>
/// <remarks>
/// <para>A standard with analyte concentration 0 is a blank (with IS: the "zero calibrator" of ICH M10). Blanks are
/// kept or excluded from a fit by <see cref="CalibrationOptions.Blanks"/>; they never receive a relative error
/// (it is undefined at a nominal value of 0).</para>
/// <para>Immutable. Equality is exact: same label (ordinal), equal concentrations (see <see cref="Concentration"/>)
/// and equal injections in the same order.</para>
/// </remarks>
public sealed class CalibrationStandard : IEquatable<CalibrationStandard>
{
    private readonly Injection[] _injections;

    /// <summary>Creates a calibration standard.</summary>
    /// <param name="label">Identity shown in reports (e.g. "CAL-3"); not empty or white space.</param>
    /// <param name="analyteConcentration">Nominal analyte concentration, ≥ 0 (0 = blank).</param>
    /// <param name="internalStandardConcentration">IS concentration in the same solution, &gt; 0.</param>
    /// <param name="injections">One or more injections of this solution.</param>
    /// <exception cref="ArgumentNullException"><paramref name="label"/> or <paramref name="injections"/> (or an element) is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="label"/> is blank, or <paramref name="injections"/> is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A concentration is out of range.</exception>
    public CalibrationStandard(string label, Concentration analyteConcentration, Concentration internalStandardConcentration, IEnumerable<Injection> injections)
    {
        Guard.NotNull(label, nameof(label));
        if (string.IsNullOrWhiteSpace(label))
        {
            throw new ArgumentException("Parameter 'label' is empty or white space; a standard needs a visible identity.", nameof(label));
        }

        if (analyteConcentration.Value < 0)
        {
            throw new ArgumentOutOfRangeException(
                nameof(analyteConcentration),
                analyteConcentration.Value,
                $"Parameter 'analyteConcentration' of standard '{label}' was {analyteConcentration}; it must be >= 0 (0 marks a blank).");
        }

        if (!(internalStandardConcentration.Value > 0))
        {
            throw new ArgumentOutOfRangeException(
                nameof(internalStandardConcentration),
                internalStandardConcentration.Value,
                $"Parameter 'internalStandardConcentration' of standard '{label}' was {internalStandardConcentration}; it must be > 0.");
        }

        Guard.NotNull(injections, nameof(injections));
        _injections = injections.ToArray();
        if (_injections.Length == 0)
        {
            throw new ArgumentException($"Parameter 'injections' of standard '{label}' is empty; at least one injection is required.", nameof(injections));
        }

        for (int i = 0; i < _injections.Length; i++)
        {
            if (_injections[i] is null)
            {
                throw new ArgumentNullException(nameof(injections), FormattableString.Invariant($"Parameter 'injections' of standard '{label}' has a null element at index {i}."));
            }
        }

        Label = label;
        AnalyteConcentration = analyteConcentration;
        InternalStandardConcentration = internalStandardConcentration;
    }

    /// <summary>Creates a calibration standard from injections given inline.</summary>
    /// <param name="label">Identity shown in reports; not empty.</param>
    /// <param name="analyteConcentration">Nominal analyte concentration, ≥ 0 (0 = blank).</param>
    /// <param name="internalStandardConcentration">IS concentration, &gt; 0.</param>
    /// <param name="injections">One or more injections.</param>
    /// <returns>The standard.</returns>
    /// <exception cref="ArgumentNullException">An argument or injection is null.</exception>
    /// <exception cref="ArgumentException">The label is blank or no injection is given.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A concentration is out of range.</exception>
    public static CalibrationStandard Create(string label, Concentration analyteConcentration, Concentration internalStandardConcentration, params Injection[] injections) =>
        new(label, analyteConcentration, internalStandardConcentration, injections);

    /// <summary>Identity of the standard.</summary>
    public string Label { get; }

    /// <summary>Nominal analyte concentration (≥ 0).</summary>
    public Concentration AnalyteConcentration { get; }

    /// <summary>IS concentration in the standard (&gt; 0).</summary>
    public Concentration InternalStandardConcentration { get; }

    /// <summary>The injections, in the order given.</summary>
    public IReadOnlyList<Injection> Injections => _injections;

    /// <summary>True when the nominal analyte concentration is zero.</summary>
    public bool IsBlank => AnalyteConcentration.Value == 0;

    /// <summary>Prints "CAL-1: 1 mg/L analyte, 5 mg/L IS, 2 injections".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Format(
        CultureInfo.InvariantCulture,
        "{0}: {1} analyte, {2} IS, {3} injection{4}",
        Label,
        AnalyteConcentration,
        InternalStandardConcentration,
        _injections.Length,
        _injections.Length == 1 ? string.Empty : "s");

    /// <inheritdoc />
    public bool Equals(CalibrationStandard? other) =>
        other is not null
        && string.Equals(Label, other.Label, StringComparison.Ordinal)
        && AnalyteConcentration.Equals(other.AnalyteConcentration)
        && InternalStandardConcentration.Equals(other.InternalStandardConcentration)
        && _injections.SequenceEqual(other._injections);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as CalibrationStandard);

    /// <inheritdoc />
    public override int GetHashCode() => (Label, AnalyteConcentration, _injections.Length).GetHashCode();
}
