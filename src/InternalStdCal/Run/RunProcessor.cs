using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Limits;
using InternalStdCal.Preparation;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// Processes an analytical run with a method in one call: internal-standard (IS) recoveries, one calibration per
/// analyte with its acceptance verdict, quantitation of every sample, back-calculation to the original sample,
/// quality-control recoveries, duplicate RPDs, spike recoveries, flags, and a status row for every injection.
/// </summary>
/// <remarks>
/// <para><b>Signals.</b> A row whose analyte or IS signal is missing, or whose IS signal is ≤ 0, is set aside for
/// that analyte, with the reason in its status row and <see cref="ResultQualifiers.MissingOrInvalidSignal"/> on the result;
/// it never stops the run. Analyte signals ≤ 0 are used and flagged.</para>
/// <para><b>Calibration.</b> Standards with the same id are replicate injections of one level; calibration-blank rows
/// are a level with nominal 0 (used or left out as <see cref="CalibrationOptions.Blanks"/> says; response-factor models
/// never use them). A calibration that cannot be made is reported with the reason; its samples are not quantified.</para>
/// <para><b>Samples.</b> Rows with the same id are replicate injections; their mean ratio is read off the calibration
/// (<see cref="SampleQuantitation.Quantify"/>) and carried to the original sample through its
/// <see cref="SamplePreparation"/>. Quality-control rows are judged one injection at a time.</para>
/// <para><b>Brackets.</b> A failed quality-control check flags every sample injected between the previous and the next
/// quality-control injection of the run with a nominal value of that analyte (common practice); a check that applies
/// but cannot be computed counts as failed.</para>
/// <para><b>Replicates.</b> With at least 3 injections of a sample used, the two-sided Grubbs test
/// (<see cref="GrubbsTest"/>, α = <see cref="RunMethod.ReplicateOutlierSignificance"/>) is applied to their ratios; a
/// suspect injection is flagged (<see cref="ResultQualifiers.SuspectReplicate"/>) and stays in the mean.</para>
/// <para><b>Limits.</b> An analyte's <see cref="AnalyteMethod.Limits"/> are its LOD/LOQ in the original sample (common
/// practice) and judge <see cref="AnalyteResult.InSample"/>, giving <see cref="AnalyteResult.Reported"/> and the
/// below-LOD/LOQ flags; limits of another kind than a sample's result are not applied to it (noted on the result).</para>
/// <para><b>Drift.</b> With a <see cref="RunMethod.Drift"/> rule, the report holds the trend of every IS signal and of
/// every analyte's QC recovery across injection order (<see cref="RunReport.Drift"/>); flagged drifts are noted.</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide what a flag or a failed check means for the reported results.</para>
/// </remarks>
public static class RunProcessor
{
    /// <summary>Processes a run.</summary>
    /// <param name="run">The run.</param>
    /// <param name="method">The method; its analytes and IS must be declared in the run.</param>
    /// <returns>The report.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">The method names an analyte or IS the run does not declare.</exception>
    public static RunReport Process(AnalyticalRun run, RunMethod method)
    {
        Guard.NotNull(run, nameof(run));
        Guard.NotNull(method, nameof(method));
        foreach (AnalyteMethod a in method.Analytes)
        {
            if (!run.Analytes.Contains(a.Analyte, StringComparer.Ordinal))
            {
                throw new ArgumentException($"Parameter 'method': analyte '{a.Analyte}' is not declared in run '{run.Name}' (declared: {string.Join(", ", run.Analytes)}).", nameof(method));
            }

            if (!run.InternalStandards.Contains(a.InternalStandard, StringComparer.Ordinal))
            {
                throw new ArgumentException($"Parameter 'method': IS '{a.InternalStandard}' of analyte '{a.Analyte}' is not declared in run '{run.Name}' (declared: {string.Join(", ", run.InternalStandards)}).", nameof(method));
            }
        }

        var state = new State(run, method);
        state.Recoveries();
        var calibrations = new List<AnalyteCalibration>();
        var results = new List<AnalyteResult>(method.Analytes.Count * state.SampleCount);
        var qc = new List<QualityControlCheck>();
        foreach (AnalyteMethod a in method.Analytes)
        {
            AnalyteContext context = state.Calibrate(a);
            calibrations.Add(context.Calibration);
            int first = results.Count;
            state.QuantifySamples(context, results);
            List<QualityControlCheck> checks = state.QualityControl(context);
            State.Bracket(checks, results, first);
            qc.AddRange(checks);
        }

        var duplicates = new List<DuplicateCheck>();
        var spikes = new List<SpikeCheck>();
        state.PairChecks(results, duplicates, spikes);

        var notes = run.Analytes.Where(a => method.For(a) is null)
            .Select(a => "Analyte '" + a + "' is declared in the run but not in the method; it was not processed.")
            .ToList();
        List<DriftCheck> drift = Drift(run, method, qc, notes);
        return new RunReport(
            run,
            method,
            state.References,
            calibrations,
            results,
            qc,
            duplicates,
            spikes,
            state.Outcomes(),
            drift,
            notes);
    }

