using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using MathNet.Numerics.LinearAlgebra;

namespace InternalStdCal.Uncertainty;

/// <summary>
/// A measurement model y = f(x₁, …, x_N) (JCGM 100:2008 §4.1) with its named uncertain inputs and their
/// correlations, ready for GUM propagation (<see cref="EvaluateGum"/>) and Monte Carlo propagation
/// (<see cref="EvaluateMonteCarlo"/>, <see cref="EvaluateMonteCarloAdaptive"/>).
/// </summary>
/// <remarks>
/// <para>Two forms: a general function of the input values (<see cref="Create"/>), with optional analytic partial
/// derivatives, and the product/quotient y = k·Π xᵢ^pᵢ (<see cref="Product"/>) with analytic sensitivities
/// cᵢ = pᵢ·y/xᵢ, the usual shape of a result: concentration = x₀ · dilution factors · sample amounts · spike terms.</para>
/// <para>Correlations are validated when the model is created: |r| ≤ 1 and the correlation matrix must be positive
/// semi-definite. Immutable; reference equality.</para>
/// </remarks>
public sealed class MeasurementModel
{
    private const double SemiDefiniteTolerance = 1e-10;
    private readonly UncertainInput[] inputs;
    private readonly Func<double[], double>? function;
    private readonly Func<double[], double[]>? derivatives;
    private readonly double[]? exponents;
    private readonly double[]? correlation; // row-major N×N, null when all inputs are uncorrelated
    private readonly Dictionary<string, int> index;

    private MeasurementModel(string outputName, string outputUnit, UncertainInput[] inputs, Func<double[], double>? function, Func<double[], double[]>? derivatives, double constant, double[]? exponents, InputCorrelation[] correlations, double[]? correlation, Dictionary<string, int> index)
    {
        OutputName = outputName;
        OutputUnit = outputUnit;
        this.inputs = inputs;
        this.function = function;
        this.derivatives = derivatives;
        Constant = constant;
        this.exponents = exponents;
        Correlations = correlations;
        this.correlation = correlation;
        this.index = index;
        try
        {
            Value = Evaluate(InputValues(), "the input values");
        }
        catch (InvalidOperationException e)
        {
            throw new ArgumentException(e.Message, function is null ? nameof(inputs) : nameof(function), e);
        }
    }

    /// <summary>Name of the output quantity y.</summary>
    public string OutputName { get; }

    /// <summary>Unit text of y (free form, may be empty).</summary>
    public string OutputUnit { get; }

    /// <summary>The inputs, in the order the function receives their values.</summary>
    public IReadOnlyList<UncertainInput> Inputs => inputs;

    /// <summary>The non-zero correlations given at creation.</summary>
    public IReadOnlyList<InputCorrelation> Correlations { get; }

    /// <summary>True for the product/quotient form of <see cref="Product"/>.</summary>
    public bool IsProduct => exponents is not null;

    /// <summary>The constant k of a product model (1 for a general model).</summary>
    public double Constant { get; }

    /// <summary>The exponents pᵢ of a product model, in input order; empty for a general model.</summary>
    public IReadOnlyList<double> Exponents => exponents ?? Array.Empty<double>();

    /// <summary>True when sensitivity coefficients are analytic (product model or derivatives supplied);
    /// false when they are found numerically.</summary>
    public bool HasAnalyticSensitivities => exponents is not null || derivatives is not null;

    /// <summary>y = f(x) at the input values, in <see cref="OutputUnit"/>.</summary>
    public double Value { get; }

    internal bool HasCorrelations => correlation is not null;

