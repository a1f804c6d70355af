using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// One row of an analytical run: an injection with its role, identity, position in the run and signals, plus the
/// role's own data (nominal concentrations, parent sample, added spike, preparation).
/// </summary>
/// <remarks>
/// <para>Create rows with the role-named factories; each checks what its role needs. Rows with the same
/// <see cref="Id"/> and role are replicate injections of one solution (one calibration level, one sample); quality
/// control rows are judged one injection at a time.</para>
/// <para>Concentrations: nominal values of standards and QC are concentrations in the measured solution; the added
/// amount of a spiked sample is a concentration in the original sample (the basis of the reported result).</para>
/// <para>Immutable. Equality is by reference (rows are identified in a run by <see cref="Order"/>).</para>
/// </remarks>
public sealed class RunInjection
{
    private static readonly IReadOnlyDictionary<string, Concentration> NoConcentrations = new SortedDictionary<string, Concentration>(StringComparer.Ordinal);

    private RunInjection(int order, InjectionRole role, string id, InjectionSignals signals, DateTimeOffset? acquiredAt, IReadOnlyDictionary<string, Concentration> nominal, string? parentId, IReadOnlyDictionary<string, Concentration> added, SamplePreparation preparation)
    {
        Order = order;
        Role = role;
        Id = id;
        Signals = signals;
        AcquiredAt = acquiredAt;
        Nominal = nominal;
        ParentId = parentId;
        Added = added;
        Preparation = preparation;
    }

    /// <summary>Injection order in the run (unique within a run; any integer, ascending = later).</summary>
    public int Order { get; }

    /// <summary>What the injection is for.</summary>
    public InjectionRole Role { get; }

    /// <summary>Identity: the sample id, or the standard's level label.</summary>
    public string Id { get; }

    /// <summary>The signals of this injection.</summary>
    public InjectionSignals Signals { get; }

    /// <summary>Acquisition time, if known (information only; the order is <see cref="Order"/>).</summary>
    public DateTimeOffset? AcquiredAt { get; }

    /// <summary>Nominal analyte concentrations in the measured solution (calibration standards and QC); empty for
    /// other roles. A calibration blank is nominally 0 for every analyte and carries no entries.</summary>
    public IReadOnlyDictionary<string, Concentration> Nominal { get; }

    /// <summary>Id of the parent sample of a duplicate or spiked sample; null otherwise.</summary>
    public string? ParentId { get; }

    /// <summary>Spiked samples: analyte added, as a concentration in the original sample; empty otherwise.</summary>
    public IReadOnlyDictionary<string, Concentration> Added { get; }

    /// <summary>How the original sample became the measured solution (<see cref="SamplePreparation.None"/> for
    /// standards, blanks and QC).</summary>
    public SamplePreparation Preparation { get; }

    /// <summary>True for the roles whose result is reported for an original sample: sample, duplicate, spiked
    /// sample and method blank.</summary>
    public bool IsSampleLike => Role is InjectionRole.Sample or InjectionRole.SampleDuplicate or InjectionRole.SpikedSample or InjectionRole.MethodBlank;

    /// <summary>A calibration standard.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="level">Level label, e.g. "CAL-3"; not blank. Rows with the same label are replicates.</param>
    /// <param name="nominal">Analyte name → nominal concentration, each ≥ 0; at least one entry.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The label is blank, <paramref name="nominal"/> is empty or has a blank name.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A nominal concentration is negative.</exception>
    public static RunInjection CalibrationStandard(int order, string level, IReadOnlyDictionary<string, Concentration> nominal, InjectionSignals signals, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.CalibrationStandard, NotBlank(level, nameof(level)), NotNull(signals), acquiredAt, Concentrations(nominal, nameof(nominal), level, allowZero: true), null, NoConcentrations, SamplePreparation.None);

    /// <summary>A calibration blank (nominal 0 for every analyte).</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Identity, e.g. "BLK"; not blank. Rows with the same id are replicates.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The id is blank.</exception>
    public static RunInjection CalibrationBlank(int order, string id, InjectionSignals signals, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.CalibrationBlank, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, NoConcentrations, null, NoConcentrations, SamplePreparation.None);

    /// <summary>A method blank, carried through the preparation of the samples.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Identity; not blank.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="preparation">Its preparation; null for <see cref="SamplePreparation.None"/>.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="id"/> or <paramref name="signals"/> is null.</exception>
    /// <exception cref="ArgumentException">The id is blank.</exception>
    public static RunInjection MethodBlank(int order, string id, InjectionSignals signals, SamplePreparation? preparation = null, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.MethodBlank, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, NoConcentrations, null, NoConcentrations, preparation ?? SamplePreparation.None);

    /// <summary>A quality-control / calibration-check standard.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Identity, e.g. "CCV"; not blank. The same id may recur through the run.</param>
    /// <param name="nominal">Analyte name → nominal concentration in the measured solution, each &gt; 0; at least one.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The id is blank, <paramref name="nominal"/> is empty or has a blank name.</exception>
    /// <exception cref="ArgumentOutOfRangeException">A nominal concentration is ≤ 0 (a recovery needs a non-zero nominal).</exception>
    public static RunInjection QualityControl(int order, string id, IReadOnlyDictionary<string, Concentration> nominal, InjectionSignals signals, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.QualityControl, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, Concentrations(nominal, nameof(nominal), id, allowZero: false), null, NoConcentrations, SamplePreparation.None);