    // Each IS signal over every injection where it is valid, and each analyte's QC recovery, against injection order.
    private static List<DriftCheck> Drift(AnalyticalRun run, RunMethod method, List<QualityControlCheck> qc, List<string> notes)
    {
        var checks = new List<DriftCheck>();
        if (method.Drift is not DriftRule rule)
        {
            return checks;
        }

        foreach (string name in run.InternalStandards)
        {
            RunInjection[] points = run.Injections.Where(r => r.Signals.InternalStandard(name) > 0).OrderBy(r => r.Order).ToArray();
            checks.Add(Trend(DriftSeriesKind.InternalStandardSignal, name, points.Select(r => r.Order).ToArray(), points.Select(r => r.Signals.InternalStandard(name)!.Value).ToArray(), rule));
        }

        foreach (AnalyteMethod a in method.Analytes)
        {
            QualityControlCheck[] points = qc.Where(c => c.Analyte == a.Analyte && c.RecoveryPercent is not null).OrderBy(c => c.Injection.Order).ToArray();
            checks.Add(Trend(DriftSeriesKind.QualityControlRecovery, a.Analyte, points.Select(c => c.Injection.Order).ToArray(), points.Select(c => c.RecoveryPercent!.Value).ToArray(), rule));
        }

        foreach (DriftCheck c in checks)
        {
            if (c.Trend is not DriftTrend t)
            {
                notes.Add("No drift trend for " + c + ": " + c.Failure);
            }
            else if (t.IsFlagged)
            {
                notes.Add("Drift flagged for " + c + ": " + Text.F(t.DriftOverRunPercent, 1) + " % of the mean over injections " + Text.I(c.InjectionOrders[0]) + "–"
                    + Text.I(c.InjectionOrders[c.InjectionOrders.Count - 1]) + " (slope " + Text.G(t.Slope) + " per injection, " + Text.F(100 * rule.ConfidenceLevel, 0) + " % CI ["
                    + Text.G(t.SlopeInterval.Lower) + ", " + Text.G(t.SlopeInterval.Upper) + "]; rule: " + rule + ").");
            }
        }

        return checks;
    }

    private static DriftCheck Trend(DriftSeriesKind kind, string name, int[] orders, double[] values, DriftRule rule)
    {
        if (values.Length < 3)
        {
            return new DriftCheck(kind, name, orders, null, Text.I(values.Length) + " point(s); a trend with a slope interval needs at least 3.");
        }

        try
        {
            return new DriftCheck(kind, name, orders, DriftTrend.Fit(orders.Select(o => (double)o).ToArray(), values, rule), null);
        }
        catch (ArgumentException e)
        {
            string message = e.Message;
            string suffix = " (Parameter '" + e.ParamName + "')";
            return new DriftCheck(kind, name, orders, null, message.EndsWith(suffix, StringComparison.Ordinal) ? message.Substring(0, message.Length - suffix.Length) : message);
        }
        catch (InvalidOperationException e)
        {
            // An interval that overflows (absurd signals) is a note on the check, never an exception from the run.
            return new DriftCheck(kind, name, orders, null, e.Message);
        }
    }

    private sealed class RowState
    {
        internal RowState(RunInjection row, Dictionary<string, int> analytes, IReadOnlyList<string> internalStandards)
        {
            Row = row;
            Statuses = new InjectionStatus?[analytes.Count];
            AnalyteSignals = new double[analytes.Count];
            AnalyteSignals.AsSpan().Fill(double.NaN);
            foreach (KeyValuePair<string, double> signal in row.Signals.Analytes)
            {
                if (analytes.TryGetValue(signal.Key, out int k))
                {
                    AnalyteSignals[k] = signal.Value;
                }
            }

            InternalStandardSignals = new double[internalStandards.Count];
            for (int k = 0; k < InternalStandardSignals.Length; k++)
            {
                InternalStandardSignals[k] = row.Signals.InternalStandard(internalStandards[k]) ?? double.NaN;
            }
        }

        internal RunInjection Row { get; }

        // By method analyte index; null = not used for that analyte (reported as excluded).
        internal InjectionStatus?[] Statuses { get; }

        // Signals by method analyte index and by run IS index, read once per run; NaN = not recorded (signals are finite).
        internal double[] AnalyteSignals { get; }

        internal double[] InternalStandardSignals { get; }

