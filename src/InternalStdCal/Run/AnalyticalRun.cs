using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// An analytical run: the declared analytes and internal standards (IS) and the injections, checked for consistency
/// and held in injection order.
/// </summary>
/// <remarks>
/// <para>Checked at creation (each error names the offending row): unique injection orders; every signal, nominal and
/// added concentration names a declared analyte or IS; ids are not shared between roles; replicate rows (same id and
/// role) agree on nominal values, preparation, parent and added amounts; duplicates and spiked samples name an
/// existing sample as parent.</para>
/// <para>Not checked here (flagged per row during processing, never a failure of the run): missing, zero or negative
/// signals.</para>
/// <para>Immutable.</para>
/// </remarks>
public sealed class AnalyticalRun
{
    private AnalyticalRun(string name, IReadOnlyList<string> analytes, IReadOnlyList<string> internalStandards, IReadOnlyList<RunInjection> injections)
    {
        Name = name;
        Analytes = analytes;
        InternalStandards = internalStandards;
        Injections = injections;
    }

    /// <summary>Name of the run (e.g. a batch id).</summary>
    public string Name { get; }

    /// <summary>Declared analyte names, in the order given.</summary>
    public IReadOnlyList<string> Analytes { get; }

    /// <summary>Declared IS names, in the order given.</summary>
    public IReadOnlyList<string> InternalStandards { get; }

    /// <summary>The injections in ascending injection order.</summary>
    public IReadOnlyList<RunInjection> Injections { get; }

    /// <summary>Creates and checks a run.</summary>
    /// <param name="name">Name of the run; not blank.</param>
    /// <param name="analytes">Analyte names; at least one, not blank, distinct.</param>
    /// <param name="internalStandards">IS names; at least one, not blank, distinct.</param>
    /// <param name="injections">The injections in any order; at least one.</param>
    /// <returns>The run, injections sorted by order.</returns>
    /// <exception cref="ArgumentNullException">An argument or an element is null.</exception>
    /// <exception cref="ArgumentException">A list is empty, a name is blank or repeated, or a row is inconsistent (the
    /// message names the row).</exception>
    public static AnalyticalRun Create(string name, IEnumerable<string> analytes, IEnumerable<string> internalStandards, IEnumerable<RunInjection> injections)
    {
        Guard.NotBlank(name, nameof(name));
        string[] a = Names(analytes, nameof(analytes));
        string[] s = Names(internalStandards, nameof(internalStandards));
        RunInjection[] rows = Guard.NotNull(injections, nameof(injections)).ToArray();
        if (rows.Length == 0)
        {
            throw new ArgumentException("Parameter 'injections' is empty; a run needs at least one injection.", nameof(injections));
        }

        for (int i = 0; i < rows.Length; i++)
        {
            if (rows[i] is null)
            {
                throw new ArgumentNullException(nameof(injections), FormattableString.Invariant($"Parameter 'injections' has a null element at index {i}."));
            }
        }

        RunInjection[] sorted = rows.OrderBy(r => r.Order).ToArray();
        var analyteSet = new HashSet<string>(a, StringComparer.Ordinal);
        var isSet = new HashSet<string>(s, StringComparer.Ordinal);
        for (int i = 0; i < sorted.Length; i++)
        {
            RunInjection r = sorted[i];
            if (i > 0 && sorted[i - 1].Order == r.Order)
            {
                throw Row(r, "has the same injection order as " + sorted[i - 1] + "; injection orders must be unique", nameof(injections));
            }

            CheckNames(r, r.Signals.Analytes.Keys, analyteSet, "analyte signal", a, nameof(injections));
            CheckNames(r, r.Signals.InternalStandards.Keys, isSet, "IS signal", s, nameof(injections));
            CheckNames(r, r.Nominal.Keys, analyteSet, "nominal concentration", a, nameof(injections));
            CheckNames(r, r.Added.Keys, analyteSet, "added concentration", a, nameof(injections));
        }

        var firstById = new Dictionary<string, RunInjection>(StringComparer.Ordinal);
        foreach (RunInjection r in sorted)
        {
            if (!firstById.TryGetValue(r.Id, out RunInjection? first))
            {
                firstById[r.Id] = r;
                continue;
            }

            if (first.Role != r.Role)
            {
                throw Row(r, "uses id '" + r.Id + "' which " + first + " already uses with another role; ids must not be shared between roles", nameof(injections));
            }

            if (r.Role != InjectionRole.QualityControl && !SameMap(first.Nominal, r.Nominal))
            {
                throw Row(r, "is a replicate of " + first + " but has other nominal concentrations", nameof(injections));
            }

            if (!first.Preparation.Equals(r.Preparation) || !string.Equals(first.ParentId, r.ParentId, StringComparison.Ordinal) || !SameMap(first.Added, r.Added))
            {
                throw Row(r, "is a replicate of " + first + " but has another preparation, parent or added amount", nameof(injections));
            }
        }

        foreach (RunInjection r in sorted.Where(r => r.ParentId is not null))
        {
            if (!firstById.TryGetValue(r.ParentId!, out RunInjection? parent) || parent.Role != InjectionRole.Sample)
            {
                throw Row(r, "names parent '" + r.ParentId + "', but the run has no sample with that id", nameof(injections));
            }
        }

        return new AnalyticalRun(name, a, s, sorted);
    }

    private static string[] Names(IEnumerable<string> names, string paramName)
    {
        string[] list = Guard.NotNull(names, paramName).ToArray();
        if (list.Length == 0)
        {
            throw new ArgumentException($"Parameter '{paramName}' is empty; at least one name is required.", paramName);
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (string n in list)
        {
            if (string.IsNullOrWhiteSpace(n))
            {
                throw new ArgumentException($"Parameter '{paramName}' has an empty or white-space name.", paramName);
            }

            if (!seen.Add(n))
            {
                throw new ArgumentException($"Parameter '{paramName}' names '{n}' twice; names must be distinct.", paramName);
            }
        }

        return list;
    }

    private static void CheckNames(RunInjection row, IEnumerable<string> names, HashSet<string> known, string what, string[] declared, string paramName)
    {
        foreach (string n in names)
        {
            if (!known.Contains(n))
            {
                throw Row(row, "has " + what + " '" + n + "', which is not declared (declared: " + string.Join(", ", declared) + ")", paramName);
            }
        }
    }

    private static bool SameMap(IReadOnlyDictionary<string, Concentration> x, IReadOnlyDictionary<string, Concentration> y) =>
        x.Count == y.Count && x.All(p => y.TryGetValue(p.Key, out Concentration c) && c.Equals(p.Value));

    private static ArgumentException Row(RunInjection row, string problem, string paramName) =>
        new("Parameter '" + paramName + "': row " + row + " " + problem + ".", paramName);
}
