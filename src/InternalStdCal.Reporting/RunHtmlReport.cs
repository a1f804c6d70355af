using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Xml;
using System.Xml.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Decisions;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using InternalStdCal.Uncertainty;
using OxyPlot;

namespace InternalStdCal.Reporting;

/// <summary>
/// A processed run (<see cref="RunReport"/>) as one self-contained HTML page for review and archiving: method
/// summary, calibration per analyte (coefficients, diagnostics, acceptance verdict, curve, residual and %RE plots),
/// every result with its qualifiers, QC, duplicates, spikes, internal-standard recovery, drift, selected uncertainty
/// budgets, optional compliance decisions, notes, and the cautions.
/// </summary>
/// <remarks>
/// <para>The page is <c>&lt;!DOCTYPE html&gt;</c> followed by well-formed XHTML-compatible markup (it parses as XML
/// after the doctype line): inline CSS and inline SVG plots, no scripts, no external resources, all text escaped.
/// UTF-8 is declared in a meta element; write the text with a UTF-8 encoding.</para>
/// <para>Deterministic: the same report and options give the same text (invariant culture, no time stamp).</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide. The page says so in its cautions paragraph.</para>
/// </remarks>
public static class RunHtmlReport
{
    private const int PlotWidth = 640;
    private const int PlotHeight = 400;
    private static readonly XNamespace X = "http://www.w3.org/1999/xhtml";
    private static readonly HashSet<string> VoidElements = new(StringComparer.Ordinal) { "meta", "br", "hr", "img", "col" };

    /// <summary>The report as HTML text.</summary>
    /// <param name="report">The processed run.</param>
    /// <param name="options">Title, laboratory, run name, budgets and decisions; null for <see cref="RunHtmlReportOptions.Default"/>.</param>
    /// <returns>The complete page, starting with <c>&lt;!DOCTYPE html&gt;</c>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="report"/> is null.</exception>
    /// <exception cref="ArgumentException">An uncertainty-budget sample id of <paramref name="options"/> has no result in
    /// the run, or a decision names an analyte not in the method (the message lists what is available); or a
    /// decision rule rejects a result (e.g. a limit of another concentration kind, see <see cref="DecisionRule.Assess(SpecificationLimit, Measured{Concentration}, Coverage)"/>).</exception>
    public static string Render(RunReport report, RunHtmlReportOptions? options = null)
    {
        var text = new StringWriter(CultureInfo.InvariantCulture) { NewLine = "\n" };
        Write(report, text, options);
        return text.ToString();
    }

    /// <summary>Writes the report as HTML text to <paramref name="writer"/> (see <see cref="Render"/>).</summary>
    /// <param name="report">The processed run.</param>
    /// <param name="writer">Where the page is written; not closed.</param>
    /// <param name="options">Title, laboratory, run name, budgets and decisions; null for <see cref="RunHtmlReportOptions.Default"/>.</param>
    /// <exception cref="ArgumentNullException"><paramref name="report"/> or <paramref name="writer"/> is null.</exception>
    /// <exception cref="ArgumentException">As <see cref="Render"/>.</exception>
    public static void Write(RunReport report, TextWriter writer, RunHtmlReportOptions? options = null)
    {
        Guard.NotNull(report, nameof(report));
        Guard.NotNull(writer, nameof(writer));
        options ??= RunHtmlReportOptions.Default;
        Validate(report, options);

        XElement html = new Page(report, options).Build();
        foreach (XElement e in html.DescendantsAndSelf().Where(e => e.Name.Namespace == X && !e.Nodes().Any() && !VoidElements.Contains(e.Name.LocalName)))
        {
            e.Value = string.Empty; // <td></td>, never <td/>, which HTML parsers read as an open tag
        }

        writer.Write("<!DOCTYPE html>\n");
        var settings = new XmlWriterSettings
        {
            OmitXmlDeclaration = true,
            Indent = true,
            IndentChars = " ",
            NewLineChars = "\n",
            NewLineHandling = NewLineHandling.Replace,
            CloseOutput = false,
        };
        using (var xml = XmlWriter.Create(writer, settings))
        {
            html.WriteTo(xml);
        }

        writer.Write("\n");
    }

