using System;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The Monte Carlo evaluation of a <see cref="MeasurementModel"/> (JCGM 101:2008, GUM Supplement 1): estimate,
/// standard uncertainty and coverage intervals from M model values.
/// </summary>
/// <remarks>
/// <para>y = mean and u(y) = standard deviation (divisor M − 1) of the M model values (JCGM 101:2008 §7.6). With q = pM
/// rounded, the probabilistically symmetric interval is [y₍ᵣ₎, y₍ᵣ₊q₎] with r = (M − q)/2 (or (M − q + 1)/2 when odd)
/// and the shortest interval is [y₍ᵣ*₎, y₍ᵣ*₊q₎] with r* minimising the length (§7.7; y₍ᵢ₎ the i-th smallest value).</para>
/// <para>Adaptive procedure (§7.9): batches of M = max(J, 10⁴) trials, J = ⌈100/(1 − p)⌉; after h ≥ 2 batches, the
/// standard deviations of the average of the h batch values of y, u(y), y_low and y_high (symmetric interval) are
/// compared with the numerical tolerance δ of u(y) from all hM values; it stops when twice each is ≤ δ, or at the trial
/// cap (then <see cref="Converged"/> is false). The result pools all hM values. Clause details are from memory of
/// JCGM 101:2008.</para>
/// <para>Sampling: one xoshiro256** stream (Blackman &amp; Vigna) seeded from <see cref="Seed"/> by SplitMix64; normal
/// deviates by Wichura's AS 241 quantile, correlated normal inputs through the Cholesky factor of their correlation
/// matrix, rectangular x + a(2U − 1), triangular x + a(U₁ + U₂ − 1), Student t by Bailey's polar method (Math. Comp. 62
/// (1994) 779–781). Logarithms and exponentials are computed from IEEE-exact operations only, so a seed gives the
/// same result bit for bit on every run, platform and target framework, provided the model function itself does.
/// Immutable; reference equality.</para>
/// </remarks>
public sealed class MonteCarloEvaluation
{
    internal MonteCarloEvaluation(MeasurementModel model, MonteCarlo.Summary s, double p, int trials, long seed, bool adaptive, bool? converged, int batches, int digits)
    {
        Model = model;
        Value = s.Mean;
        StandardUncertainty = s.StandardDeviation;
        CoverageProbability = p;
        SymmetricInterval = new CoverageInterval(s.SymmetricLow, s.SymmetricHigh, p, model.OutputUnit);
        ShortestInterval = new CoverageInterval(s.ShortestLow, s.ShortestHigh, p, model.OutputUnit);
        Trials = trials;
        Seed = seed;
        IsAdaptive = adaptive;
        Converged = converged;
        Batches = batches;
        SignificantDigits = adaptive ? digits : null;
    }

    /// <summary>The model evaluated.</summary>
    public MeasurementModel Model { get; }

    /// <summary>The estimate y (mean of the model values), in the output unit.</summary>
    public double Value { get; }

    /// <summary>u(y): standard deviation of the model values, in the output unit.</summary>
    public double StandardUncertainty { get; }

    /// <summary>Coverage probability p.</summary>
    public double CoverageProbability { get; }

    /// <summary>The probabilistically symmetric coverage interval (2.5 % and 97.5 % quantiles for p = 0.95).</summary>
    public CoverageInterval SymmetricInterval { get; }

    /// <summary>The shortest coverage interval.</summary>
    public CoverageInterval ShortestInterval { get; }

    /// <summary>Number of trials M used (hM for the adaptive procedure).</summary>
    public int Trials { get; }

    /// <summary>The seed given.</summary>
    public long Seed { get; }

    /// <summary>True for the adaptive procedure.</summary>
    public bool IsAdaptive { get; }

    /// <summary>Adaptive: whether the stopping rule was met before the trial cap; null for a fixed number of trials.</summary>
    public bool? Converged { get; }

    /// <summary>Number of batches h (1 for a fixed number of trials).</summary>
    public int Batches { get; }

