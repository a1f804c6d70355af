using System;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>
/// The smallest number of replicates for which the one-sided one-sample t test at level α decides with the wanted
/// power, from <see cref="ReplicatesPlanner"/>; with the power at n and at n − 1 and the normal-approximation n.
/// </summary>
/// <remarks>
/// <para>A plan is only as good as the expected mean and standard deviation it assumes. Planned from a few replicates
/// already measured, it takes their mean and s as the truth, which is optimistic when the mean happens to lie far from
/// the limit.</para>
/// <para><b>Caution.</b> The plan supports, never replaces, the responsible analyst's decision: the library computes;
/// the laboratory's validated method, its quality system, local regulations and licensed practice decide.</para>
/// </remarks>
public sealed class ReplicatePlan
{
    internal ReplicatePlan(
        double effectSize,
        double alpha,
        double targetPower,
        int replicates,
        double power,
        double? powerWithOneFewer,
        double normalApproximation,
        SpecificationLimit? limit,
        Concentration? expectedMean,
        Concentration? standardDeviation,
        int alreadyMeasured)
    {
        EffectSize = effectSize;
        Alpha = alpha;
        TargetPower = targetPower;
        Replicates = replicates;
        Power = power;
        PowerWithOneFewer = powerWithOneFewer;
        NormalApproximation = normalApproximation;
        Limit = limit;
        ExpectedMean = expectedMean;
        StandardDeviation = standardDeviation;
        AlreadyMeasured = alreadyMeasured;
    }

    /// <summary>|δ|/σ: the distance of the expected mean from the limit in standard deviations (&gt; 0).</summary>
    public double EffectSize { get; }

    /// <summary>Significance level α of the one-sided t test.</summary>
    public double Alpha { get; }

    /// <summary>The wanted power 1 − β.</summary>
    public double TargetPower { get; }

    /// <summary>The smallest n (≥ 2) with power ≥ <see cref="TargetPower"/>.</summary>
    public int Replicates { get; }

    /// <summary>The exact power at <see cref="Replicates"/>: P(T′(n − 1, √n·δ/σ) &gt; t(1 − α, n − 1)).</summary>
    public double Power { get; }

    /// <summary>The exact power with n − 1 replicates (below the target); null when n = 2 (one replicate cannot be tested).</summary>
    public double? PowerWithOneFewer { get; }

    /// <summary>The normal-approximation sample size ((z(1 − α) + z(1 − β))·σ/δ)², unrounded, for comparison.</summary>
    public double NormalApproximation { get; }

    /// <summary>The limit; null for a plan made from an effect size or a distance alone.</summary>
    public SpecificationLimit? Limit { get; }

    /// <summary>The expected mean; null when not given.</summary>
    public Concentration? ExpectedMean { get; }

    /// <summary>The standard deviation σ of one result; null for a plan made from an effect size alone.</summary>
    public Concentration? StandardDeviation { get; }

    /// <summary>Replicates already measured (0 unless planned from replicates or set with <see cref="WithAlreadyMeasured"/>).</summary>
    public int AlreadyMeasured { get; }

    /// <summary>How many more replicates to measure: max(0, <see cref="Replicates"/> − <see cref="AlreadyMeasured"/>).</summary>
    public int AdditionalReplicates => Math.Max(0, Replicates - AlreadyMeasured);

    /// <summary>What the test is expected to show: non-compliance when the expected mean is beyond the limit, compliance
    /// when within; null when no limit was given.</summary>
    public ComplianceOutcome? ExpectedOutcome
    {
        get
        {
            if (Limit is null || ExpectedMean is not Concentration mean)
            {
                return null;
            }

            bool beyond = Limit.Direction == LimitDirection.Upper ? mean > Limit.Value : mean < Limit.Value;
            return beyond ? ComplianceOutcome.NonCompliant : ComplianceOutcome.Compliant;
        }
    }

    /// <summary>The same plan, counting <paramref name="alreadyMeasured"/> replicates as done.</summary>
    /// <param name="alreadyMeasured">Replicates measured so far, ≥ 0.</param>
    /// <returns>A copy with <see cref="AlreadyMeasured"/> set.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="alreadyMeasured"/> &lt; 0.</exception>
    public ReplicatePlan WithAlreadyMeasured(int alreadyMeasured) =>
        new(EffectSize, Alpha, TargetPower, Replicates, Power, PowerWithOneFewer, NormalApproximation, Limit, ExpectedMean, StandardDeviation, Guard.AtLeast(alreadyMeasured, 0, nameof(alreadyMeasured)));

    /// <summary>Prints e.g. "8 replicates give power 0.815 (7 give 0.7544) to decide in a one-sided t test at α = 0.05
    /// (δ/σ = 1; target power 0.8; normal approximation n = 6.18)."; with a limit, "to show compliance with the upper
    /// limit ..." or "to show non-compliance ...", and the replicates still to measure.</summary>
    /// <returns>The text (invariant culture).</returns>
    public override string ToString()
    {
        var text = new StringBuilder();
        text.Append(I(Replicates)).Append(" replicates give power ").Append(G(Power));
        if (PowerWithOneFewer is double fewer)
        {
            text.Append(" (").Append(I(Replicates - 1)).Append(" give ").Append(G(fewer)).Append(')');
        }

        text.Append(ExpectedOutcome switch
        {
            ComplianceOutcome.NonCompliant => " to show non-compliance with the " + Limit,
            ComplianceOutcome.Compliant => " to show compliance with the " + Limit,
            _ => " to decide",
        });
        text.Append(" in a one-sided t test at α = ").Append(G(Alpha));
        text.Append(" (δ/σ = ").Append(G(EffectSize));
        if (ExpectedMean is Concentration mean)
        {
            text.Append(", expected mean ").Append(mean.ToString("G6", CultureInfo.InvariantCulture));
        }

        if (StandardDeviation is Concentration sd)
        {
            text.Append(", σ = ").Append(sd.ToString("G6", CultureInfo.InvariantCulture));
        }

        text.Append("; target power ").Append(G(TargetPower)).Append("; normal approximation n = ").Append(NormalApproximation.ToString("F2", CultureInfo.InvariantCulture)).Append(").");
        if (AlreadyMeasured > 0)
        {
            text.Append(' ').Append(I(AlreadyMeasured)).Append(" measured so far: ").Append(I(AdditionalReplicates)).Append(" more.");
        }

        return text.ToString();
    }

    private static string G(double value) => value.ToString("G4", CultureInfo.InvariantCulture);

    private static string I(int value) => value.ToString(CultureInfo.InvariantCulture);
}
