using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>
/// A decision rule for statements of conformity with a <see cref="SpecificationLimit"/>, held as a value so that it
/// can be agreed with the customer before measuring (ISO/IEC 17025:2017 §7.1.3) and printed with its source.
/// </summary>
/// <remarks>
/// <para>Every rule is a guard band w around the limit L, applied in a <see cref="DecisionMode"/>: simple acceptance
/// (w = 0, ILAC G8:09/2019), w = m·U (ILAC G8:09/2019, m = 1), g = k·u for a chosen maximum risk (EURACHEM/CITAC
/// "Use of uncertainty information in compliance assessment", 2nd ed. 2021) and the one-sided t test of a mean at
/// level α (w = t(1 − α, n − 1)·s/√n).</para>
/// <para>Boundaries: for an upper limit a result is compliant when x ≤ acceptance limit and non-compliant when
/// x &gt; rejection limit (EURACHEM/CITAC writes the acceptance zone as x ≤ L − g; ILAC G8 writes "pass if below AL"
/// — the two differ only for a result exactly on a decision limit). A lower limit is the mirror image: compliant
/// when x ≥ acceptance limit, non-compliant when x &lt; rejection limit.</para>
/// <para><b>Caution.</b> The outcome supports, never replaces, the responsible analyst's decision: the library
/// computes; the laboratory's validated method, its quality system, local regulations and licensed practice decide
/// which rule applies and what is reported.</para>
/// <para>Immutable; equality is exact on kind, parameter, mode and name.</para>
/// </remarks>
public sealed class DecisionRule : IEquatable<DecisionRule>
{
    private const string EurachemGuide = "EURACHEM/CITAC Guide \"Use of uncertainty information in compliance assessment\", 2nd ed. 2021";

    private DecisionRule(DecisionRuleKind kind, double? parameter, DecisionMode mode, string name, string source, string description)
    {
        Kind = kind;
        Parameter = parameter;
        Mode = mode;
        Name = name;
        Source = source;
        Description = description;
    }

    /// <summary>Simple acceptance, w = 0: compliant when x ≤ L (upper limit), otherwise non-compliant; binary.
    /// The risk of false acceptance reaches 50 % for a result on the limit (ILAC G8:09/2019).</summary>
    public static DecisionRule SimpleAcceptance { get; } = new(
        DecisionRuleKind.SimpleAcceptance,
        null,
        DecisionMode.BinaryGuardedAcceptance,
        "Simple acceptance (w = 0)",
        "ILAC G8:09/2019, binary statement with simple acceptance; " + EurachemGuide + ", §4.2",
        "Guard band w = 0. Upper limit L: compliant when x ≤ L, otherwise non-compliant (lower limit: compliant when x ≥ L). "
        + "No uncertainty is needed to decide; the probability of false acceptance can reach 50 % for a result on the limit.");

    /// <summary>How the guard band is set.</summary>
    public DecisionRuleKind Kind { get; }

    /// <summary>How the guard band is applied. <see cref="SimpleAcceptance"/> reports
    /// <see cref="DecisionMode.BinaryGuardedAcceptance"/> (with w = 0 the binary modes coincide).</summary>
    public DecisionMode Mode { get; }

    /// <summary>The multiple m of U (<see cref="DecisionRuleKind.ExpandedUncertaintyGuardBand"/>), the maximum risk r
    /// (<see cref="DecisionRuleKind.RiskGuardBand"/>) or α (<see cref="DecisionRuleKind.OneSidedTTest"/>); null for simple acceptance.</summary>
    public double? Parameter { get; }

    /// <summary>Whether the rule gives the ILAC G8 zones (non-binary statement with a guard band).</summary>
    public bool HasZones => Mode == DecisionMode.NonBinary;

    /// <summary>Short name printed in decisions.</summary>
    public string Name { get; }

    /// <summary>Where the rule comes from.</summary>
    public string Source { get; }

    /// <summary>What the rule does, in words and formulas.</summary>
    public string Description { get; }

    /// <summary>Guard band w = U (ILAC G8:09/2019): U = k·u with the coverage stated when assessing (k = 2 gives a
    /// probability of false acceptance below 2.5 % at the acceptance limit for a normal distribution).</summary>
    /// <param name="mode">How the guard band is applied.</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="mode"/> is not defined.</exception>
    public static DecisionRule ExpandedUncertaintyGuardBand(DecisionMode mode) => ExpandedUncertaintyGuardBand(1, mode);

