using System;
using System.Globalization;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// One measurement of a solution: the analyte signal and the internal-standard (IS) signal read in the same
/// injection, aspiration or scan (peak areas, counts or intensities — any consistent signal unit).
/// </summary>
/// <remarks>
/// <para>The response used for calibration is the signal ratio <see cref="Ratio"/> = analyte / IS
/// (SW-846 Method 8000C §11.4.3 response-factor form).</para>
/// <para>The IS signal must be finite and &gt; 0 (it is a divisor). The analyte signal may be any finite number,
/// including zero and negative values: blank-corrected intensities (e.g. ICP-MS counts after subtracting the
/// calibration blank) legitimately scatter around zero, and dropping them would bias the low end.</para>
/// <para>Immutable; equality is exact on both signals.</para>
/// </remarks>
public sealed class Injection : IEquatable<Injection>
{
    /// <summary>Creates an injection.</summary>
    /// <param name="analyteSignal">Analyte signal; any finite number (negative allowed for blank-corrected signals).</param>
    /// <param name="internalStandardSignal">IS signal in the same injection; finite and &gt; 0.</param>
    /// <exception cref="ArgumentOutOfRangeException">A signal is NaN or ±∞, the IS signal is ≤ 0, or the ratio overflows.</exception>
    public Injection(double analyteSignal, double internalStandardSignal)
    {
        AnalyteSignal = Guard.Finite(analyteSignal, nameof(analyteSignal));
        InternalStandardSignal = Guard.Positive(internalStandardSignal, nameof(internalStandardSignal));
        Ratio = analyteSignal / internalStandardSignal;
        if (double.IsInfinity(Ratio))
        {
            throw Guard.OutOfRange(
                nameof(internalStandardSignal),
                internalStandardSignal,
                "large enough that analyte/IS (" + Guard.Format(analyteSignal) + " / " + Guard.Format(internalStandardSignal) + ") is finite");
        }
    }

    /// <summary>Analyte signal (signal units, e.g. peak area or counts).</summary>
    public double AnalyteSignal { get; }

    /// <summary>Internal-standard signal (same signal units), &gt; 0.</summary>
    public double InternalStandardSignal { get; }

    /// <summary>Response ratio analyte / IS (dimensionless).</summary>
    public double Ratio { get; }

    /// <summary>Prints "A = 10250, IS = 50000 (ratio 0.205)", invariant culture.</summary>
    /// <returns>The text.</returns>
    public override string ToString() => string.Format(
        CultureInfo.InvariantCulture,
        "A = {0:G10}, IS = {1:G10} (ratio {2:G6})",
        AnalyteSignal,
        InternalStandardSignal,
        Ratio);

    /// <inheritdoc />
    public bool Equals(Injection? other) =>
        other is not null && AnalyteSignal.Equals(other.AnalyteSignal) && InternalStandardSignal.Equals(other.InternalStandardSignal);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Injection);

    /// <inheritdoc />
    public override int GetHashCode() => (Normalize(AnalyteSignal), InternalStandardSignal).GetHashCode();

    // +0 and -0 compare equal; make them hash equal too.
    private static double Normalize(double value) => value == 0 ? 0 : value;
}
