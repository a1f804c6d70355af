using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>
/// Plans the number of replicates for the one-sided one-sample t test of a mean against a limit
/// (<see cref="DecisionRule.OneSidedTTest"/>): the smallest n that decides with a wanted power, how many more
/// replicates that means, and the largest standard deviation (or RSD) with which n replicates decide.
/// </summary>
/// <remarks>
/// <para>Power is exact, from the non-central t distribution: with true distance δ = |μ − L| and SD σ of one result,
/// power(n) = P(T′(n − 1, √n·δ/σ) &gt; t(1 − α, n − 1)), the probability that the test shows the side of the limit the
/// true mean is on (the negligible probability of a significant result on the wrong side is not counted). The search
/// starts at the normal approximation ((z(1 − α) + z(1 − β))·σ/δ)² and returns the smallest n ≥ 2 with
/// power(n) ≥ target, up to <see cref="MaxReplicates"/>.</para>
/// <para><b>Caution.</b> A plan supports, never replaces, the responsible analyst's decision: the library computes;
/// the laboratory's validated method, its quality system, local regulations and licensed practice decide.</para>
/// </remarks>
public static class ReplicatesPlanner
{
    /// <summary>The largest number of replicates the planner considers (10 000). A target that needs more is refused.</summary>
    public const int MaxReplicates = 10_000;

    /// <summary>Exact power of the one-sided one-sample t test with n replicates.</summary>
    /// <param name="effectSize">|δ|/σ &gt; 0, finite.</param>
    /// <param name="replicates">n ≥ 2.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <returns>P(T′(n − 1, √n·δ/σ) &gt; t(1 − α, n − 1)), in (α, 1].</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double Power(double effectSize, int replicates, double alpha)
    {
        Guard.Positive(effectSize, nameof(effectSize));
        Guard.AtLeast(replicates, 2, nameof(replicates));
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        return PowerUnchecked(effectSize, replicates, alpha);
    }

    /// <summary>The smallest n for an effect size |δ|/σ.</summary>
    /// <param name="effectSize">|δ|/σ &gt; 0, finite.</param>
    /// <param name="alpha">α in (0, 0.5), e.g. 0.05.</param>
    /// <param name="power">Wanted power 1 − β in (0, 1), e.g. 0.95.</param>
    /// <returns>The plan.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range, or more than
    /// <see cref="MaxReplicates"/> replicates would be needed (reported against <paramref name="effectSize"/>).</exception>
    public static ReplicatePlan ForEffectSize(double effectSize, double alpha, double power)
    {
        Guard.Positive(effectSize, nameof(effectSize));
        return Plan(effectSize, alpha, power, nameof(effectSize), null, null, null, 0);
    }

    /// <summary>The smallest n for a true distance δ from the limit and an SD σ of one result.</summary>
    /// <param name="distance">δ, the expected distance of the mean from the limit; non-zero (its sign is ignored).</param>
    /// <param name="standardDeviation">σ of one result, &gt; 0, same kind as <paramref name="distance"/>.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (0, 1).</param>
    /// <returns>The plan.</returns>
    /// <exception cref="ArgumentException"><paramref name="standardDeviation"/> is of another kind.</exception>
    /// <exception cref="ArgumentOutOfRangeException">δ = 0 (no number of replicates decides), σ ≤ 0, α or power out of
    /// range, or more than <see cref="MaxReplicates"/> replicates would be needed.</exception>
    public static ReplicatePlan ForDistance(Concentration distance, Concentration standardDeviation, double alpha, double power)
    {
        double sigma = SameKind(standardDeviation, distance, nameof(standardDeviation));
        Guard.Positive(sigma, nameof(standardDeviation));
        double delta = NonZeroDistance(distance.Value, nameof(distance), distance.ToString());
        return Plan(delta / sigma, alpha, power, nameof(distance), null, null, standardDeviation, 0);
    }

    /// <summary>The smallest n for an expected mean and an SD σ of one result.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="expectedMean">The expected true mean, same kind as the limit, not equal to it.</param>
    /// <param name="standardDeviation">σ of one result, &gt; 0, same kind as the limit.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (0, 1).</param>
    /// <returns>The plan.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> is null.</exception>
    /// <exception cref="ArgumentException">A concentration is of another kind than the limit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The expected mean equals the limit (no number of replicates
    /// decides), σ ≤ 0, α or power out of range, or more than <see cref="MaxReplicates"/> replicates would be needed.</exception>
    public static ReplicatePlan ForExpectedMean(SpecificationLimit limit, Concentration expectedMean, Concentration standardDeviation, double alpha, double power)
    {
        Guard.NotNull(limit, nameof(limit));
        double delta = Distance(limit, expectedMean);
        double sigma = limit.ValueOf(standardDeviation, nameof(standardDeviation));
        Guard.Positive(sigma, nameof(standardDeviation));
        return Plan(delta / sigma, alpha, power, nameof(expectedMean), limit, expectedMean, standardDeviation, 0);
    }

