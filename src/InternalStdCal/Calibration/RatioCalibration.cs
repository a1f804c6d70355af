using System;
using System.Collections.Generic;
using System.Text;
using System.Threading;
using InternalStdCal.Quantitation;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>
/// An internal-standard calibration: the response ratio y = A_x/A_is against the analyte concentration (constant
/// IS) or the concentration ratio C_x/C_is (variable IS), with everything a reviewer needs to accept or reject it:
/// per-standard and per-injection back-calculated concentrations and relative errors, the relative standard error
/// (US EPA SW-846 Method 8000D), and the model-specific statistics of the derived types.
/// </summary>
/// <remarks>
/// <para>Create one with <see cref="ResponseFactorCalibration.Fit"/>, <see cref="ResponseFactorCalibration.FitSinglePoint"/>
/// or <see cref="RegressionCalibration.Fit"/>. Immutable.</para>
/// <para>Concentrations are reported in <see cref="Unit"/>; responses are dimensionless ratios; on the ratio axis
/// x is dimensionless too.</para>
/// </remarks>
public abstract class RatioCalibration
{
    // Notes made while fitting (exclusions, back-calculation), then those of the derived type's diagnostics, then the RSE note.
    private readonly List<string> _fitNotes;
    private readonly string? _rseNote;
    private IReadOnlyList<string>? _notes;

    private protected RatioCalibration(StandardSet set, RatioModel model, int parameterCount, IReadOnlyList<StandardResult> standards, List<string> notes)
    {
        Set = set;
        Model = model;
        ParameterCount = parameterCount;
        Standards = standards;
        LowestX = RangeEnd(low: true);
        HighestX = RangeEnd(low: false);
        (RelativeStandardErrorPercent, _rseNote) = ComputeRse();
        _fitNotes = notes;
    }

    /// <summary>The calibration function.</summary>
    public RatioModel Model { get; }

    /// <summary>What x is.</summary>
    public CalibrationAxis Axis => Set.Options.Axis;

    /// <summary>Whether every injection or the level means were fitted.</summary>
    public ReplicateHandling Replicates => Set.Options.Replicates;

    /// <summary>Whether blanks were fitted or left out.</summary>
    public BlankHandling Blanks => Set.Options.Blanks;

    /// <summary>The options the calibration was made with.</summary>
    public CalibrationOptions Options => Set.Options;

    /// <summary>Unit of every concentration in this calibration.</summary>
    public ConcentrationUnit Unit => Set.Unit;

    /// <summary>Unit symbol of x: the concentration unit, or "1" (dimensionless) on the ratio axis.</summary>
    public string AxisUnitSymbol => Set.AxisSymbol;

    /// <summary>For <see cref="CalibrationAxis.AnalyteConcentration"/>: the IS concentration shared by all standards;
    /// null on the ratio axis.</summary>
    public Concentration? InternalStandardConcentration =>
        Axis == CalibrationAxis.AnalyteConcentration ? Concentration.From(Set.ReferenceIs, Unit) : null;

    /// <summary>Per-standard results, in the order the standards were given.</summary>
    public IReadOnlyList<StandardResult> Standards { get; }

    /// <summary>Number of model terms p used in the RSE (1 response factor or through origin, 2 straight line,
    /// 3 quadratic; US EPA SW-846 Method 8000D).</summary>
    public int ParameterCount { get; }

    /// <summary>Number of points the model was fitted to (injections or level means; excluded blanks not counted).</summary>
    public int PointCount => Set.Points.Count;

    /// <summary>Number of fitted non-blank levels: distinct x values (two standards at the same x are one level).</summary>
    public int LevelCount
    {
        get
        {
            var levels = new HashSet<double>();
            foreach (StandardResult s in Standards)
            {
                if (s.Included && !s.IsBlank)
                {
                    levels.Add(s.X);
                }
            }

            return levels.Count;
        }
    }

    /// <summary>Lowest fitted non-blank x (axis unit, see <see cref="AxisUnitSymbol"/>).</summary>
    public double LowestX { get; }

    /// <summary>Highest fitted non-blank x (axis unit).</summary>
    public double HighestX { get; }

    /// <summary>
    /// Relative standard error in %, US EPA SW-846 Method 8000D:
    /// RSE = 100·sqrt( Σ((x'_i − x_i)/x_i)² / (n − p) ), over the fitted non-blank points (injections or level
    /// means, as fitted), x'_i back-calculated, x_i nominal, p = <see cref="ParameterCount"/>.
    /// Null (with a note) when n − p &lt; 1 or a point cannot be back-calculated.
    /// </summary>
    public double? RelativeStandardErrorPercent { get; }