    /// <summary>A model given as a function of the input values.</summary>
    /// <param name="outputName">Name of y, not blank.</param>
    /// <param name="outputUnit">Unit text of y; null means empty.</param>
    /// <param name="inputs">The inputs, at least one, unique names; the function receives their values in this order.</param>
    /// <param name="function">y = f(x). It receives an array it must not keep (Monte Carlo reuses it for every
    /// trial) and must return a finite number; it is called from one thread at a time.</param>
    /// <param name="partialDerivatives">Optional ∂f/∂xᵢ at x, returned as a new array of N finite numbers; when null the
    /// sensitivities are found by Richardson-refined central differences (see <see cref="EvaluateGum"/>).</param>
    /// <param name="correlations">Optional correlations between inputs (each pair at most once).</param>
    /// <returns>The model.</returns>
    /// <exception cref="ArgumentNullException">A required argument or an input is null.</exception>
    /// <exception cref="ArgumentException">No inputs; duplicate names; a correlation names an unknown input or a pair
    /// twice; the correlation matrix is not positive semi-definite; or f is not finite at the input values.</exception>
    public static MeasurementModel Create(string outputName, string? outputUnit, IReadOnlyList<UncertainInput> inputs, Func<double[], double> function, Func<double[], double[]>? partialDerivatives = null, IReadOnlyList<InputCorrelation>? correlations = null)
    {
        Guard.NotBlank(outputName, nameof(outputName));
        Guard.NotNull(function, nameof(function));
        UncertainInput[] list = CopyInputs(inputs, out Dictionary<string, int> index);
        (InputCorrelation[] pairs, double[]? matrix) = BuildCorrelation(list, index, correlations);
        return new MeasurementModel(outputName, outputUnit ?? string.Empty, list, function, partialDerivatives, 1, null, pairs, matrix, index);
    }

    /// <summary>The product/quotient model y = k·Π xᵢ^pᵢ (JCGM 100:2008 §5.1.6), e.g. c = x₀·V_final/V_aliquot·
    /// V_digest/m_sample.</summary>
    /// <param name="outputName">Name of y, not blank.</param>
    /// <param name="outputUnit">Unit text of y; null means empty.</param>
    /// <param name="constant">k, finite, non-zero (unit conversions and exact factors).</param>
    /// <param name="inputs">The inputs, at least one, unique names.</param>
    /// <param name="exponents">pᵢ, finite and non-zero, one per input (+1 numerator, −1 denominator).</param>
    /// <param name="correlations">Optional correlations between inputs.</param>
    /// <returns>The model.</returns>
    /// <remarks>Sensitivities are analytic: cᵢ = pᵢ·k·xᵢ^(pᵢ−1)·Π_{j≠i} xⱼ^pⱼ (= pᵢ·y/xᵢ for xᵢ ≠ 0). Exponents ±1, ±2 and
    /// ½ are evaluated with ×, ÷ and √ (bit-reproducible everywhere); other exponents use Math.Pow.</remarks>
    /// <exception cref="ArgumentNullException">A required argument or an input is null.</exception>
    /// <exception cref="ArgumentException">No inputs; duplicate names; lengths differ; a bad correlation; an input is
    /// zero with a negative exponent, or negative with a non-integer exponent; or y overflows.</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="constant"/> or an exponent is zero or not finite.</exception>
    public static MeasurementModel Product(string outputName, string? outputUnit, double constant, IReadOnlyList<UncertainInput> inputs, IReadOnlyList<double> exponents, IReadOnlyList<InputCorrelation>? correlations = null)
    {
        Guard.NotBlank(outputName, nameof(outputName));
        Guard.Finite(constant, nameof(constant));
        if (constant == 0)
        {
            throw Guard.OutOfRange(nameof(constant), constant, "a finite non-zero number");
        }

        UncertainInput[] list = CopyInputs(inputs, out Dictionary<string, int> index);
        Guard.NotNull(exponents, nameof(exponents));
        Guard.SameLength(list.Length, exponents.Count, nameof(inputs), nameof(exponents));
        var p = new double[list.Length];
        for (int i = 0; i < p.Length; i++)
        {
            double e = exponents[i];
            if (!(e != 0) || double.IsInfinity(e) || double.IsNaN(e))
            {
                throw Guard.OutOfRange(FormattableString.Invariant($"exponents[{i}]"), e, "a finite non-zero number");
            }

            double x = list[i].Value;
            if ((x == 0 && e < 0) || (x < 0 && Math.Floor(e) != e))
            {
                throw new ArgumentException(
                    FormattableString.Invariant($"Parameter 'inputs': input '{list[i].Name}' is {Guard.Format(x)} with exponent {Guard.Format(e)}; a zero input needs a positive exponent and a negative input an integer exponent."),
                    nameof(inputs));
            }

            p[i] = e;
        }

        (InputCorrelation[] pairs, double[]? matrix) = BuildCorrelation(list, index, correlations);
        return new MeasurementModel(outputName, outputUnit ?? string.Empty, list, null, null, constant, p, pairs, matrix, index);
    }