    private static void Validate(RunReport report, RunHtmlReportOptions options)
    {
        if (options.UncertaintyBudgetSamples is IReadOnlyList<string> ids)
        {
            var known = report.Results.Select(r => r.SampleId).Distinct(StringComparer.Ordinal).ToList();
            foreach (string id in ids.Where(id => !known.Contains(id, StringComparer.Ordinal)))
            {
                throw new ArgumentException(
                    $"Parameter 'options': UncertaintyBudgetSamples lists '{id}', which has no result in the run; sample ids with results: {Quoted(known)}.",
                    nameof(options));
            }
        }

        var analytes = report.Method.Analytes.Select(a => a.Analyte).ToList();
        foreach (AnalyteSpecification spec in options.Decisions.Where(s => !analytes.Contains(s.Analyte, StringComparer.Ordinal)))
        {
            throw new ArgumentException(
                $"Parameter 'options': a decision names analyte '{spec.Analyte}', which is not in the method; analytes: {Quoted(analytes)}.",
                nameof(options));
        }
    }

    private static string Quoted(IEnumerable<string> names) => string.Join(", ", names.Select(n => "'" + n + "'"));

    private static XElement E(string name, params object?[] content) => new(X + name, content);

    private static XElement Cls(string name, string cssClass, params object?[] content) => new(X + name, new XAttribute("class", cssClass), content);

    /// <summary>A table; <paramref name="headers"/> are the column headings separated by '|'.</summary>
    private static XElement Table(string headers, IEnumerable<object?[]> rows, string? cssClass = null) =>
        E(
            "table",
            cssClass is null ? null : new XAttribute("class", cssClass),
            E("thead", E("tr", headers.Split('|').Select(h => E("th", h)))),
            E("tbody", rows.Select(r => E("tr", r.Select(c => c is XElement td && td.Name == X + "td" ? td : E("td", c))))));

    private static XElement Verdict(bool? passed) => passed switch
    {
        true => Cls("span", "ok", "pass"),
        false => Cls("span", "bad", "FAIL"),
        _ => Cls("span", "na", "not evaluated"),
    };

    private static XElement? Small(IReadOnlyList<string> notes) =>
        notes.Count == 0 ? null : Cls("div", "note", string.Join(" ", notes));

    private static string N(double value) => double.IsPositiveInfinity(value) ? "∞" : value.ToString("G4", CultureInfo.InvariantCulture);

