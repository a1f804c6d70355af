using System;
using System.Collections.Generic;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// One candidate internal standard for <see cref="InternalStandardSelection"/>: its name, its signals in the same
/// injections as the analyte, and optionally its signals in method blanks prepared without the internal standard.
/// </summary>
/// <remarks>Immutable; the lists are copied and validated at creation.</remarks>
public sealed class InternalStandardSelectionCandidate
{
    /// <summary>Creates a candidate.</summary>
    /// <param name="name">Name (e.g. an isotope or compound label); not blank.</param>
    /// <param name="signals">Signals (counts, peak areas, ...) in the same injections, same order as the analyte's;
    /// at least one; each finite and &gt; 0 (ratios and logarithms need positive signals).</param>
    /// <param name="methodBlankSignals">Optional signals of the candidate in method blanks prepared without the
    /// internal-standard spike (does the candidate occur in the samples or reagents?); each finite and ≥ 0;
    /// null or empty when not measured.</param>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> or <paramref name="signals"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank, <paramref name="signals"/> is empty, or a
    /// signal is missing (NaN), infinite or not positive, or a blank signal is not finite or negative; the message
    /// names the candidate and the index.</exception>
    public InternalStandardSelectionCandidate(string name, IReadOnlyList<double> signals, IReadOnlyList<double>? methodBlankSignals = null)
    {
        Name = Guard.NotBlank(name, nameof(name));
        Guard.NotEmpty(signals, nameof(signals));
        var copy = new double[signals.Count];
        for (int i = 0; i < copy.Length; i++)
        {
            copy[i] = CheckSignal(signals[i], name, i, nameof(signals), positive: true);
        }

        var blanks = new double[methodBlankSignals?.Count ?? 0];
        for (int i = 0; i < blanks.Length; i++)
        {
            blanks[i] = CheckSignal(methodBlankSignals![i], name, i, nameof(methodBlankSignals), positive: false);
        }

        Signals = Array.AsReadOnly(copy);
        MethodBlankSignals = Array.AsReadOnly(blanks);
    }

    /// <summary>Name of the candidate.</summary>
    public string Name { get; }

    /// <summary>Signals in the injections (&gt; 0).</summary>
    public IReadOnlyList<double> Signals { get; }

    /// <summary>Signals in method blanks without the internal-standard spike (≥ 0); empty when not measured.</summary>
    public IReadOnlyList<double> MethodBlankSignals { get; }

    internal static double CheckSignal(double value, string name, int index, string paramName, bool positive)
    {
        bool ok = positive ? value > 0 && !double.IsPositiveInfinity(value) : value >= 0 && !double.IsPositiveInfinity(value);
        if (!ok)
        {
            string what = double.IsNaN(value) ? "missing (NaN)" : Guard.Format(value);
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{paramName}' of '{name}' at index {index} was {what}; every value must be a finite number {(positive ? "> 0" : ">= 0")}."),
                paramName);
        }

        return value;
    }
}