    /// <summary>Guard band w = m·U, a multiple of the expanded uncertainty U = k·u (ILAC G8:09/2019 for m = 1; other
    /// multiples are the laboratory's choice).</summary>
    /// <param name="multiple">m &gt; 0, finite.</param>
    /// <param name="mode">How the guard band is applied.</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="multiple"/> ≤ 0 or not finite, or
    /// <paramref name="mode"/> is not defined.</exception>
    public static DecisionRule ExpandedUncertaintyGuardBand(double multiple, DecisionMode mode)
    {
        Guard.Positive(multiple, nameof(multiple));
        CheckMode(mode);
        string w = multiple == 1 ? "U" : G(multiple) + "·U";
        return new(
            DecisionRuleKind.ExpandedUncertaintyGuardBand,
            multiple,
            mode,
            $"Guard band w = {w}, {ModeName(mode)}",
            "ILAC G8:09/2019, guard band w = U with binary and non-binary statements" + (multiple == 1 ? string.Empty : $"; the multiple {G(multiple)} is the laboratory's choice"),
            $"Guard band w = {w}, with U = k·u the expanded uncertainty of the result (k as stated when assessing). " + ModeDescription(mode));
    }

    /// <summary>Guard band g = k·u set for a maximum risk r of a wrong decision at the decision limit (EURACHEM/CITAC
    /// 2021): k = z(1 − r) for a normal distribution (1.645 for 5 %, 2.326 for 1 %), or t(1 − r, ν) when u has ν degrees
    /// of freedom. With <see cref="DecisionMode.BinaryGuardedAcceptance"/> r bounds the risk of false acceptance, with
    /// <see cref="DecisionMode.BinaryGuardedRejection"/> the risk of false rejection, with
    /// <see cref="DecisionMode.NonBinary"/> both.</summary>
    /// <param name="maximumRisk">r in (0, 0.5), e.g. 0.05.</param>
    /// <param name="mode">How the guard band is applied.</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="maximumRisk"/> outside (0, 0.5), or
    /// <paramref name="mode"/> is not defined.</exception>
    public static DecisionRule RiskGuardBand(double maximumRisk, DecisionMode mode)
    {
        Guard.InOpenRange(maximumRisk, 0, 0.5, nameof(maximumRisk));
        CheckMode(mode);
        return new(
            DecisionRuleKind.RiskGuardBand,
            maximumRisk,
            mode,
            $"Guard band g = k·u for {Percent(maximumRisk)} maximum risk, {ModeName(mode)}",
            EurachemGuide + ", §4.3 and Annex A (g = k·u; k = 1.64 for 5 %, 2.33 for 1 %)",
            $"Guard band g = k·u with k = z(1 − {G(maximumRisk)}) for a normal distribution, or t(1 − {G(maximumRisk)}, ν) when u has ν degrees of freedom. " + ModeDescription(mode));
    }

    /// <summary>One-sided one-sample Student t test of the mean of replicates against the limit at level α:
    /// w = t(1 − α, ν)·u with u = s/√n and ν = n − 1 (or the degrees of freedom of a single result's u).
    /// In <see cref="DecisionMode.NonBinary"/> mode the result is non-compliant when the mean is significantly beyond
    /// the limit, compliant when significantly within, and inconclusive otherwise; the binary modes keep one of the
    /// two tests.</summary>
    /// <param name="alpha">Significance level α in (0, 0.5), e.g. 0.05.</param>
    /// <param name="mode">How the critical distance is applied.</param>
    /// <returns>The rule.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="alpha"/> outside (0, 0.5), or
    /// <paramref name="mode"/> is not defined.</exception>
    public static DecisionRule OneSidedTTest(double alpha, DecisionMode mode)
    {
        Guard.InOpenRange(alpha, 0, 0.5, nameof(alpha));
        CheckMode(mode);
        string tests = mode switch
        {
            DecisionMode.BinaryGuardedAcceptance => "Compliant only when the mean is significantly within the limit (t ≤ −t(1 − α, ν)), otherwise non-compliant.",
            DecisionMode.BinaryGuardedRejection => "Non-compliant only when the mean is significantly beyond the limit (t > t(1 − α, ν)), otherwise compliant.",
            _ => "Non-compliant when the mean is significantly beyond the limit (t > t(1 − α, ν)), compliant when significantly within (t ≤ −t(1 − α, ν)), otherwise inconclusive.",
        };
        return new(
            DecisionRuleKind.OneSidedTTest,
            alpha,
            mode,
            $"One-sided t test at α = {G(alpha)}, {ModeName(mode)}",
            "One-sided one-sample Student t test of the mean against the limit (standard statistics); decision limits L ± t(1 − α, n − 1)·s/√n",
            $"t = (x̄ − L)/(s/√n) with ν = n − 1 for an upper limit ((L − x̄)/(s/√n) for a lower limit), α = {G(alpha)}. " + tests);
    }