    /// <summary>Everything the calibration did that a reviewer should know about: excluded points, statistics
    /// that could not be computed and why, options that had no effect.</summary>
    /// <remarks>Put together on first use, with the diagnostics it reports on (thread-safe; every caller sees the same instance).</remarks>
    public IReadOnlyList<string> Notes => Volatile.Read(ref _notes) ?? (Interlocked.CompareExchange(ref _notes, JoinNotes(), null) ?? _notes!);

    internal StandardSet Set { get; }

    /// <summary>A readable report of the calibration: model, coefficients, diagnostics and every standard, with
    /// units (invariant culture).</summary>
    /// <returns>Multi-line text.</returns>
    public string Summary()
    {
        var sb = new StringBuilder();
        sb.Append("Ratio calibration: ").Append(ModelText()).AppendLine();
        sb.Append("  x = ").Append(Axis == CalibrationAxis.AnalyteConcentration
            ? "analyte concentration (" + Set.Symbol + "), constant IS " + Text.G(Set.ReferenceIs) + " " + Set.Symbol
            : "analyte/IS concentration ratio (dimensionless; concentrations in " + Set.Symbol + ")").AppendLine();
        sb.Append("  y = analyte/IS signal ratio (dimensionless)").AppendLine();
        sb.Append("  fitted points: ").Append(Text.I(PointCount))
            .Append(Replicates == ReplicateHandling.EveryInjection ? " injections" : " level means")
            .Append(" from ").Append(Text.I(LevelCount)).Append(" non-blank levels; blanks ")
            .Append(Blanks == BlankHandling.Include ? "included" : "excluded").AppendLine();
        sb.Append("  calibrated range: x = ").Append(Text.G(LowestX)).Append(" to ").Append(Text.G(HighestX))
            .Append(' ').Append(AxisUnitSymbol).AppendLine();
        AppendModel(sb);
        sb.Append("  RSE (US EPA 8000D, p = ").Append(Text.I(ParameterCount)).Append("): ")
            .Append(RelativeStandardErrorPercent is double rse ? Text.F(rse, 3) + " %" : "not computed").AppendLine();
        AppendStandards(sb);
        if (Notes.Count > 0)
        {
            sb.AppendLine("Notes:");
            foreach (string note in Notes)
            {
                sb.Append("  - ").AppendLine(note);
            }
        }

        return sb.ToString();
    }

    /// <summary>Same as <see cref="Summary"/>.</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString() => Summary();