    /// <summary>The correlation coefficient between two inputs (1 for an input with itself, 0 if none was given).</summary>
    /// <param name="firstInput">Name of an input.</param>
    /// <param name="secondInput">Name of an input.</param>
    /// <returns>r in [−1, 1].</returns>
    /// <exception cref="ArgumentNullException">A name is null.</exception>
    /// <exception cref="ArgumentException">A name is not an input of the model.</exception>
    public double Correlation(string firstInput, string secondInput)
    {
        int i = IndexOf(firstInput, nameof(firstInput));
        int j = IndexOf(secondInput, nameof(secondInput));
        return CorrelationAt(i, j);
    }

    /// <summary>GUM evaluation (JCGM 100:2008): sensitivities, combined standard uncertainty with correlation terms,
    /// Welch–Satterthwaite ν_eff, coverage factor and expanded uncertainty.</summary>
    /// <param name="coverageProbability">p in (0, 1), default 0.95.</param>
    /// <returns>The evaluation with its budget.</returns>
    /// <remarks>See <see cref="GumEvaluation"/> for formulas and conventions. Numeric sensitivities (no analytic
    /// derivatives): central differences D(h) = (f(x + h·eᵢ) − f(x − h·eᵢ))/(2h) with h = u(xᵢ)/8 (|xᵢ|·2⁻²⁰, or
    /// 2⁻²⁰, when u(xᵢ) = 0), refined by Richardson extrapolation cᵢ = (4·D(h/2) − D(h))/3 (error O(h⁴)).</remarks>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="coverageProbability"/> is not in (0, 1).</exception>
    /// <exception cref="InvalidOperationException">f or a supplied derivative is not finite near the input values,
    /// or the derivatives have the wrong length.</exception>
    public GumEvaluation EvaluateGum(double coverageProbability = 0.95)
    {
        Guard.InOpenRange(coverageProbability, 0, 1, nameof(coverageProbability));
        return GumEvaluation.Evaluate(this, coverageProbability);
    }

    /// <summary>Monte Carlo propagation with a fixed number of trials M (JCGM 101:2008 §7).</summary>
    /// <param name="trials">M ≥ ⌈100/(1 − p)⌉ (JCGM 101:2008 §7.2.2 recommends M ≥ 10⁴/(1 − p), e.g. 10⁶ for 95 %).</param>
    /// <param name="seed">Seed of the generator; the same seed, model and M give the same result bit for bit.</param>
    /// <param name="coverageProbability">p in (0, 1), default 0.95.</param>
    /// <returns>The evaluation.</returns>
    /// <remarks>See <see cref="MonteCarloEvaluation"/>.</remarks>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="trials"/> or <paramref name="coverageProbability"/> is out of range.</exception>
    /// <exception cref="NotSupportedException">A correlated input is not normal (only correlated normal inputs can be sampled).</exception>
    /// <exception cref="InvalidOperationException">f returned a value that is not finite for some trial.</exception>
    public MonteCarloEvaluation EvaluateMonteCarlo(int trials, long seed, double coverageProbability = 0.95)
    {
        Guard.InOpenRange(coverageProbability, 0, 1, nameof(coverageProbability));
        Guard.AtLeast(trials, MonteCarlo.MinimumTrials(coverageProbability), nameof(trials));
        return MonteCarlo.Fixed(this, trials, seed, coverageProbability);
    }

    /// <summary>Adaptive Monte Carlo propagation (JCGM 101:2008 §7.9): batches until the results are stable to the
    /// numerical tolerance of <paramref name="significantDigits"/> significant digits of u(y).</summary>
    /// <param name="seed">Seed of the generator; the same seed and model give the same result bit for bit.</param>
    /// <param name="coverageProbability">p in (0, 1), default 0.95.</param>
    /// <param name="significantDigits">n_dig, 1 to 4 (default 2).</param>
    /// <param name="maxTrials">Cap on the total number of trials, at least two batches (default 5·10⁶; memory is
    /// 8 bytes per trial).</param>
    /// <returns>The pooled evaluation; <see cref="MonteCarloEvaluation.Converged"/> is false when the cap stopped it.</returns>
    /// <remarks>See <see cref="MonteCarloEvaluation"/>.</remarks>
    /// <exception cref="ArgumentOutOfRangeException">An argument is out of range.</exception>
    /// <exception cref="NotSupportedException">A correlated input is not normal.</exception>
    /// <exception cref="InvalidOperationException">f returned a value that is not finite for some trial.</exception>
    public MonteCarloEvaluation EvaluateMonteCarloAdaptive(long seed, double coverageProbability = 0.95, int significantDigits = 2, long maxTrials = 5_000_000)
    {
        Guard.InOpenRange(coverageProbability, 0, 1, nameof(coverageProbability));
        Guard.InClosedRange(significantDigits, 1, 4, nameof(significantDigits));
        int batch = MonteCarlo.BatchSize(coverageProbability);
        if (maxTrials < 2L * batch || maxTrials > int.MaxValue)
        {
            throw Guard.OutOfRange(nameof(maxTrials), maxTrials, FormattableString.Invariant($"in [{2L * batch}, {int.MaxValue}] (two batches of {batch} trials at least)"));
        }

        return MonteCarlo.Adaptive(this, seed, coverageProbability, significantDigits, (int)maxTrials);
    }

