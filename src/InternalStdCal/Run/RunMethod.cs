using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Limits;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>
/// How one analyte of a run is calibrated and judged: the internal standard (IS) that corrects it, the calibration
/// function, weighting and options, the acceptance rule set and the reporting limits.
/// </summary>
/// <remarks>Immutable.</remarks>
public sealed class AnalyteMethod
{
    /// <summary>Creates the method of one analyte.</summary>
    /// <param name="analyte">Analyte name as in the run; not blank.</param>
    /// <param name="internalStandard">Name of the IS that corrects it; not blank.</param>
    /// <param name="model">Calibration function. <see cref="RatioModel.SinglePointResponseFactor"/> needs exactly one
    /// non-blank standard level in the run.</param>
    /// <param name="weighting">Weighting of a regression model (1/x, 1/x², 1/y, 1/y² or none); null for none. Per-point
    /// weightings (1/s², custom) are refused: which points exist is only known once invalid rows are set aside.</param>
    /// <param name="options">Calibration options; null for <see cref="CalibrationOptions.Default"/>.</param>
    /// <param name="acceptance">Acceptance rule set applied to the calibration; null for none.</param>
    /// <param name="limits">Reporting limits: the method's LOD/LOQ expressed in the original sample (e.g. µg/L of the
    /// water sample, mg/kg of a solid), applied to <see cref="AnalyteResult.InSample"/>; null for none. Results in the
    /// original sample of another kind than the limits are not censored (the result's notes say so).</param>
    /// <exception cref="ArgumentNullException">A name is null.</exception>
    /// <exception cref="ArgumentException">A name is blank, or a weighting is given for a response-factor model, or a
    /// per-point weighting is given.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="model"/> is not defined.</exception>
    public AnalyteMethod(string analyte, string internalStandard, RatioModel model, Weighting? weighting = null, CalibrationOptions? options = null, AcceptanceRuleSet? acceptance = null, ReportingLimits? limits = null)
    {
        Analyte = Guard.NotBlank(analyte, nameof(analyte));
        InternalStandard = Guard.NotBlank(internalStandard, nameof(internalStandard));
        if (model is < RatioModel.SinglePointResponseFactor or > RatioModel.Quadratic)
        {
            throw new ArgumentOutOfRangeException(nameof(model), model, $"Parameter 'model' was {model}; it must be a defined RatioModel.");
        }

        weighting ??= Weighting.None;
        if (weighting.IsPerPoint)
        {
            throw new ArgumentException($"Parameter 'weighting' was '{weighting}' for analyte '{analyte}'; a run method takes 1/x, 1/x², 1/y, 1/y² or none, because per-point weights cannot follow rows set aside during processing.", nameof(weighting));
        }

        if (model is RatioModel.SinglePointResponseFactor or RatioModel.AverageResponseFactor && weighting.Scheme != WeightingScheme.None)
        {
            throw new ArgumentException($"Parameter 'weighting' was '{weighting}' for analyte '{analyte}' with the {model} model; response-factor models take no weighting.", nameof(weighting));
        }

        Model = model;
        Weighting = weighting;
        Options = options ?? CalibrationOptions.Default;
        Acceptance = acceptance;
        Limits = limits;
    }

    /// <summary>Analyte name.</summary>
    public string Analyte { get; }

    /// <summary>Name of the correcting IS.</summary>
    public string InternalStandard { get; }

    /// <summary>Calibration function.</summary>
    public RatioModel Model { get; }

    /// <summary>Weighting (regression models); <see cref="Weighting.None"/> otherwise.</summary>
    public Weighting Weighting { get; }

    /// <summary>Calibration options.</summary>
    public CalibrationOptions Options { get; }

    /// <summary>Acceptance rule set; null for none.</summary>
    public AcceptanceRuleSet? Acceptance { get; }

    /// <summary>Reporting limits in the original sample (see <see cref="AnalyteResult.Reported"/>); null for none.</summary>
    public ReportingLimits? Limits { get; }

    /// <inheritdoc />
    public override string ToString() => Analyte + " / IS " + InternalStandard + ": " + Model + (Weighting.Scheme == WeightingScheme.None ? string.Empty : ", weighting " + Weighting.Name);
}

/// <summary>
/// The processing method of an analytical run: one <see cref="AnalyteMethod"/> per analyte, the IS concentration of
/// every internal standard (the same in every measured solution), the IS recovery window and the quality-control
/// criteria.
/// </summary>
/// <remarks>The library computes; the lab's validated method, its QA system, local regulations and licensed practice
/// decide the criteria and what their outcome means. Immutable.</remarks>
public sealed class RunMethod
{
    private readonly double _confidenceLevel = 0.95;
    private readonly double _replicateOutlierSignificance = 0.05;
    private readonly InverseIntervalMethod _intervalMethod;

