using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Preparation;

/// <summary>
/// Standard uncertainties of delivered and contained volumes: class A one-mark pipettes and flasks from built-in
/// tolerance tables, adjustable pipettes from the caller's specification, the temperature effect, and the
/// root-sum-square combination of components (EURACHEM/CITAC QUAM example A1).
/// </summary>
/// <remarks>
/// The class A tolerances are from memory of ISO 648 (one-mark pipettes) and ISO 1042 (one-mark volumetric flasks)
/// and have not been checked against the current editions; use the tolerance printed on your glassware or its
/// calibration certificate (<see cref="Measured.FromTolerance{T}"/>) where it differs.
/// </remarks>
public static class VolumetricEquipment
{
    // Nominal volume (mL) and class A tolerance ± (mL). ISO 648, from memory (field-reference §7.3).
    private static readonly (double Nominal, double Tolerance)[] OneMarkPipettes =
    {
        (1, 0.008), (2, 0.010), (5, 0.015), (10, 0.020), (20, 0.030), (25, 0.030), (50, 0.050), (100, 0.080),
    };

    // Nominal volume (mL) and class A tolerance ± (mL). ISO 1042, from memory (field-reference §7.3).
    private static readonly (double Nominal, double Tolerance)[] OneMarkFlasks =
    {
        (10, 0.025), (25, 0.04), (50, 0.06), (100, 0.10), (250, 0.15), (500, 0.25), (1000, 0.40), (2000, 0.60),
    };

    /// <summary>Nominal sizes of the built-in class A one-mark pipette table (ISO 648, from memory):
    /// 1, 2, 5, 10, 20, 25, 50, 100 mL.</summary>
    public static IReadOnlyList<Volume> ClassAOneMarkPipetteSizes { get; } = Sizes(OneMarkPipettes);

    /// <summary>Nominal sizes of the built-in class A one-mark flask table (ISO 1042, from memory):
    /// 10, 25, 50, 100, 250, 500, 1000, 2000 mL.</summary>
    public static IReadOnlyList<Volume> ClassAOneMarkFlaskSizes { get; } = Sizes(OneMarkFlasks);

    /// <summary>The cubic expansion coefficient of water near 20 °C, 2.1 × 10⁻⁴ K⁻¹ (QUAM example A1; the value is
    /// confirmed in field-reference §7.3).</summary>
    public static double WaterExpansionCoefficientPerKelvin => 2.1e-4;

    /// <summary>The class A tolerance of a one-mark pipette (ISO 648, from memory).</summary>
    /// <param name="nominal">A tabulated nominal volume (see <see cref="ClassAOneMarkPipetteSizes"/>), in any unit.</param>
    /// <returns>The tolerance ± a, in mL.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="nominal"/> is not in the table; the message lists the sizes.</exception>
    public static Volume ClassAOneMarkPipetteTolerance(Volume nominal) =>
        Volume.FromMillilitres(Lookup(OneMarkPipettes, nominal, nameof(nominal), "class A one-mark pipettes (ISO 648)"));

    /// <summary>The class A tolerance of a one-mark volumetric flask (ISO 1042, from memory).</summary>
    /// <param name="nominal">A tabulated nominal volume (see <see cref="ClassAOneMarkFlaskSizes"/>), in any unit.</param>
    /// <returns>The tolerance ± a, in mL.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="nominal"/> is not in the table; the message lists the sizes.</exception>
    public static Volume ClassAOneMarkFlaskTolerance(Volume nominal) =>
        Volume.FromMillilitres(Lookup(OneMarkFlasks, nominal, nameof(nominal), "class A one-mark volumetric flasks (ISO 1042)"));