    /// <summary>Inverse prediction of x for the mean ratio of <paramref name="replicates"/> injections of an unknown.</summary>
    internal abstract AxisPrediction PredictAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method);

    /// <summary>The numbers of <see cref="PredictAxis"/> (which is built on this), without notes or text.</summary>
    internal abstract AxisEstimate EstimateAxis(double meanRatio, int replicates, double confidenceLevel, InverseIntervalMethod method);

    /// <summary>x on the calibration axis for one response; null when the function cannot be inverted there.</summary>
    internal abstract double? InverseAxis(double response);

    /// <summary>Short model description with the fitted function.</summary>
    internal abstract string ModelText();

    /// <summary>Model-specific report lines.</summary>
    private protected abstract void AppendModel(StringBuilder sb);

    /// <summary>Notes of the model-specific diagnostics, which come after the fit's notes and before the RSE note.</summary>
    private protected virtual IReadOnlyList<string> DiagnosticNotes() => Array.Empty<string>();

    /// <summary>The points counted by RSE and by acceptance rules: the fitted non-blank points, each with its
    /// level and its relative error (null when not back-calculable).</summary>
    internal IEnumerable<CalibratorPoint> Calibrators()
    {
        foreach (StandardResult s in Standards)
        {
            if (!s.Included || s.IsBlank)
            {
                continue;
            }

            if (Replicates == ReplicateHandling.LevelMeans)
            {
                yield return new CalibratorPoint(s, s.Label, s.RelativeErrorPercent, s.BackCalculated);
                continue;
            }

            for (int j = 0; j < s.Injections.Count; j++)
            {
                string id = s.Injections.Count == 1 ? s.Label : s.Label + " #" + Text.I(j + 1);
                yield return new CalibratorPoint(s, id, s.Injections[j].RelativeErrorPercent, s.Injections[j].BackCalculated);
            }
        }
    }

    internal Concentration Conc(double value) => Concentration.From(value, Unit);

    private List<string> JoinNotes()
    {
        IReadOnlyList<string> diagnostics = DiagnosticNotes();
        var notes = new List<string>(_fitNotes.Count + diagnostics.Count + 1);
        notes.AddRange(_fitNotes);
        notes.AddRange(diagnostics);
        if (_rseNote is not null)
        {
            notes.Add(_rseNote);
        }

        return notes;
    }

    // RSE, or null with the note saying why.
    private (double? Rse, string? Note) ComputeRse()
    {
        double sum = 0;
        int n = 0;
        foreach (CalibratorPoint c in Calibrators())
        {
            if (c.RelativeErrorPercent is not double re)
            {
                return (null, "RSE not computed: point '" + c.Id + "' has no back-calculated concentration.");
            }

            double e = re / 100;
            sum += e * e;
            n++;
        }

        if (n - ParameterCount < 1)
        {
            return (null, "RSE not computed: " + Text.I(n) + " non-blank points and p = " + Text.I(ParameterCount) + " leave no degrees of freedom (n − p < 1).");
        }

        return (100 * Math.Sqrt(sum / (n - ParameterCount)), null);
    }

    private double RangeEnd(bool low)
    {
        double result = low ? double.PositiveInfinity : double.NegativeInfinity;
        foreach (StandardResult s in Standards)
        {
            if (s.Included && !s.IsBlank)
            {
                result = low ? Math.Min(result, s.X) : Math.Max(result, s.X);
            }
        }

        return result;
    }

    private void AppendStandards(StringBuilder sb)
    {
        sb.Append("Standards (concentrations in ").Append(Set.Symbol).AppendLine("):");
        sb.AppendLine("  label        nominal      IS     x         mean y       fitted y     residual     back-calc     %RE");
        foreach (StandardResult s in Standards)
        {
            sb.Append("  ").Append(Text.Pad(s.Label, 12))
                .Append(Text.Pad(Text.G(s.Standard.AnalyteConcentration.In(Unit)), 13))
                .Append(Text.Pad(Text.G(s.Standard.InternalStandardConcentration.In(Unit)), 7))
                .Append(Text.Pad(Text.G(s.X), 10))
                .Append(Text.Pad(Text.G(s.MeanResponse), 13))
                .Append(Text.Pad(Text.G(s.FittedResponse), 13))
                .Append(Text.Pad(Text.G(s.Residual), 13))
                .Append(Text.Pad(s.BackCalculated is Concentration b ? Text.G(b.Value) : "n/a", 14))
                .Append(s.RelativeErrorPercent is double re ? Text.Signed(re, 2) : (s.IsBlank ? "blank" : "n/a"))
                .Append(s.Included ? string.Empty : "  (excluded from fit)")
                .AppendLine();
            if (s.Injections.Count > 1 || s.StandardizedResidual is null)
            {
                for (int j = 0; j < s.Injections.Count; j++)
                {
                    InjectionResult r = s.Injections[j];
                    sb.Append("      #").Append(Text.Pad(Text.I(j + 1), 4))
                        .Append("A = ").Append(Text.Signal(r.Injection.AnalyteSignal))
                        .Append(", IS = ").Append(Text.Signal(r.Injection.InternalStandardSignal))
                        .Append(", y = ").Append(Text.G(r.Response))
                        .Append(", residual ").Append(Text.G(r.Residual))
                        .Append(r.StandardizedResidual is double z ? " (std " + Text.F(z, 2) + ")" : string.Empty)
                        .Append(", back-calc ").Append(r.BackCalculated is Concentration c ? Text.G(c.Value) + " " + Set.Symbol : "n/a")
                        .Append(r.RelativeErrorPercent is double e ? ", " + Text.Signed(e, 2) + " %" : string.Empty)
                        .Append(r.ResponseFactor is double rf ? ", RF " + Text.G(rf) : string.Empty)
                        .AppendLine();
                }
            }
        }
    }
}

/// <summary>A fitted non-blank calibration point (injection or level mean) with its level and relative error.</summary>
internal readonly struct CalibratorPoint
{
    internal CalibratorPoint(StandardResult level, string id, double? relativeErrorPercent, Concentration? backCalculated)
    {
        Level = level;
        Id = id;
        RelativeErrorPercent = relativeErrorPercent;
        BackCalculated = backCalculated;
    }

    internal StandardResult Level { get; }

    internal string Id { get; }

    internal double? RelativeErrorPercent { get; }

    internal Concentration? BackCalculated { get; }
}