    /// <summary>The smallest n for an expected mean and a relative standard deviation of one result.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="expectedMean">The expected true mean, same kind as the limit, not equal to it and not zero.</param>
    /// <param name="rsdPercent">RSD of one result in % of the expected mean, &gt; 0 (σ = RSD/100·|mean|).</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (0, 1).</param>
    /// <returns>The plan.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="expectedMean"/> is of another kind than the limit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The expected mean equals the limit or is zero, the RSD ≤ 0, α or
    /// power out of range, or more than <see cref="MaxReplicates"/> replicates would be needed.</exception>
    public static ReplicatePlan ForExpectedMean(SpecificationLimit limit, Concentration expectedMean, double rsdPercent, double alpha, double power)
    {
        Guard.NotNull(limit, nameof(limit));
        Guard.Positive(rsdPercent, nameof(rsdPercent));
        double mean = NonZeroMean(limit, expectedMean);
        Concentration sigma = limit.InUnit(rsdPercent / 100 * Math.Abs(mean));
        return ForExpectedMean(limit, expectedMean, sigma, alpha, power);
    }

    /// <summary>How many replicates in total (and how many more) decide, taking the mean and sample SD of the
    /// replicates measured so far as the expected mean and σ.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="replicates">The results so far: at least two, of the same kind as the limit, not all equal.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (0, 1).</param>
    /// <returns>The plan, with <see cref="ReplicatePlan.AlreadyMeasured"/> = n so far.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> or <paramref name="replicates"/> is null.</exception>
    /// <exception cref="ArgumentException">Fewer than two replicates, a replicate of another kind, or all equal (s = 0).</exception>
    /// <exception cref="ArgumentOutOfRangeException">The mean equals the limit, α or power out of range, or more than
    /// <see cref="MaxReplicates"/> replicates would be needed.</exception>
    public static ReplicatePlan ForReplicates(SpecificationLimit limit, IReadOnlyList<Concentration> replicates, double alpha, double power)
    {
        Guard.NotNull(limit, nameof(limit));
        ReplicateStatistics stats = ReplicateStatistics.Of(limit, replicates, nameof(replicates));
        if (!(stats.StandardDeviation > 0))
        {
            throw new ArgumentException($"Parameter 'replicates': all {stats.Count.ToString(CultureInfo.InvariantCulture)} replicates are equal (s = 0); a spread is needed to plan.", nameof(replicates));
        }

        return ForExpectedMean(limit, limit.InUnit(stats.Mean), limit.InUnit(stats.StandardDeviation), alpha, power).WithAlreadyMeasured(stats.Count);
    }

    /// <summary>The smallest effect size |δ|/σ that n replicates decide with the wanted power:
    /// δ(α, β, n − 1)/√n, where δ solves P(T′(n − 1, δ) ≤ t(1 − α, n − 1)) = 1 − power.</summary>
    /// <param name="replicates">n ≥ 2.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (α, 1).</param>
    /// <returns>|δ|/σ &gt; 0.</returns>
    /// <exception cref="ArgumentOutOfRangeException">An argument is outside its range.</exception>
    public static double MinimumEffectSize(int replicates, double alpha, double power)
    {
        Guard.AtLeast(replicates, 2, nameof(replicates));
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        Guard.InOpenRange(power, alpha, 1, nameof(power));
        int df = replicates - 1;
        double critical = StudentTQuantile.OneSided(1 - alpha, df);
        return NoncentralT.Noncentrality(critical, df, 1 - power) / Math.Sqrt(replicates);
    }

    /// <summary>The largest SD σ of one result with which n replicates decide with the wanted power, for an expected
    /// mean: σ = |mean − L| / <see cref="MinimumEffectSize"/>.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="expectedMean">The expected mean, same kind as the limit, not equal to it.</param>
    /// <param name="replicates">n ≥ 2.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (α, 1).</param>
    /// <returns>σ in the limit's unit.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="expectedMean"/> is of another kind than the limit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The expected mean equals the limit, or another argument is out of range.</exception>
    public static Concentration MaximumStandardDeviation(SpecificationLimit limit, Concentration expectedMean, int replicates, double alpha, double power)
    {
        Guard.NotNull(limit, nameof(limit));
        double delta = Distance(limit, expectedMean);
        return limit.InUnit(Math.Abs(delta) / MinimumEffectSize(replicates, alpha, power));
    }

    /// <summary>The largest RSD (in % of the expected mean) with which n replicates decide with the wanted power.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="expectedMean">The expected mean, same kind as the limit, not equal to it and not zero.</param>
    /// <param name="replicates">n ≥ 2.</param>
    /// <param name="alpha">α in (0, 0.5).</param>
    /// <param name="power">Wanted power in (α, 1).</param>
    /// <returns>100·σ/|mean|.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="expectedMean"/> is of another kind than the limit.</exception>
    /// <exception cref="ArgumentOutOfRangeException">The expected mean equals the limit or is zero, or another argument is out of range.</exception>
    public static double MaximumRsdPercent(SpecificationLimit limit, Concentration expectedMean, int replicates, double alpha, double power)
    {
        Guard.NotNull(limit, nameof(limit));
        double mean = NonZeroMean(limit, expectedMean);
        return 100 * MaximumStandardDeviation(limit, expectedMean, replicates, alpha, power).Value / Math.Abs(mean);
    }