    /// <summary>The volume delivered by a class A one-mark pipette: the nominal volume with u = a/√3 (rectangular,
    /// JCGM 100:2008 §4.3.7) or a/√6 (triangular, §4.3.9; the QUAM choice for glassware calibration).</summary>
    /// <param name="nominal">A tabulated nominal volume (ISO 648, from memory): 1, 2, 5, 10, 20, 25, 50 or 100 mL.</param>
    /// <param name="distribution">The distribution assumed within the tolerance.</param>
    /// <returns>The volume with its standard uncertainty (calibration tolerance only; add repeatability and
    /// temperature with <see cref="Combine"/>).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="nominal"/> is not in the table, or
    /// <paramref name="distribution"/> is not defined.</exception>
    public static Measured<Volume> ClassAOneMarkPipette(Volume nominal, ToleranceDistribution distribution) =>
        Measured.FromTolerance(nominal, ClassAOneMarkPipetteTolerance(nominal), distribution);

    /// <summary>The volume contained by a class A one-mark flask: the nominal volume with u = a/√3 or a/√6.</summary>
    /// <param name="nominal">A tabulated nominal volume (ISO 1042, from memory): 10, 25, 50, 100, 250, 500, 1000 or 2000 mL.</param>
    /// <param name="distribution">The distribution assumed within the tolerance.</param>
    /// <returns>The volume with its standard uncertainty (calibration tolerance only).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="nominal"/> is not in the table, or
    /// <paramref name="distribution"/> is not defined.</exception>
    public static Measured<Volume> ClassAOneMarkFlask(Volume nominal, ToleranceDistribution distribution) =>
        Measured.FromTolerance(nominal, ClassAOneMarkFlaskTolerance(nominal), distribution);

    /// <summary>
    /// The volume delivered by an adjustable (piston) pipette from its specification: a maximum permissible
    /// systematic error ±e_s (converted with <paramref name="distribution"/>) and a random error given as a standard
    /// deviation s_r: u = √((e_s/√3)² + s_r²) for rectangular (common practice, in the manner of ISO 8655 limits).
    /// </summary>
    /// <param name="setVolume">The volume set; &gt; 0.</param>
    /// <param name="systematicErrorLimit">Maximum permissible systematic error at this volume, ≥ 0.</param>
    /// <param name="randomErrorStandardDeviation">Random error (repeatability) as a standard deviation at this volume, ≥ 0.</param>
    /// <param name="distribution">Distribution assumed for the systematic error.</param>
    /// <returns>The volume with its combined standard uncertainty, in the unit of <paramref name="setVolume"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="setVolume"/> is 0,
    /// <paramref name="distribution"/> is not defined, or a component overflows in the unit of the set volume.</exception>
    public static Measured<Volume> AdjustablePipette(Volume setVolume, Volume systematicErrorLimit, Volume randomErrorStandardDeviation, ToleranceDistribution distribution)
    {
        Guard.PositiveQuantity(setVolume, nameof(setVolume), "a volume");
        (double divisor, _) = Tolerances.Divisor(distribution, nameof(distribution));
        double systematic = In(systematicErrorLimit, setVolume.Unit, nameof(systematicErrorLimit)) / divisor;
        double random = In(randomErrorStandardDeviation, setVolume.Unit, nameof(randomErrorStandardDeviation));
        return Combined(setVolume, new[] { systematic, random });
    }

    /// <summary>
    /// Standard uncertainty of a volume from a temperature that may differ from the calibration temperature by up
    /// to ±ΔT: u = V·α·ΔT/√3 (rectangular; QUAM example A1 with ΔT = 4 K and α of water gives 0.0485 mL for 100 mL).
    /// </summary>
    /// <param name="volume">The volume; ≥ 0.</param>
    /// <param name="temperatureHalfRangeKelvin">ΔT in K (= °C difference), finite and ≥ 0.</param>
    /// <param name="expansionCoefficientPerKelvin">Cubic expansion coefficient α of the liquid in K⁻¹, finite and ≥ 0
    /// (<see cref="WaterExpansionCoefficientPerKelvin"/> for dilute aqueous solutions; the glass's own expansion is
    /// much smaller and neglected, as in QUAM).</param>
    /// <returns>The standard uncertainty, in the unit of <paramref name="volume"/>.</returns>
    /// <exception cref="ArgumentOutOfRangeException">A number is negative, NaN or ±∞, or V·α·ΔT overflows.</exception>
    public static Volume TemperatureEffect(Volume volume, double temperatureHalfRangeKelvin, double expansionCoefficientPerKelvin)
    {
        Guard.NonNegative(temperatureHalfRangeKelvin, nameof(temperatureHalfRangeKelvin));
        Guard.NonNegative(expansionCoefficientPerKelvin, nameof(expansionCoefficientPerKelvin));
        try
        {
            return volume.Scale(expansionCoefficientPerKelvin * temperatureHalfRangeKelvin / Tolerances.RootThree);
        }
        catch (ArgumentOutOfRangeException)
        {
            // u must be a finite volume (common practice: never return ∞ silently).
            throw Guard.OutOfRange(nameof(temperatureHalfRangeKelvin), temperatureHalfRangeKelvin, $"small enough that V·α·ΔT/√3 stays finite (V = {volume}, α = {Guard.Format(expansionCoefficientPerKelvin)} 1/K)");
        }
    }

