using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;

namespace InternalStdCal.IO;

/// <summary>
/// One problem found while reading a run file: where it is (line, column, value) and what is wrong.
/// </summary>
/// <remarks>Immutable; value equality.</remarks>
public sealed class RunFileProblem : IEquatable<RunFileProblem>
{
    /// <summary>Creates a problem.</summary>
    /// <param name="line">1-based physical line of the file; 0 when the problem concerns the whole file or the line is
    /// not known (JSON content problems: see <paramref name="column"/>).</param>
    /// <param name="columnNumber">1-based field number in a CSV row, or the 1-based character position of a JSON syntax
    /// error in its line; 0 when not known.</param>
    /// <param name="column">CSV column name, or the JSON path of the element (e.g. "injections[3].order"); null when the
    /// problem concerns a whole row or file.</param>
    /// <param name="value">The offending text; null when there is none.</param>
    /// <param name="message">What is wrong; not blank.</param>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="line"/> or <paramref name="columnNumber"/> is negative.</exception>
    /// <exception cref="ArgumentException"><paramref name="message"/> is null or blank.</exception>
    public RunFileProblem(int line, int columnNumber, string? column, string? value, string message)
    {
        if (line < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(line), line, "Parameter 'line' was " + line.ToString(CultureInfo.InvariantCulture) + "; it must be >= 0.");
        }

        if (columnNumber < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(columnNumber), columnNumber, "Parameter 'columnNumber' was " + columnNumber.ToString(CultureInfo.InvariantCulture) + "; it must be >= 0.");
        }

        if (string.IsNullOrWhiteSpace(message))
        {
            throw new ArgumentException("Parameter 'message' is empty; a problem needs a description.", nameof(message));
        }

        Line = line;
        ColumnNumber = columnNumber;
        Column = column;
        Value = value;
        Message = message;
    }

    /// <summary>1-based physical line; 0 = whole file or not known.</summary>
    public int Line { get; }

    /// <summary>1-based field number (CSV) or character position (JSON syntax error); 0 = not known.</summary>
    public int ColumnNumber { get; }

    /// <summary>Column name (CSV) or JSON path; null for a whole row or file.</summary>
    public string? Column { get; }

    /// <summary>The offending text; null when there is none.</summary>
    public string? Value { get; }

    /// <summary>What is wrong.</summary>
    public string Message { get; }

    /// <inheritdoc />
    public bool Equals(RunFileProblem? other) =>
        other is not null && Line == other.Line && ColumnNumber == other.ColumnNumber
        && string.Equals(Column, other.Column, StringComparison.Ordinal) && string.Equals(Value, other.Value, StringComparison.Ordinal)
        && string.Equals(Message, other.Message, StringComparison.Ordinal);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as RunFileProblem);

    /// <inheritdoc />
    public override int GetHashCode() => (Line, ColumnNumber, Message).GetHashCode();

    /// <summary>Prints e.g. "line 7, column 5 'analyte:Cd-111', value 'abc': not a number".</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString()
    {
        var parts = new List<string>();
        parts.Add(Line > 0 ? "line " + Line.ToString(CultureInfo.InvariantCulture) : "file");
        if (ColumnNumber > 0 || Column is not null)
        {
            parts.Add("column " + (ColumnNumber > 0 ? ColumnNumber.ToString(CultureInfo.InvariantCulture) : string.Empty)
                + (Column is null ? string.Empty : (ColumnNumber > 0 ? " " : string.Empty) + "'" + Column + "'"));
        }

        if (Value is not null)
        {
            parts.Add("value '" + Value + "'");
        }

        return string.Join(", ", parts) + ": " + Message;
    }
}

/// <summary>Thrown by the strict readers when a run file has problems; lists all of them.</summary>
public sealed class RunFileException : FormatException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="problems">The problems; at least one.</param>
    /// <exception cref="ArgumentNullException"><paramref name="problems"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="problems"/> is empty.</exception>
    public RunFileException(IEnumerable<RunFileProblem> problems)
        : this(Check(problems))
    {
    }

    private RunFileException(RunFileProblem[] problems)
        : base(Describe(problems))
    {
        Problems = problems;
    }

    /// <summary>The problems, in file order.</summary>
    public IReadOnlyList<RunFileProblem> Problems { get; }

    private static RunFileProblem[] Check(IEnumerable<RunFileProblem> problems)
    {
        if (problems is null)
        {
            throw new ArgumentNullException(nameof(problems), "Parameter 'problems' must not be null.");
        }

        RunFileProblem[] list = problems.ToArray();
        if (list.Length == 0 || list.Any(p => p is null))
        {
            throw new ArgumentException("Parameter 'problems' is empty or has a null element; the exception needs at least one problem.", nameof(problems));
        }

        return list;
    }

    private static string Describe(RunFileProblem[] problems) =>
        "The run file has " + problems.Length.ToString(CultureInfo.InvariantCulture) + (problems.Length == 1 ? " problem" : " problems") + ":"
        + Environment.NewLine + string.Join(Environment.NewLine, problems.Select(p => "  " + p));
}
