using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;

namespace InternalStdCal.Run;

/// <summary>
/// Chooses an internal standard from data: ranks candidate internal standards by how much dividing the analyte
/// signal by theirs reduces its scatter over repeated injections, and tests the reduction.
/// </summary>
/// <remarks>
/// <para><b>Data.</b> Signals of the analyte and of every candidate from the same injections of one solution
/// (replicates, or a check standard repeated through a run), so that the analyte's true signal is constant and
/// its scatter is measurement variation. Series from solutions of different concentration would measure the
/// concentration differences instead.</para>
/// <para><b>Method</b> (field reference §9). Per candidate: RSD of the raw analyte signal and of the ratio
/// analyte/candidate; correlation ρ of the log signals and the threshold ρ &gt; s(ln I)/(2·s(ln A)); a one-sided
/// Pitman–Morgan test of equal variances for paired data on X = ln A and Y = ln(A/I) (E. J. G. Pitman and
/// W. A. Morgan, Biometrika 31, 1939 — from memory). Verdict: <c>Improves</c>
/// when the test shows a reduction at the significance level α, <c>Worsens</c> when the opposite one-sided test
/// shows an increase at α, otherwise <c>NoSignificantImprovement</c>. Candidates are ranked by the RSD of the
/// ratio (ties keep the input order).</para>
/// <para><b>Refusals</b> (explained, never silent): a candidate with the analyte's name (ordinal, ignoring case and
/// surrounding white space), with a signal identical to the analyte's at every injection, or with a signal that
/// does not vary (SD of its logarithm ≤ 1e-12, i.e. at most rounding). <b>Warning</b>: the mean method-blank
/// signal (blanks without the IS spike) exceeds a caller-set percentage of the candidate's mean signal — an
/// internal standard should not be present in the samples (SW-846 Method 8000C §11.4.3, via the field reference §9); the percentage itself is the caller's choice
/// (library default 1 %, no published source).</para>
/// <para>Caution: the library computes; the lab's validated method, its QA system, local regulations and licensed
/// practice decide. Chemical suitability (mass, ionisation energy, retention, isotope labelling) is not assessed.</para>
/// <para>Immutable. No member returns NaN or infinity.</para>
/// </remarks>
public sealed class InternalStandardSelection
{
    // s(ln R) at or below this is arithmetic rounding (e.g. A/(3·A)): the ratio counts as constant.
    private const double RoundingLevel = 1e-12;

    private InternalStandardSelection(
        string analyteName,
        int count,
        double analyteRsd,
        double analyteLogSd,
        double significanceLevel,
        double blankWarningPercent,
        IReadOnlyList<InternalStandardSelectionAssessment> candidates)
    {
        AnalyteName = analyteName;
        Count = count;
        AnalyteRsdPercent = analyteRsd;
        AnalyteLogSd = analyteLogSd;
        SignificanceLevel = significanceLevel;
        BlankWarningPercent = blankWarningPercent;
        Candidates = candidates;
    }

    /// <summary>Name of the analyte.</summary>
    public string AnalyteName { get; }

    /// <summary>Number of injections n (≥ 3).</summary>
    public int Count { get; }

    /// <summary>RSD of the raw analyte signal, 100·s/x̄, in %.</summary>
    public double AnalyteRsdPercent { get; }

    /// <summary>Standard deviation of ln(analyte signal) (≈ its CV as a fraction).</summary>
    public double AnalyteLogSd { get; }

    /// <summary>Significance level α of each one-sided Pitman–Morgan test.</summary>
    public double SignificanceLevel { get; }

    /// <summary>Method-blank warning level, in % of the candidate's mean signal.</summary>
    public double BlankWarningPercent { get; }

    /// <summary>Assessed candidates in rank order, then the refused ones in input order.</summary>
    public IReadOnlyList<InternalStandardSelectionAssessment> Candidates { get; }

    /// <summary>The best-ranked candidate if its verdict is <c>Improves</c>; otherwise null (no candidate helps significantly).</summary>
    public InternalStandardSelectionAssessment? Best =>
        Candidates.FirstOrDefault(c => c.Rank == 1 && c.Verdict == InternalStandardSelectionVerdict.Improves);