    /// <summary>Creates a method.</summary>
    /// <param name="name">Name printed in reports; not blank.</param>
    /// <param name="analytes">One method per analyte; at least one, analytes distinct.</param>
    /// <param name="internalStandardConcentrations">IS name → IS concentration in every measured solution, &gt; 0;
    /// every IS named by an analyte method must be listed.</param>
    /// <param name="recoveryWindow">The IS recovery window.</param>
    /// <exception cref="ArgumentNullException">An argument or element is null.</exception>
    /// <exception cref="ArgumentException">A list is empty, an analyte appears twice, or an analyte's IS has no concentration.</exception>
    /// <exception cref="ArgumentOutOfRangeException">An IS concentration is ≤ 0.</exception>
    public RunMethod(string name, IEnumerable<AnalyteMethod> analytes, IReadOnlyDictionary<string, Concentration> internalStandardConcentrations, InternalStandardRecoveryWindow recoveryWindow)
    {
        Name = Guard.NotBlank(name, nameof(name));
        AnalyteMethod[] list = Guard.NotNull(analytes, nameof(analytes)).ToArray();
        if (list.Length == 0)
        {
            throw new ArgumentException("Parameter 'analytes' is empty; a method needs at least one analyte.", nameof(analytes));
        }

        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < list.Length; i++)
        {
            if (list[i] is null)
            {
                throw new ArgumentNullException(nameof(analytes), FormattableString.Invariant($"Parameter 'analytes' has a null element at index {i}."));
            }

            if (!seen.Add(list[i].Analyte))
            {
                throw new ArgumentException($"Parameter 'analytes' lists analyte '{list[i].Analyte}' twice; one method per analyte.", nameof(analytes));
            }
        }

        Guard.NotNull(internalStandardConcentrations, nameof(internalStandardConcentrations));
        var conc = new SortedDictionary<string, Concentration>(StringComparer.Ordinal);
        foreach (KeyValuePair<string, Concentration> p in internalStandardConcentrations)
        {
            if (!(p.Value.Value > 0))
            {
                throw new ArgumentOutOfRangeException(nameof(internalStandardConcentrations), p.Value.Value, $"Parameter 'internalStandardConcentrations' has {p.Key} = {p.Value}; it must be > 0.");
            }

            conc[p.Key] = p.Value;
        }

        foreach (AnalyteMethod a in list)
        {
            if (!conc.ContainsKey(a.InternalStandard))
            {
                throw new ArgumentException($"Parameter 'internalStandardConcentrations' has no concentration for IS '{a.InternalStandard}', which corrects analyte '{a.Analyte}'.", nameof(internalStandardConcentrations));
            }
        }

        Analytes = list;
        InternalStandardConcentrations = conc;
        RecoveryWindow = Guard.NotNull(recoveryWindow, nameof(recoveryWindow));
    }

    /// <summary>Name printed in reports.</summary>
    public string Name { get; }

    /// <summary>The analyte methods, in the order given.</summary>
    public IReadOnlyList<AnalyteMethod> Analytes { get; }

    /// <summary>IS name → IS concentration in every measured solution.</summary>
    public IReadOnlyDictionary<string, Concentration> InternalStandardConcentrations { get; }

    /// <summary>The IS recovery window.</summary>
    public InternalStandardRecoveryWindow RecoveryWindow { get; }

    /// <summary>Window for the recovery of quality-control / check standards (found/nominal·100); null = recoveries
    /// are reported but not judged.</summary>
    public RecoveryWindow? QualityControlRecovery { get; init; }

    /// <summary>Limit of the duplicate RPD; null = RPDs are reported but not judged.</summary>
    public RpdLimit? DuplicateRpd { get; init; }

    /// <summary>Window of the spike recovery ((spiked − unspiked)/added·100); null = reported but not judged.</summary>
    public RecoveryWindow? SpikeRecovery { get; init; }

    /// <summary>Rule for the drift trends of the report (each IS signal and each analyte's QC recovery across injection
    /// order, see <see cref="RunReport.Drift"/>); null (default) = no drift trends.</summary>
    public DriftRule? Drift { get; init; }

    /// <summary>Significance level α of the two-sided Grubbs test on the replicate injections of a sample (applied when
    /// at least 3 injections are used; their ratios are tested, see <see cref="GrubbsTest"/>), in (0, 0.5).
    /// Default 0.05. A suspect injection is flagged (<see cref="ResultQualifiers.SuspectReplicate"/>), never removed.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 0.5).</exception>
    public double ReplicateOutlierSignificance
    {
        get => _replicateOutlierSignificance;
        init => _replicateOutlierSignificance = Guard.InOpenRange(value, 0, 0.5, nameof(ReplicateOutlierSignificance));
    }

    /// <summary>Confidence level of result intervals, in (0, 1). Default 0.95.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 1).</exception>
    public double ConfidenceLevel { get => _confidenceLevel; init => _confidenceLevel = Guard.InOpenRange(value, 0, 1, nameof(ConfidenceLevel)); }

    /// <summary>How result intervals are formed. Default <see cref="InverseIntervalMethod.Symmetric"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not defined.</exception>
    public InverseIntervalMethod IntervalMethod
    {
        get => _intervalMethod;
        init => _intervalMethod = value is InverseIntervalMethod.Symmetric or InverseIntervalMethod.Fieller
            ? value
            : throw new ArgumentOutOfRangeException(nameof(IntervalMethod), value, $"Parameter 'IntervalMethod' was {value}; it must be Symmetric or Fieller.");
    }

    /// <summary>The method of an analyte.</summary>
    /// <param name="analyte">Analyte name.</param>
    /// <returns>The analyte method, or null when the analyte is not in this method.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="analyte"/> is null.</exception>
    public AnalyteMethod? For(string analyte)
    {
        Guard.NotNull(analyte, nameof(analyte));
        return Analytes.FirstOrDefault(a => string.Equals(a.Analyte, analyte, StringComparison.Ordinal));
    }

    /// <inheritdoc />
    public override string ToString() => Name + " (" + string.Join("; ", Analytes) + ")";
}
