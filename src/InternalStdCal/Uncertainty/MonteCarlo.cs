using System;
using System.Collections.Generic;
using System.Globalization;
using System.Text;
using InternalStdCal.Internal;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// The Monte Carlo method of JCGM 101:2008: draws from the input distributions, evaluates the model once per trial,
/// summarises the model values. Allocation is per batch, never per trial.
/// </summary>
/// <remarks>
/// Random numbers: one xoshiro256** stream per evaluation, seeded from the caller's seed by SplitMix64. Each trial
/// draws, in order, the correlated normal group (one uniform each, mapped by the AS 241 normal quantile, then
/// multiplied by the Cholesky factor of the correlation matrix) and then every other input in model order:
/// normal x + u·Φ⁻¹(U) (one uniform); rectangular x + a(2U − 1) (one); triangular x + a(U₁ + U₂ − 1) (two); Student t
/// x + u·T with T from Bailey's polar method (Math. Comp. 62 (1994) 779–781: V₁, V₂ uniform on (−1, 1),
/// W = V₁² + V₂² &lt; 1, T = V₁·√(ν(W^(−2/ν) − 1)/W)). Inputs with u = 0 draw nothing. Only IEEE-exact operations and
/// the portable log/exp are used, so results are identical bit for bit across runs, platforms and target frameworks
/// (provided the model function itself is).
/// </remarks>
internal static class MonteCarlo
{
    internal const int MinimumBatch = 10_000;

    /// <summary>J = ⌈100/(1 − p)⌉ (JCGM 101:2008 §7.9.4 a), the smallest number of trials accepted.</summary>
    internal static int MinimumTrials(double p) => (int)Math.Ceiling(100 / (1 - p) - 1e-9);

    /// <summary>Adaptive batch size max(J, 10⁴) (JCGM 101:2008 §7.9.4 b).</summary>
    internal static int BatchSize(double p) => Math.Max(MinimumTrials(p), MinimumBatch);

    internal static MonteCarloEvaluation Fixed(MeasurementModel model, int trials, long seed, double p)
    {
        var sampler = new InputSampler(model);
        var rng = new Xoshiro256StarStar(unchecked((ulong)seed));
        var values = new double[trials];
        Generate(model, sampler, ref rng, values, 0, trials);
        Summary s = Summarize(values, 0, trials, p);
        return new MonteCarloEvaluation(model, s, p, trials, seed, false, null, 1, 0);
    }

    internal static MonteCarloEvaluation Adaptive(MeasurementModel model, long seed, double p, int digits, int maxTrials)
    {
        var sampler = new InputSampler(model);
        var rng = new Xoshiro256StarStar(unchecked((ulong)seed));
        int m = BatchSize(p);
        int capacity = Math.Min(maxTrials, 16 * m);
        var values = new double[capacity];
        var means = new List<double>();
        var sds = new List<double>();
        var lows = new List<double>();
        var highs = new List<double>();
        var sumSquares = new List<double>();
        bool converged = false;
        double tolerance = 0;
        int used = 0;
        while ((long)used + m <= maxTrials)
        {
            if (used + m > values.Length)
            {
                Array.Resize(ref values, (int)Math.Min(maxTrials, 2L * values.Length));
            }

            Generate(model, sampler, ref rng, values, used, m);
            Summary b = Summarize(values, used, m, p);
            used += m;
            means.Add(b.Mean);
            sds.Add(b.StandardDeviation);
            lows.Add(b.SymmetricLow);
            highs.Add(b.SymmetricHigh);
            sumSquares.Add(b.SumOfSquares);
            int h = means.Count;
            if (h < 2)
            {
                continue;
            }

            double pooledMean = Average(means);
            double ss = 0;
            for (int r = 0; r < h; r++)
            {
                double d = means[r] - pooledMean;
                ss += sumSquares[r] + (m * d * d);
            }

            tolerance = NumericalTolerance(Math.Sqrt(ss / (((long)h * m) - 1)), digits);
            if (2 * StandardDeviationOfAverage(means) <= tolerance && 2 * StandardDeviationOfAverage(sds) <= tolerance
                && 2 * StandardDeviationOfAverage(lows) <= tolerance && 2 * StandardDeviationOfAverage(highs) <= tolerance)
            {
                converged = true;
                break;
            }
        }

        Summary pooled = Summarize(values, 0, used, p);
        return new MonteCarloEvaluation(model, pooled, p, used, seed, true, converged, means.Count, digits);
    }

    /// <summary>δ = ½·10^ℓ where u = c·10^ℓ with c an integer of n_dig digits (JCGM 101:2008 §7.9.2); 0 for u = 0.</summary>
    internal static double NumericalTolerance(double u, int digits)
    {
        if (!(u > 0))
        {
            return 0;
        }

        int e = (int)Math.Floor(Math.Log10(u));
        if (Pow10(e) > u)
        {
            e--;
        }
        else if (Pow10(e + 1) <= u)
        {
            e++;
        }

        int l = e - digits + 1;
        if (Math.Round(u / Pow10(l)) >= Pow10(digits))
        {
            l++;
        }

        return 0.5 * Pow10(l);
    }