        internal List<string> Reasons { get; } = new();

        internal List<InternalStandardRecovery> Recoveries { get; } = new();

        internal void Set(int analyte, string name, InjectionStatus status, string? reason)
        {
            Statuses[analyte] = status;
            if (reason is not null)
            {
                Reasons.Add(name + ": " + reason);
            }
        }
    }

    private sealed class State
    {
        // The notes of a check without notes (one read-only instance for all).
        private static readonly IReadOnlyList<string> NoNotes = Array.AsReadOnly(Array.Empty<string>());

        private readonly AnalyticalRun _run;
        private readonly RunMethod _method;
        private readonly Dictionary<int, RowState> _rows = new();
        private readonly Dictionary<string, double?> _references = new(StringComparer.Ordinal);
        private readonly List<RunInjection[]> _samples;
        private readonly List<IReadOnlyList<int>> _sampleOrders;
        private readonly List<RowState[]> _sampleStates;
        private readonly List<RunInjection[]> _calibrationLevels;
        private readonly double[] _ratios;

        // Each quality-control row (as a one-row sample) with its state, in injection order.
        private readonly List<(RunInjection[] Row, RowState[] State)> _qualityControls;
        private readonly Dictionary<string, int> _samplePosition = new(StringComparer.Ordinal);
        private readonly Dictionary<string, int> _analyteIndex = new(StringComparer.Ordinal);
        private readonly Dictionary<string, int> _isIndex = new(StringComparer.Ordinal);
        private readonly string[] _sortedAnalytes;
        private readonly int[] _sortedToIndex;

        internal State(AnalyticalRun run, RunMethod method)
        {
            _run = run;
            _method = method;
            for (int k = 0; k < method.Analytes.Count; k++)
            {
                _analyteIndex[method.Analytes[k].Analyte] = k;
            }

            for (int k = 0; k < run.InternalStandards.Count; k++)
            {
                _isIndex[run.InternalStandards[k]] = k;
            }

            _sortedAnalytes = _analyteIndex.Keys.ToArray();
            Array.Sort(_sortedAnalytes, StringComparer.Ordinal);
            _sortedToIndex = _sortedAnalytes.Select(n => _analyteIndex[n]).ToArray();
            foreach (RunInjection r in run.Injections)
            {
                _rows[r.Order] = new RowState(r, _analyteIndex, run.InternalStandards);
            }

            // Sample-like rows by id, in order of first injection (as GroupBy), formed once for all analytes.
            _samples = run.Injections.Where(r => r.IsSampleLike).GroupBy(r => r.Id, StringComparer.Ordinal).Select(g => g.ToArray()).ToList();
            _sampleOrders = _samples.Select(g => (IReadOnlyList<int>)Array.AsReadOnly(g.Select(r => r.Order).ToArray())).ToList();
            _sampleStates = _samples.Select(g => g.Select(r => _rows[r.Order]).ToArray()).ToList();
            for (int i = 0; i < _samples.Count; i++)
            {
                _samplePosition.Add(_samples[i][0].Id, i);
            }

            // Calibration rows by id (a level and its replicate injections), in order of first injection (as GroupBy).
            _calibrationLevels = run.Injections.Where(r => r.Role is InjectionRole.CalibrationStandard or InjectionRole.CalibrationBlank)
                .GroupBy(r => r.Id, StringComparer.Ordinal).Select(g => g.ToArray()).ToList();
            _qualityControls = run.Injections.Where(r => r.Role == InjectionRole.QualityControl).Select(r => (new[] { r }, new[] { _rows[r.Order] })).ToList();
            _ratios = new double[Math.Max(1, _samples.Count == 0 ? 1 : _samples.Max(g => g.Length))];
        }

        internal int SampleCount => _samples.Count;

        internal IReadOnlyDictionary<string, double?> References => _references;

        // Brackets are formed by the QC injections that carry a nominal value of this analyte, in injection order.
        internal static void Bracket(List<QualityControlCheck> checks, List<AnalyteResult> results, int first)
        {
            int[] qcOrders = checks.Select(c => c.Injection.Order).ToArray();
            foreach (QualityControlCheck c in checks.Where(c => c.Passed == false))
            {
                int k = Array.IndexOf(qcOrders, c.Injection.Order);
                int previous = k > 0 ? qcOrders[k - 1] : int.MinValue;
                int next = k < qcOrders.Length - 1 ? qcOrders[k + 1] : int.MaxValue;
                for (int i = first; i < results.Count; i++)
                {
                    AnalyteResult r = results[i];
                    if (r.Rows.Any(row => row.Order > previous && row.Order < next))
                    {
                        r.Qualifiers |= ResultQualifiers.QualityControlFailureInBracket;
                        r.AddNote("QC " + c.Injection + " failed (recovery " + (c.RecoveryPercent is double p ? Text.F(p, 1) + " %" : "not computed")
                            + ") and brackets this sample (injections between QC orders " + OrderText(previous) + " and " + OrderText(next) + ").");
                    }
                }
            }
        }

