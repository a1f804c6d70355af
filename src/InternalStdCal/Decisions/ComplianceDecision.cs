using System.Globalization;
using System.Text;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>
/// The outcome of assessing a result (or the mean of replicates) against a <see cref="SpecificationLimit"/> with a
/// <see cref="DecisionRule"/>: compliant, non-compliant or inconclusive, the zone where the rule has zones, the
/// decision limits used, the probability that the true value lies beyond the limit, and a readable justification
/// (<see cref="ToString"/>).
/// </summary>
/// <remarks>
/// <para>All concentrations are in the unit of the limit. The probability treats the true value as distributed around
/// the result with standard deviation u: normal, or Student t with ν degrees of freedom (<see cref="Model"/> says which).</para>
/// <para><b>Caution.</b> The outcome supports, never replaces, the responsible analyst's decision: the library
/// computes; the laboratory's validated method, its quality system, local regulations and licensed practice decide.</para>
/// </remarks>
public sealed class ComplianceDecision
{
    private ComplianceDecision(
        DecisionRule rule,
        SpecificationLimit limit,
        Evidence evidence,
        ComplianceOutcome outcome,
        DecisionZone? zone,
        double guardBand,
        double? guardBandFactor,
        double? coverageFactor,
        double acceptanceLimit,
        double rejectionLimit,
        double? standardizedDistance,
        ProbabilityModel model,
        double beyond,
        double within)
    {
        Rule = rule;
        Limit = limit;
        Outcome = outcome;
        Zone = zone;
        Result = limit.InUnit(evidence.Result);
        StandardUncertainty = limit.InUnit(evidence.StandardUncertainty);
        DegreesOfFreedom = evidence.DegreesOfFreedom;
        Replicates = evidence.Replicates;
        ReplicateStandardDeviation = evidence.StandardDeviation is double s ? limit.InUnit(s) : null;
        CoverageFactor = coverageFactor;
        ExpandedUncertainty = coverageFactor is double k ? limit.InUnit(k * evidence.StandardUncertainty) : null;
        GuardBand = limit.InUnit(guardBand);
        GuardBandFactor = guardBandFactor;
        AcceptanceLimit = limit.InUnit(acceptanceLimit);
        RejectionLimit = limit.InUnit(rejectionLimit);
        StandardizedDistance = standardizedDistance;
        Model = model;
        ProbabilityBeyondLimit = beyond;
        ProbabilityWithinLimit = within;
    }

    /// <summary>The rule applied.</summary>
    public DecisionRule Rule { get; }

    /// <summary>The limit assessed against.</summary>
    public SpecificationLimit Limit { get; }

    /// <summary>Compliant, non-compliant or inconclusive.</summary>
    public ComplianceOutcome Outcome { get; }

    /// <summary>The ILAC G8 zone for rules with zones (<see cref="DecisionMode.NonBinary"/>); null for binary rules.</summary>
    public DecisionZone? Zone { get; }

    /// <summary>The result, or the mean of the replicates, in the limit's unit.</summary>
    public Concentration Result { get; }

    /// <summary>The standard uncertainty u of <see cref="Result"/>: as given, or s/√n for replicates.</summary>
    public Concentration StandardUncertainty { get; }

    /// <summary>Degrees of freedom used for t quantiles and probabilities (⌊ν⌋ of the given ν, or n − 1 for
    /// replicates); null for a normal distribution.</summary>
    public int? DegreesOfFreedom { get; }

    /// <summary>Number of replicates n; null when a single result was assessed.</summary>
    public int? Replicates { get; }

    /// <summary>Sample standard deviation s of the replicates; null for a single result.</summary>
    public Concentration? ReplicateStandardDeviation { get; }

    /// <summary>The coverage factor k of U = k·u when a <see cref="Coverage"/> was given; null otherwise.</summary>
    public double? CoverageFactor { get; }

