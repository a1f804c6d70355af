using System.Collections.Generic;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>Recovery of one quality-control / check-standard injection for one analyte: 100 · found / nominal.</summary>
public sealed class QualityControlCheck
{
    private readonly AnalyteResult _notes;

    // notes: the QC injection's result, whose notes are formatted on first read.
    internal QualityControlCheck(RunInjection injection, string analyte, Concentration nominal, Concentration? found, double? recoveryPercent, RecoveryWindow? window, bool? passed, AnalyteResult notes)
    {
        Injection = injection;
        Analyte = analyte;
        Nominal = nominal;
        Found = found;
        RecoveryPercent = recoveryPercent;
        Window = window;
        Passed = passed;
        _notes = notes;
    }

    /// <summary>The QC row.</summary>
    public RunInjection Injection { get; }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>Nominal concentration in the measured solution.</summary>
    public Concentration Nominal { get; }

    /// <summary>Concentration found (calibration unit); null when not quantified.</summary>
    public Concentration? Found { get; }

    /// <summary>Recovery in %; null when not computable.</summary>
    public double? RecoveryPercent { get; }

    /// <summary>The window applied; null = not judged.</summary>
    public RecoveryWindow? Window { get; }

    /// <summary>True inside the window; false outside it or when a window applies but no recovery could be computed;
    /// null without a window.</summary>
    public bool? Passed { get; }

    /// <summary>Why a value is missing, if it is.</summary>
    public IReadOnlyList<string> Notes => _notes.Notes;
}

/// <summary>Relative percent difference of a sample and its duplicate for one analyte, on the original-sample results:
/// RPD = |a − b| / ((a + b)/2) · 100 (common practice).</summary>
public sealed class DuplicateCheck
{
    internal DuplicateCheck(string analyte, string sampleId, string duplicateId, Concentration? sample, Concentration? duplicate, double? rpdPercent, RpdLimit? limit, bool? passed, IReadOnlyList<string> notes)
    {
        Analyte = analyte;
        SampleId = sampleId;
        DuplicateId = duplicateId;
        Sample = sample;
        Duplicate = duplicate;
        RpdPercent = rpdPercent;
        Limit = limit;
        Passed = passed;
        Notes = notes;
    }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>Parent sample id.</summary>
    public string SampleId { get; }

    /// <summary>Duplicate id.</summary>
    public string DuplicateId { get; }

    /// <summary>Parent result in the original sample; null when not quantified.</summary>
    public Concentration? Sample { get; }

    /// <summary>Duplicate result in the original sample (parent's unit); null when not quantified.</summary>
    public Concentration? Duplicate { get; }

    /// <summary>RPD in %; null when not computable (a value missing, or mean ≤ 0).</summary>
    public double? RpdPercent { get; }

    /// <summary>The limit applied; null = not judged.</summary>
    public RpdLimit? Limit { get; }

    /// <summary>True within the limit; false above it or when a limit applies but no RPD could be computed; null without a limit.</summary>
    public bool? Passed { get; }

    /// <summary>Why a value is missing.</summary>
    public IReadOnlyList<string> Notes { get; }
}

/// <summary>Spike recovery for one analyte on the original-sample results: 100 · (spiked − unspiked) / added
/// (common practice).</summary>
public sealed class SpikeCheck
{
    internal SpikeCheck(string analyte, string spikedId, string parentId, Concentration? spiked, Concentration? unspiked, Concentration added, double? recoveryPercent, RecoveryWindow? window, bool? passed, IReadOnlyList<string> notes)
    {
        Analyte = analyte;
        SpikedId = spikedId;
        ParentId = parentId;
        Spiked = spiked;
        Unspiked = unspiked;
        Added = added;
        RecoveryPercent = recoveryPercent;
        Window = window;
        Passed = passed;
        Notes = notes;
    }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>Spiked sample id.</summary>
    public string SpikedId { get; }

    /// <summary>Unspiked parent id.</summary>
    public string ParentId { get; }

    /// <summary>Spiked result in the original sample; null when not quantified.</summary>
    public Concentration? Spiked { get; }

    /// <summary>Parent result in the original sample (spiked result's unit); null when not quantified.</summary>
    public Concentration? Unspiked { get; }

    /// <summary>Amount added, as a concentration in the original sample.</summary>
    public Concentration Added { get; }

    /// <summary>Recovery in %; null when not computable.</summary>
    public double? RecoveryPercent { get; }

    /// <summary>The window applied; null = not judged.</summary>
    public RecoveryWindow? Window { get; }

    /// <summary>True inside the window; false outside it or when a window applies but no recovery could be computed;
    /// null without a window.</summary>
    public bool? Passed { get; }

    /// <summary>Why a value is missing.</summary>
    public IReadOnlyList<string> Notes { get; }
}