        // results: each method analyte's results in turn, each in the order of _samples, so a parent is found by its id's position.
        internal void PairChecks(List<AnalyteResult> results, List<DuplicateCheck> duplicates, List<SpikeCheck> spikes)
        {
            int n = _samples.Count;
            for (int k = 0; k < _method.Analytes.Count; k++)
            {
                AnalyteMethod a = _method.Analytes[k];
                int offset = k * n;
                for (int i = 0; i < n; i++)
                {
                    AnalyteResult d = results[offset + i];
                    if (d.Role == InjectionRole.SampleDuplicate)
                    {
                        AnalyteResult parent = results[offset + _samplePosition[d.Rows[0].ParentId!]];
                        duplicates.Add(Duplicate(a.Analyte, parent, d, _method.DuplicateRpd));
                    }
                }

                for (int i = 0; i < n; i++)
                {
                    AnalyteResult s = results[offset + i];
                    if (s.Role != InjectionRole.SpikedSample)
                    {
                        continue;
                    }

                    RunInjection row = s.Rows[0];
                    if (!row.Added.TryGetValue(a.Analyte, out Concentration added))
                    {
                        s.AddNote("No spike recovery: no added amount for " + a.Analyte + ".");
                        continue;
                    }

                    spikes.Add(Spike(a.Analyte, results[offset + _samplePosition[row.ParentId!]], s, added, _method.SpikeRecovery));
                }
            }
        }

        internal void Recoveries()
        {
            InternalStandardRecoveryWindow window = _method.RecoveryWindow;
            InjectionRole referenceRole = window.Reference == RecoveryReference.CalibrationBlankMean ? InjectionRole.CalibrationBlank : InjectionRole.CalibrationStandard;
            foreach (string name in _run.InternalStandards)
            {
                var sum = default(CompensatedSum);
                int n = 0;
                foreach (RunInjection r in _run.Injections.Where(r => r.Role == referenceRole))
                {
                    if (r.Signals.InternalStandard(name) is double s && s > 0)
                    {
                        sum.Add(s);
                        n++;
                    }
                }

                double? reference = n > 0 ? sum.Value / n : null;
                _references[name] = reference;
                foreach (RowState st in _rows.Values)
                {
                    double? signal = st.Row.Signals.InternalStandard(name);
                    double? pct = signal is double sg && sg > 0 && reference is double rf ? 100 * sg / rf : null;
                    bool? within = pct is double p ? window.Contains(p) : null;
                    st.Recoveries.Add(new InternalStandardRecovery(name, signal, reference, pct, within));
                    if (within == false)
                    {
                        st.Reasons.Add("IS " + name + " recovery " + Text.F(pct!.Value, 1) + " % is outside " + window + ".");
                    }
                }
            }
        }

        // The analyte's calibration with its acceptance, and what its results share.
        internal AnalyteContext Calibrate(AnalyteMethod a)
        {
            int ai = _analyteIndex[a.Analyte];
            Concentration cIs = _method.InternalStandardConcentrations[a.InternalStandard];
            bool rf = a.Model is RatioModel.AverageResponseFactor or RatioModel.SinglePointResponseFactor;
            ConcentrationUnit? unit = UnitOf(a.Analyte);
            var standards = new List<CalibrationStandard>();
            var used = new List<RunInjection>();
            foreach (RunInjection[] level in _calibrationLevels)
            {
                var injections = new List<Injection>(level.Length);
                var levelRows = new List<RunInjection>(level.Length);
                Concentration nominal;
                if (level[0].Role == InjectionRole.CalibrationBlank)
                {
                    if (rf || unit is null)
                    {
                        string why = rf ? "calibration blank not used by a response-factor model." : "no calibration standard carries a nominal concentration of this analyte.";
                        foreach (RunInjection r in level)
                        {
                            _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, why);
                        }

                        continue;
                    }

                    nominal = Concentration.From(0, unit.Value);
                }
                else if (!level[0].Nominal.TryGetValue(a.Analyte, out nominal))
                {
                    foreach (RunInjection r in level)
                    {
                        _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "no nominal concentration for this analyte in standard '" + r.Id + "'.");
                    }

                    continue;
                }
                else if (rf && nominal.Value == 0)
                {
                    foreach (RunInjection r in level)
                    {
                        _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "nominal 0 (blank) not used by a response-factor model.");
                    }

                    continue;
                }

