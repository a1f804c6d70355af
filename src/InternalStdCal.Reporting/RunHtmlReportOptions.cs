using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Decisions;
using InternalStdCal.Internal;

namespace InternalStdCal.Reporting;

/// <summary>
/// What <see cref="RunHtmlReport"/> puts in a report beyond the run itself: title, laboratory and run name, whose
/// uncertainty budgets to show, and which compliance decisions to take. Immutable; validated at creation.
/// </summary>
public sealed class RunHtmlReportOptions
{
    private readonly string _title = "Analytical run report";
    private readonly string? _laboratory;
    private readonly string? _runName;
    private readonly IReadOnlyList<string>? _budgetSamples;
    private readonly IReadOnlyList<AnalyteSpecification> _decisions = Array.Empty<AnalyteSpecification>();

    /// <summary>Default options: title "Analytical run report", no laboratory, the run's own name, the default
    /// budget selection and no decisions.</summary>
    public static RunHtmlReportOptions Default { get; } = new();

    /// <summary>Title of the report (first heading and HTML title); default "Analytical run report".</summary>
    /// <exception cref="ArgumentNullException">Set to null.</exception>
    /// <exception cref="ArgumentException">Set to a blank string.</exception>
    public string Title { get => _title; init => _title = Guard.NotBlank(value, nameof(Title)); }

    /// <summary>Laboratory named under the title; null for none.</summary>
    /// <exception cref="ArgumentException">Set to a blank string.</exception>
    public string? Laboratory { get => _laboratory; init => _laboratory = value is null ? null : Guard.NotBlank(value, nameof(Laboratory)); }

    /// <summary>Run name shown in the report; null for <see cref="Run.AnalyticalRun.Name"/>.</summary>
    /// <exception cref="ArgumentException">Set to a blank string.</exception>
    public string? RunName { get => _runName; init => _runName = value is null ? null : Guard.NotBlank(value, nameof(RunName)); }

    /// <summary>
    /// Sample ids whose uncertainty budgets are shown (every analyte of each id that has a result in the
    /// original sample). Null (the default): for each analyte, the first result in injection order of an injection
    /// with role <see cref="Run.InjectionRole.Sample"/> that is reported as a number (not censored, not extrapolated,
    /// no other qualifier). An empty list shows no budgets.
    /// </summary>
    /// <exception cref="ArgumentNullException">An element is null.</exception>
    /// <exception cref="ArgumentException">An element is blank or repeated.</exception>
    public IReadOnlyList<string>? UncertaintyBudgetSamples
    {
        get => _budgetSamples;
        init => _budgetSamples = value is null ? null : Distinct(value, nameof(UncertaintyBudgetSamples));
    }

    /// <summary>Compliance decisions to take: each specification is applied to every result of its analyte in the
    /// original sample from injections of role <see cref="Run.InjectionRole.Sample"/> or
    /// <see cref="Run.InjectionRole.SampleDuplicate"/> (not blanks, QC or spiked samples). Default: none.</summary>
    /// <exception cref="ArgumentNullException">Set to null, or an element is null.</exception>
    public IReadOnlyList<AnalyteSpecification> Decisions
    {
        get => _decisions;
        init
        {
            Guard.NotNull(value, nameof(Decisions));
            for (int i = 0; i < value.Count; i++)
            {
                Guard.NotNull(value[i], nameof(Decisions) + "[" + i.ToString(System.Globalization.CultureInfo.InvariantCulture) + "]");
            }

            _decisions = value.ToArray();
        }
    }

    private static string[] Distinct(IReadOnlyList<string> values, string paramName)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (string? v in values)
        {
            Guard.NotBlank(v, paramName);
            if (!seen.Add(v))
            {
                throw new ArgumentException($"Parameter '{paramName}' lists '{v}' twice; each sample id may appear once.", paramName);
            }
        }

        return values.ToArray();
    }
}

/// <summary>
/// A specification limit of one analyte with the decision rule agreed for it (ISO/IEC 17025 §7.1.3), for the
/// decisions section of <see cref="RunHtmlReport"/>.
/// </summary>
public sealed class AnalyteSpecification
{
    /// <summary>Creates the specification.</summary>
    /// <param name="analyte">Analyte name as in the run's method, e.g. "Pb-208".</param>
    /// <param name="limit">The specification limit, in any unit of the analyte's concentration kind.</param>
    /// <param name="rule">The decision rule, e.g. <see cref="DecisionRule.SimpleAcceptance"/>.</param>
    /// <param name="coverage">Coverage of the expanded uncertainty U for rules that use it; null for the run method's
    /// confidence level as coverage probability (<see cref="Run.RunMethod.ConfidenceLevel"/>).</param>
    /// <exception cref="ArgumentNullException"><paramref name="analyte"/>, <paramref name="limit"/> or <paramref name="rule"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="analyte"/> is blank.</exception>
    public AnalyteSpecification(string analyte, SpecificationLimit limit, DecisionRule rule, Coverage? coverage = null)
    {
        Analyte = Guard.NotBlank(analyte, nameof(analyte));
        Limit = Guard.NotNull(limit, nameof(limit));
        Rule = Guard.NotNull(rule, nameof(rule));
        Coverage = coverage;
    }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>The specification limit.</summary>
    public SpecificationLimit Limit { get; }

    /// <summary>The decision rule.</summary>
    public DecisionRule Rule { get; }

    /// <summary>Coverage of U; null for the run method's confidence level.</summary>
    public Coverage? Coverage { get; }

    /// <summary>"analyte: limit, rule name".</summary>
    /// <returns>The text.</returns>
    public override string ToString() => Analyte + ": " + Limit + ", " + Rule.Name;
}
