using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using System.Threading;
using InternalStdCal.Internal;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>
/// Regression calibration of the response ratio: straight line, line through the origin or quadratic, with any
/// <see cref="Weighting"/>, fitted by <see cref="RegressionFit"/>, plus the diagnostics a reviewer signs off: coefficients
/// with standard errors, covariance and confidence intervals, s_y/x, r, R², residuals, back-calculated standards,
/// RSE, the lack-of-fit test, Mandel's test and the ISO 8466-1 variance-homogeneity check.
/// </summary>
/// <remarks>
/// <para>Fit points are listed in the order of the standards (and of their injections) with excluded blanks left
/// out; per-point weightings (<see cref="Weighting.InverseVariance"/>, <see cref="Weighting.Custom"/>) must hold one
/// value per fit point in that order (see <see cref="ReplicateVarianceWeighting"/>).</para>
/// <para>Weights are normalised to Σw = n by <see cref="RegressionFit"/>; weighted diagnostics use the normalised
/// weights.</para>
/// <para>The lack-of-fit, Mandel and variance-homogeneity tests (and their notes) are computed on first use,
/// thread-safely: every caller sees the same instances, with the values computing them in <see cref="Fit"/> gave.</para>
/// </remarks>
public sealed class RegressionCalibration : RatioCalibration
{
    // The weighting Fit was given (what Mandel's extra fits use); the diagnostics once computed.
    private readonly Weighting _weighting;
    private DiagnosticTests? _diagnostics;

    private RegressionCalibration(StandardSet set, RegressionFit regression, Weighting weighting, IReadOnlyList<StandardResult> standards, List<string> notes)
        : base(set, ToRatioModel(regression.Model), regression.ParameterCount, standards, notes)
    {
        Regression = regression;
        _weighting = weighting;
        string x = set.AxisSymbol;
        string perX = x == "1" ? "1" : "(" + x + ")⁻¹";
        string perX2 = x == "1" ? "1" : "(" + x + ")⁻²";
        var list = new List<CoefficientEstimate>();
        string[] symbols = regression.Model switch
        {
            CalibrationModel.LinearThroughOrigin => new[] { "b" },
            CalibrationModel.Linear => new[] { "a", "b" },
            _ => new[] { "a", "b", "c" },
        };
        for (int i = 0; i < symbols.Length; i++)
        {
            (string meaning, string unit, double value) = symbols[i] switch
            {
                "a" => ("intercept", "1", regression.Intercept),
                "b" => ("slope", perX, regression.Slope),
                _ => ("curvature", perX2, regression.Curvature),
            };

            // regression.Coefficients[i] and StandardErrors[i] by their definitions, without the fit's residual views
            // (made on first use of residuals).
            list.Add(new CoefficientEstimate(symbols[i], meaning, value, Math.Sqrt(regression.Covariance(i, i)), regression.CoefficientInterval(i, set.Options.ConfidenceLevel), unit));
        }

        Coefficients = list;
    }

    /// <summary>The underlying least-squares fit (x on the calibration axis, y = response ratio).</summary>
    public RegressionFit Regression { get; }

    /// <summary>The weighting used.</summary>
    public Weighting Weighting => Regression.Weighting;

    /// <summary>The coefficients with standard errors, intervals (at <see cref="CalibrationOptions.ConfidenceLevel"/>) and units.</summary>
    public IReadOnlyList<CoefficientEstimate> Coefficients { get; }

    /// <summary>s_y/x, the (weighted) residual standard deviation with n − p degrees of freedom (response-ratio units).</summary>
    public double ResidualStandardDeviation => Regression.ResidualStandardDeviation;

    /// <summary>Correlation coefficient r (see <see cref="RegressionFit.CorrelationCoefficient"/>).</summary>
    public double CorrelationCoefficient => Regression.CorrelationCoefficient;

    /// <summary>Coefficient of determination R² (see <see cref="RegressionFit.RSquared"/>).</summary>
    public double CoefficientOfDetermination => Regression.RSquared;

    /// <summary>Lack-of-fit F test; null (with a note) without replicates or without lack-of-fit degrees of freedom.</summary>
    /// <remarks>Computed on first use (thread-safe; every caller sees the same instance).</remarks>
    public LackOfFitTest? LackOfFit => Diagnostics.LackOfFit;

    /// <summary>Mandel's test straight line vs quadratic, same points and weighting; null (with a note) when not computable.</summary>
    /// <remarks>Computed on first use (thread-safe; every caller sees the same instance).</remarks>
    public MandelTest? Mandel => Diagnostics.Mandel;