    /// <summary>The expanded uncertainty U = k·u when a <see cref="Coverage"/> was given; null otherwise.</summary>
    public Concentration? ExpandedUncertainty { get; }

    /// <summary>The guard band w (0 for simple acceptance).</summary>
    public Concentration GuardBand { get; }

    /// <summary>w/u: m·k for w = m·U, k = z(1 − r) or t(1 − r, ν) for a risk rule, t(1 − α, ν) for the t test;
    /// null for simple acceptance.</summary>
    public double? GuardBandFactor { get; }

    /// <summary>The acceptance limit: compliant when the result is at or on the compliant side of it (x ≤ AL for an
    /// upper limit, x ≥ AL for a lower). For a binary rule it equals <see cref="RejectionLimit"/>.</summary>
    public Concentration AcceptanceLimit { get; }

    /// <summary>The rejection limit: non-compliant when the result is strictly beyond it (x &gt; RL for an upper limit,
    /// x &lt; RL for a lower).</summary>
    public Concentration RejectionLimit { get; }

    /// <summary>(x − L)/u for an upper limit, (L − x)/u for a lower: positive on the non-compliant side. For the t test
    /// of replicates this is the t statistic. Null when u = 0.</summary>
    public double? StandardizedDistance { get; }

    /// <summary>The distribution behind the probabilities.</summary>
    public ProbabilityModel Model { get; }

    /// <summary>Probability that the true value exceeds an upper limit (falls below a lower limit), in [0, 1].</summary>
    public double ProbabilityBeyondLimit { get; }

    /// <summary>Probability that the true value is within the limit, 1 − <see cref="ProbabilityBeyondLimit"/> (computed
    /// from the other tail, without cancellation). For the t test it is the one-sided p-value of the test of
    /// "true value within the limit" against "beyond".</summary>
    public double ProbabilityWithinLimit { get; }

    /// <summary>The specific risk of the statement (JCGM 106:2012 terms): for a compliant outcome the probability that
    /// the true value is beyond the limit (false acceptance), for a non-compliant outcome the probability that it is
    /// within (false rejection); null when inconclusive.</summary>
    public double? SpecificRisk => Outcome switch
    {
        ComplianceOutcome.Compliant => ProbabilityBeyondLimit,
        ComplianceOutcome.NonCompliant => ProbabilityWithinLimit,
        _ => null,
    };

    /// <summary>A short justification, e.g. "Non-compliant (zone: fail): mean of 4 replicates 10.6 mg/L is above the
    /// rejection limit 10.3038 mg/L of the upper limit 10 mg/L. Rule: ...", followed by u, the guard band, the test
    /// statistic and the probability beyond the limit with the distribution used.</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString()
    {
        bool upper = Limit.Direction == LimitDirection.Upper;
        bool binary = Rule.Mode != DecisionMode.NonBinary;
        var text = new StringBuilder();
        text.Append(Outcome switch
        {
            ComplianceOutcome.Compliant => "Compliant",
            ComplianceOutcome.NonCompliant => "Non-compliant",
            _ => "Inconclusive",
        });
        if (Zone is DecisionZone zone)
        {
            text.Append(" (zone: ").Append(ZoneName(zone)).Append(')');
        }

        text.Append(": ");
        text.Append(Replicates is int n ? "mean of " + n.ToString(CultureInfo.InvariantCulture) + " replicates " : "result ");
        text.Append(C(Result)).Append(" is ");
        text.Append(Outcome switch
        {
            ComplianceOutcome.Compliant => (upper ? "at or below the " : "at or above the ") + (binary ? "decision limit " : "acceptance limit ") + C(AcceptanceLimit),
            ComplianceOutcome.NonCompliant => (upper ? "above the " : "below the ") + (binary ? "decision limit " : "rejection limit ") + C(RejectionLimit),
            _ => "between the acceptance limit " + C(AcceptanceLimit) + " and the rejection limit " + C(RejectionLimit),
        });
        text.Append(" of the ").Append(Limit).Append(". Rule: ").Append(Rule.Name);
        text.Append("; u = ").Append(C(StandardUncertainty));
        if (ReplicateStandardDeviation is Concentration s)
        {
            text.Append(" (s = ").Append(C(s)).Append(')');
        }

        if (ExpandedUncertainty is Concentration expanded)
        {
            text.Append(", U = ").Append(C(expanded)).Append(" (k = ").Append(G(CoverageFactor!.Value)).Append(')');
        }

        if (GuardBandFactor is double factor)
        {
            text.Append(", w = ").Append(G(factor)).Append("·u = ").Append(C(GuardBand));
        }

        if (StandardizedDistance is double distance)
        {
            text.Append(Rule.Kind == DecisionRuleKind.OneSidedTTest ? ", t = " : ", (x − L)/u = ").Append(G(upper ? distance : -distance));
        }

        text.Append(". P(true value ").Append(upper ? "> " : "< ").Append("limit) = ").Append(Percent(ProbabilityBeyondLimit));
        text.Append(Model switch
        {
            ProbabilityModel.Normal => " (normal)",
            ProbabilityModel.StudentT => " (Student t, ν = " + DegreesOfFreedom!.Value.ToString(CultureInfo.InvariantCulture) + ")",
            _ => " (zero uncertainty: result taken as exact)",
        });
        text.Append('.');
        return text.ToString();
    }