    /// <summary>Assesses and ranks the candidates.</summary>
    /// <param name="analyteName">Name of the analyte; not blank.</param>
    /// <param name="analyteSignals">Analyte signals in the injections; at least 3, each finite and &gt; 0, not all equal.</param>
    /// <param name="candidates">Candidates; at least one, distinct names (ordinal, ignoring case and surrounding white space), each with as many
    /// signals as the analyte, in the same injection order.</param>
    /// <param name="significanceLevel">α of each one-sided test, in (0, 0.5); default 0.05.</param>
    /// <param name="blankWarningPercent">Warn when the mean method-blank signal exceeds this % of the candidate's mean
    /// signal; finite, ≥ 0; default 1.</param>
    /// <returns>The ranked assessment.</returns>
    /// <exception cref="ArgumentNullException">An argument or a candidate is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 3 injections; an analyte signal missing, infinite or not
    /// positive (the message names the index); all analyte signals equal, or varying only at the rounding level
    /// (SD of ln ≤ 1e-12); no candidates; duplicate candidate names; or a candidate with a different number of
    /// signals (the message names it).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="significanceLevel"/> or
    /// <paramref name="blankWarningPercent"/> is outside its range.</exception>
    public static InternalStandardSelection Evaluate(
        string analyteName,
        IReadOnlyList<double> analyteSignals,
        IReadOnlyList<InternalStandardSelectionCandidate> candidates,
        double significanceLevel = 0.05,
        double blankWarningPercent = 1.0)
    {
        Guard.NotBlank(analyteName, nameof(analyteName));
        Guard.NotNull(analyteSignals, nameof(analyteSignals));
        Guard.NotEmpty(candidates, nameof(candidates));
        Guard.InOpenRange(significanceLevel, 0, 0.5, nameof(significanceLevel));
        Guard.NonNegative(blankWarningPercent, nameof(blankWarningPercent));
        int n = analyteSignals.Count;
        if (n < 3)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(analyteSignals)}' has {n} values; the paired variance test needs at least 3 injections (n − 2 ≥ 1 degrees of freedom)."),
                nameof(analyteSignals));
        }

        var a = new double[n];
        for (int i = 0; i < n; i++)
        {
            a[i] = InternalStandardSelectionCandidate.CheckSignal(analyteSignals[i], analyteName, i, nameof(analyteSignals), positive: true);
        }

        if (Array.TrueForAll(a, v => v == a[0]))
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(analyteSignals)}' of '{analyteName}' holds the same value {Guard.Format(a[0])} at all {n} injections; with no scatter there is nothing an internal standard could reduce."),
                nameof(analyteSignals));
        }

        double[] lnA = a.Select(v => Math.Log(v)).ToArray();
        double analyteRsd = Rsd(a);
        double analyteLogSd = Sd(lnA);
        if (analyteLogSd <= RoundingLevel)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(analyteSignals)}' of '{analyteName}' varies only at the rounding level (SD of ln = {Guard.Format(analyteLogSd)}); with no scatter there is nothing an internal standard could reduce."),
                nameof(analyteSignals));
        }

        var names = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (InternalStandardSelectionCandidate c in candidates)
        {
            Guard.NotNull(c, nameof(candidates));
            if (!names.Add(c.Name.Trim()))
            {
                throw new ArgumentException($"Parameter '{nameof(candidates)}' names '{c.Name}' more than once; candidate names must be distinct (ignoring case).", nameof(candidates));
            }

            if (c.Signals.Count != n)
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Candidate '{c.Name}' in '{nameof(candidates)}' has {c.Signals.Count} signals; it must have one per injection, as many as '{nameof(analyteSignals)}' ({n})."),
                    nameof(candidates));
            }
        }


        var assessed = new List<(InternalStandardSelectionCandidate Candidate, InternalStandardSelectionStatistics Stats, InternalStandardSelectionVerdict Verdict, List<string> Warnings)>();
        var refused = new List<InternalStandardSelectionAssessment>();
        foreach (InternalStandardSelectionCandidate c in candidates)
        {
            string? refusal = Refusal(analyteName, a, c);
            if (refusal is not null)
            {
                refused.Add(new InternalStandardSelectionAssessment(c.Name, null, InternalStandardSelectionVerdict.Refused, null, refusal, Array.Empty<string>()));
                continue;
            }

            var warnings = new List<string>();
            InternalStandardSelectionStatistics stats = Assess(a, lnA, analyteRsd, analyteLogSd, c, warnings);
            if (stats.MethodBlankPercent is double blank && blank > blankWarningPercent)
            {
                warnings.Insert(0, FormattableString.Invariant(
                    $"signal in method blanks: mean blank signal is {Text.G(blank)} % of its mean signal (warning level {Text.G(blankWarningPercent)} %); an internal standard should be absent from the samples"));
            }

            InternalStandardSelectionVerdict verdict = stats.ImprovementPValue < significanceLevel
                ? InternalStandardSelectionVerdict.Improves
                : stats.WorseningPValue < significanceLevel
                    ? InternalStandardSelectionVerdict.Worsens
                    : InternalStandardSelectionVerdict.NoSignificantImprovement;
            assessed.Add((c, stats, verdict, warnings));
        }

        List<InternalStandardSelectionAssessment> ranked = assessed
            .OrderBy(x => x.Stats.RatioRsdPercent)
            .Select((x, i) => new InternalStandardSelectionAssessment(x.Candidate.Name, i + 1, x.Verdict, x.Stats, null, x.Warnings.AsReadOnly()))
            .ToList();
        return new InternalStandardSelection(analyteName, n, analyteRsd, analyteLogSd, significanceLevel, blankWarningPercent, ranked.Concat(refused).ToList().AsReadOnly());
    }

    /// <summary>
    /// Pitman–Morgan t for equal variances of paired data, t = (F − 1)·√(n − 2)/(2·√(F·(1 − r²))) (field reference §9).
    /// </summary>
    /// <param name="varianceRatio">F = s²_X/s²_Y, finite and &gt; 0.</param>
    /// <param name="correlation">r = corr(X, Y), |r| &lt; 1.</param>
    /// <param name="count">n ≥ 3.</param>
    /// <returns>t with n − 2 degrees of freedom.</returns>
    internal static double PitmanMorganT(double varianceRatio, double correlation, int count) =>
        (varianceRatio - 1) * Math.Sqrt(count - 2) / (2 * Math.Sqrt(varianceRatio * (1 - (correlation * correlation))));

    /// <summary>Readable ranked table with the numbers, verdicts, refusals and warnings.</summary>
    /// <returns>Multi-line text (invariant culture).</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Internal-standard selection for '").Append(AnalyteName).Append("' (n = ").Append(Text.I(Count))
            .Append(" injections; analyte RSD ").Append(Text.F(AnalyteRsdPercent, 3)).Append(" %; one-sided Pitman–Morgan tests at α = ")
            .Append(Text.G(SignificanceLevel)).AppendLine("):");
        sb.Append("  ").Append(Text.Pad("rank", 6)).Append(Text.Pad("candidate", 16)).Append(Text.Pad("RSD IS %", 10)).Append(Text.Pad("RSD ratio %", 13))
            .Append(Text.Pad("change %", 10)).Append(Text.Pad("rho(ln)", 9)).Append(Text.Pad("rho*", 8)).Append(Text.Pad("t(PM)", 11))
            .Append(Text.Pad("p(less)", 10)).AppendLine("verdict");
        foreach (InternalStandardSelectionAssessment c in Candidates)
        {
            InternalStandardSelectionStatistics? s = c.Statistics;
            if (s is null)
            {
                continue;
            }

            sb.Append("  ").Append(Text.Pad(Text.I(c.Rank!.Value), 6)).Append(Text.Pad(c.Name, 16)).Append(Text.Pad(Text.F(s.CandidateRsdPercent, 3), 10))
                .Append(Text.Pad(Text.F(s.RatioRsdPercent, 3), 13)).Append(Text.Pad(Text.Signed(s.RsdChangePercent, 1), 10))
                .Append(Text.Pad(Text.F(s.LogCorrelation, 3), 9)).Append(Text.Pad(Text.F(s.CorrelationThreshold, 3), 8))
                .Append(Text.Pad(s.PitmanMorganT.HasValue ? Text.F(s.PitmanMorganT.Value, 3) : "unbounded", 11)).Append(Text.Pad(s.ImprovementPValue < 1e-4 ? "<0.0001" : Text.F(s.ImprovementPValue, 4), 10))
                .AppendLine(VerdictText(c.Verdict));
        }

        foreach (InternalStandardSelectionAssessment c in Candidates)
        {
            if (c.Refusal is not null)
            {
                sb.Append("  refused: ").Append(c.Name).Append(" — ").AppendLine(c.Refusal);
            }

            foreach (string w in c.Warnings)
            {
                sb.Append("  warning: ").Append(c.Name).Append(" — ").AppendLine(w);
            }
        }

        sb.AppendLine("  (rho(ln) = corr(ln A, ln IS); rho* = s(ln IS)/(2·s(ln A)): the ratio scatters less exactly when rho(ln) > rho*;"
            + " p(less) = one-sided p value of a reduction; change % = RSD ratio/RSD analyte − 1)");
        sb.Append("  ").Append(Best is InternalStandardSelectionAssessment best
            ? "best: " + best.Name + " (least scatter of the ratio, significant reduction)"
            : "no candidate reduces the scatter significantly");
        return sb.ToString();
    }

    private static string VerdictText(InternalStandardSelectionVerdict verdict) => verdict switch
    {
        InternalStandardSelectionVerdict.Improves => "improves",
        InternalStandardSelectionVerdict.Worsens => "worsens",
        InternalStandardSelectionVerdict.NoSignificantImprovement => "no significant improvement",
        _ => "refused",
    };

    private static string? Refusal(string analyteName, double[] a, InternalStandardSelectionCandidate c)
    {
        if (string.Equals(c.Name.Trim(), analyteName.Trim(), StringComparison.OrdinalIgnoreCase))
        {
            return "it is the analyte itself (same name); dividing by it would cancel the analyte signal";
        }

        if (c.Signals.SequenceEqual(a))
        {
            return "its signals are identical to the analyte's at every injection, so it is the analyte itself; dividing by it would cancel the analyte signal";
        }

        double first = c.Signals[0];
        if (c.Signals.All(v => v == first))
        {
            return FormattableString.Invariant($"its signal is {Guard.Format(first)} at every injection; a signal that does not vary can neither follow nor correct the analyte's");
        }

        if (Sd(c.Signals.Select(v => Math.Log(v)).ToArray()) <= RoundingLevel)
        {
            return "its signal varies only at the rounding level; a signal that does not vary can neither follow nor correct the analyte's";
        }

        return null;
    }

    private static InternalStandardSelectionStatistics Assess(double[] a, double[] lnA, double analyteRsd, double analyteLogSd, InternalStandardSelectionCandidate c, List<string> warnings)
    {
        int n = a.Length;
        double[] s = c.Signals.ToArray();
        double[] lnI = s.Select(v => Math.Log(v)).ToArray();
        var ratios = new double[n];
        var lnR = new double[n];
        for (int i = 0; i < n; i++)
        {
            ratios[i] = a[i] / s[i];
            lnR[i] = lnA[i] - lnI[i];
        }

        double candidateLogSd = Sd(lnI);
        double ratioLogSd = Sd(lnR);
        double rho = Correlation(lnA, lnI);
        double threshold = candidateLogSd / (2 * analyteLogSd);

        double? f = null, r = null, t = null;
        double pImprove, pWorsen;
        double sxx = CentredSumOfSquares(lnA);
        double syy = CentredSumOfSquares(lnR);
        double ratio = sxx / syy;
        if (ratioLogSd > RoundingLevel && !double.IsInfinity(ratio))
        {
            f = ratio;
            r = Correlation(lnA, lnR);
            double oneMinusR2 = 1 - (r.Value * r.Value);
            if (ratio == 1)
            {
                t = 0;
            }
            else if (oneMinusR2 > 0)
            {
                t = PitmanMorganT(ratio, r.Value, n);
            }
        }
        else
        {
            warnings.Add("the ratio is the same at every injection (to rounding): all scatter removed; make sure the candidate is not the analyte measured another way (e.g. another isotope of the same element)");
        }

        if (t is double tv)
        {
            pImprove = tv >= 0 ? StudentTQuantile.UpperTail(tv, n - 2) : 1 - StudentTQuantile.UpperTail(-tv, n - 2);
            pWorsen = 1 - pImprove;
        }
        else
        {
            // Unbounded statistic: the direction is certain.
            bool less = f is null || f.Value > 1;
            pImprove = less ? 0 : 1;
            pWorsen = less ? 1 : 0;
        }

        double? blankPercent = null;
        if (c.MethodBlankSignals.Count > 0)
        {
            blankPercent = 100 * Mean(c.MethodBlankSignals.ToArray()) / Mean(s);
        }

        return new InternalStandardSelectionStatistics(
            Rsd(s), Rsd(ratios), analyteRsd, candidateLogSd, ratioLogSd, rho, threshold, f, r, t, n - 2, pImprove, pWorsen, Array.AsReadOnly(ratios), blankPercent);
    }

    private static double Mean(double[] v) => SampleStatistics.Mean(v);

    private static double CentredSumOfSquares(double[] v) => SampleStatistics.CentredSumOfSquares(v, Mean(v));

    private static double Sd(double[] v) => SampleStatistics.StandardDeviation(v);

    private static double Rsd(double[] v) => 100 * Sd(v) / Mean(v);

    private static double Correlation(double[] x, double[] y)
    {
        double mx = Mean(x), my = Mean(y);
        var sxy = default(CompensatedSum);
        for (int i = 0; i < x.Length; i++)
        {
            sxy.AddProduct(x[i] - mx, y[i] - my);
        }

        double r = sxy.Value / Math.Sqrt(CentredSumOfSquares(x) * CentredSumOfSquares(y));
        return Math.Max(-1, Math.Min(1, r));
    }
}