    /// <summary>ISO 8466-1 variance-homogeneity check of the lowest and highest standard; null (with a note) without replicates there.</summary>
    /// <remarks>Computed on first use (thread-safe; every caller sees the same instance).</remarks>
    public VarianceHomogeneityTest? VarianceHomogeneity => Diagnostics.VarianceHomogeneity;

    private DiagnosticTests Diagnostics => Volatile.Read(ref _diagnostics) ?? (Interlocked.CompareExchange(ref _diagnostics, Diagnose(), null) ?? _diagnostics!);

    /// <summary>Covariance of two coefficients (see <see cref="RegressionFit.Covariance"/>), in the order of <see cref="Coefficients"/>.</summary>
    /// <param name="i">First index, 0 ≤ i &lt; p.</param>
    /// <param name="j">Second index, 0 ≤ j &lt; p.</param>
    /// <returns>The covariance (product of the coefficients' units).</returns>
    /// <exception cref="ArgumentOutOfRangeException">An index is out of range.</exception>
    public double Covariance(int i, int j) => Regression.Covariance(i, j);

    /// <summary>Fits a regression calibration to the standards.</summary>
    /// <param name="standards">The standards; all concentrations of one kind.</param>
    /// <param name="model">Straight line, through the origin, or quadratic.</param>
    /// <param name="weighting">Weighting; null for none. 1/x and 1/x² refuse an included blank; 1/y and 1/y² a response ≤ 0.</param>
    /// <param name="options">Options; null for <see cref="CalibrationOptions.Default"/>.</param>
    /// <returns>The calibration.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standards"/> or an element is null.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="model"/> is not defined.</exception>
    /// <exception cref="ArgumentException">Bad standards (see <see cref="ResponseFactorCalibration.Fit"/>); too few
    /// points or levels for the model; the weighting is undefined at a point or has the wrong number of values.</exception>
    /// <exception cref="InvalidOperationException">A back-calculated interval of a standard overflows (absurd magnitudes).</exception>
    public static RegressionCalibration Fit(IReadOnlyList<CalibrationStandard> standards, CalibrationModel model, Weighting? weighting = null, CalibrationOptions? options = null)
    {
        StandardSet set = StandardSet.Create(standards, options);
        weighting ??= Weighting.None;
        double[] x = set.Points.Select(p => p.X).ToArray();
        double[] y = set.Points.Select(p => p.Y).ToArray();
        RegressionFit fit;
        try
        {
            fit = RegressionFit.Fit(x, y, model, weighting);
        }
        catch (ArgumentException e) when (e is not ArgumentOutOfRangeException)
        {
            string message = e.Message + " Fit points: " + PointList(set) + ".";
            throw e.ParamName == "weighting" ? new ArgumentException(message, nameof(weighting), e) : new ArgumentException(message, nameof(standards), e);
        }

        var notes = new List<string>();
        ResponseFactorCalibration.AddExclusionNotes(set, notes);
        StandardResult[] results = Describe(set, fit, notes);
        return new RegressionCalibration(set, fit, weighting, results, notes);
    }

    /// <summary>Inverse-variance weighting (1/s²) from the replicate injections of each standard, one value per fit
    /// point in the order <see cref="Fit"/> uses: each injection gets the SD of its standard's ratios; with
    /// <see cref="ReplicateHandling.LevelMeans"/> each level gets the SD of its mean, s/√n.</summary>
    /// <param name="standards">The standards, as they will be passed to <see cref="Fit"/>.</param>
    /// <param name="options">The same options.</param>
    /// <returns>The weighting.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standards"/> or an element is null.</exception>
    /// <exception cref="ArgumentException">Bad standards, or a fitted standard has fewer than 2 injections or identical
    /// ratios (SD 0), so its variance cannot be estimated.</exception>
    public static Weighting ReplicateVarianceWeighting(IReadOnlyList<CalibrationStandard> standards, CalibrationOptions? options = null)
    {
        StandardSet set = StandardSet.Create(standards, options);
        var sds = new List<double>();
        foreach (FitPoint p in set.Points)
        {
            CalibrationStandard s = set.Standards[p.Standard];
            int n = s.Injections.Count;
            double[] r = s.Injections.Select(i => i.Ratio).ToArray();
            double sd = n > 1 ? SampleStatistics.StandardDeviation(r, SampleStatistics.Mean(r)) : 0;
            if (!(sd > 0))
            {
                throw new ArgumentException(
                    $"Parameter 'standards': standard '{s.Label}' has {Text.I(n)} injection(s){(n > 1 ? " with identical ratios" : string.Empty)}; 1/s² weighting needs at least 2 injections with non-zero spread at every fitted standard.",
                    nameof(standards));
            }

            sds.Add(p.Injection < 0 ? sd / Math.Sqrt(n) : sd);
        }

        return Weighting.InverseVariance(sds);
    }