    /// <summary>n_dig of the adaptive procedure; null for a fixed number of trials.</summary>
    public int? SignificantDigits { get; }

    /// <summary>Numerical tolerance δ of u(y) for n significant digits (JCGM 101:2008 §7.9.2): u = c·10^ℓ with c an
    /// n-digit integer, δ = ½·10^ℓ (u = 0.0236, n = 2 → δ = 0.0005).</summary>
    /// <param name="significantDigits">n, 1 to 4.</param>
    /// <returns>δ in the output unit (0 when u(y) = 0).</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="significantDigits"/> is outside 1 to 4.</exception>
    public double NumericalTolerance(int significantDigits = 2)
    {
        Guard.InClosedRange(significantDigits, 1, 4, nameof(significantDigits));
        return MonteCarlo.NumericalTolerance(StandardUncertainty, significantDigits);
    }

    /// <summary>Validates the GUM uncertainty framework against this result (JCGM 101:2008 §8): d_low = |y − U_p − y_low|
    /// and d_high = |y + U_p − y_high| (y, U_p from the GUM; y_low, y_high the symmetric Monte Carlo interval) are
    /// compared with the numerical tolerance δ of u(y) for n significant digits.</summary>
    /// <param name="gum">The GUM evaluation of the same model at the same coverage probability.</param>
    /// <param name="significantDigits">n, 1 to 4 (default 2).</param>
    /// <returns>The comparison and its verdict.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="gum"/> is null.</exception>
    /// <exception cref="ArgumentException"><paramref name="gum"/> is of another model or coverage probability.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="significantDigits"/> is outside 1 to 4.</exception>
    public GufValidation ValidateGum(GumEvaluation gum, int significantDigits = 2)
    {
        Guard.NotNull(gum, nameof(gum));
        if (!ReferenceEquals(gum.Model, Model))
        {
            throw new ArgumentException("Parameter 'gum' evaluates another model; compare evaluations of the same MeasurementModel.", nameof(gum));
        }

        if (gum.CoverageProbability != CoverageProbability)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter 'gum' has coverage probability {Guard.Format(gum.CoverageProbability)}; the Monte Carlo evaluation used {Guard.Format(CoverageProbability)}. They must be the same."),
                nameof(gum));
        }

        return new GufValidation(gum.Interval, SymmetricInterval, NumericalTolerance(significantDigits), significantDigits);
    }

    /// <summary>The result as a measured concentration (value, u(y), ν = ∞, evaluation Combined).</summary>
    /// <param name="unit">The unit the model's output is expressed in.</param>
    /// <returns>The measured value.</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="unit"/> is not defined.</exception>
    public Measured<Concentration> ToMeasuredConcentration(ConcentrationUnit unit) =>
        Measured.WithStandardUncertainty(Concentration.From(Value, unit), Concentration.From(StandardUncertainty, unit), null, UncertaintyEvaluation.Combined);

    /// <summary>Prints the estimate, u(y), both intervals, M, seed and convergence (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        string unit = Model.OutputUnit.Length > 0 ? " " + Model.OutputUnit : string.Empty;
        var text = new StringBuilder();
        text.Append(Model.OutputName).Append(" = ").Append(G(Value)).Append(unit).Append(", u = ").Append(G(StandardUncertainty)).Append(unit)
            .Append("; symmetric ").Append(SymmetricInterval.ToString()).Append(", shortest ").Append(ShortestInterval.ToString())
            .Append("; Monte Carlo (JCGM 101:2008), M = ").Append(Trials.ToString(CultureInfo.InvariantCulture))
            .Append(", seed ").Append(Seed.ToString(CultureInfo.InvariantCulture));
        if (IsAdaptive)
        {
            text.Append(", adaptive, ").Append(Batches.ToString(CultureInfo.InvariantCulture)).Append(" batches, ")
                .Append(Converged == true ? "converged" : "NOT converged (trial cap reached)");
        }

        return text.ToString();
    }

    private static string G(double x) => x.ToString("G6", CultureInfo.InvariantCulture);
}