    private static ReplicatePlan Plan(double effect, double alpha, double power, string effectParam, SpecificationLimit? limit, Concentration? mean, Concentration? sd, int already)
    {
        Guard.Positive(effect, effectParam);
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        Guard.InOpenRange(power, 0, 1, nameof(power));

        double normal = Math.Pow((DecisionMath.Quantile(1 - alpha, null) + DecisionMath.Quantile(power, null)) / effect, 2);
        int n = (int)Math.Min(MaxReplicates, Math.Max(2, Math.Ceiling(normal)));
        if (PowerUnchecked(effect, n, alpha) >= power)
        {
            // Only for a wanted power below α does the normal approximation overshoot (the z test is uniformly more
            // powerful than the t test): step down.
            while (n > 2 && PowerUnchecked(effect, n - 1, alpha) >= power)
            {
                n--;
            }
        }
        else
        {
            // Power rises with n: gallop up to a passing n, then bisect between the last failing and it.
            int failing = n;
            int step = 1;
            int passing = MaxReplicates;
            while (true)
            {
                int candidate = (int)Math.Min(MaxReplicates, (long)failing + step);
                double p = PowerUnchecked(effect, candidate, alpha);
                if (p >= power)
                {
                    passing = candidate;
                    break;
                }

                if (candidate == MaxReplicates)
                {
                    throw new ArgumentOutOfRangeException(
                        effectParam,
                        FormattableString.Invariant($"No number of replicates up to {MaxReplicates} reaches power {power:G4}: with δ/σ = {effect:G4} the power at n = {MaxReplicates} is {p:G4} (α = {alpha:G4}). The expected mean is too close to the limit for this spread; only a better method (smaller σ) can decide."));
                }

                failing = candidate;
                step *= 2;
            }

            while (passing - failing > 1)
            {
                int middle = failing + ((passing - failing) / 2);
                if (PowerUnchecked(effect, middle, alpha) >= power)
                {
                    passing = middle;
                }
                else
                {
                    failing = middle;
                }
            }

            n = passing;
        }

        double? fewer = n > 2 ? PowerUnchecked(effect, n - 1, alpha) : null;
        return new ReplicatePlan(effect, alpha, power, n, PowerUnchecked(effect, n, alpha), fewer, normal, limit, mean, sd, already);
    }

    private static double PowerUnchecked(double effect, int n, double alpha)
    {
        int df = n - 1;
        double critical = StudentTQuantile.OneSided(1 - alpha, df);
        double noncentrality = effect * Math.Sqrt(n);

        // T′ = (Z + δ)/S with S = √(χ²_ν/ν): for δ ≥ 40(c + 1), P(T′ ≤ c) ≤ P(Z ≤ −δ/2) + P(S ≥ δ/(2c)) < 1e-80,
        // so the power is 1 in double precision; skip the series, whose length grows with δ².
        if (noncentrality >= 40 * (critical + 1))
        {
            return 1;
        }

        return NoncentralT.UpperTail(critical, df, noncentrality);
    }

    private static double Distance(SpecificationLimit limit, Concentration expectedMean)
    {
        double mean = limit.ValueOf(expectedMean, nameof(expectedMean));
        return NonZeroDistance(mean - limit.Value.Value, nameof(expectedMean), $"{expectedMean}, equal to the {limit}");
    }

    private static double NonZeroDistance(double delta, string paramName, string shown)
    {
        if (delta == 0 || double.IsInfinity(delta))
        {
            throw new ArgumentOutOfRangeException(paramName, delta, $"Parameter '{paramName}' was {shown}; the distance from the limit must be finite and non-zero (a mean on the limit is never decided by any number of replicates).");
        }

        return Math.Abs(delta);
    }

    private static double NonZeroMean(SpecificationLimit limit, Concentration expectedMean)
    {
        double mean = limit.ValueOf(expectedMean, nameof(expectedMean));
        if (mean == 0)
        {
            throw new ArgumentOutOfRangeException(nameof(expectedMean), mean, $"Parameter 'expectedMean' was {expectedMean}; an RSD needs a non-zero mean.");
        }

        return mean;
    }

    private static double SameKind(Concentration value, Concentration reference, string paramName)
    {
        if (value.Kind != reference.Kind)
        {
            throw new ArgumentException($"Parameter '{paramName}' was {value} ({value.Kind}) but the distance is {reference} ({reference.Kind}); the kinds must match.", paramName);
        }

        return value.In(reference.Unit);
    }
}