    /// <summary>The same rule under another name, e.g. the name of the laboratory's procedure that adopts it.</summary>
    /// <param name="name">The new name; not blank.</param>
    /// <returns>A copy with the new <see cref="Name"/>.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="name"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="name"/> is empty or white space.</exception>
    public DecisionRule Named(string name) => new(Kind, Parameter, Mode, Guard.NotBlank(name, nameof(name)), Source, Description);

    /// <summary>Assesses one result with its standard uncertainty. The uncertainty is taken as normal when
    /// <see cref="Measured{T}.DegreesOfFreedom"/> is null, otherwise as Student t with ⌊ν⌋ degrees of freedom.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="result">The result and its standard uncertainty, of the same kind as the limit.</param>
    /// <returns>The decision.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> is null, or the rule is
    /// <see cref="DecisionRuleKind.ExpandedUncertaintyGuardBand"/> (needs a <see cref="Coverage"/>; reported as 'coverage').</exception>
    /// <exception cref="ArgumentException">The result is of another kind than the limit; the rule needs a non-zero
    /// uncertainty and u = 0; or the rule is a t test and the result has no degrees of freedom.</exception>
    public ComplianceDecision Assess(SpecificationLimit limit, Measured<Concentration> result) => AssessResult(limit, result, null);

    /// <summary>Assesses one result with its uncertainty; <paramref name="coverage"/> states how U = k·u is formed.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="result">The result and its standard uncertainty, of the same kind as the limit.</param>
    /// <param name="coverage">Coverage factor or probability for U (used by w = m·U rules, reported by all).</param>
    /// <returns>The decision.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> or <paramref name="coverage"/> is null.</exception>
    /// <exception cref="ArgumentException">The result is of another kind than the limit; the rule needs a non-zero
    /// uncertainty and u = 0; or the rule is a t test and the result has no degrees of freedom.</exception>
    public ComplianceDecision Assess(SpecificationLimit limit, Measured<Concentration> result, Coverage coverage) =>
        AssessResult(limit, result, Guard.NotNull(coverage, nameof(coverage)));

    /// <summary>Assesses the mean of replicate results: x̄, u = s/√n (sample standard deviation s) and ν = n − 1.</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="replicates">At least two results, all of the same kind as the limit.</param>
    /// <returns>The decision.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/> or <paramref name="replicates"/> is null, or the
    /// rule is <see cref="DecisionRuleKind.ExpandedUncertaintyGuardBand"/> (needs a <see cref="Coverage"/>; reported as 'coverage').</exception>
    /// <exception cref="ArgumentException">Fewer than two replicates; a replicate of another kind; or the rule needs a
    /// non-zero spread and all replicates are equal.</exception>
    public ComplianceDecision Assess(SpecificationLimit limit, IReadOnlyList<Concentration> replicates) => AssessReplicates(limit, replicates, null);

    /// <summary>Assesses the mean of replicate results; <paramref name="coverage"/> states how U = k·u is formed
    /// (a coverage probability uses t with n − 1 degrees of freedom).</summary>
    /// <param name="limit">The limit.</param>
    /// <param name="replicates">At least two results, all of the same kind as the limit.</param>
    /// <param name="coverage">Coverage factor or probability for U.</param>
    /// <returns>The decision.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="limit"/>, <paramref name="replicates"/> or
    /// <paramref name="coverage"/> is null.</exception>
    /// <exception cref="ArgumentException">Fewer than two replicates; a replicate of another kind; or the rule needs a
    /// non-zero spread and all replicates are equal.</exception>
    public ComplianceDecision Assess(SpecificationLimit limit, IReadOnlyList<Concentration> replicates, Coverage coverage) =>
        AssessReplicates(limit, replicates, Guard.NotNull(coverage, nameof(coverage)));

    /// <inheritdoc />
    public override string ToString() => $"{Name} — {Description} Source: {Source}.";