    internal static ComplianceDecision Create(DecisionRule rule, SpecificationLimit limit, Evidence e, double w, double? factor, double? coverageFactor)
    {
        // Work in oriented coordinates (y = sign·x) so that the upper-limit logic serves both directions; negation is exact.
        double sign = limit.Direction == LimitDirection.Upper ? 1 : -1;
        double y = sign * e.Result;
        double l = sign * limit.Value.Value;
        double acceptance = rule.Mode == DecisionMode.BinaryGuardedRejection ? l + w : l - w;
        double rejection = rule.Mode == DecisionMode.BinaryGuardedAcceptance ? l - w : l + w;

        ComplianceOutcome outcome = y <= acceptance ? ComplianceOutcome.Compliant
            : y > rejection ? ComplianceOutcome.NonCompliant
            : ComplianceOutcome.Inconclusive;
        DecisionZone? zone = rule.Mode != DecisionMode.NonBinary ? null
            : y <= l - w ? DecisionZone.Pass
            : y <= l ? DecisionZone.ConditionalPass
            : y <= l + w ? DecisionZone.ConditionalFail
            : DecisionZone.Fail;

        double? distance = null;
        ProbabilityModel model;
        double beyond, within;
        if (e.StandardUncertainty > 0)
        {
            double z = (y - l) / e.StandardUncertainty;
            distance = z;
            model = e.DegreesOfFreedom is null ? ProbabilityModel.Normal : ProbabilityModel.StudentT;
            beyond = DecisionMath.UpperTail(-z, e.DegreesOfFreedom);
            within = DecisionMath.UpperTail(z, e.DegreesOfFreedom);
        }
        else
        {
            model = ProbabilityModel.Exact;
            beyond = y > l ? 1 : 0;
            within = 1 - beyond;
        }

        return new ComplianceDecision(rule, limit, e, outcome, zone, w, factor, coverageFactor, sign * acceptance, sign * rejection, distance, model, beyond, within);
    }

    private static string ZoneName(DecisionZone zone) => zone switch
    {
        DecisionZone.Pass => "pass",
        DecisionZone.ConditionalPass => "conditional pass",
        DecisionZone.ConditionalFail => "conditional fail",
        _ => "fail",
    };

    private static string C(Concentration c) => c.ToString("G6", CultureInfo.InvariantCulture);

    private static string G(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    private static string Percent(double p) => (100 * p).ToString("G4", CultureInfo.InvariantCulture) + " %";
}