    /// <summary>Prints the model: output, form, inputs and correlations (invariant culture).</summary>
    /// <returns>The text.</returns>
    public override string ToString()
    {
        var text = new System.Text.StringBuilder();
        text.Append(OutputName).Append(" = ");
        if (exponents is not null)
        {
            text.Append(Constant.ToString("G17", CultureInfo.InvariantCulture));
            for (int i = 0; i < inputs.Length; i++)
            {
                text.Append(" · ").Append(inputs[i].Name);
                if (exponents[i] != 1)
                {
                    text.Append('^').Append(exponents[i].ToString("G6", CultureInfo.InvariantCulture));
                }
            }
        }
        else
        {
            text.Append("f(").Append(string.Join(", ", Array.ConvertAll(inputs, x => x.Name))).Append(')');
        }

        text.Append(" = ").Append(UncertainInput.Text(Value));
        if (OutputUnit.Length > 0)
        {
            text.Append(' ').Append(OutputUnit);
        }

        foreach (UncertainInput x in inputs)
        {
            text.AppendLine().Append("  ").Append(x);
        }

        foreach (InputCorrelation r in Correlations)
        {
            text.AppendLine().Append("  ").Append(r);
        }

        return text.ToString();
    }

    internal double CorrelationAt(int i, int j) =>
        i == j ? 1 : correlation is null ? 0 : correlation[(i * inputs.Length) + j];

    internal double[] InputValues()
    {
        var x = new double[inputs.Length];
        for (int i = 0; i < x.Length; i++)
        {
            x[i] = inputs[i].Value;
        }

        return x;
    }

    /// <summary>f(x) for a trial or a GUM evaluation point, without checks (hot path).</summary>
    internal double EvaluateUnchecked(double[] x)
    {
        if (exponents is null)
        {
            return function!(x);
        }

        double y = Constant;
        for (int i = 0; i < x.Length; i++)
        {
            y *= Power(x[i], exponents[i]);
        }

        return y;
    }

    /// <summary>f(x), which must be finite.</summary>
    /// <exception cref="InvalidOperationException">f is not finite.</exception>
    internal double Evaluate(double[] x, string where)
    {
        double y = EvaluateUnchecked(x);
        if (double.IsNaN(y) || double.IsInfinity(y))
        {
            throw new InvalidOperationException(FormattableString.Invariant($"The model '{OutputName}' gave {Guard.Format(y)} at {where}; f must be finite there."));
        }

        return y;
    }

    /// <summary>Analytic sensitivities, or null when they must be found numerically.</summary>
    internal double[]? AnalyticSensitivities(double[] x)
    {
        if (exponents is not null)
        {
            var c = new double[x.Length];
            for (int i = 0; i < c.Length; i++)
            {
                double ci = exponents[i] * Constant * Power(x[i], exponents[i] - 1);
                for (int j = 0; j < c.Length; j++)
                {
                    if (j != i)
                    {
                        ci *= Power(x[j], exponents[j]);
                    }
                }

                c[i] = ci;
            }

            return c;
        }

        if (derivatives is null)
        {
            return null;
        }

        double[] d = derivatives((double[])x.Clone())
            ?? throw new InvalidOperationException($"The partial derivatives of '{OutputName}' returned null; they must return an array of {inputs.Length} numbers.");
        if (d.Length != inputs.Length)
        {
            throw new InvalidOperationException(FormattableString.Invariant($"The partial derivatives of '{OutputName}' returned {d.Length} values; the model has {inputs.Length} inputs."));
        }

        for (int i = 0; i < d.Length; i++)
        {
            if (double.IsNaN(d[i]) || double.IsInfinity(d[i]))
            {
                throw new InvalidOperationException(FormattableString.Invariant($"The partial derivative of '{OutputName}' with respect to '{inputs[i].Name}' is {Guard.Format(d[i])}; it must be finite."));
            }
        }

        return (double[])d.Clone();
    }