    private static double Pow10(int k) => Math.Abs(k) <= 22 ? PowerOfTen.Scale(1, k) : Math.Pow(10, k);

    private static double Average(List<double> v)
    {
        var sum = default(CompensatedSum);
        foreach (double x in v)
        {
            sum.Add(x);
        }

        return sum.Value / v.Count;
    }

    /// <summary>s = √(Σ(vᵣ − v̄)²/(h(h − 1))), the standard deviation of the average of h batch values (JCGM 101:2008 §7.9.4 d).</summary>
    private static double StandardDeviationOfAverage(List<double> v)
    {
        double mean = Average(v);
        double ss = 0;
        foreach (double x in v)
        {
            ss += (x - mean) * (x - mean);
        }

        return Math.Sqrt(ss / (v.Count * (v.Count - 1.0)));
    }

    private static void Generate(MeasurementModel model, InputSampler sampler, ref Xoshiro256StarStar rng, double[] values, int offset, int count)
    {
        double[] x = new double[model.Inputs.Count];
        int end = offset + count;
        for (int t = offset; t < end; t++)
        {
            sampler.Fill(ref rng, x);
            double y = model.EvaluateUnchecked(x);
            if (double.IsNaN(y) || double.IsInfinity(y))
            {
                throw new InvalidOperationException(FormattableString.Invariant($"Monte Carlo trial {t + 1}: the model '{model.OutputName}' gave {Guard.Format(y)} at ") + Describe(model, x)
                    + "; f must be finite over the whole range of the input distributions (e.g. a divisor whose distribution reaches zero).");
            }

            values[t] = y;
        }
    }

    private static string Describe(MeasurementModel model, double[] x)
    {
        var text = new StringBuilder();
        for (int i = 0; i < x.Length; i++)
        {
            text.Append(i == 0 ? string.Empty : ", ").Append(model.Inputs[i].Name).Append(" = ").Append(x[i].ToString("R", CultureInfo.InvariantCulture));
        }

        return text.ToString();
    }

    /// <summary>Mean, standard deviation (divisor M − 1, JCGM 101:2008 §7.6), and the probabilistically symmetric and
    /// shortest coverage intervals (§7.7) of values[offset..offset+count), which are sorted in place.</summary>
    private static Summary Summarize(double[] values, int offset, int count, double p)
    {
        Array.Sort(values, offset, count);
        int end = offset + count;
        var sum = default(CompensatedSum);
        for (int i = offset; i < end; i++)
        {
            sum.Add(values[i]);
        }

        double mean = sum.Value / count;
        var ss = default(CompensatedSum);
        for (int i = offset; i < end; i++)
        {
            double d = values[i] - mean;
            ss.AddProductOfSquare(1, d);
        }

        // q = pM rounded to the nearest integer; r = (M − q)/2, or (M − q + 1)/2 when M − q is odd (1-based order statistics).
        int q = (int)Math.Floor((p * count) + 0.5);
        int r = (count - q + 1) / 2;
        double symLow = values[offset + r - 1];
        double symHigh = values[offset + r + q - 1];
        int best = 1;
        double shortest = double.PositiveInfinity;
        for (int s = 1; s <= count - q; s++)
        {
            double length = values[offset + s + q - 1] - values[offset + s - 1];
            if (length < shortest)
            {
                shortest = length;
                best = s;
            }
        }

        double sd = Math.Sqrt(ss.Value / (count - 1));
        if (double.IsNaN(sd) || double.IsInfinity(sd))
        {
            // Squares of huge trial values overflow; the scaled form does not (never NaN silently).
            sd = SampleStatistics.StandardDeviation(new ArraySegment<double>(values, offset, count), mean);
        }

        return new Summary(mean, ss.Value, sd, symLow, symHigh, values[offset + best - 1], values[offset + best + q - 1]);
    }

    internal readonly struct Summary
    {
        internal Summary(double mean, double sumOfSquares, double sd, double symLow, double symHigh, double shortLow, double shortHigh)
        {
            Mean = mean;
            SumOfSquares = sumOfSquares;
            StandardDeviation = sd;
            SymmetricLow = symLow;
            SymmetricHigh = symHigh;
            ShortestLow = shortLow;
            ShortestHigh = shortHigh;
        }

        internal double Mean { get; }

        internal double SumOfSquares { get; }

        internal double StandardDeviation { get; }

        internal double SymmetricLow { get; }

        internal double SymmetricHigh { get; }

        internal double ShortestLow { get; }

        internal double ShortestHigh { get; }
    }

