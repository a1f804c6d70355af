using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// The signals read in one injection: per analyte and per internal standard (IS), by name, in any consistent signal
/// unit (counts, intensities, peak areas).
/// </summary>
/// <remarks>
/// <para>A signal that was not recorded is simply absent; <see cref="Analyte"/> and <see cref="InternalStandard"/>
/// then return null and processing flags the row (it never drops it). Zero and negative values are accepted here
/// (blank-corrected signals scatter around zero) and judged during processing: an IS signal ≤ 0 cannot be a divisor
/// and is flagged as invalid.</para>
/// <para>Names are compared ordinally (case-sensitive), trimmed of nothing. Immutable; equality is exact (same names,
/// identical values).</para>
/// </remarks>
public sealed class InjectionSignals : IEquatable<InjectionSignals>
{
    private readonly SortedDictionary<string, double> _analytes;
    private readonly SortedDictionary<string, double> _internalStandards;

    /// <summary>Creates the signals of one injection.</summary>
    /// <param name="analytes">Analyte name → signal; names not blank; values finite (absent = not recorded).</param>
    /// <param name="internalStandards">IS name → signal; names not blank; values finite (absent = not recorded).</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">A name is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A value is NaN or ±∞ (the message names the signal).</exception>
    public InjectionSignals(IReadOnlyDictionary<string, double> analytes, IReadOnlyDictionary<string, double> internalStandards)
    {
        _analytes = Copy(analytes, nameof(analytes));
        _internalStandards = Copy(internalStandards, nameof(internalStandards));
    }

    private InjectionSignals(SortedDictionary<string, double> analytes, SortedDictionary<string, double> internalStandards)
    {
        _analytes = analytes;
        _internalStandards = internalStandards;
    }

    /// <summary>No signals at all.</summary>
    public static InjectionSignals Empty { get; } = new(new SortedDictionary<string, double>(StringComparer.Ordinal), new SortedDictionary<string, double>(StringComparer.Ordinal));

    /// <summary>Analyte signals by name (ordinal order).</summary>
    public IReadOnlyDictionary<string, double> Analytes => _analytes;

    /// <summary>IS signals by name (ordinal order).</summary>
    public IReadOnlyDictionary<string, double> InternalStandards => _internalStandards;

    /// <summary>The signal of an analyte, or null when it was not recorded.</summary>
    /// <param name="name">Analyte name.</param>
    /// <returns>The signal or null.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    public double? Analyte(string name) => _analytes.TryGetValue(Guard.NotNull(name, nameof(name)), out double v) ? v : null;

    /// <summary>The signal of an internal standard, or null when it was not recorded.</summary>
    /// <param name="name">IS name.</param>
    /// <returns>The signal or null.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    public double? InternalStandard(string name) => _internalStandards.TryGetValue(Guard.NotNull(name, nameof(name)), out double v) ? v : null;

    /// <summary>A copy with one analyte signal set (added or replaced).</summary>
    /// <param name="name">Analyte name, not blank.</param>
    /// <param name="signal">Finite signal.</param>
    /// <returns>The new signals.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="signal"/> is NaN or ±∞.</exception>
    public InjectionSignals WithAnalyte(string name, double signal) =>
        new(With(_analytes, name, signal, nameof(signal)), _internalStandards);

    /// <summary>A copy with one IS signal set (added or replaced).</summary>
    /// <param name="name">IS name, not blank.</param>
    /// <param name="signal">Finite signal.</param>
    /// <returns>The new signals.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is blank.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="signal"/> is NaN or ±∞.</exception>
    public InjectionSignals WithInternalStandard(string name, double signal) =>
        new(_analytes, With(_internalStandards, name, signal, nameof(signal)));

    /// <inheritdoc />
    public bool Equals(InjectionSignals? other) =>
        other is not null && SameMap(_analytes, other._analytes) && SameMap(_internalStandards, other._internalStandards);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as InjectionSignals);

    /// <inheritdoc />
    public override int GetHashCode() => (_analytes.Count, _internalStandards.Count).GetHashCode();

    /// <summary>Prints "Pb = 1200, Cd = 35; IS Bi = 50000" (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        string.Join(", ", _analytes.Select(p => p.Key + " = " + Text.Signal(p.Value)))
        + "; IS " + string.Join(", ", _internalStandards.Select(p => p.Key + " = " + Text.Signal(p.Value)));

    private static SortedDictionary<string, double> Copy(IReadOnlyDictionary<string, double> source, string paramName)
    {
        Guard.NotNull(source, paramName);
        var copy = new SortedDictionary<string, double>(StringComparer.Ordinal);
        foreach (KeyValuePair<string, double> p in source)
        {
            Check(p.Key, p.Value, paramName);
            copy[p.Key] = p.Value;
        }

        return copy;
    }

    private static SortedDictionary<string, double> With(SortedDictionary<string, double> source, string name, double signal, string paramName)
    {
        Guard.NotNull(name, nameof(name));
        if (string.IsNullOrWhiteSpace(name))
        {
            throw new ArgumentException("Parameter 'name' is empty or white space; a signal needs a name.", nameof(name));
        }

        Guard.Finite(signal, paramName);
        var copy = new SortedDictionary<string, double>(source, StringComparer.Ordinal) { [name] = signal };
        return copy;
    }

    private static void Check(string name, double value, string paramName)
    {
        if (string.IsNullOrWhiteSpace(name))
        {
            throw new ArgumentException($"Parameter '{paramName}' has an empty or white-space name; every signal needs a name.", paramName);
        }

        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"Parameter '{paramName}' has signal '{name}' = {Guard.Format(value)}; a signal must be finite (leave a missing signal out).");
        }
    }

    private static bool SameMap(SortedDictionary<string, double> a, SortedDictionary<string, double> b) =>
        a.Count == b.Count && a.All(p => b.TryGetValue(p.Key, out double v) && v.Equals(p.Value));
}
