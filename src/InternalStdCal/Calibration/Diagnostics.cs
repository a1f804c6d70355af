using System;
using System.Collections.Generic;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>An F test: statistic, degrees of freedom, critical value F(1 − α; ν1, ν2) and p-value.</summary>
public sealed class FTestResult
{
    internal FTestResult(double statistic, int numeratorDf, int denominatorDf, double significanceLevel)
    {
        Statistic = statistic;
        NumeratorDegreesOfFreedom = numeratorDf;
        DenominatorDegreesOfFreedom = denominatorDf;
        SignificanceLevel = significanceLevel;
        CriticalValue = FQuantile.Quantile(1 - significanceLevel, numeratorDf, denominatorDf);
        PValue = FQuantile.UpperTail(statistic, numeratorDf, denominatorDf);
    }

    /// <summary>The test statistic (dimensionless, ≥ 0).</summary>
    public double Statistic { get; }

    /// <summary>Numerator degrees of freedom ν1.</summary>
    public int NumeratorDegreesOfFreedom { get; }

    /// <summary>Denominator degrees of freedom ν2.</summary>
    public int DenominatorDegreesOfFreedom { get; }

    /// <summary>Significance level α.</summary>
    public double SignificanceLevel { get; }

    /// <summary>F(1 − α; ν1, ν2).</summary>
    public double CriticalValue { get; }

    /// <summary>P(F ≥ statistic) under the null hypothesis.</summary>
    public double PValue { get; }

    /// <summary>True when the statistic exceeds the critical value.</summary>
    public bool IsSignificant => Statistic > CriticalValue;

    /// <summary>Prints "F = 1.56 vs F(0.99; 1, 4) = 21.2, p = 0.28".</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "F = " + Text.G(Statistic) + " vs F(" + Text.G(1 - SignificanceLevel) + "; " + Text.I(NumeratorDegreesOfFreedom) + ", "
        + Text.I(DenominatorDegreesOfFreedom) + ") = " + Text.G(CriticalValue) + ", p = " + Text.G(PValue);
}

/// <summary>Lack-of-fit F test with replicated standards: the residual sum of squares split into pure error
/// (replicates about their level mean) and lack of fit (level means about the curve); F = MS_lof/MS_pe.</summary>
/// <remarks>Standard regression-analysis result (e.g. Draper &amp; Smith, Applied Regression Analysis, ch. 2 —
/// from memory). Weighted fits use weighted sums of squares. Sums of squares are in (response ratio)².</remarks>
public sealed class LackOfFitTest
{
    internal LackOfFitTest(double pureError, double lackOfFit, int pureErrorDf, int lackOfFitDf, double alpha)
    {
        PureErrorSumOfSquares = pureError;
        LackOfFitSumOfSquares = lackOfFit;
        PureErrorDegreesOfFreedom = pureErrorDf;
        LackOfFitDegreesOfFreedom = lackOfFitDf;
        Test = new FTestResult(lackOfFit / lackOfFitDf / (pureError / pureErrorDf), lackOfFitDf, pureErrorDf, alpha);
    }

    /// <summary>SS_pe = Σ w_ij (y_ij − ȳ_i)², replicates about their (weighted) level mean.</summary>
    public double PureErrorSumOfSquares { get; }

    /// <summary>SS_lof = Σ W_i (ȳ_i − ŷ_i)², level means about the fitted curve.</summary>
    public double LackOfFitSumOfSquares { get; }

    /// <summary>N − k (injections minus levels).</summary>
    public int PureErrorDegreesOfFreedom { get; }

    /// <summary>k − p (levels minus model terms).</summary>
    public int LackOfFitDegreesOfFreedom { get; }

    /// <summary>F = (SS_lof/ν_lof)/(SS_pe/ν_pe) against F(1 − α; ν_lof, ν_pe).</summary>
    public FTestResult Test { get; }

    /// <summary>Readable conclusion.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "lack of fit: SS_lof = " + Text.G(LackOfFitSumOfSquares) + " (ν = " + Text.I(LackOfFitDegreesOfFreedom) + "), SS_pe = "
        + Text.G(PureErrorSumOfSquares) + " (ν = " + Text.I(PureErrorDegreesOfFreedom) + "); " + Test + " → "
        + (Test.IsSignificant ? "significant lack of fit: the model does not describe the level means within replicate scatter" : "no significant lack of fit");