    /// <summary>Draws one vector of input values per call; holds its own scratch arrays (one per evaluation).</summary>
    private sealed class InputSampler
    {
        private const double PivotTolerance = 1e-12;
        private readonly InputDistribution[] kind;
        private readonly double[] mu;
        private readonly double[] u;
        private readonly double[] halfWidth;
        private readonly double[] nu;
        private readonly int[] independent;
        private readonly int[] group;
        private readonly double[] cholesky;
        private readonly double[] z;

        internal InputSampler(MeasurementModel model)
        {
            IReadOnlyList<UncertainInput> inputs = model.Inputs;
            int n = inputs.Count;
            kind = new InputDistribution[n];
            mu = new double[n];
            u = new double[n];
            halfWidth = new double[n];
            nu = new double[n];
            var correlated = new List<int>();
            var others = new List<int>();
            for (int i = 0; i < n; i++)
            {
                UncertainInput x = inputs[i];
                kind[i] = x.Distribution;
                mu[i] = x.Value;
                u[i] = x.StandardUncertainty;
                halfWidth[i] = x.HalfWidth ?? 0;
                nu[i] = x.DegreesOfFreedom;
                bool isCorrelated = false;
                for (int j = 0; j < n && model.HasCorrelations; j++)
                {
                    isCorrelated |= j != i && model.CorrelationAt(i, j) != 0;
                }

                if (isCorrelated && x.Distribution != InputDistribution.Normal)
                {
                    throw new NotSupportedException(
                        $"Input '{x.Name}' is correlated with another input but has a {x.Distribution} distribution; Monte Carlo sampling of correlated inputs is supported only for normal inputs (a multivariate Gaussian, JCGM 101:2008 §6.4.8). Use the GUM evaluation, or give the correlated inputs normal distributions.");
                }

                (isCorrelated ? correlated : others).Add(i);
            }

            independent = others.ToArray();
            group = correlated.ToArray();
            int k = group.Length;
            z = new double[k];
            cholesky = new double[k * k];
            for (int a = 0; a < k; a++)
            {
                for (int b = 0; b <= a; b++)
                {
                    double s = model.CorrelationAt(group[a], group[b]);
                    for (int c = 0; c < b; c++)
                    {
                        s -= cholesky[(a * k) + c] * cholesky[(b * k) + c];
                    }

                    if (a == b)
                    {
                        // Positive semi-definite (checked by the model): a pivot at rounding level is a zero pivot.
                        cholesky[(a * k) + a] = s > PivotTolerance ? Math.Sqrt(s) : 0;
                    }
                    else
                    {
                        double pivot = cholesky[(b * k) + b];
                        cholesky[(a * k) + b] = pivot > 0 ? s / pivot : 0;
                    }
                }
            }
        }

        internal void Fill(ref Xoshiro256StarStar rng, double[] x)
        {
            int k = group.Length;
            if (k > 0)
            {
                for (int a = 0; a < k; a++)
                {
                    z[a] = PortableMath.NormalQuantile(rng.NextOpenUnit());
                }

                for (int a = 0; a < k; a++)
                {
                    double s = 0;
                    int row = a * k;
                    for (int b = 0; b <= a; b++)
                    {
                        s += cholesky[row + b] * z[b];
                    }

                    int i = group[a];
                    x[i] = mu[i] + (u[i] * s);
                }
            }

            for (int m = 0; m < independent.Length; m++)
            {
                int i = independent[m];
                if (u[i] == 0)
                {
                    x[i] = mu[i];
                    continue;
                }

                switch (kind[i])
                {
                    case InputDistribution.Rectangular:
                        x[i] = mu[i] + (halfWidth[i] * ((2 * rng.NextOpenUnit()) - 1));
                        break;
                    case InputDistribution.Triangular:
                        x[i] = mu[i] + (halfWidth[i] * ((rng.NextOpenUnit() + rng.NextOpenUnit()) - 1));
                        break;
                    case InputDistribution.StudentT:
                        x[i] = mu[i] + (u[i] * StudentT(ref rng, nu[i]));
                        break;
                    default:
                        x[i] = mu[i] + (u[i] * PortableMath.NormalQuantile(rng.NextOpenUnit()));
                        break;
                }
            }
        }

        private static double StudentT(ref Xoshiro256StarStar rng, double nu)
        {
            while (true)
            {
                double v1 = (2 * rng.NextOpenUnit()) - 1;
                double v2 = (2 * rng.NextOpenUnit()) - 1;
                double w = (v1 * v1) + (v2 * v2);
                if (w < 1 && w > 0)
                {
                    double power = PortableMath.Exp(-2 / nu * PortableMath.Log(w));
                    return v1 * Math.Sqrt(nu * (power - 1) / w);
                }
            }
        }
    }
}