                foreach (RunInjection r in level)
                {
                    (Injection? inj, string? why) = Signal(_rows[r.Order], ai, a);
                    if (inj is null)
                    {
                        _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, why);
                        continue;
                    }

                    injections.Add(inj);
                    levelRows.Add(r);
                }

                if (injections.Count > 0)
                {
                    standards.Add(new CalibrationStandard(level[0].Id, nominal, cIs, injections));
                    used.AddRange(levelRows);
                }
            }

            RatioCalibration? calibration = null;
            string? failure = null;
            try
            {
                calibration = Fit(a, standards);
            }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException)
            {
                failure = e.Message;
            }

            AcceptanceVerdict? verdict = calibration is not null ? a.Acceptance?.Evaluate(calibration) : null;
            foreach (RunInjection r in used)
            {
                if (calibration is null)
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "the calibration could not be made: " + failure);
                }
                else if (calibration.Standards.FirstOrDefault(s => s.Label == r.Id) is StandardResult s && !s.Included)
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "blank left out of the fit by the calibration options (back-calculated for information).");
                }
                else
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.UsedInCalibration, NonPositive(_rows[r.Order].AnalyteSignals[ai]));
                }
            }

            var result = new AnalyteCalibration(a, calibration, verdict, failure, used.Select(r => r.Order).ToList());
            return new AnalyteContext(_method, a, ai, _isIndex[a.InternalStandard], cIs, result);
        }

        // Unit of the first nominal concentration of the analyte among the calibration rows, in injection order.
        private ConcentrationUnit? UnitOf(string analyte)
        {
            foreach (RunInjection r in _run.Injections)
            {
                if (r.Role is InjectionRole.CalibrationStandard or InjectionRole.CalibrationBlank && r.Nominal.TryGetValue(analyte, out Concentration c))
                {
                    return c.Unit;
                }
            }

            return null;
        }

        // Appends one result per sample, in the order of _samples.
        internal void QuantifySamples(AnalyteContext c, List<AnalyteResult> results)
        {
            for (int i = 0; i < _samples.Count; i++)
            {
                var b = new AnalyteResult(c, _samples[i], _sampleOrders[i]);
                if (Quantify(c, b, _sampleStates[i], InjectionStatus.Quantified) is QuantitationEstimate q)
                {
                    ToSample(b, q);
                    ApplyLimits(c.Method, b);
                }

                results.Add(b);
            }
        }

        internal List<QualityControlCheck> QualityControl(AnalyteContext c)
        {
            AnalyteMethod a = c.Method;
            int ai = c.Index;
            var checks = new List<QualityControlCheck>();
            RecoveryWindow? window = _method.QualityControlRecovery;
            foreach ((RunInjection[] qcRow, RowState[] qcState) in _qualityControls)
            {
                RunInjection r = qcRow[0];
                if (!r.Nominal.TryGetValue(a.Analyte, out Concentration nominal))
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "no nominal concentration for this analyte; not evaluated.");
                    continue;
                }

                var b = new AnalyteResult(c, qcRow, Array.Empty<int>());
                QuantitationEstimate? estimate = Quantify(c, b, qcState, InjectionStatus.QualityControlEvaluated);
                double? recovery = null;
                if (estimate is QuantitationEstimate q)
                {
                    if (nominal.Kind == q.Concentration.Kind)
                    {
                        recovery = 100 * q.Concentration.RatioTo(nominal);
                    }
                    else
                    {
                        b.AddNote("Nominal " + nominal + " is of another kind than the calibration (" + q.Concentration.Kind + "); no recovery.");
                    }
                }

                bool? passed = window is null ? null : recovery is double p && window.Contains(p);
                if (passed == false)
                {
                    _rows[r.Order].Reasons.Add(a.Analyte + ": QC recovery " + (recovery is double v ? Text.F(v, 1) + " %" : "not computed") + " fails " + window + "; samples up to the neighbouring QC injections are flagged.");
                }

                checks.Add(new QualityControlCheck(r, a.Analyte, nominal, estimate?.Concentration, recovery, window, passed, b));
            }

            return checks;
        }

        internal List<InjectionOutcome> Outcomes()
        {
            var outcomes = new List<InjectionOutcome>(_run.Injections.Count);
            foreach (RunInjection r in _run.Injections)
            {
                RowState st = _rows[r.Order];
                var statuses = new InjectionStatus[_sortedAnalytes.Length];
                for (int k = 0; k < statuses.Length; k++)
                {
                    statuses[k] = st.Statuses[_sortedToIndex[k]] ?? InjectionStatus.Excluded;
                }

                outcomes.Add(new InjectionOutcome(r, new AnalyteStatusMap(_sortedAnalytes, statuses), st.Recoveries.ToList(), st.Reasons.ToList()));
            }

            return outcomes;
        }

        private static DuplicateCheck Duplicate(string analyte, AnalyteResult parent, AnalyteResult dup, RpdLimit? limit)
        {
            List<string>? notes = null;
            Concentration? a = parent.SampleValue;
            Concentration? b = dup.SampleValue;
            double? rpd = null;
            if (a is Concentration x && b is Concentration y)
            {
                if (x.Kind != y.Kind)
                {
                    (notes = new List<string>()).Add("Sample and duplicate results are of different kinds; no RPD.");
                    b = null;
                }
                else
                {
                    double yv = y.In(x.Unit);
                    b = Concentration.From(yv, x.Unit);
                    double mean = (x.Value + yv) / 2;
                    if (mean > 0)
                    {
                        rpd = 100 * Math.Abs(x.Value - yv) / mean;
                    }
                    else
                    {
                        (notes = new List<string>()).Add("Mean of sample and duplicate is ≤ 0; no RPD.");
                    }
                }
            }
            else
            {
                (notes = new List<string>()).Add("Sample or duplicate has no result in the original sample; no RPD.");
            }

            bool? passed = limit is null ? null : rpd is double r && r <= limit.MaxPercent;
            if (passed == false)
            {
                string text = "Duplicate RPD " + (rpd is double v ? Text.F(v, 1) + " %" : "not computed") + " fails " + limit + ".";
                dup.Qualifiers |= ResultQualifiers.DuplicateRpdExceeded;
                dup.AddNote(text);
                parent.Qualifiers |= ResultQualifiers.DuplicateRpdExceeded;
                parent.AddNote(text + " (duplicate '" + dup.SampleId + "')");
            }

            return new DuplicateCheck(analyte, parent.SampleId, dup.SampleId, a, b, rpd, limit, passed, notes ?? NoNotes);
        }

        private static SpikeCheck Spike(string analyte, AnalyteResult parent, AnalyteResult spiked, Concentration added, RecoveryWindow? window)
        {
            List<string>? notes = null;
            Concentration? s = spiked.SampleValue;
            Concentration? u = parent.SampleValue;
            double? recovery = null;
            if (s is Concentration x && u is Concentration y)
            {
                if (x.Kind != y.Kind || x.Kind != added.Kind)
                {
                    (notes = new List<string>()).Add("Spiked, unspiked and added amounts are not all of one kind; no recovery.");
                    u = null;
                }
                else
                {
                    double yv = y.In(x.Unit);
                    u = Concentration.From(yv, x.Unit);
                    recovery = 100 * (x.Value - yv) / added.In(x.Unit);
                }
            }
            else
            {
                (notes = new List<string>()).Add("Spiked or unspiked sample has no result in the original sample; no recovery.");
            }

            bool? passed = window is null ? null : recovery is double r && window.Contains(r);
            if (passed == false)
            {
                spiked.Qualifiers |= ResultQualifiers.SpikeRecoveryOutOfWindow;
                spiked.AddNote("Spike recovery " + (recovery is double v ? Text.F(v, 1) + " %" : "not computed") + " fails " + window + ".");
            }

            return new SpikeCheck(analyte, spiked.SampleId, parent.SampleId, s, u, added, recovery, window, passed, notes ?? NoNotes);
        }


        private static string OrderText(int order) =>
            order == int.MinValue ? "start of run" : order == int.MaxValue ? "end of run" : Text.I(order);

        private static string? NonPositive(double signal) =>
            signal <= 0 ? "analyte signal " + Text.G(signal) + " ≤ 0 (used)." : null;

        private (Injection? Injection, string? Reason) Signal(RowState st, int ai, AnalyteMethod a)
        {
            string? why = Ratio(st, ai, _isIndex[a.InternalStandard], a.InternalStandard, out _);
            return why is null ? (new Injection(st.AnalyteSignals[ai], st.InternalStandardSignals[_isIndex[a.InternalStandard]]), null) : (null, why);
        }

        // The ratio analyte/IS of a row, or why the row is set aside for the analyte: exactly the cases in which
        // an Injection cannot be made (then its exception is quoted).
        private static string? Ratio(RowState st, int ai, int isIndex, string internalStandard, out double ratio)
        {
            ratio = 0;
            double signal = st.AnalyteSignals[ai];
            double isSignal = st.InternalStandardSignals[isIndex];
            if (double.IsNaN(signal))
            {
                return "no analyte signal; set aside.";
            }

            if (double.IsNaN(isSignal))
            {
                return "no signal for IS " + internalStandard + "; set aside.";
            }

            if (!(isSignal > 0))
            {
                return "IS " + internalStandard + " signal " + Text.G(isSignal) + " ≤ 0 is invalid; set aside.";
            }

            ratio = signal / isSignal;
            if (double.IsInfinity(signal) || double.IsInfinity(isSignal) || double.IsInfinity(ratio))
            {
                try
                {
                    _ = new Injection(signal, isSignal);
                }
                catch (ArgumentOutOfRangeException e)
                {
                    return "signals cannot form a ratio (" + e.Message + "); set aside.";
                }
            }

            return null;
        }

        private static RatioCalibration Fit(AnalyteMethod a, List<CalibrationStandard> standards)
        {
            if (standards.Count == 0)
            {
                throw new ArgumentException("No valid calibration injection for analyte '" + a.Analyte + "'.", nameof(standards));
            }

            switch (a.Model)
            {
                case RatioModel.SinglePointResponseFactor:
                    if (standards.Count != 1)
                    {
                        throw new ArgumentException("The single-point response-factor model needs exactly one standard level; the run has " + Text.I(standards.Count) + " (" + string.Join(", ", standards.Select(s => s.Label)) + ").", nameof(standards));
                    }

                    return ResponseFactorCalibration.FitSinglePoint(standards[0], a.Options);
                case RatioModel.AverageResponseFactor:
                    return ResponseFactorCalibration.Fit(standards, a.Options);
                case RatioModel.Linear:
                    return RegressionCalibration.Fit(standards, CalibrationModel.Linear, a.Weighting, a.Options);
                case RatioModel.LinearThroughOrigin:
                    return RegressionCalibration.Fit(standards, CalibrationModel.LinearThroughOrigin, a.Weighting, a.Options);
                default:
                    return RegressionCalibration.Fit(standards, CalibrationModel.Quadratic, a.Weighting, a.Options);
            }
        }

        // Limits are the method's LOD/LOQ in the original sample (common practice), so they judge InSample.
        private static void ApplyLimits(AnalyteMethod a, AnalyteResult b)
        {
            if (b.SampleValue is not Concentration c)
            {
                return;
            }

            if (a.Limits is not ReportingLimits limits)
            {
                b.MarkReported();
                return;
            }

            if (limits.QuantificationLimit.Kind != c.Kind)
            {
                b.AddNote("Reporting limits (" + limits + ") not applied: they are of kind " + limits.QuantificationLimit.Kind + ", the result in the original sample is in "
                    + Concentration.SymbolOf(c.Unit) + " (" + c.Kind + "); not censored.");
                return;
            }

            ReportedStatus status = limits.Classify(c);
            b.MarkReported();
            if (status == ReportedStatus.NotDetected)
            {
                b.Qualifiers |= ResultQualifiers.BelowLimitOfDetection;
                b.AddNote("Below the LOD (" + b.Reported!.Limit + ") in the original sample; reported as " + b.Reported + ", value kept.");
            }
            else if (status == ReportedStatus.BelowQuantificationLimit)
            {
                b.Qualifiers |= ResultQualifiers.BelowLimitOfQuantitation;
                b.AddNote("Below the LOQ (" + b.Reported!.Limit + ") in the original sample; reported as " + b.Reported + ", value kept.");
            }
        }

        // The value and the interval ends carried back without uncertainty budgets (built when the result is asked for one).
        private static void ToSample(AnalyteResult b, QuantitationEstimate q)
        {
            SamplePreparation prep = b.Rows[0].Preparation;
            try
            {
                Concentration value = prep.ToSampleValue(q.Concentration);
                Concentration? lower = null, upper = null;
                if (q.Lower is Concentration lo && q.Upper is Concentration hi)
                {
                    lower = prep.ToSampleValue(lo);
                    upper = prep.ToSampleValue(hi);
                }

                b.InOriginalSample(value, lower, upper);
            }
            catch (ArgumentException e)
            {
                b.AddNote("No result in the original sample: the preparation does not fit the measured concentration (" + e.Message + ").");
            }
        }

        // Grubbs' test on the ratios of ≥ 3 replicate injections: flags a suspect one, which stays in the mean.
        private void Outlier(AnalyteMethod a, AnalyteResult b, double[] ratios, int count, IReadOnlyList<RunInjection> used)
        {
            if (count < 3)
            {
                return;
            }

            OutlierTestResult g = GrubbsTest.Evaluate(ratios.AsSpan(0, count).ToArray(), _method.ReplicateOutlierSignificance, OutlierSide.TwoSided);
            if (!g.IsOutlier)
            {
                return;
            }

            RunInjection suspect = used[g.SuspectIndex];
            string text = "ratio " + Text.G(g.SuspectValue) + " is a suspect outlier by Grubbs' test (G = " + Text.G(g.Statistic) + " > " + Text.G(g.CriticalValue)
                + ", n = " + Text.I(count) + ", two-sided α = " + Text.G(g.SignificanceLevel) + "); kept in the mean.";
            b.Qualifiers |= ResultQualifiers.SuspectReplicate;
            b.AddNote("Injection " + Text.I(suspect.Order) + ": " + text);
            _rows[suspect.Order].Reasons.Add(a.Analyte + ": " + text);
        }

        // Reads the sample's mean ratio off the calibration; states: the RowStates of b's rows. Null when not quantified.
        private QuantitationEstimate? Quantify(AnalyteContext c, AnalyteResult b, RowState[] states, InjectionStatus success)
        {
            AnalyteMethod a = c.Method;
            int ai = c.Index;
            RunInjection[] rows = b.Rows;
            double[] ratios = states.Length <= _ratios.Length ? _ratios : new double[states.Length];
            int count = 0;
            List<RunInjection>? setAside = null;
            for (int k = 0; k < rows.Length; k++)
            {
                RunInjection r = rows[k];
                string? why = Ratio(states[k], ai, c.InternalStandardIndex, a.InternalStandard, out double ratio);
                if (why is not null)
                {
                    states[k].Set(ai, a.Analyte, InjectionStatus.Excluded, why);
                    b.Qualifiers |= ResultQualifiers.MissingOrInvalidSignal;
                    b.AddNote("Injection " + Text.I(r.Order) + ": " + why);
                    (setAside ??= new List<RunInjection>()).Add(r);
                    continue;
                }

                ratios[count++] = ratio;
            }

            // Usually every row is valid: then the rows themselves are the rows used.
            IReadOnlyList<RunInjection> used = setAside is null ? rows : rows.Where(r => !setAside.Contains(r)).ToList();

            if (c.Calibration.Calibration is not RatioCalibration calibration)
            {
                b.Qualifiers |= ResultQualifiers.NotQuantified;
                b.AddNote("Not quantified: no calibration (" + c.Calibration.Failure + ").");
                foreach (RunInjection r in used)
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "no calibration for this analyte.");
                }

                return null;
            }

            if (count == 0)
            {
                b.Qualifiers |= ResultQualifiers.NotQuantified;
                b.AddNote("Not quantified: no valid injection.");
                return null;
            }

            Concentration cIs = c.InternalStandardConcentration;
            QuantitationEstimate q;
            try
            {
                if (string.IsNullOrWhiteSpace(b.SampleId) || !(cIs.Value > 0))
                {
                    // What UnknownSample refuses: let it say why.
                    _ = UnknownSample.Create(b.SampleId, cIs, new Injection(1, 1));
                }

                // The mean as UnknownSample.MeanResponse forms it: summed in order from the first ratio.
                double sum = ratios[0];
                for (int k = 1; k < count; k++)
                {
                    sum += ratios[k];
                }

                q = SampleQuantitation.Estimate(calibration, b.SampleId, cIs, sum / count, count, _method.ConfidenceLevel, _method.IntervalMethod);
            }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException)
            {
                b.Qualifiers |= ResultQualifiers.NotQuantified;
                b.AddNote("Not quantified: " + e.Message);
                foreach (RunInjection r in used)
                {
                    _rows[r.Order].Set(ai, a.Analyte, InjectionStatus.Excluded, "could not be read off the calibration.");
                }

                return null;
            }

            b.Quantified(setAside is null ? null : used, q.MeanResponse, q.Concentration, q.Lower, q.Upper);
            if (q.IsExtrapolated)
            {
                b.Qualifiers |= ResultQualifiers.Extrapolated;
            }

            if (c.CalibrationFailedNote is string failed)
            {
                b.Qualifiers |= ResultQualifiers.CalibrationRejected;
                b.AddNote(failed);
            }

            Outlier(a, b, ratios, count, used);
            int isIndex = c.InternalStandardIndex;
            for (int k = 0; k < used.Count; k++)
            {
                RunInjection r = used[k];
                RowState st = setAside is null ? states[k] : _rows[r.Order];
                double signal = st.AnalyteSignals[ai];
                st.Set(ai, a.Analyte, success, NonPositive(signal));
                if (signal <= 0)
                {
                    b.Qualifiers |= ResultQualifiers.NonPositiveAnalyteSignal;
                }

                if (st.Recoveries[isIndex] is { WithinWindow: false } rec)
                {
                    b.Qualifiers |= ResultQualifiers.InternalStandardRecoveryOutOfWindow;
                    b.AddNote("Injection " + Text.I(r.Order) + ": IS " + a.InternalStandard + " recovery " + Text.F(rec.RecoveryPercent!.Value, 1) + " % outside " + _method.RecoveryWindow + ".");
                }
            }

            return q;
        }
    }
}