    /// <summary>Computes the test from the fit points grouped by level. Null (with a note) when not applicable.</summary>
    internal static LackOfFitTest? Compute(IReadOnlyList<LevelGroup> levels, int parameterCount, double alpha, List<string> notes)
    {
        int n = 0;
        double pe = 0;
        double lof = 0;
        foreach (LevelGroup g in levels)
        {
            double wSum = 0;
            double wy = 0;
            for (int j = 0; j < g.Responses.Length; j++)
            {
                wSum += g.Weights[j];
                wy += g.Weights[j] * g.Responses[j];
            }

            double mean = wy / wSum;
            for (int j = 0; j < g.Responses.Length; j++)
            {
                double d = g.Responses[j] - mean;
                pe += g.Weights[j] * d * d;
            }

            double e = mean - g.Fitted;
            lof += wSum * e * e;
            n += g.Responses.Length;
        }

        int k = levels.Count;
        if (n - k < 1)
        {
            notes.Add("Lack-of-fit test not computed: no replicate injections (pure-error degrees of freedom N − k = 0).");
            return null;
        }

        if (k - parameterCount < 1)
        {
            notes.Add("Lack-of-fit test not computed: " + Text.I(k) + " levels and " + Text.I(parameterCount) + " model terms leave no lack-of-fit degrees of freedom (k − p < 1).");
            return null;
        }

        if (!(pe > 0))
        {
            notes.Add("Lack-of-fit test not computed: replicate responses are identical (pure-error sum of squares 0).");
            return null;
        }

        return new LackOfFitTest(pe, lof, n - k, k - parameterCount, alpha);
    }
}

/// <summary>Mandel's fitting test, linear against second-order (ISO 8466-1): DS² = (N − 2)·s_y1² − (N − 3)·s_y2²,
/// PG = DS²/s_y2² against F(1 − α; 1, N − 3). PG ≤ F: the straight line is adequate.</summary>
/// <remarks>Formula FROM MEMORY (ISO 8466-1; field-reference §1.3); its existence and IUPAC endorsement VERIFIED
/// (Andrade &amp; Gómez-Carracedo, Anal. Methods 2013, 5, 1145). Weighted fits use weighted residual sums of squares.</remarks>
public sealed class MandelTest
{
    internal MandelTest(double sseLinear, double sseQuadratic, int n, double alpha)
    {
        ResidualStandardDeviationLinear = Math.Sqrt(sseLinear / (n - 2));
        ResidualStandardDeviationQuadratic = Math.Sqrt(sseQuadratic / (n - 3));
        DifferenceOfVariances = sseLinear - sseQuadratic;
        Test = new FTestResult(DifferenceOfVariances / (sseQuadratic / (n - 3)), 1, n - 3, alpha);
    }

    /// <summary>s_y1, residual SD of the straight line (N − 2 df), response-ratio units.</summary>
    public double ResidualStandardDeviationLinear { get; }

    /// <summary>s_y2, residual SD of the quadratic (N − 3 df).</summary>
    public double ResidualStandardDeviationQuadratic { get; }

    /// <summary>DS² = (N − 2)·s_y1² − (N − 3)·s_y2².</summary>
    public double DifferenceOfVariances { get; }

    /// <summary>PG = DS²/s_y2² against F(1 − α; 1, N − 3).</summary>
    public FTestResult Test { get; }

    /// <summary>Readable conclusion.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "Mandel (ISO 8466-1): s_y1 = " + Text.G(ResidualStandardDeviationLinear) + ", s_y2 = " + Text.G(ResidualStandardDeviationQuadratic)
        + ", DS² = " + Text.G(DifferenceOfVariances) + ", PG = " + Text.G(Test.Statistic) + " vs F(" + Text.G(1 - Test.SignificanceLevel) + "; 1, "
        + Text.I(Test.DenominatorDegreesOfFreedom) + ") = " + Text.G(Test.CriticalValue) + " → "
        + (Test.IsSignificant ? "the second-order function fits significantly better" : "the straight line is adequate");

    internal static MandelTest? Compute(double sseLinear, double sseQuadratic, int n, double alpha, List<string> notes)
    {
        if (n < 4)
        {
            notes.Add("Mandel's test not computed: it needs at least 4 points (N − 3 ≥ 1); there are " + Text.I(n) + ".");
            return null;
        }

        if (!(sseQuadratic > 0))
        {
            notes.Add("Mandel's test not computed: the quadratic fits exactly (residual sum of squares 0).");
            return null;
        }

        return new MandelTest(sseLinear, sseQuadratic, n, alpha);
    }
}

/// <summary>Variance-homogeneity check of ISO 8466-1: replicate variances of the response at the lowest and the
/// highest standard, PG = larger/smaller variance against F(1 − α; ν_larger, ν_smaller). A significant result
/// means the scatter changes over the range, which motivates weighting.</summary>
/// <remarks>FROM MEMORY (ISO 8466-1, field-reference §1.3, which states PG = s²_high/s²_low for the usual case
/// s_high &gt; s_low; F(0.99; 9, 9) = 5.35113 COMPUTED). ISO 8466-1 asks for 10 replicates at each end.</remarks>
public sealed class VarianceHomogeneityTest
{
    internal VarianceHomogeneityTest(string lowLabel, string highLabel, double varLow, int nLow, double varHigh, int nHigh, double alpha)
    {
        LowestLevel = lowLabel;
        HighestLevel = highLabel;
        VarianceLowest = varLow;
        VarianceHighest = varHigh;
        ReplicatesLowest = nLow;
        ReplicatesHighest = nHigh;
        Test = varHigh >= varLow
            ? new FTestResult(varHigh / varLow, nHigh - 1, nLow - 1, alpha)
            : new FTestResult(varLow / varHigh, nLow - 1, nHigh - 1, alpha);
    }

