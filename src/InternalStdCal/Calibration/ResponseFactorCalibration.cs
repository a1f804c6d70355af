using System;
using System.Collections.Generic;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>
/// Response-factor calibration (US EPA SW-846 Method 8000C §11.4.3): each standard gives a relative response factor
/// RF = (A_x·C_is)/(A_is·C_x); the calibration is their mean, and an unknown is C_x = A_x·C_is/(A_is·mean RF).
/// With one standard this is single-point calibration.
/// </summary>
/// <remarks>
/// <para>The RFs averaged are those of the fitted points: one per injection (<see cref="ReplicateHandling.EveryInjection"/>)
/// or one per level from its mean ratio (<see cref="ReplicateHandling.LevelMeans"/>). RFs are dimensionless because
/// analyte and IS concentrations are expressed in the same unit.</para>
/// <para>Blanks have no RF (C_x = 0); fitting with blanks requires <see cref="BlankHandling.Exclude"/>.
/// Weighting does not apply to this model.</para>
/// <para>RSE with p = 1 equals the %RSD of the RFs (field-reference §0/§4 identity): x'_i/x_i = RF_i/mean RF.</para>
/// </remarks>
public sealed class ResponseFactorCalibration : RatioCalibration
{
    private ResponseFactorCalibration(
        StandardSet set,
        RatioModel model,
        IReadOnlyList<StandardResult> standards,
        List<string> notes,
        double mean,
        double? sd,
        int count)
        : base(set, model, 1, standards, notes)
    {
        MeanResponseFactor = mean;
        ResponseFactorStandardDeviation = sd;
        ResponseFactorCount = count;
    }

    /// <summary>Mean relative response factor (dimensionless).</summary>
    public double MeanResponseFactor { get; }

    /// <summary>Sample standard deviation of the RFs (n − 1 denominator); null when there is one RF.</summary>
    public double? ResponseFactorStandardDeviation { get; }

    /// <summary>Relative standard deviation of the RFs, 100·SD/mean in %; null when there is one RF.</summary>
    public double? ResponseFactorRsdPercent => ResponseFactorStandardDeviation / Math.Abs(MeanResponseFactor) * 100;

    /// <summary>Number of RFs averaged (fitted points).</summary>
    public int ResponseFactorCount { get; }

    /// <summary>True for a single-point calibration (one standard).</summary>
    public bool IsSinglePoint => Model == RatioModel.SinglePointResponseFactor;

    /// <summary>Fits the average-RF model to the standards.</summary>
    /// <param name="standards">One or more standards; all concentrations of one kind; no blank unless
    /// <see cref="CalibrationOptions.Blanks"/> is <see cref="BlankHandling.Exclude"/>.</param>
    /// <param name="options">Options; null for <see cref="CalibrationOptions.Default"/>.</param>
    /// <returns>The calibration; <see cref="RatioModel.SinglePointResponseFactor"/> when only one standard is fitted.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standards"/> or an element is null.</exception>
    /// <exception cref="ArgumentException">No standards; duplicate labels; mixed concentration kinds; IS concentration
    /// not constant on the concentration axis; a blank is included; or the mean RF is ≤ 0.</exception>
    public static ResponseFactorCalibration Fit(IReadOnlyList<CalibrationStandard> standards, CalibrationOptions? options = null)
    {
        StandardSet set = StandardSet.Create(standards, options);
        for (int i = 0; i < set.Standards.Count; i++)
        {
            if (set.Standards[i].IsBlank && set.Included[i])
            {
                throw new ArgumentException(
                    $"Parameter 'standards': standard '{set.Standards[i].Label}' is a blank ({set.Standards[i].AnalyteConcentration}); a response factor is undefined at zero concentration. Set CalibrationOptions.Blanks = BlankHandling.Exclude to leave blanks out (recorded in the result).",
                    nameof(standards));
            }
        }

        var notes = new List<string>();
        var rf = new double[set.Points.Count];
        for (int k = 0; k < rf.Length; k++)
        {
            FitPoint p = set.Points[k];
            rf[k] = p.Y / ToRatioAxis(set, p.Standard);
        }

        double mean = SampleStatistics.Mean(rf);
        if (!(mean > 0))
        {
            throw new ArgumentException($"Parameter 'standards': the mean response factor is {Text.G(mean)}; it must be > 0 (the analyte signals of the standards are zero or negative on average).", nameof(standards));
        }

        double? sd = rf.Length > 1 ? SampleStatistics.StandardDeviation(rf, mean) : null;
        RatioModel model = set.IncludedLevelCount == 1 ? RatioModel.SinglePointResponseFactor : RatioModel.AverageResponseFactor;
        if (sd is null)
        {
            notes.Add("Only one response factor: SD, %RSD and prediction intervals are not available.");
        }
        else if (sd == 0)
        {
            notes.Add("All response factors are identical (SD = 0): standardised residuals are not defined.");
        }

        AddExclusionNotes(set, notes);
        var results = new StandardResult[set.Standards.Count];
        for (int i = 0; i < results.Length; i++)
        {
            results[i] = Describe(set, i, mean, sd);
        }

        return new ResponseFactorCalibration(set, model, results, notes, mean, sd, rf.Length);
    }