    /// <summary>x^p with ×, ÷ and √ for the common exponents (exact rounding, portable), Math.Pow otherwise.</summary>
    internal static double Power(double x, double p) => p switch
    {
        1 => x,
        -1 => 1 / x,
        2 => x * x,
        -2 => 1 / (x * x),
        0.5 => Math.Sqrt(x),
        0 => 1,
        _ => Math.Pow(x, p),
    };

    private int IndexOf(string name, string paramName)
    {
        Guard.NotNull(name, paramName);
        return index.TryGetValue(name, out int i)
            ? i
            : throw new ArgumentException($"Parameter '{paramName}' was '{name}'; it is not an input of the model (inputs: {string.Join(", ", Array.ConvertAll(inputs, x => x.Name))}).", paramName);
    }

    private static UncertainInput[] CopyInputs(IReadOnlyList<UncertainInput> inputs, out Dictionary<string, int> index)
    {
        Guard.NotEmpty(inputs, nameof(inputs));
        var list = new UncertainInput[inputs.Count];
        index = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < list.Length; i++)
        {
            UncertainInput x = inputs[i] ?? throw new ArgumentNullException(nameof(inputs), FormattableString.Invariant($"Parameter 'inputs' has null at index {i}; every input must be given."));
            if (index.TryGetValue(x.Name, out int first))
            {
                throw new ArgumentException(FormattableString.Invariant($"Parameter 'inputs' has the name '{x.Name}' twice (indices {first} and {i}); names must be unique."), nameof(inputs));
            }

            index.Add(x.Name, i);
            list[i] = x;
        }

        return list;
    }

    private static (InputCorrelation[] Pairs, double[]? Matrix) BuildCorrelation(UncertainInput[] inputs, Dictionary<string, int> index, IReadOnlyList<InputCorrelation>? correlations)
    {
        if (correlations is null || correlations.Count == 0)
        {
            return (Array.Empty<InputCorrelation>(), null);
        }

        int n = inputs.Length;
        var matrix = new double[n * n];
        var given = new bool[n * n];
        var pairs = new List<InputCorrelation>();
        for (int k = 0; k < correlations.Count; k++)
        {
            InputCorrelation r = correlations[k];
            if (r.FirstInput is null || r.SecondInput is null)
            {
                throw new ArgumentException(FormattableString.Invariant($"Parameter 'correlations' has an uninitialised (default) entry at index {k}."), nameof(correlations));
            }

            int i = Find(r.FirstInput, k);
            int j = Find(r.SecondInput, k);
            if (given[(i * n) + j])
            {
                throw new ArgumentException(FormattableString.Invariant($"Parameter 'correlations' gives the pair ('{r.FirstInput}', '{r.SecondInput}') more than once (again at index {k})."), nameof(correlations));
            }

            given[(i * n) + j] = given[(j * n) + i] = true;
            matrix[(i * n) + j] = matrix[(j * n) + i] = r.Coefficient;
            if (r.Coefficient != 0)
            {
                pairs.Add(r);
            }
        }

        if (pairs.Count == 0)
        {
            return (Array.Empty<InputCorrelation>(), null);
        }

        for (int i = 0; i < n; i++)
        {
            matrix[(i * n) + i] = 1;
        }

        Matrix<double> m = Matrix<double>.Build.Dense(n, n, (i, j) => matrix[(i * n) + j]);
        double smallest = m.Evd(Symmetricity.Symmetric).EigenValues.Real().Minimum();
        if (smallest < -SemiDefiniteTolerance * n)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter 'correlations' gives a correlation matrix that is not positive semi-definite (smallest eigenvalue {smallest.ToString("G6", CultureInfo.InvariantCulture)}); such coefficients cannot occur together (e.g. r(a,b) = r(b,c) = 0.9 with r(a,c) = −0.9)."),
                nameof(correlations));
        }

        return (pairs.ToArray(), matrix);

        int Find(string name, int k) => index.TryGetValue(name, out int i)
            ? i
            : throw new ArgumentException(FormattableString.Invariant($"Parameter 'correlations' names '{name}' at index {k}; it is not an input (inputs: {string.Join(", ", Array.ConvertAll(inputs, x => x.Name))})."), nameof(correlations));
    }
}