    /// <summary>Label of the lowest fitted non-blank standard.</summary>
    public string LowestLevel { get; }

    /// <summary>Label of the highest fitted standard.</summary>
    public string HighestLevel { get; }

    /// <summary>Variance of the response ratios at the lowest standard (n − 1 denominator).</summary>
    public double VarianceLowest { get; }

    /// <summary>Variance of the response ratios at the highest standard.</summary>
    public double VarianceHighest { get; }

    /// <summary>Injections at the lowest standard.</summary>
    public int ReplicatesLowest { get; }

    /// <summary>Injections at the highest standard.</summary>
    public int ReplicatesHighest { get; }

    /// <summary>PG = larger/smaller variance against F(1 − α; ν_larger, ν_smaller).</summary>
    public FTestResult Test { get; }

    /// <summary>True when the variances differ significantly (weighting advisable).</summary>
    public bool IsHeteroscedastic => Test.IsSignificant;

    /// <summary>Readable conclusion.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "variance homogeneity (ISO 8466-1): s² = " + Text.G(VarianceLowest) + " at '" + LowestLevel + "' (n = " + Text.I(ReplicatesLowest) + "), "
        + Text.G(VarianceHighest) + " at '" + HighestLevel + "' (n = " + Text.I(ReplicatesHighest) + "); PG = " + Text.G(Test.Statistic)
        + " vs F(" + Text.G(1 - Test.SignificanceLevel) + "; " + Text.I(Test.NumeratorDegreesOfFreedom) + ", " + Text.I(Test.DenominatorDegreesOfFreedom) + ") = "
        + Text.G(Test.CriticalValue) + " → " + (IsHeteroscedastic
            ? "variances differ: consider a weighted fit"
            : "no significant difference" + (Math.Min(ReplicatesLowest, ReplicatesHighest) < 10
                ? " (with " + Text.I(Math.Min(ReplicatesLowest, ReplicatesHighest)) + " replicates the test has little power; ISO 8466-1 asks for 10 at each end)"
                : ": an unweighted fit is justified"));

    internal static VarianceHomogeneityTest? Compute(StandardSet set, double alpha, List<string> notes)
    {
        int low = -1;
        int high = -1;
        for (int i = 0; i < set.Standards.Count; i++)
        {
            if (!set.Included[i] || set.Standards[i].IsBlank)
            {
                continue;
            }

            if (low < 0 || set.AxisValues[i] < set.AxisValues[low])
            {
                low = i;
            }

            if (high < 0 || set.AxisValues[i] > set.AxisValues[high])
            {
                high = i;
            }
        }

        if (low < 0 || low == high)
        {
            notes.Add("Variance-homogeneity check not computed: it needs two distinct non-blank levels.");
            return null;
        }

        CalibrationStandard lo = set.Standards[low];
        CalibrationStandard hi = set.Standards[high];
        if (lo.Injections.Count < 2 || hi.Injections.Count < 2)
        {
            notes.Add("Variance-homogeneity check not computed: it needs replicate injections at the lowest ('" + lo.Label + "', "
                + Text.I(lo.Injections.Count) + ") and highest ('" + hi.Label + "', " + Text.I(hi.Injections.Count) + ") standard; ISO 8466-1 asks for 10 each.");
            return null;
        }

        double vLow = Variance(lo);
        double vHigh = Variance(hi);
        if (!(vLow > 0) || !(vHigh > 0))
        {
            notes.Add("Variance-homogeneity check not computed: replicate responses at '" + (vLow > 0 ? hi.Label : lo.Label) + "' are identical (variance 0).");
            return null;
        }

        return new VarianceHomogeneityTest(lo.Label, hi.Label, vLow, lo.Injections.Count, vHigh, hi.Injections.Count, alpha);
    }

    private static double Variance(CalibrationStandard s)
    {
        double[] r = new double[s.Injections.Count];
        for (int j = 0; j < r.Length; j++)
        {
            r[j] = s.Injections[j].Ratio;
        }

        double sd = SampleStatistics.StandardDeviation(r, SampleStatistics.Mean(r));
        return sd * sd;
    }
}

/// <summary>Responses and weights of one level with the fitted response there (for the lack-of-fit test).</summary>
internal sealed class LevelGroup
{
    internal LevelGroup(double[] responses, double[] weights, double fitted)
    {
        Responses = responses;
        Weights = weights;
        Fitted = fitted;
    }

    internal double[] Responses { get; }

    internal double[] Weights { get; }

    internal double Fitted { get; }
}
