using System.Collections.Generic;

namespace InternalStdCal.Run;

/// <summary>
/// The numbers behind one candidate's verdict in an <see cref="InternalStandardSelection"/>: relative standard
/// deviations, log-scale standard deviations and correlation, the correlation threshold and the Pitman–Morgan test.
/// </summary>
/// <remarks>
/// With A the analyte signal, I the candidate's and R = A/I, the log-scale sample statistics obey exactly
/// s²(ln R) = s²(ln A) + s²(ln I) − 2ρ·s(ln A)·s(ln I), so the ratio scatters less than the raw signal exactly when
/// ρ &gt; s(ln I)/(2·s(ln A)) (error propagation on the log scale; the CV is approximated by the SD of ln). The Pitman–Morgan
/// test compares the variances of X = ln A and Y = ln R, which come from the same injections:
/// t = (F − 1)·√(n − 2)/(2·√(F·(1 − r²))), F = s²_X/s²_Y, r = corr(X, Y), ν = n − 2 (Pitman and Morgan,
/// Biometrika 31, 1939 — from memory). Immutable.
/// </remarks>
public sealed class InternalStandardSelectionStatistics
{
    internal InternalStandardSelectionStatistics(
        double candidateRsd,
        double ratioRsd,
        double analyteRsd,
        double candidateLogSd,
        double ratioLogSd,
        double logCorrelation,
        double threshold,
        double? varianceRatio,
        double? pmCorrelation,
        double? pmT,
        int df,
        double pImprove,
        double pWorsen,
        IReadOnlyList<double> ratios,
        double? blankPercent)
    {
        CandidateRsdPercent = candidateRsd;
        RatioRsdPercent = ratioRsd;
        RsdChangePercent = 100 * ((ratioRsd / analyteRsd) - 1);
        CandidateLogSd = candidateLogSd;
        RatioLogSd = ratioLogSd;
        LogCorrelation = logCorrelation;
        CorrelationThreshold = threshold;
        VarianceRatio = varianceRatio;
        PitmanMorganCorrelation = pmCorrelation;
        PitmanMorganT = pmT;
        DegreesOfFreedom = df;
        ImprovementPValue = pImprove;
        WorseningPValue = pWorsen;
        Ratios = ratios;
        MethodBlankPercent = blankPercent;
    }

    /// <summary>RSD of the candidate's signal, 100·s/x̄, in %.</summary>
    public double CandidateRsdPercent { get; }

    /// <summary>RSD of the ratio analyte/candidate, 100·s/x̄, in %: the ranking key (smaller is better).</summary>
    public double RatioRsdPercent { get; }

    /// <summary>Change of the RSD from raw analyte to ratio, 100·(RSD_ratio/RSD_analyte − 1), in % (negative = less scatter).</summary>
    public double RsdChangePercent { get; }

    /// <summary>Standard deviation of ln(candidate signal) (≈ its CV as a fraction).</summary>
    public double CandidateLogSd { get; }

    /// <summary>Standard deviation of ln(ratio) (≈ the ratio's CV as a fraction).</summary>
    public double RatioLogSd { get; }

    /// <summary>Pearson correlation ρ of ln(analyte) and ln(candidate), in [−1, 1].</summary>
    public double LogCorrelation { get; }

    /// <summary>ρ* = s(ln I)/(2·s(ln A)): the ratio beats the raw signal exactly when ρ &gt; ρ* (may exceed 1, then it cannot).</summary>
    public double CorrelationThreshold { get; }

    /// <summary>True when <see cref="LogCorrelation"/> &gt; <see cref="CorrelationThreshold"/>.</summary>
    public bool MeetsCorrelationThreshold => LogCorrelation > CorrelationThreshold;

    /// <summary>F = s²(ln A)/s²(ln R); null when the ratio does not vary at all (s(ln R) ≤ 1e-12, i.e. rounding only).</summary>
    public double? VarianceRatio { get; }

    /// <summary>r = corr(ln A, ln R) used by the Pitman–Morgan test; null when the ratio does not vary at all.</summary>
    public double? PitmanMorganCorrelation { get; }

    /// <summary>Pitman–Morgan t statistic (positive = the ratio scatters less); null when it is unbounded (the ratio
    /// does not vary, or r² = 1), in which case the p values are 0 and 1.</summary>
    public double? PitmanMorganT { get; }

    /// <summary>Degrees of freedom of the test, n − 2.</summary>
    public int DegreesOfFreedom { get; }

    /// <summary>One-sided p value for "the ratio scatters less than the raw signal", P(T_ν ≥ t).</summary>
    public double ImprovementPValue { get; }

    /// <summary>One-sided p value for "the ratio scatters more than the raw signal", P(T_ν ≤ t).</summary>
    public double WorseningPValue { get; }

    /// <summary>The ratios analyte/candidate, injection by injection.</summary>
    public IReadOnlyList<double> Ratios { get; }

    /// <summary>Mean method-blank signal in % of the candidate's mean signal; null when no blanks were given.</summary>
    public double? MethodBlankPercent { get; }
}
