using System;
using System.Collections.Generic;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>Logical fields of an injection row, used to point problems at a column.</summary>
internal enum RowField
{
    Row,
    Order,
    Role,
    Id,
    Parent,
    Time,
    Preparation,
    Signal,
    Nominal,
    Added,
}

/// <summary>One row of a run file as read, before the run is formed: parsed values and where each came from.</summary>
internal sealed class RowDraft
{
    private readonly Dictionary<RowField, (int Number, string Name)> _columns = new();

    internal RowDraft(int line) => Line = line;

    internal int Line { get; }

    internal List<RunFileProblem> Problems { get; } = new();

    internal int? Order { get; set; }

    internal InjectionRole? Role { get; set; }

    internal string? Id { get; set; }

    internal string? Parent { get; set; }

    internal DateTimeOffset? Time { get; set; }

    internal SamplePreparation? Preparation { get; set; }

    internal SortedDictionary<string, double> Signals { get; } = new(StringComparer.Ordinal);

    internal SortedDictionary<string, double> InternalStandardSignals { get; } = new(StringComparer.Ordinal);

    internal SortedDictionary<string, Concentration> Nominal { get; } = new(StringComparer.Ordinal);

    internal SortedDictionary<string, Concentration> Added { get; } = new(StringComparer.Ordinal);

    /// <summary>Remembers the column of a logical field (the first one given wins).</summary>
    internal void At(RowField field, int number, string name)
    {
        if (!_columns.ContainsKey(field))
        {
            _columns[field] = (number, name);
        }
    }

    internal void Problem(RowField field, string? value, string message)
    {
        (int number, string? name) = _columns.TryGetValue(field, out (int Number, string Name) c) ? (c.Number, c.Name) : (0, null);
        Problems.Add(new RunFileProblem(Line, number, name, value, message));
    }

    internal void Problem(int number, string? name, string? value, string message) =>
        Problems.Add(new RunFileProblem(Line, number, name, value, message));
}

/// <summary>Preparation cells → <see cref="SamplePreparation"/>. Equal preparations give the same instance, so replicate
/// rows compare equal (the run compares dilution steps by reference).</summary>
internal sealed class PreparationCache
{
    private readonly Dictionary<string, SamplePreparation> _cache = new(StringComparer.Ordinal);

    internal static string[] Fields(SamplePreparation p) => new[]
    {
        RunText.FormatDilutions(p.Dilutions),
        p.SampleMass is Measured<Mass> m ? RunText.FormatMeasured(m) : string.Empty,
        p.DigestVolume is Measured<Volume> v ? RunText.FormatMeasured(v) : string.Empty,
        p.DigestMass is Measured<Mass> d ? RunText.FormatMeasured(d) : string.Empty,
        p.ResultUnit is ConcentrationUnit u ? RunText.FormatUnit(u) : string.Empty,
    };

    /// <summary>Parses the five cells (dilutions, sample mass, digest volume, digest mass, result unit; null or blank =
    /// not given). Returns null on success, else the message; <paramref name="field"/> is the index of the bad cell.</summary>
    internal string? Parse(string?[] cells, out SamplePreparation? preparation, out int field)
    {
        preparation = null;
        field = 0;
        string?[] c = new string?[5];
        for (int i = 0; i < 5; i++)
        {
            c[i] = string.IsNullOrWhiteSpace(cells[i]) ? null : cells[i]!.Trim();
        }

        if (Array.TrueForAll(c, x => x is null))
        {
            return null;
        }

        DilutionStep[] steps = Array.Empty<DilutionStep>();
        if (c[0] is string dil && RunText.Dilutions(dil, out steps) is string e0)
        {
            return e0;
        }

        Measured<Mass>? sampleMass = null;
        Measured<Volume>? digestVolume = null;
        Measured<Mass>? digestMass = null;
        ConcentrationUnit? unit = null;
        field = 1;
        if (c[1] is string sm)
        {
            if (RunText.Measured(sm, Mass.Parse, out Measured<Mass> x) is string e)
            {
                return "sample mass: " + e;
            }

            sampleMass = x;
        }

        field = 2;
        if (c[2] is string dv)
        {
            if (RunText.Measured(dv, Volume.Parse, out Measured<Volume> x) is string e)
            {
                return "digest volume: " + e;
            }

            digestVolume = x;
        }

        field = 3;
        if (c[3] is string dm)
        {
            if (RunText.Measured(dm, Mass.Parse, out Measured<Mass> x) is string e)
            {
                return "digest mass: " + e;
            }

            digestMass = x;
        }

        field = 4;
        if (c[4] is string ru)
        {
            if (RunText.Unit(ru, out ConcentrationUnit x) is string e)
            {
                return "result unit: " + e;
            }

            unit = x;
        }

        field = 1;
        try
        {
            SamplePreparation p;
            if (sampleMass is null)
            {
                if (digestVolume is not null || digestMass is not null || unit is not null)
                {
                    return "a digest volume or mass or a result unit needs the sample mass (solid sample)";
                }

                p = SamplePreparation.Liquid(steps);
            }
            else if (unit is null || (digestVolume is null) == (digestMass is null))
            {
                return "a solid sample needs exactly one of digest volume and digest mass, and a result unit (a mass fraction, e.g. mg/kg)";
            }
            else
            {
                p = digestVolume is Measured<Volume> v
                    ? SamplePreparation.SolidToVolume(v, sampleMass.Value, unit.Value, steps)
                    : SamplePreparation.SolidToMass(digestMass!.Value, sampleMass.Value, unit.Value, steps);
            }

            string key = string.Join("\u001f", Fields(p));
            if (_cache.TryGetValue(key, out SamplePreparation? known))
            {
                preparation = known;
            }
            else
            {
                _cache[key] = p;
                preparation = p;
            }

            return null;
        }
        catch (ArgumentException ex)
        {
            return ex.Message;
        }
    }
}
