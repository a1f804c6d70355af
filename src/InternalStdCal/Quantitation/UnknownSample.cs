using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Quantitation;

/// <summary>
/// A measured solution of unknown analyte concentration: its IS concentration (as spiked into the measured
/// solution) and one or more injections.
/// </summary>
/// <remarks>Immutable.</remarks>
public sealed class UnknownSample
{
    private readonly Injection[] _injections;

    /// <summary>Creates an unknown sample.</summary>
    /// <param name="label">Identity shown in reports; not blank.</param>
    /// <param name="internalStandardConcentration">IS concentration in the measured solution, &gt; 0.</param>
    /// <param name="injections">One or more injections; their mean response ratio is used.</param>
    /// <exception cref="ArgumentNullException">An argument or injection is null.</exception>
    /// <exception cref="ArgumentException">The label is blank or there are no injections.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The IS concentration is ≤ 0.</exception>
    public UnknownSample(string label, Concentration internalStandardConcentration, IEnumerable<Injection> injections)
    {
        Guard.NotNull(label, nameof(label));
        if (string.IsNullOrWhiteSpace(label))
        {
            throw new ArgumentException("Parameter 'label' is empty or white space; a sample needs a visible identity.", nameof(label));
        }

        if (!(internalStandardConcentration.Value > 0))
        {
            throw new ArgumentOutOfRangeException(
                nameof(internalStandardConcentration),
                internalStandardConcentration.Value,
                $"Parameter 'internalStandardConcentration' of sample '{label}' was {internalStandardConcentration}; it must be > 0.");
        }

        _injections = Guard.NotNull(injections, nameof(injections)).ToArray();
        if (_injections.Length == 0)
        {
            throw new ArgumentException($"Parameter 'injections' of sample '{label}' is empty; at least one injection is required.", nameof(injections));
        }

        for (int i = 0; i < _injections.Length; i++)
        {
            if (_injections[i] is null)
            {
                throw new ArgumentNullException(nameof(injections), FormattableString.Invariant($"Parameter 'injections' of sample '{label}' has a null element at index {i}."));
            }
        }

        Label = label;
        InternalStandardConcentration = internalStandardConcentration;
    }

    /// <summary>Creates an unknown sample from injections given inline.</summary>
    /// <param name="label">Identity; not blank.</param>
    /// <param name="internalStandardConcentration">IS concentration in the measured solution, &gt; 0.</param>
    /// <param name="injections">One or more injections.</param>
    /// <returns>The sample.</returns>
    /// <exception cref="ArgumentNullException">An argument or injection is null.</exception>
    /// <exception cref="ArgumentException">The label is blank or there are no injections.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The IS concentration is ≤ 0.</exception>
    public static UnknownSample Create(string label, Concentration internalStandardConcentration, params Injection[] injections) =>
        new(label, internalStandardConcentration, injections);

    /// <summary>Identity of the sample.</summary>
    public string Label { get; }

    /// <summary>IS concentration in the measured solution.</summary>
    public Concentration InternalStandardConcentration { get; }

    /// <summary>The injections.</summary>
    public IReadOnlyList<Injection> Injections => _injections;

    /// <summary>Mean response ratio analyte/IS of the injections.</summary>
    public double MeanResponse
    {
        get
        {
            // Summed in order from the first ratio, then divided by the count (as Enumerable.Average), without allocating.
            double sum = _injections[0].Ratio;
            for (int i = 1; i < _injections.Length; i++)
            {
                sum += _injections[i].Ratio;
            }

            return sum / _injections.Length;
        }
    }

    /// <summary>Prints e.g. "RF-19: 2 injections, mean ratio 0.010171, IS 10 µg/L" (invariant culture, ratio to 6
    /// significant digits).</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Format(
        CultureInfo.InvariantCulture,
        "{0}: {1} injection{2}, mean ratio {3:G6}, IS {4}",
        Label,
        _injections.Length,
        _injections.Length == 1 ? string.Empty : "s",
        MeanResponse,
        InternalStandardConcentration);
}
