using System;
using System.Collections.Generic;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>
/// What a lenient run reader returns: the run made of every good row, the IS concentrations the file states, and one
/// problem per bad line, column or file-level issue. A bad row never takes good rows with it.
/// </summary>
/// <remarks>Immutable.</remarks>
public sealed class RunReadResult
{
    internal RunReadResult(AnalyticalRun? run, IReadOnlyDictionary<string, Concentration> internalStandardConcentrations, IReadOnlyList<RunFileProblem> problems)
    {
        Run = run;
        InternalStandardConcentrations = internalStandardConcentrations;
        Problems = problems;
    }

    /// <summary>The run of all good rows; null when no run could be formed (no good row, or a fatal header or
    /// syntax problem — see <see cref="Problems"/>).</summary>
    public AnalyticalRun? Run { get; }

    /// <summary>IS name → IS concentration in every measured solution, as the file states it (empty when it states
    /// none); use it to build the <see cref="RunMethod"/>.</summary>
    public IReadOnlyDictionary<string, Concentration> InternalStandardConcentrations { get; }

    /// <summary>The problems, in file order; empty for a clean file. Rows named here are not in <see cref="Run"/>.</summary>
    public IReadOnlyList<RunFileProblem> Problems { get; }

    /// <summary>True when the file had no problem at all.</summary>
    public bool IsClean => Problems.Count == 0 && Run is not null;

    /// <summary>The run, when the file was clean.</summary>
    /// <returns>The run.</returns>
    /// <exception cref="RunFileException">The file had at least one problem (all are listed).</exception>
    public AnalyticalRun RunOrThrow()
    {
        if (Problems.Count > 0)
        {
            throw new RunFileException(Problems);
        }

        return Run ?? throw new InvalidOperationException("No run and no problem; this is a bug of the reader.");
    }
}
