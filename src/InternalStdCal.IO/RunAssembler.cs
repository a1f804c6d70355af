using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>Turns row drafts into a run: role checks per row, then the checks <see cref="AnalyticalRun.Create"/> would
/// make across rows, reported on the offending row so the other rows survive.</summary>
internal static class RunAssembler
{
    internal static RunReadResult Assemble(
        string name,
        IReadOnlyList<string> analytes,
        IReadOnlyList<string> internalStandards,
        IReadOnlyDictionary<string, Concentration> isConcentrations,
        List<RunFileProblem> fileProblems,
        IReadOnlyList<RowDraft> drafts,
        bool fatal)
    {
        var problems = new List<RunFileProblem>(fileProblems);
        if (fatal)
        {
            return new RunReadResult(null, isConcentrations, Sorted(problems));
        }

        var accepted = new List<(RowDraft Draft, RunInjection Row)>();
        var byOrder = new Dictionary<int, RowDraft>();
        var firstById = new Dictionary<string, RunInjection>(StringComparer.Ordinal);
        foreach (RowDraft d in drafts)
        {
            RunInjection? row = d.Problems.Count == 0 ? Build(d) : null;
            if (row is not null)
            {
                if (byOrder.TryGetValue(row.Order, out RowDraft? other))
                {
                    d.Problem(RowField.Order, Text(row.Order), "injection order already used on line " + Text(other.Line) + "; orders must be unique");
                }
                else if (firstById.TryGetValue(row.Id, out RunInjection? first) && Conflict(first, row) is string conflict)
                {
                    d.Problem(RowField.Id, row.Id, conflict);
                }
            }

            if (d.Problems.Count > 0 || row is null)
            {
                problems.AddRange(d.Problems);
                continue;
            }

            byOrder[row.Order] = d;
            if (!firstById.ContainsKey(row.Id))
            {
                firstById[row.Id] = row;
            }

            accepted.Add((d, row));
        }

        var good = new List<RunInjection>();
        foreach ((RowDraft d, RunInjection row) in accepted)
        {
            if (row.ParentId is string parent && !(firstById.TryGetValue(parent, out RunInjection? p) && p.Role == InjectionRole.Sample))
            {
                d.Problem(RowField.Parent, parent, "no good row of role 'sample' has this id");
                problems.AddRange(d.Problems);
                continue;
            }

            good.Add(row);
        }

        AnalyticalRun? run = null;
        if (good.Count == 0)
        {
            problems.Add(new RunFileProblem(0, 0, null, null, "no good injection row; no run formed"));
        }
        else
        {
            try
            {
                run = AnalyticalRun.Create(name, analytes, internalStandards, good);
            }
            catch (ArgumentException ex)
            {
                problems.Add(new RunFileProblem(0, 0, null, null, "the run could not be formed: " + ex.Message));
            }
        }

        return new RunReadResult(run, isConcentrations, Sorted(problems));
    }

    private static RunFileProblem[] Sorted(List<RunFileProblem> problems) =>
        problems.Select((p, i) => (p, i)).OrderBy(x => x.p.Line).ThenBy(x => x.i).Select(x => x.p).ToArray();

    private static string Text(int i) => i.ToString(System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>The row's injection, or null with the row's problems added to the draft.</summary>
    internal static RunInjection? Build(RowDraft d)
    {
        if (d.Order is not int order || d.Role is not InjectionRole role || d.Id is null)
        {
            return null;
        }

        InjectionRole r = role;
        string token = RunText.Token(r);
        bool needsNominal = r is InjectionRole.CalibrationStandard or InjectionRole.QualityControl;
        bool needsParent = r is InjectionRole.SampleDuplicate or InjectionRole.SpikedSample;
        bool takesPreparation = r is InjectionRole.Sample or InjectionRole.SampleDuplicate or InjectionRole.SpikedSample or InjectionRole.MethodBlank;
        if (needsNominal && d.Nominal.Count == 0)
        {
            d.Problem(RowField.Nominal, null, "a row of role '" + token + "' needs at least one nominal concentration");
        }

        if (!needsNominal && d.Nominal.Count > 0)
        {
            d.Problem(RowField.Nominal, null, "a row of role '" + token + "' takes no nominal concentration (only cal and qc do)");
        }

        if (needsParent && d.Parent is null)
        {
            d.Problem(RowField.Parent, null, "a row of role '" + token + "' needs the id of its parent sample");
        }

        if (!needsParent && d.Parent is not null)
        {
            d.Problem(RowField.Parent, d.Parent, "a row of role '" + token + "' takes no parent (only duplicate and spike do)");
        }

        if (r == InjectionRole.SpikedSample && d.Added.Count == 0)
        {
            d.Problem(RowField.Added, null, "a spiked sample needs at least one added concentration");
        }

        if (r != InjectionRole.SpikedSample && d.Added.Count > 0)
        {
            d.Problem(RowField.Added, null, "a row of role '" + token + "' takes no added concentration (only spike does)");
        }

        if (!takesPreparation && d.Preparation is not null)
        {
            d.Problem(RowField.Preparation, null, "a row of role '" + token + "' takes no preparation (standards, blanks and qc are measured as made)");
        }

        if (d.Problems.Count > 0)
        {
            return null;
        }

        var signals = new InjectionSignals(d.Signals, d.InternalStandardSignals);
        try
        {
            return r switch
            {
                InjectionRole.CalibrationStandard => RunInjection.CalibrationStandard(order, d.Id, d.Nominal, signals, d.Time),
                InjectionRole.CalibrationBlank => RunInjection.CalibrationBlank(order, d.Id, signals, d.Time),
                InjectionRole.MethodBlank => RunInjection.MethodBlank(order, d.Id, signals, d.Preparation, d.Time),
                InjectionRole.QualityControl => RunInjection.QualityControl(order, d.Id, d.Nominal, signals, d.Time),
                InjectionRole.Sample => RunInjection.Sample(order, d.Id, signals, d.Preparation, d.Time),
                InjectionRole.SampleDuplicate => RunInjection.SampleDuplicate(order, d.Id, d.Parent!, signals, d.Preparation, d.Time),
                _ => RunInjection.SpikedSample(order, d.Id, d.Parent!, d.Added, signals, d.Preparation, d.Time),
            };
        }
        catch (ArgumentException ex)
        {
            RowField field = ex.ParamName switch
            {
                "nominal" => RowField.Nominal,
                "added" => RowField.Added,
                "parentId" => RowField.Parent,
                "id" or "level" => RowField.Id,
                _ => RowField.Row,
            };
            d.Problem(field, null, ex.Message);
            return null;
        }
    }

    private static string? Conflict(RunInjection first, RunInjection row)
    {
        if (first.Role != row.Role)
        {
            return "id already used by the " + RunText.Token(first.Role) + " row with order " + Text(first.Order) + "; ids must not be shared between roles";
        }

        if (row.Role != InjectionRole.QualityControl && !SameMap(first.Nominal, row.Nominal))
        {
            return "replicate of order " + Text(first.Order) + " with other nominal concentrations";
        }

        if (!first.Preparation.Equals(row.Preparation) || !string.Equals(first.ParentId, row.ParentId, StringComparison.Ordinal) || !SameMap(first.Added, row.Added))
        {
            return "replicate of order " + Text(first.Order) + " with another preparation, parent or added amount";
        }

        return null;
    }

    private static bool SameMap(IReadOnlyDictionary<string, Concentration> x, IReadOnlyDictionary<string, Concentration> y) =>
        x.Count == y.Count && x.All(p => y.TryGetValue(p.Key, out Concentration c) && c.Equals(p.Value));
}