    internal override double? InverseAxis(double response)
    {
        try
        {
            return Regression.InverseEvaluate(response);
        }
        catch (ArgumentOutOfRangeException)
        {
            return null;
        }
        catch (InvalidOperationException)
        {
            return null;
        }
    }

    internal override AxisPrediction PredictAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method)
    {
        AxisEstimate e = EstimateAxis(meanRatio, replicates, confidenceLevel, method);
        var notes = new List<string>();
        if (Weighting.IsPerPoint)
        {
            notes.Add("Weight of the unknown for '" + Weighting.Name + "' weighting interpolated linearly (in "
                + (Weighting.Scheme == WeightingScheme.InverseVariance ? "s" : "w") + ") between the standards at x0 = " + Text.G(e.X) + " " + AxisUnitSymbol + ".");
        }

        // The method text only: the numbers are e's (InversePredict gives them bit for bit, see EstimateInverse).
        string formula = Regression.InversePredict(meanRatio, replicates, confidenceLevel, e.UnknownWeight).Method;
        string how = "symmetric interval x0 ± t·s_x0";
        if (method == InverseIntervalMethod.Fieller)
        {
            if (Regression.Model == CalibrationModel.Quadratic)
            {
                notes.Add("Fieller's interval is defined here for straight lines only; the symmetric interval is given for the quadratic.");
            }
            else if (e.Lower is not null)
            {
                how = "Fieller interval";
            }
            else
            {
                notes.Add("Fieller's interval is unbounded: the slope is not significantly different from 0 at this confidence level (g ≥ 1).");
                return new AxisPrediction(e, formula + "; Fieller interval unbounded", notes);
            }
        }

        return new AxisPrediction(e, formula + "; " + how, notes);
    }

    internal override AxisEstimate EstimateAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method)
    {
        double? w0 = Weighting.IsPerPoint ? InterpolatedRawWeight(Regression.InverseEvaluate(meanRatio)) : null;
        InverseEstimate p = Regression.EstimateInverse(meanRatio, replicates, confidenceLevel, w0);
        double? lower = p.Interval.Lower;
        double? upper = p.Interval.Upper;
        if (method == InverseIntervalMethod.Fieller && Regression.Model != CalibrationModel.Quadratic)
        {
            ConfidenceInterval? f = Regression.FiellerInterval(meanRatio, replicates, confidenceLevel, w0);
            lower = f?.Lower;
            upper = f?.Upper;
        }

        return new AxisEstimate(p.Value, p.StandardError, lower, upper, p.DegreesOfFreedom, w0);
    }

    internal override string ModelText()
    {
        string w = Weighting.Scheme == WeightingScheme.None ? "unweighted" : "weighted " + Weighting.Name;
        return Regression.Model switch
        {
            CalibrationModel.Linear => "straight line y = a + b·x, " + w,
            CalibrationModel.LinearThroughOrigin => "straight line through the origin y = b·x, " + w,
            _ => "quadratic y = a + b·x + c·x², " + w,
        };
    }

    private protected override void AppendModel(StringBuilder sb)
    {
        sb.Append("  coefficients (").Append(Text.F(100 * Options.ConfidenceLevel, 0)).Append(" % CI, ν = ")
            .Append(Text.I(Regression.DegreesOfFreedom)).AppendLine("):");
        foreach (CoefficientEstimate c in Coefficients)
        {
            sb.Append("    ").AppendLine(c.ToString());
        }

        for (int i = 0; i < Coefficients.Count; i++)
        {
            for (int j = i + 1; j < Coefficients.Count; j++)
            {
                sb.Append("    cov(").Append(Coefficients[i].Symbol).Append(", ").Append(Coefficients[j].Symbol).Append(") = ")
                    .AppendLine(Text.G(Covariance(i, j)));
            }
        }

        sb.Append("  s_y/x = ").Append(Text.G(ResidualStandardDeviation)).Append(" (response ratio), r = ")
            .Append(Text.F(CorrelationCoefficient, 6)).Append(", R² = ").Append(Text.F(CoefficientOfDetermination, 6))
            .Append(Regression.Model == CalibrationModel.LinearThroughOrigin ? " (uncentred)" : string.Empty).AppendLine();
        if (Weighting.Scheme != WeightingScheme.None)
        {
            sb.AppendLine("  weights normalised to Σw = n; s_y/x and sums of squares are weighted");
        }

        if (LackOfFit is not null)
        {
            sb.Append("  ").AppendLine(LackOfFit.ToString());
        }

        if (Mandel is not null)
        {
            sb.Append("  ").AppendLine(Mandel.ToString());
        }

        if (VarianceHomogeneity is not null)
        {
            sb.Append("  ").AppendLine(VarianceHomogeneity.ToString());
        }
    }

    private protected override IReadOnlyList<string> DiagnosticNotes() => Diagnostics.Notes;

    private static RatioModel ToRatioModel(CalibrationModel model) => model switch
    {
        CalibrationModel.Linear => RatioModel.Linear,
        CalibrationModel.LinearThroughOrigin => RatioModel.LinearThroughOrigin,
        _ => RatioModel.Quadratic,
    };

    // Names the standard behind each fit-point index, so a refusal by RegressionFit can be traced.
    private static string PointList(StandardSet set) =>
        string.Join(", ", set.Points.Select((p, k) => Text.I(k) + " = '" + set.Standards[p.Standard].Label + "'"
            + (p.Injection >= 0 ? " #" + Text.I(p.Injection + 1) : string.Empty)));

    private static StandardResult[] Describe(StandardSet set, RegressionFit fit, List<string> notes)
    {
        // Fit points of a standard are consecutive (its injections in order, or its level mean): the first one's index.
        int[] firstPoint = new int[set.Standards.Count];
        firstPoint.AsSpan().Fill(-1);
        for (int k = set.Points.Count - 1; k >= 0; k--)
        {
            firstPoint[set.Points[k].Standard] = k;
        }

        var results = new StandardResult[set.Standards.Count];
        for (int i = 0; i < results.Length; i++)
        {
            CalibrationStandard s = set.Standards[i];
            double x = set.AxisValues[i];
            double fitted = fit.Predict(x);
            var injections = new InjectionResult[s.Injections.Count];
            double[] ratios = new double[injections.Length];
            for (int j = 0; j < injections.Length; j++)
            {
                ratios[j] = s.Injections[j].Ratio;
                Concentration? back = BackCalculate(set, fit, i, ratios[j], j, notes);
                int? k = PointOf(set, firstPoint[i], i, j);
                injections[j] = new InjectionResult(
                    s.Injections[j],
                    fitted,
                    null,
                    back,
                    back is Concentration b ? ResponseFactorCalibration.RelativeError(b.Value, set.Analyte[i]) : null,
                    s.IsBlank ? null : ratios[j] / (set.Analyte[i] / set.InternalStandard[i]),
                    k is null ? null : fit,
                    k ?? -1);
            }

            double mean = StandardSet.MeanRatio(s);
            int? level = PointOf(set, firstPoint[i], i, -1);
            Concentration? levelBack = BackCalculate(set, fit, i, mean, -1, notes);
            results[i] = new StandardResult(
                s,
                set.Included[i],
                x,
                mean,
                ratios.Length > 1 ? SampleStatistics.StandardDeviation(ratios, mean) : null,
                fitted,
                null,
                levelBack,
                levelBack is Concentration lb ? ResponseFactorCalibration.RelativeError(lb.Value, set.Analyte[i]) : null,
                s.IsBlank ? null : mean / (set.Analyte[i] / set.InternalStandard[i]),
                injections,
                level is null ? null : fit,
                level ?? -1);
        }

        return results;
    }

    // Index of the fit point of injection j of a standard (j = -1: its level mean), or null when it is not one.
    private static int? PointOf(StandardSet set, int first, int standard, int injection)
    {
        if (first < 0)
        {
            return null;
        }

        int k = injection < 0 ? first : first + injection;
        return k < set.Points.Count && set.Points[k].Standard == standard && set.Points[k].Injection == injection ? k : null;
    }

    // injection: the injection's index, or -1 for the standard's mean response.
    private static Concentration? BackCalculate(StandardSet set, RegressionFit fit, int standard, double response, int injection, List<string> notes)
    {
        double x;
        try
        {
            x = fit.InverseEvaluate(response);
        }
        catch (Exception e) when (e is ArgumentOutOfRangeException or InvalidOperationException)
        {
            string label = set.Standards[standard].Label;
            notes.Add("No back-calculated value for " + (injection < 0 ? label + " (mean)" : label + " #" + Text.I(injection + 1)) + ": " + e.Message);
            return null;
        }

        return Concentration.From(set.ToConcentration(x, set.InternalStandard[standard]), set.Unit);
    }

    private static List<LevelGroup> Groups(StandardSet set, RegressionFit fit)
    {
        var groups = new List<LevelGroup>();
        for (int i = 0; i < set.Standards.Count; i++)
        {
            if (!set.Included[i])
            {
                continue;
            }

            CalibrationStandard s = set.Standards[i];
            double[] responses = s.Injections.Select(inj => inj.Ratio).ToArray();
            double[] weights = new double[responses.Length];
            for (int k = 0; k < set.Points.Count; k++)
            {
                FitPoint p = set.Points[k];
                if (p.Standard != i)
                {
                    continue;
                }

                if (p.Injection < 0)
                {
                    // Level-mean fit: every injection of the level carries the level's weight.
                    for (int j = 0; j < weights.Length; j++)
                    {
                        weights[j] = fit.Weights[k];
                    }
                }
                else
                {
                    weights[p.Injection] = fit.Weights[k];
                }
            }

            groups.Add(new LevelGroup(responses, weights, fit.Predict(set.AxisValues[i])));
        }

        return groups;
    }

    // The three tests in the order Fit used to make them (their notes in that order); the fit points as Fit formed them.
    private DiagnosticTests Diagnose()
    {
        StandardSet set = Set;
        RegressionFit fit = Regression;
        double[] x = set.Points.Select(p => p.X).ToArray();
        double[] y = set.Points.Select(p => p.Y).ToArray();
        var notes = new List<string>();
        double alpha = set.Options.SignificanceLevel;
        LackOfFitTest? lof = LackOfFitTest.Compute(Groups(set, fit), fit.ParameterCount, alpha, notes);
        MandelTest? mandel = ComputeMandel(x, y, fit.Model, _weighting, fit, alpha, notes);
        VarianceHomogeneityTest? homogeneity = VarianceHomogeneityTest.Compute(set, alpha, notes);
        return new DiagnosticTests(lof, mandel, homogeneity, notes);
    }

    private static MandelTest? ComputeMandel(double[] x, double[] y, CalibrationModel model, Weighting weighting, RegressionFit fit, double alpha, List<string> notes)
    {
        try
        {
            RegressionFit line = model == CalibrationModel.Linear ? fit : RegressionFit.Fit(x, y, CalibrationModel.Linear, weighting);
            RegressionFit quad = model == CalibrationModel.Quadratic ? fit : RegressionFit.Fit(x, y, CalibrationModel.Quadratic, weighting);
            return MandelTest.Compute(line.ResidualSumOfSquares, quad.ResidualSumOfSquares, x.Length, alpha, notes);
        }
        catch (ArgumentException e)
        {
            notes.Add("Mandel's test not computed: " + e.Message);
            return null;
        }
    }

    // Raw weight of the unknown for per-point weightings: s (1/s²) or w (custom) interpolated linearly in x between the
    // standards' values (averaged per distinct x), held constant beyond the ends (field-reference §2.2 interpolates s_i).
    private double InterpolatedRawWeight(double x0)
    {
        bool bySd = Weighting.Scheme == WeightingScheme.InverseVariance;
        var table = Regression.X
            .Select((x, k) => (x, v: Weighting.PointValues[k]))
            .GroupBy(t => t.x)
            .Select(g => (x: g.Key, v: g.Average(t => t.v)))
            .OrderBy(t => t.x)
            .ToList();
        double value;
        if (x0 <= table[0].x)
        {
            value = table[0].v;
        }
        else if (x0 >= table[table.Count - 1].x)
        {
            value = table[table.Count - 1].v;
        }
        else
        {
            int k = 1;
            while (table[k].x < x0)
            {
                k++;
            }

            (double xa, double va) = table[k - 1];
            (double xb, double vb) = table[k];
            value = va + ((vb - va) * (x0 - xa) / (xb - xa));
        }

        return bySd ? 1 / (value * value) : value;
    }

    private sealed class DiagnosticTests
    {
        internal DiagnosticTests(LackOfFitTest? lackOfFit, MandelTest? mandel, VarianceHomogeneityTest? varianceHomogeneity, IReadOnlyList<string> notes)
        {
            LackOfFit = lackOfFit;
            Mandel = mandel;
            VarianceHomogeneity = varianceHomogeneity;
            Notes = notes;
        }

        internal LackOfFitTest? LackOfFit { get; }

        internal MandelTest? Mandel { get; }

        internal VarianceHomogeneityTest? VarianceHomogeneity { get; }

        internal IReadOnlyList<string> Notes { get; }
    }
}