    /// <inheritdoc />
    public bool Equals(DecisionRule? other) =>
        other is not null && Kind == other.Kind && Mode == other.Mode && Nullable.Equals(Parameter, other.Parameter)
        && string.Equals(Name, other.Name, StringComparison.Ordinal);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as DecisionRule);

    /// <inheritdoc />
    public override int GetHashCode() => (Kind, Mode, Parameter, Name).GetHashCode();

    private ComplianceDecision AssessResult(SpecificationLimit limit, Measured<Concentration> result, Coverage? coverage)
    {
        Guard.NotNull(limit, nameof(limit));
        double x = limit.ValueOf(result.Value, nameof(result));
        double u = limit.ValueOf(result.StandardUncertainty, nameof(result));
        int? df = result.DegreesOfFreedom is double nu ? DecisionMath.WholeDegreesOfFreedom(nu, nameof(result)) : null;
        return Decide(limit, new Evidence(x, u, df, null, null), coverage, nameof(result));
    }

    private ComplianceDecision AssessReplicates(SpecificationLimit limit, IReadOnlyList<Concentration> replicates, Coverage? coverage)
    {
        Guard.NotNull(limit, nameof(limit));
        ReplicateStatistics stats = ReplicateStatistics.Of(limit, replicates, nameof(replicates));
        return Decide(limit, new Evidence(stats.Mean, stats.StandardDeviation / Math.Sqrt(stats.Count), stats.Count - 1, stats.Count, stats.StandardDeviation), coverage, nameof(replicates));
    }

    private ComplianceDecision Decide(SpecificationLimit limit, Evidence e, Coverage? coverage, string paramName)
    {
        double? factor = null;
        double? coverageFactor = null;
        switch (Kind)
        {
            case DecisionRuleKind.ExpandedUncertaintyGuardBand:
                if (coverage is null)
                {
                    throw new ArgumentNullException(nameof(coverage), $"Parameter 'coverage' is null; the rule '{Name}' needs the expanded uncertainty U = k·u, so state the coverage factor or probability.");
                }

                coverageFactor = coverage.FactorFor(e.DegreesOfFreedom);
                factor = Parameter!.Value * coverageFactor.Value;
                break;
            case DecisionRuleKind.RiskGuardBand:
                factor = DecisionMath.Quantile(1 - Parameter!.Value, e.DegreesOfFreedom);
                break;
            case DecisionRuleKind.OneSidedTTest:
                if (e.DegreesOfFreedom is null)
                {
                    throw new ArgumentException($"Parameter '{paramName}' has no degrees of freedom (u taken as exactly known); the rule '{Name}' needs a Student t. Give ν (e.g. Measured.TypeA) or use RiskGuardBand for a known σ.", paramName);
                }

                factor = DecisionMath.Quantile(1 - Parameter!.Value, e.DegreesOfFreedom);
                break;
        }

        if (coverageFactor is null && coverage is not null)
        {
            coverageFactor = coverage.FactorFor(e.DegreesOfFreedom);
        }

        if (factor is not null && !(e.StandardUncertainty > 0))
        {
            string what = e.Replicates is int n ? $"all {n} replicates are equal (s = 0)" : "its standard uncertainty is 0";
            throw new ArgumentException($"Parameter '{paramName}' cannot be assessed with the rule '{Name}': {what}, but the guard band is a multiple of u and needs u > 0.", paramName);
        }

        double w = factor is double f ? f * e.StandardUncertainty : 0;
        if (double.IsInfinity(w))
        {
            // The guard band must be a finite concentration (common practice: never ∞ silently).
            throw new ArgumentOutOfRangeException(paramName, FormattableString.Invariant($"Parameter '{paramName}' has u = {Guard.Format(e.StandardUncertainty)}; the guard band {Guard.Format(factor!.Value)}·u of the rule '{Name}' overflows, so u must be smaller."));
        }
        return ComplianceDecision.Create(this, limit, e, w, factor, coverageFactor);
    }

    private static void CheckMode(DecisionMode mode)
    {
        if (mode < DecisionMode.BinaryGuardedAcceptance || mode > DecisionMode.NonBinary)
        {
            throw new ArgumentOutOfRangeException(nameof(mode), mode, $"Parameter 'mode' was {(int)mode}; it must be a defined DecisionMode (0 to 2).");
        }
    }

    private static string ModeName(DecisionMode mode) => mode switch
    {
        DecisionMode.BinaryGuardedAcceptance => "binary, guarded acceptance",
        DecisionMode.BinaryGuardedRejection => "binary, guarded rejection",
        _ => "non-binary (ILAC G8 zones)",
    };

    private static string ModeDescription(DecisionMode mode) => mode switch
    {
        DecisionMode.BinaryGuardedAcceptance => "Upper limit L: compliant when x ≤ L − w, otherwise non-compliant (lower limit: compliant when x ≥ L + w).",
        DecisionMode.BinaryGuardedRejection => "Upper limit L: non-compliant when x > L + w, otherwise compliant (lower limit: non-compliant when x < L − w).",
        _ => "Upper limit L: pass (compliant) when x ≤ L − w, conditional pass when L − w < x ≤ L, conditional fail when L < x ≤ L + w "
            + "(both inconclusive), fail (non-compliant) when x > L + w; a lower limit is the mirror image.",
    };

    private static string G(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    private static string Percent(double fraction) => (100 * fraction).ToString("G4", CultureInfo.InvariantCulture) + " %";
}