    private static string G6(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    private static string N(double? value) => value is double v ? N(v) : "–";

    private static string Signal(double? value) => value is double v ? v.ToString("G7", CultureInfo.InvariantCulture) : "–";

    private static string Level(double fraction) => N(100 * fraction) + " %";

    private static string P(double? percent) => percent is double v ? v.ToString("F1", CultureInfo.InvariantCulture) + " %" : "–";

    private static string C(Concentration? value) => value is Concentration c ? c.ToString("G4", CultureInfo.InvariantCulture) : "–";

    private static string ZoneText(DecisionZone zone) => zone switch
    {
        DecisionZone.Pass => "zone pass",
        DecisionZone.ConditionalPass => "zone conditional pass",
        DecisionZone.ConditionalFail => "zone conditional fail",
        _ => "zone fail",
    };

    private static string Role(InjectionRole role) => role switch
    {
        InjectionRole.CalibrationStandard => "calibration standard",
        InjectionRole.CalibrationBlank => "calibration blank",
        InjectionRole.MethodBlank => "method blank",
        InjectionRole.QualityControl => "QC",
        InjectionRole.Sample => "sample",
        InjectionRole.SampleDuplicate => "duplicate",
        _ => "spiked sample",
    };

    /// <summary>Builds one page; holds the counter that keeps the ids of inline plots unique.</summary>
    private sealed class Page
    {
        private readonly RunReport _report;
        private readonly RunHtmlReportOptions _options;
        private int _plots;

        internal Page(RunReport report, RunHtmlReportOptions options)
        {
            _report = report;
            _options = options;
        }

        private double ConfidenceLevel => _report.Method.ConfidenceLevel;

        internal XElement Build()
        {
            string runName = _options.RunName ?? _report.Run.Name;
            var sections = new (string Id, string Heading, Func<IEnumerable<object?>> Body)[]
            {
                ("method", "Method summary", MethodSection),
                ("calibration", "Calibration", CalibrationSection),
                ("results", "Results", ResultsSection),
                ("qc", "Quality-control checks", QualityControlSection),
                ("duplicates", "Duplicates", DuplicatesSection),
                ("spikes", "Spiked samples", SpikesSection),
                ("is-recovery", "Internal-standard recovery", InternalStandardSection),
                ("drift", "Drift across the run", DriftSection),
                ("uncertainty", "Uncertainty budgets", UncertaintySection),
                ("decisions", "Compliance decisions", DecisionsSection),
                ("notes", "Notes", NotesSection),
                ("cautions", "Cautions", CautionsSection),
            };

            return E(
                "html",
                new XAttribute("lang", "en"),
                E(
                    "head",
                    E("meta", new XAttribute("charset", "utf-8")),
                    E("meta", new XAttribute("name", "viewport"), new XAttribute("content", "width=device-width, initial-scale=1")),
                    E("title", _options.Title + " – " + runName),
                    E("style", Css)),
                E(
                    "body",
                    E(
                        "header",
                        E("h1", _options.Title),
                        Cls(
                            "p",
                            "meta",
                            _options.Laboratory is string lab ? new object[] { E("b", lab), " · " } : null,
                            "Run ",
                            E("b", runName),
                            " · method ",
                            E("b", _report.Method.Name),
                            " · " + Acquired())),
                    E("nav", E("ol", sections.Select(s => E("li", E("a", new XAttribute("href", "#" + s.Id), s.Heading))))),
                    sections.Select(s => E("section", new XAttribute("id", s.Id), E("h2", s.Heading), s.Body()))));
        }

        private string Acquired()
        {
            IReadOnlyList<RunInjection> injections = _report.Run.Injections;
            var times = injections.Where(i => i.AcquiredAt is not null).Select(i => i.AcquiredAt!.Value).ToList();
            string count = injections.Count.ToString(CultureInfo.InvariantCulture) + " injections";
            return times.Count == 0
                ? count
                : count + ", acquired " + times.Min().ToString("yyyy-MM-dd HH:mm zzz", CultureInfo.InvariantCulture) + " to " + times.Max().ToString("HH:mm", CultureInfo.InvariantCulture);
        }

        private XElement Plot(PlotModel model, string caption)
        {
            _plots++;
            string prefix = "p" + _plots.ToString(CultureInfo.InvariantCulture) + "-";
            XElement svg = XElement.Parse(PlotExport.ToInlineSvg(model, PlotWidth, PlotHeight, prefix));
            svg.SetAttributeValue("viewBox", "0 0 " + PlotWidth.ToString(CultureInfo.InvariantCulture) + " " + PlotHeight.ToString(CultureInfo.InvariantCulture));
            svg.SetAttributeValue("class", "plot");
            svg.SetAttributeValue("role", "img");
            svg.SetAttributeValue("aria-label", caption);
            return E("figure", svg, E("figcaption", caption));
        }

        private IEnumerable<object?> MethodSection()
        {
            RunMethod m = _report.Method;
            yield return Table(
                "Analyte|Internal standard|IS in measured solutions|Model|Weighting|x axis|Fitted points|Blanks|Acceptance rules|LOD|LOQ",
                m.Analytes.Select(a => new object?[]
                {
                    E("b", a.Analyte),
                    a.InternalStandard,
                    m.InternalStandardConcentrations.TryGetValue(a.InternalStandard, out Concentration isc) ? C(isc) : "–",
                    CalibrationPlots.ModelName(a.Model),
                    a.Weighting.Name,
                    a.Options.Axis == CalibrationAxis.AnalyteConcentration ? "analyte concentration" : "concentration ratio C/C_IS",
                    a.Options.Replicates == ReplicateHandling.EveryInjection ? "every injection" : "level means",
                    a.Options.Blanks == BlankHandling.Include ? "fitted" : "left out",
                    a.Acceptance?.ToString() ?? "none",
                    C(a.Limits?.DetectionLimit),
                    C(a.Limits?.QuantificationLimit),
                }));
            yield return Cls(
                "ul",
                "facts",
                E("li", "IS recovery window: ", m.RecoveryWindow.ToString()),
                E("li", "QC recovery window: ", m.QualityControlRecovery?.ToString() ?? "none"),
                E("li", "Duplicate limit: ", m.DuplicateRpd?.ToString() ?? "none"),
                E("li", "Spike recovery window: ", m.SpikeRecovery?.ToString() ?? "none"),
                E("li", "Drift rule: ", m.Drift?.ToString() ?? "none"),
                E("li", "Intervals: " + Level(m.ConfidenceLevel) + ", inverse-prediction method " + m.IntervalMethod),
                E("li", "LOD and LOQ are concentrations in the original sample; results below them are reported censored (the estimate is kept)."));
        }

        private IEnumerable<object?> CalibrationSection()
        {
            foreach (AnalyteCalibration c in _report.Calibrations)
            {
                string verdict = c.Calibration is null ? "no calibration" : c.IsAccepted ? "accepted" : "rejected";
                yield return E(
                    "h3",
                    c.Analyte + " (IS " + c.Method.InternalStandard + ") ",
                    Cls("span", c.IsAccepted ? "ok" : "bad", verdict));
                if (c.Calibration is not RatioCalibration cal)
                {
                    yield return Cls("p", "bad-text", "The calibration could not be fitted: " + c.Failure);
                    continue;
                }

                yield return E("p", "Injection orders: " + string.Join(", ", c.InjectionOrders.Select(o => o.ToString(CultureInfo.InvariantCulture))) + ".");
                yield return Coefficients(cal);
                yield return Diagnostics(cal);
                if (c.Verdict is AcceptanceVerdict v)
                {
                    yield return E("h4", "Acceptance: " + v.RuleSet);
                    yield return Table(
                        "Criterion|Status|Observed|Limit|Explanation",
                        v.Criteria.Select(k => new object?[]
                        {
                            k.Criterion,
                            k.Status == CriterionStatus.NotApplicable ? Verdict(null) : Verdict(k.Status == CriterionStatus.Passed),
                            k.Observed is double observed ? G6(observed) : "–",
                            G6(k.Limit),
                            Cls("td", "note", k.Explanation),
                        }));
                }

                if (cal.Notes.Count > 0)
                {
                    yield return E("ul", cal.Notes.Select(n => E("li", n)));
                }

                yield return Cls(
                    "div",
                    "plots",
                    Plot(CalibrationPlots.Curve(cal, ConfidenceLevel, "Calibration curve: " + c.Analyte), "Calibration curve of " + c.Analyte + " with the " + Level(ConfidenceLevel) + " confidence band of the fitted mean."),
                    Plot(CalibrationPlots.Residuals(cal, "Residuals: " + c.Analyte), "Residuals of the fitted points of " + c.Analyte + "."),
                    Plot(CalibrationPlots.RelativeErrors(cal, c.Method.Acceptance, "Relative error: " + c.Analyte), "Back-calculated relative error per standard level of " + c.Analyte + "."));
            }
        }

        private static XElement Coefficients(RatioCalibration cal)
        {
            if (cal is RegressionCalibration r)
            {
                return Table(
                    "Coefficient|Meaning|Value|Standard error|Confidence interval|Unit",
                    r.Coefficients.Select(k => new object?[]
                    {
                        k.Symbol, k.Meaning, N(k.Value), N(k.StandardError),
                        N(k.Interval.Lower) + " to " + N(k.Interval.Upper) + " (" + Level(k.Interval.ConfidenceLevel) + ")",
                        k.Unit,
                    }));
            }

            var rf = (ResponseFactorCalibration)cal;
            return Table(
                "Mean response factor|Standard deviation|RSD|Response factors",
                new[] { new object?[] { N(rf.MeanResponseFactor), N(rf.ResponseFactorStandardDeviation), P(rf.ResponseFactorRsdPercent), rf.ResponseFactorCount.ToString(CultureInfo.InvariantCulture) } });
        }

        private static XElement Diagnostics(RatioCalibration cal)
        {
            var items = new List<XElement>
            {
                E("li", "Fitted: " + cal.PointCount.ToString(CultureInfo.InvariantCulture) + (cal.Replicates == ReplicateHandling.EveryInjection ? " injections" : " level means")
                    + " from " + cal.LevelCount.ToString(CultureInfo.InvariantCulture) + " non-blank levels; calibrated range x = " + N(cal.LowestX) + " to " + N(cal.HighestX) + " " + cal.AxisUnitSymbol),
                E("li", "Relative standard error (US EPA SW-846 8000D): " + P(cal.RelativeStandardErrorPercent)),
            };
            if (cal is RegressionCalibration r)
            {
                items.Add(E("li", "Correlation coefficient r = " + r.CorrelationCoefficient.ToString("F5", CultureInfo.InvariantCulture)
                    + ", R² = " + r.CoefficientOfDetermination.ToString("F5", CultureInfo.InvariantCulture)
                    + ", residual standard deviation s = " + N(r.ResidualStandardDeviation)));
                items.Add(E("li", "Lack of fit: " + (r.LackOfFit?.ToString() ?? "not tested (no replicate injections)")));
                items.Add(E("li", "Mandel test: " + (r.Mandel?.ToString() ?? "not computed")));
                items.Add(E("li", "Variance homogeneity: " + (r.VarianceHomogeneity?.ToString() ?? "not tested")));
            }

            return Cls("ul", "facts", items);
        }

        private IEnumerable<object?> ResultsSection()
        {
            yield return E("p", "Every analyte of every sample-like injection, in injection order. Values in the original sample carry the dilution chain; intervals are " + Level(ConfidenceLevel) + " intervals. Censored values keep their estimate.");
            yield return Table(
                "Sample|Role|Analyte|In measured solution|In sample (u)|Interval in sample|Reported|Qualifiers",
                Ordered().Select(r => new object?[]
                {
                    E("b", r.SampleId),
                    Role(r.Role),
                    r.Analyte,
                    C(r.InMeasuredSolution),
                    r.InSample is Measured<Concentration> m ? C(m.Value) + " (u " + C(m.StandardUncertainty) + ")" : "–",
                    r.SampleLower is Concentration lo && r.SampleUpper is Concentration hi ? C(lo) + " to " + C(hi) : "–",
                    r.Reported is null ? "not reported" : (object)E("b", r.Reported.ToString()),
                    E("td", r.Qualifiers == ResultQualifiers.None ? null : Cls("span", "flag", RunReport.QualifierText(r.Qualifiers)), Small(r.Notes)),
                }),
                "results");
        }

        private IEnumerable<AnalyteResult> Ordered() =>
            _report.Results.OrderBy(r => r.InjectionOrders.Count == 0 ? int.MaxValue : r.InjectionOrders[0]).ThenBy(r => r.Analyte, StringComparer.Ordinal);

        private IEnumerable<object?> QualityControlSection()
        {
            if (_report.QualityControl.Count == 0)
            {
                yield return E("p", "No QC injections in the run.");
                yield break;
            }

            yield return Table(
                "Order|QC|Analyte|Nominal|Found|Recovery|Window|Result",
                _report.QualityControl.Select(c => new object?[]
                {
                    c.Injection.Order.ToString(CultureInfo.InvariantCulture), c.Injection.Id, c.Analyte, C(c.Nominal), C(c.Found), P(c.RecoveryPercent),
                    c.Window?.ToString() ?? "none", E("td", Verdict(c.Passed), Small(c.Notes)),
                }));
        }

        private IEnumerable<object?> DuplicatesSection()
        {
            if (_report.Duplicates.Count == 0)
            {
                yield return E("p", "No duplicate injections in the run.");
                yield break;
            }

            yield return Table(
                "Analyte|Sample|Duplicate|Sample result|Duplicate result|RPD|Limit|Result",
                _report.Duplicates.Select(d => new object?[]
                {
                    d.Analyte, d.SampleId, d.DuplicateId, C(d.Sample), C(d.Duplicate), P(d.RpdPercent), d.Limit?.ToString() ?? "none", E("td", Verdict(d.Passed), Small(d.Notes)),
                }));
        }

        private IEnumerable<object?> SpikesSection()
        {
            if (_report.Spikes.Count == 0)
            {
                yield return E("p", "No spiked samples in the run.");
                yield break;
            }

            yield return Table(
                "Analyte|Spiked|Parent|Spiked result|Parent result|Added|Recovery|Window|Result",
                _report.Spikes.Select(s => new object?[]
                {
                    s.Analyte, s.SpikedId, s.ParentId, C(s.Spiked), C(s.Unspiked), C(s.Added), P(s.RecoveryPercent), s.Window?.ToString() ?? "none", E("td", Verdict(s.Passed), Small(s.Notes)),
                }));
        }

        private IEnumerable<object?> InternalStandardSection()
        {
            yield return E("p", "Recovery = 100 · IS signal / reference IS signal; window " + _report.Method.RecoveryWindow + ".");
            foreach (string name in RunPlots.InternalStandardNames(_report))
            {
                double? reference = _report.InternalStandardReferences.TryGetValue(name, out double? r) ? r : null;
                yield return E("h3", name + " (reference signal " + Signal(reference) + ")");
                yield return Cls(
                    "div",
                    "side",
                    Plot(RunPlots.InternalStandardRecovery(_report, name), "Recovery of " + name + " over injection order."),
                    Table(
                    "Order|Injection|Role|IS signal|Recovery|Within window",
                    _report.Injections.SelectMany(o => o.InternalStandardRecoveries.Where(x => x.InternalStandard == name).Select(x => new object?[]
                    {
                        o.Injection.Order.ToString(CultureInfo.InvariantCulture), o.Injection.Id, Role(o.Injection.Role), Signal(x.Signal), P(x.RecoveryPercent), Verdict(x.WithinWindow),
                    })),
                    "compact"));
            }
        }

        private IEnumerable<object?> DriftSection()
        {
            if (_report.Drift.Count == 0)
            {
                yield return E("p", "No drift rule in the method; drift was not checked.");
                yield break;
            }

            yield return E("p", "Straight-line trend across injection order; flagged by the rule " + _report.Method.Drift + ".");
            yield return Table(
                "Series|Points|Slope per injection|Drift over the run|Interval of the drift|Flag",
                _report.Drift.Select(d => d.Trend is DriftTrend t
                    ? new object?[]
                    {
                        d.ToString(), t.Count.ToString(CultureInfo.InvariantCulture), N(t.Slope) + " ± " + N(t.SlopeStandardError), P(t.DriftOverRunPercent),
                        P(t.DriftOverRunPercentInterval.Lower) + " to " + P(t.DriftOverRunPercentInterval.Upper), t.IsFlagged ? Cls("span", "bad", "flagged") : Cls("span", "ok", "not flagged"),
                    }
                    : new object?[] { d.ToString(), d.InjectionOrders.Count.ToString(CultureInfo.InvariantCulture), "–", "–", "–", Cls("span", "na", "no trend: " + d.Failure) }));
            yield return Cls("div", "plots", _report.Method.Analytes.Select(a => Plot(RunPlots.QualityControlDrift(_report, a.Analyte), "QC recovery of " + a.Analyte + " over injection order.")));
        }

        private IEnumerable<object?> UncertaintySection()
        {
            List<AnalyteResult> selected = SelectedForBudget();
            yield return E("p", _options.UncertaintyBudgetSamples is null
                ? "For each analyte, the first sample result reported as a number (GUM law of propagation, JCGM 100). Other budgets: set the sample ids in the report options."
                : "Budgets of the samples chosen in the report options (GUM law of propagation, JCGM 100).");
            if (selected.Count == 0)
            {
                yield return E("p", "No result selected for an uncertainty budget.");
            }

            foreach (AnalyteResult r in selected)
            {
                yield return E("h3", r.SampleId + " · " + r.Analyte);
                (ResultUncertaintyBudget? budget, string? failure) = Budget(r);
                if (budget is null)
                {
                    yield return Cls("p", "bad-text", "No budget: " + failure);
                    continue;
                }

                GumEvaluation g = budget.Gum;
                string unit = Concentration.SymbolOf(budget.Unit);
                yield return E(
                    "p",
                    "Result " + N(g.Value) + " " + unit + ", combined standard uncertainty u = " + N(g.StandardUncertainty) + " " + unit
                    + ", k = " + g.CoverageFactor.ToString("F2", CultureInfo.InvariantCulture) + " (ν_eff = " + N(g.EffectiveDegreesOfFreedom) + ", p = " + Level(g.CoverageProbability)
                    + "), expanded uncertainty U = " + N(g.ExpandedUncertainty) + " " + unit + ", interval " + N(g.Interval.Lower) + " to " + N(g.Interval.Upper) + " " + unit + ".");
                yield return Table(
                    "Input|Value|Unit|Standard uncertainty|Degrees of freedom|Sensitivity|Contribution (" + unit + ")|Share of variance",
                    g.Contributions.Select(k => new object?[]
                    {
                        k.Name, N(k.Value), k.Input.Unit, N(k.StandardUncertainty), N(k.DegreesOfFreedom), N(k.SensitivityCoefficient), N(k.Contribution), P(100 * k.VarianceShare),
                    }),
                    "compact");
            }
        }

        private (ResultUncertaintyBudget? Budget, string? Failure) Budget(AnalyteResult result)
        {
            try
            {
                return (result.UncertaintyBudget(coverageProbability: ConfidenceLevel), null);
            }
            catch (InvalidOperationException e)
            {
                return (null, e.Message);
            }
        }

        private List<AnalyteResult> SelectedForBudget()
        {
            if (_options.UncertaintyBudgetSamples is IReadOnlyList<string> ids)
            {
                return ids.SelectMany(id => Ordered().Where(r => r.SampleId == id && r.InSample is not null)).ToList();
            }

            return _report.Method.Analytes
                .Select(a => Ordered().FirstOrDefault(r => r.Analyte == a.Analyte && r.Role == InjectionRole.Sample && r.InSample is not null
                    && r.Qualifiers == ResultQualifiers.None && r.Reported?.IsCensored == false))
                .Where(r => r is not null)
                .Select(r => r!)
                .ToList();
        }

        private IEnumerable<object?> DecisionsSection()
        {
            if (_options.Decisions.Count == 0)
            {
                yield return E("p", "No specification limits were given for this report; no compliance decisions were taken.");
                yield break;
            }

            foreach (AnalyteSpecification spec in _options.Decisions)
            {
                yield return E("h3", spec.Analyte + ": " + spec.Limit);
                Coverage coverage = spec.Coverage ?? Coverage.WithProbability(ConfidenceLevel);
                yield return Cls("p", "rule", "Decision rule: " + spec.Rule + " Coverage: " + coverage + ".");
                var rows = new List<object?[]>();
                foreach (AnalyteResult r in Ordered().Where(r => r.Analyte == spec.Analyte && r.Role is InjectionRole.Sample or InjectionRole.SampleDuplicate))
                {
                    if (r.InSample is not Measured<Concentration> m)
                    {
                        rows.Add(new object?[] { r.SampleId, "–", Cls("span", "na", "no decision"), Cls("td", "note", "No result in the original sample. " + string.Join(" ", r.Notes)) });
                        continue;
                    }

                    ComplianceDecision d = spec.Rule.Assess(spec.Limit, m, coverage);
                    string css = d.Outcome switch
                    {
                        ComplianceOutcome.Compliant => "ok",
                        ComplianceOutcome.NonCompliant => "bad",
                        _ => "na",
                    };
                    string outcome = d.Outcome switch
                    {
                        ComplianceOutcome.Compliant => "compliant",
                        ComplianceOutcome.NonCompliant => "non-compliant",
                        _ => "inconclusive",
                    };
                    rows.Add(new object?[]
                    {
                        r.SampleId,
                        C(m.Value) + " (u " + C(m.StandardUncertainty) + ")",
                        Cls("span", css, outcome + (d.Zone is DecisionZone z ? " (" + ZoneText(z) + ")" : string.Empty)),
                        E("td", Cls("div", "note", d.ToString()), r.Qualifiers == ResultQualifiers.None ? null : Cls("div", "flag", "Result qualifiers: " + RunReport.QualifierText(r.Qualifiers))),
                    });
                }

                yield return Table("Sample|Result in sample (u)|Decision|How it was decided", rows);
            }
        }

        private IEnumerable<object?> NotesSection()
        {
            var injectionNotes = _report.Injections.Where(o => o.Reasons.Count > 0).ToList();
            if (_report.Notes.Count == 0 && injectionNotes.Count == 0)
            {
                yield return E("p", "No notes.");
                yield break;
            }

            yield return E(
                "ul",
                _report.Notes.Select(n => E("li", n)),
                injectionNotes.Select(o => E("li", E("b", "Injection " + o.Injection.Order.ToString(CultureInfo.InvariantCulture) + " (" + o.Injection.Id + "): "), string.Join(" ", o.Reasons))));
        }

        private IEnumerable<object?> CautionsSection()
        {
            yield return Cls(
                "p",
                "caution",
                "This report was computed by the InternalStdCal library from the signals and the method settings shown above. "
                + "The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide "
                + "which results are released, how they are qualified and what they mean for a decision. Check the method settings, "
                + "the acceptance criteria and every flagged result before use.");
        }
    }

    private const string Css = @"
body { font-family: Arial, 'Liberation Sans', Helvetica, sans-serif; color: #22262b; margin: 0 auto; padding: 16px 24px 40px; max-width: 1400px; line-height: 1.4; font-size: 14px; }
header { border-bottom: 3px solid #1f5a96; margin-bottom: 12px; }
h1 { font-size: 26px; margin: 8px 0 4px; }
h2 { font-size: 20px; margin: 28px 0 8px; padding-bottom: 4px; border-bottom: 1px solid #c9d2dc; color: #1f5a96; }
h3 { font-size: 16px; margin: 20px 0 6px; }
h4 { font-size: 14px; margin: 12px 0 4px; }
p.meta { color: #4a525a; margin: 0 0 10px; }
nav ol { columns: 3; margin: 0; padding-left: 20px; }
table { border-collapse: collapse; margin: 6px 0 12px; font-size: 13px; }
th, td { border: 1px solid #d5dbe1; padding: 3px 7px; text-align: left; vertical-align: top; }
th { background: #eef2f6; font-weight: bold; }
tbody tr:nth-child(even) { background: #f8fafc; }
table.compact td, table.compact th { padding: 2px 6px; }
.ok { color: #1d5f2c; background: #e3f1e6; padding: 0 5px; border-radius: 3px; font-weight: bold; }
.bad { color: #8a3a00; background: #fde7d3; padding: 0 5px; border-radius: 3px; font-weight: bold; }
.na { color: #4a525a; background: #eceff2; padding: 0 5px; border-radius: 3px; }
.bad-text { color: #8a3a00; }
.flag { color: #8a3a00; font-weight: bold; }
.note { color: #4a525a; font-size: 12px; max-width: 520px; }
ul.facts { margin: 4px 0 10px; padding-left: 20px; }
div.side { display: flex; flex-wrap: wrap; gap: 16px; align-items: flex-start; }
div.side figure { flex: 0 1 600px; }
table.results td:first-child { white-space: nowrap; }
div.plots { display: grid; grid-template-columns: repeat(auto-fill, minmax(420px, 1fr)); gap: 12px; margin: 8px 0 16px; }
figure { margin: 0; border: 1px solid #d5dbe1; padding: 4px; background: #ffffff; }
figcaption { font-size: 12px; color: #4a525a; padding: 2px 4px; }
svg.plot { width: 100%; height: auto; display: block; }
p.rule { font-size: 13px; }
p.caution { border-left: 4px solid #d96c06; background: #fff6ee; padding: 8px 12px; }
@media print { div.plots { grid-template-columns: 1fr 1fr; } nav { display: none; } }
";
}