    /// <summary>Single-point calibration from one standard: its RF (the mean over its injections when
    /// <see cref="ReplicateHandling.EveryInjection"/>).</summary>
    /// <param name="standard">A non-blank standard.</param>
    /// <param name="options">Options; null for the defaults.</param>
    /// <returns>The calibration (<see cref="RatioModel.SinglePointResponseFactor"/>).</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standard"/> is null.</exception>
    /// <exception cref="ArgumentException">The standard is a blank or its RF is ≤ 0.</exception>
    public static ResponseFactorCalibration FitSinglePoint(CalibrationStandard standard, CalibrationOptions? options = null)
    {
        try
        {
            return Fit(new[] { Guard.NotNull(standard, nameof(standard)) }, options);
        }
        catch (ArgumentException e) when (e.ParamName == "standards")
        {
            throw new ArgumentException(e.Message.Replace("Parameter 'standards'", "Parameter 'standard'"), nameof(standard), e);
        }
    }

    /// <summary>Relative standard uncertainty of a result under a constant-relative-error model: the RFs of the
    /// standards scatter with relative SD s_rel, the mean RF of n has s_rel/√n, and the mean of m sample ratios
    /// s_rel/√m, so u_rel = s_rel·sqrt(1/m + 1/n) with n − 1 degrees of freedom (delta method; common practice,
    /// the analogue of s_x0 for this model).</summary>
    internal override AxisPrediction PredictAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method)
    {
        AxisEstimate e = EstimateAxis(meanRatio, replicates, confidenceLevel, method);
        var notes = new List<string>();
        if (method == InverseIntervalMethod.Fieller)
        {
            notes.Add("Fieller's interval applies to straight-line regressions; the response-factor model gives the symmetric interval.");
        }

        if (e.StandardError is null)
        {
            notes.Add("Single response factor: no spread is available, so no standard error or interval.");
            return new AxisPrediction(e, "mean response factor (no spread)", notes);
        }

        return new AxisPrediction(e, "mean response factor, relative SD of the RFs: s = C·RSD·sqrt(1/m + 1/n)", notes);
    }

    internal override AxisEstimate EstimateAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method)
    {
        double x = InverseAxis(meanRatio)!.Value;
        if (ResponseFactorStandardDeviation is not double sd)
        {
            return new AxisEstimate(x, null, null, null, null, null);
        }

        int n = ResponseFactorCount;
        double se = Math.Abs(x) * sd / MeanResponseFactor * Math.Sqrt((1.0 / replicates) + (1.0 / n));
        double t = StudentTQuantile.TwoSided(confidenceLevel, n - 1);
        return new AxisEstimate(x, se, x - (t * se), x + (t * se), n - 1, null);
    }

    internal override double? InverseAxis(double response)
    {
        double q = response / MeanResponseFactor;
        return Axis == CalibrationAxis.AnalyteConcentration ? q * Set.ReferenceIs : q;
    }

    internal override string ModelText() => IsSinglePoint
        ? "single-point response factor, C_x = A_x·C_is/(A_is·RF), RF = " + Text.G(MeanResponseFactor)
        : "average response factor, C_x = A_x·C_is/(A_is·mean RF), mean RF = " + Text.G(MeanResponseFactor);

    private protected override void AppendModel(StringBuilder sb)
    {
        sb.Append("  response factors (dimensionless): n = ").Append(Text.I(ResponseFactorCount))
            .Append(", mean = ").Append(Text.G(MeanResponseFactor))
            .Append(", SD = ").Append(ResponseFactorStandardDeviation is double sd ? Text.G(sd) : "n/a")
            .Append(", RSD = ").Append(ResponseFactorRsdPercent is double rsd ? Text.F(rsd, 3) + " %" : "n/a")
            .AppendLine();
    }

    internal static void AddExclusionNotes(StandardSet set, List<string> notes)
    {
        for (int i = 0; i < set.Standards.Count; i++)
        {
            if (!set.Included[i])
            {
                notes.Add("Blank '" + set.Standards[i].Label + "' excluded from the fit (BlankHandling.Exclude); its back-calculated value is listed for information.");
            }
        }
    }

    // C_x/C_is of a standard: the x of the RF formula, RF = y / (C_x/C_is).
    private static double ToRatioAxis(StandardSet set, int standard) => set.Analyte[standard] / set.InternalStandard[standard];

    private static StandardResult Describe(StandardSet set, int i, double meanRf, double? sd)
    {
        CalibrationStandard s = set.Standards[i];
        double ratioAxis = ToRatioAxis(set, i);
        double fitted = meanRf * ratioAxis;
        bool fitByInjection = set.Options.Replicates == ReplicateHandling.EveryInjection && set.Included[i];
        bool zOk = sd is double d && d > 0 && !s.IsBlank;
        var injections = new InjectionResult[s.Injections.Count];
        double[] ratios = new double[injections.Length];
        for (int j = 0; j < injections.Length; j++)
        {
            Injection inj = s.Injections[j];
            ratios[j] = inj.Ratio;
            double? rf = s.IsBlank ? null : inj.Ratio / ratioAxis;
            double back = inj.Ratio * set.InternalStandard[i] / meanRf;
            injections[j] = new InjectionResult(
                inj,
                fitted,
                fitByInjection && zOk ? (rf!.Value - meanRf) / sd!.Value : null,
                Concentration.From(back, set.Unit),
                RelativeError(back, set.Analyte[i]),
                rf);
        }

        double meanRatio = StandardSet.MeanRatio(s);
        double? levelRf = s.IsBlank ? null : meanRatio / ratioAxis;
        double levelBack = meanRatio * set.InternalStandard[i] / meanRf;
        bool fitByLevel = set.Options.Replicates == ReplicateHandling.LevelMeans && set.Included[i];
        return new StandardResult(
            s,
            set.Included[i],
            set.AxisValues[i],
            meanRatio,
            ratios.Length > 1 ? SampleStatistics.StandardDeviation(ratios, SampleStatistics.Mean(ratios)) : null,
            fitted,
            fitByLevel && zOk ? (levelRf!.Value - meanRf) / sd!.Value : null,
            Concentration.From(levelBack, set.Unit),
            RelativeError(levelBack, set.Analyte[i]),
            levelRf,
            injections);
    }

    /// <summary>100·(x' − x)/x; null at x = 0.</summary>
    internal static double? RelativeError(double backCalculated, double nominal) =>
        nominal == 0 ? null : 100 * (backCalculated - nominal) / nominal;
}