    /// <summary>
    /// Combines independent standard uncertainty components of one volume by root sum of squares
    /// (JCGM 100:2008 §5.1.2 with unit sensitivity), e.g. calibration, filling repeatability and temperature
    /// (QUAM example A1: 0.041, 0.02 and 0.049 mL give 0.066 mL for 100 mL).
    /// </summary>
    /// <param name="nominal">The volume; &gt; 0.</param>
    /// <param name="standardUncertainties">The components as standard uncertainties (≥ 0 by construction), any unit; at least one.</param>
    /// <returns>The volume with the combined standard uncertainty (evaluation Combined), in the unit of <paramref name="nominal"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standardUncertainties"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="standardUncertainties"/> is empty.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="nominal"/> is 0.</exception>
    public static Measured<Volume> Combine(Volume nominal, params Volume[] standardUncertainties)
    {
        Guard.PositiveQuantity(nominal, nameof(nominal), "a volume");
        Guard.NotEmpty(standardUncertainties, nameof(standardUncertainties));
        return Combined(nominal, standardUncertainties.Select(u => u.In(nominal.Unit)).ToArray());
    }

    private static Measured<Volume> Combined(Volume nominal, double[] components)
    {
        double max = components.Max();
        double sum = 0;
        if (max > 0)
        {
            foreach (double c in components)
            {
                sum += (c / max) * (c / max);
            }
        }

        return Measured.WithStandardUncertainty(nominal, Volume.From(max * Math.Sqrt(sum), nominal.Unit), null, UncertaintyEvaluation.Combined);
    }

    private static double Lookup((double Nominal, double Tolerance)[] table, Volume nominal, string paramName, string what)
    {
        double millilitres = nominal.Millilitres;
        foreach ((double size, double tolerance) in table)
        {
            // Nominal sizes are whole millilitres; the tolerance absorbs rounding from other units (e.g. 0.1 L).
            if (Math.Abs(millilitres - size) <= 1e-9 * size)
            {
                return tolerance;
            }
        }

        string sizes = string.Join(", ", table.Select(t => t.Nominal.ToString(CultureInfo.InvariantCulture)));
        throw new ArgumentOutOfRangeException(paramName, nominal.Value, $"Parameter '{paramName}' was {nominal}; {what} are tabulated for {sizes} mL only. For other sizes give the tolerance with Measured.FromTolerance.");
    }

    private static System.Collections.ObjectModel.ReadOnlyCollection<Volume> Sizes((double Nominal, double Tolerance)[] table) =>
        Array.AsReadOnly(table.Select(t => Volume.FromMillilitres(t.Nominal)).ToArray());

    // Volume.In that names the caller's parameter when the value overflows in the set volume's unit.
    private static double In(Volume volume, VolumeUnit unit, string paramName) =>
        PowerOfTen.ScaleChecked(volume.Value, UnitTable.Exponent(volume.Unit) - UnitTable.Exponent(unit), UnitTable.Symbol(volume.Unit), UnitTable.Symbol(unit), paramName);
}
