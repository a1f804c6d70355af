using System.Collections.Generic;
using System.Linq;
using System.Text;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>Outcome of one criterion.</summary>
public enum CriterionStatus
{
    /// <summary>The criterion is met.</summary>
    Passed = 0,

    /// <summary>The criterion is not met, or applies but could not be evaluated.</summary>
    Failed,

    /// <summary>The criterion does not apply to this calibration (e.g. r for a quadratic).</summary>
    NotApplicable,
}

/// <summary>The outcome of one criterion of an <see cref="AcceptanceRuleSet"/>.</summary>
public sealed class CriterionOutcome
{
    internal CriterionOutcome(string criterion, CriterionStatus status, double? observed, double limit, string explanation)
    {
        Criterion = criterion;
        Status = status;
        Observed = observed;
        Limit = limit;
        Explanation = explanation;
    }

    /// <summary>Name of the criterion (the rule-set property name).</summary>
    public string Criterion { get; }

    /// <summary>Passed, failed or not applicable.</summary>
    public CriterionStatus Status { get; }

    /// <summary>Observed value in the criterion's unit; null when it could not be evaluated or does not apply.</summary>
    public double? Observed { get; }

    /// <summary>The limit from the rule set.</summary>
    public double Limit { get; }

    /// <summary>Readable explanation with numbers and units.</summary>
    public string Explanation { get; }

    /// <inheritdoc />
    public override string ToString() => Status + ": " + Explanation;
}

/// <summary>The outcome of one calibrator (fitted non-blank injection or level mean).</summary>
public sealed class CalibratorOutcome
{
    internal CalibratorOutcome(string id, string level, Concentration nominal, Concentration? backCalculated, double? relativeErrorPercent, double? limitPercent, bool passed)
    {
        Id = id;
        Level = level;
        Nominal = nominal;
        BackCalculated = backCalculated;
        RelativeErrorPercent = relativeErrorPercent;
        LimitPercent = limitPercent;
        Passed = passed;
    }

    /// <summary>Identity: the standard's label, with "#k" for the k-th injection when injections were fitted.</summary>
    public string Id { get; }

    /// <summary>Label of the standard (level).</summary>
    public string Level { get; }

    /// <summary>Nominal concentration.</summary>
    public Concentration Nominal { get; }

    /// <summary>Back-calculated concentration; null when not invertible.</summary>
    public Concentration? BackCalculated { get; }

    /// <summary>100·(x' − x)/x in %; null when not back-calculable.</summary>
    public double? RelativeErrorPercent { get; }

    /// <summary>The |%RE| limit that applied; null when the rule set has none for this level.</summary>
    public double? LimitPercent { get; }

    /// <summary>Whether the calibrator is within its limit (true when no limit applies).</summary>
    public bool Passed { get; }
}

/// <summary>The verdict of an <see cref="AcceptanceRuleSet"/> on a <see cref="RatioCalibration"/>.</summary>
public sealed class AcceptanceVerdict
{
    internal AcceptanceVerdict(AcceptanceRuleSet ruleSet, IReadOnlyList<CriterionOutcome> criteria, IReadOnlyList<CalibratorOutcome> calibrators)
    {
        RuleSet = ruleSet;
        Criteria = criteria;
        Calibrators = calibrators;
    }

    /// <summary>The rule set applied.</summary>
    public AcceptanceRuleSet RuleSet { get; }

    /// <summary>True when no criterion failed.</summary>
    public bool Accepted => Criteria.All(c => c.Status != CriterionStatus.Failed);

    /// <summary>Every criterion with its outcome, in a fixed order.</summary>
    public IReadOnlyList<CriterionOutcome> Criteria { get; }

    /// <summary>Every calibrator with its relative error, limit and outcome.</summary>
    public IReadOnlyList<CalibratorOutcome> Calibrators { get; }

    /// <summary>The failed criteria.</summary>
    public IEnumerable<CriterionOutcome> Failures => Criteria.Where(c => c.Status == CriterionStatus.Failed);

    /// <summary>Readable verdict: ACCEPTED/REJECTED, every criterion, and every failing calibrator with its %RE.</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append(RuleSet.Name).Append(": ").AppendLine(Accepted ? "ACCEPTED" : "REJECTED");
        foreach (CriterionOutcome c in Criteria)
        {
            sb.Append("  [").Append(c.Status switch
            {
                CriterionStatus.Passed => "pass",
                CriterionStatus.Failed => "FAIL",
                _ => "n/a ",
            }).Append("] ").AppendLine(c.Explanation);
        }

        foreach (CalibratorOutcome p in Calibrators.Where(p => !p.Passed))
        {
            sb.Append("  failing calibrator ").Append(p.Id).Append(": nominal ").Append(p.Nominal.ToString("G6", null))
                .Append(", back-calculated ").Append(p.BackCalculated is Concentration b ? b.ToString("G6", null) : "n/a")
                .Append(", %RE ").Append(p.RelativeErrorPercent is double re ? Text.Signed(re, 2) + " %" : "n/a")
                .Append(" (limit ±").Append(p.LimitPercent is double l ? Text.G(l) : "n/a").AppendLine(" %)");
        }

        sb.Append("  source: ").AppendLine(RuleSet.Source);
        return sb.ToString();
    }
}