    /// <summary>A sample.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Sample id; not blank. Rows with the same id are replicate injections of one solution.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="preparation">Its preparation; null for <see cref="SamplePreparation.None"/>.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="id"/> or <paramref name="signals"/> is null.</exception>
    /// <exception cref="ArgumentException">The id is blank.</exception>
    public static RunInjection Sample(int order, string id, InjectionSignals signals, SamplePreparation? preparation = null, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.Sample, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, NoConcentrations, null, NoConcentrations, preparation ?? SamplePreparation.None);

    /// <summary>A sample duplicate: an independent second preparation of a sample.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Id of the duplicate; not blank, different from the parent's.</param>
    /// <param name="parentId">Id of the parent <see cref="InjectionRole.Sample"/>; not blank.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="preparation">Its preparation; null for <see cref="SamplePreparation.None"/>.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException">A required argument is null.</exception>
    /// <exception cref="ArgumentException">An id is blank, or the duplicate names itself as parent.</exception>
    public static RunInjection SampleDuplicate(int order, string id, string parentId, InjectionSignals signals, SamplePreparation? preparation = null, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.SampleDuplicate, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, NoConcentrations, Parent(id, parentId), NoConcentrations, preparation ?? SamplePreparation.None);

    /// <summary>A spiked sample (matrix spike): the parent sample with known amounts of analyte added.</summary>
    /// <param name="order">Injection order.</param>
    /// <param name="id">Id of the spiked sample; not blank, different from the parent's.</param>
    /// <param name="parentId">Id of the unspiked parent <see cref="InjectionRole.Sample"/>; not blank.</param>
    /// <param name="added">Analyte name → amount added, as a concentration in the original sample, each &gt; 0; at least one.</param>
    /// <param name="signals">The signals.</param>
    /// <param name="preparation">Its preparation; null for <see cref="SamplePreparation.None"/>.</param>
    /// <param name="acquiredAt">Acquisition time, optional.</param>
    /// <returns>The row.</returns>
    /// <exception cref="ArgumentNullException">A required argument is null.</exception>
    /// <exception cref="ArgumentException">An id is blank, the row names itself as parent, or <paramref name="added"/> is empty or has a blank name.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An added concentration is ≤ 0.</exception>
    public static RunInjection SpikedSample(int order, string id, string parentId, IReadOnlyDictionary<string, Concentration> added, InjectionSignals signals, SamplePreparation? preparation = null, DateTimeOffset? acquiredAt = null) =>
        new(order, InjectionRole.SpikedSample, NotBlank(id, nameof(id)), NotNull(signals), acquiredAt, NoConcentrations, Parent(id, parentId), Concentrations(added, nameof(added), id, allowZero: false), preparation ?? SamplePreparation.None);

    /// <summary>Prints "#12 Sample 'S-04'" (with the parent for duplicates and spikes), invariant culture.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "#" + Order.ToString(CultureInfo.InvariantCulture) + " " + Role + " '" + Id + "'" + (ParentId is null ? string.Empty : " (parent '" + ParentId + "')");

    private static InjectionSignals NotNull(InjectionSignals signals) => Guard.NotNull(signals, nameof(signals));

    private static string NotBlank(string value, string paramName)
    {
        Guard.NotNull(value, paramName);
        if (string.IsNullOrWhiteSpace(value))
        {
            throw new ArgumentException($"Parameter '{paramName}' is empty or white space; an injection needs a visible identity.", paramName);
        }

        return value;
    }

    private static string Parent(string id, string parentId)
    {
        NotBlank(parentId, nameof(parentId));
        if (string.Equals(id, parentId, StringComparison.Ordinal))
        {
            throw new ArgumentException($"Parameter 'parentId' was '{parentId}', the row's own id; the parent must be another sample.", nameof(parentId));
        }

        return parentId;
    }

    private static SortedDictionary<string, Concentration> Concentrations(IReadOnlyDictionary<string, Concentration> values, string paramName, string id, bool allowZero)
    {
        Guard.NotNull(values, paramName);
        if (values.Count == 0)
        {
            throw new ArgumentException($"Parameter '{paramName}' of '{id}' is empty; at least one analyte concentration is required.", paramName);
        }

        var copy = new SortedDictionary<string, Concentration>(StringComparer.Ordinal);
        foreach (KeyValuePair<string, Concentration> p in values.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            if (string.IsNullOrWhiteSpace(p.Key))
            {
                throw new ArgumentException($"Parameter '{paramName}' of '{id}' has an empty or white-space analyte name.", paramName);
            }

            if (p.Value.Value < 0 || (!allowZero && p.Value.Value == 0))
            {
                throw new ArgumentOutOfRangeException(
                    paramName,
                    p.Value.Value,
                    $"Parameter '{paramName}' of '{id}' has {p.Key} = {p.Value}; it must be {(allowZero ? ">= 0" : "> 0")}.");
            }

            copy[p.Key] = p.Value;
        }

        return copy;
    }
}
