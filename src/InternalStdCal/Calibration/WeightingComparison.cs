using System;
using System.Collections.Generic;
using System.Linq;
using System.Text;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>One weighting tried by <see cref="WeightingComparison"/>: its calibration and score, or why it was refused.</summary>
public sealed class WeightingCandidate
{
    internal WeightingCandidate(string name, Weighting? weighting, RegressionCalibration? calibration, double? sumAbsRelativeError, int? rank, string? refusal)
    {
        Rank = rank;
        Name = name;
        Weighting = weighting;
        Calibration = calibration;
        SumAbsRelativeErrorPercent = sumAbsRelativeError;
        Refusal = refusal;
    }

    /// <summary>Name of the weighting ("none", "1/x", …, "1/s² (replicates)").</summary>
    public string Name { get; }

    /// <summary>The weighting; null when it could not even be formed (1/s² without replicates).</summary>
    public Weighting? Weighting { get; }

    /// <summary>The fitted calibration; null when refused.</summary>
    public RegressionCalibration? Calibration { get; }

    /// <summary>Σ|%RE| over the fitted non-blank points, in %; null when refused.</summary>
    public double? SumAbsRelativeErrorPercent { get; }

    /// <summary>Rank by <see cref="SumAbsRelativeErrorPercent"/> (1 = best); null when refused.</summary>
    public int? Rank { get; }

    /// <summary>Why the weighting could not be used; null when it was fitted.</summary>
    public string? Refusal { get; }

    /// <summary>True when the weighting was refused.</summary>
    public bool IsRefused => Refusal is not null;
}

/// <summary>
/// Fits one model with several weightings and ranks them by the sum of absolute relative errors of the
/// back-calculated standards, Σ|%RE| (the smaller, the better the curve reproduces its own standards), listing the
/// weightings that were refused and why (e.g. 1/x with a blank).
/// </summary>
/// <remarks>Ranking by Σ|%RE| is common practice in bioanalysis (no published source); the ISO 8466-1
/// variance-homogeneity check of the unweighted fit is quoted as the statistical motivation for weighting.</remarks>
public sealed class WeightingComparison
{
    private WeightingComparison(CalibrationModel model, IReadOnlyList<WeightingCandidate> candidates, VarianceHomogeneityTest? homogeneity)
    {
        Model = model;
        Candidates = candidates;
        VarianceHomogeneity = homogeneity;
    }

    /// <summary>The model compared.</summary>
    public CalibrationModel Model { get; }

    /// <summary>Fitted candidates in rank order, followed by the refused ones in the order tried.</summary>
    public IReadOnlyList<WeightingCandidate> Candidates { get; }

    /// <summary>The best-ranked candidate; null when every weighting was refused.</summary>
    public WeightingCandidate? Best => Candidates.FirstOrDefault(c => c.Rank == 1);

    /// <summary>ISO 8466-1 variance-homogeneity check of the unweighted fit's data; null without replicates at both ends.</summary>
    public VarianceHomogeneityTest? VarianceHomogeneity { get; }

    /// <summary>Fits <paramref name="model"/> with each weighting and ranks them.</summary>
    /// <param name="standards">The standards.</param>
    /// <param name="model">The model.</param>
    /// <param name="options">Options; null for the defaults.</param>
    /// <param name="weightings">Weightings to try; null for none, 1/x, 1/x², 1/y, 1/y² and 1/s² from the replicates
    /// (<see cref="RegressionCalibration.ReplicateVarianceWeighting"/>).</param>
    /// <returns>The comparison.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="standards"/> or an element of a list is null.</exception>
    /// <exception cref="ArgumentException">The standards themselves are invalid (checked before any weighting).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="model"/> is not defined.</exception>
    public static WeightingComparison Compare(IReadOnlyList<CalibrationStandard> standards, CalibrationModel model, CalibrationOptions? options = null, IEnumerable<Weighting>? weightings = null)
    {
        StandardSet set = StandardSet.Create(standards, options);
        if (model is < CalibrationModel.Linear or > CalibrationModel.Quadratic)
        {
            throw new ArgumentOutOfRangeException(nameof(model), model, $"Parameter 'model' was {model}; it must be Linear, LinearThroughOrigin or Quadratic.");
        }

        var tried = new List<(string Name, Func<Weighting> Make)>();
        if (weightings is null)
        {
            foreach (Weighting w in new[] { Weighting.None, Weighting.InverseX, Weighting.InverseXSquared, Weighting.InverseY, Weighting.InverseYSquared })
            {
                tried.Add((w.Name, () => w));
            }

            tried.Add(("1/s² (replicates)", () => RegressionCalibration.ReplicateVarianceWeighting(standards, set.Options)));
        }
        else
        {
            foreach (Weighting w in weightings)
            {
                Weighting checkedW = Guard.NotNull(w, nameof(weightings));
                tried.Add((checkedW.ToString(), () => checkedW));
            }
        }

        var fitted = new List<(string Name, Weighting W, RegressionCalibration Cal, double Sum)>();
        var refused = new List<WeightingCandidate>();
        foreach ((string name, Func<Weighting> make) in tried)
        {
            Weighting? weighting = null;
            try
            {
                weighting = make();
                RegressionCalibration cal = RegressionCalibration.Fit(standards, model, weighting, set.Options);
                double sum = 0;
                string? missing = null;
                foreach (CalibratorPoint c in cal.Calibrators())
                {
                    if (c.RelativeErrorPercent is double re)
                    {
                        sum += Math.Abs(re);
                    }
                    else
                    {
                        missing ??= c.Id;
                    }
                }

                if (missing is null)
                {
                    fitted.Add((name, weighting, cal, sum));
                }
                else
                {
                    refused.Add(new WeightingCandidate(name, weighting, null, null, null, "point '" + missing + "' cannot be back-calculated, so Σ|%RE| is undefined"));
                }
            }
            catch (Exception e) when (e is ArgumentException or InvalidOperationException)
            {
                refused.Add(new WeightingCandidate(name, weighting, null, null, null, e.Message));
            }
        }

        List<WeightingCandidate> ranked = fitted
            .OrderBy(f => f.Sum)
            .Select((f, i) => new WeightingCandidate(f.Name, f.W, f.Cal, f.Sum, i + 1, null))
            .ToList();

        var notes = new List<string>();
        VarianceHomogeneityTest? homogeneity = VarianceHomogeneityTest.Compute(set, set.Options.SignificanceLevel, notes);
        return new WeightingComparison(model, ranked.Concat(refused).ToList(), homogeneity);
    }

    /// <summary>Readable ranking with the reason for the choice and for every refusal.</summary>
    /// <returns>Multi-line text.</returns>
    public override string ToString()
    {
        var sb = new StringBuilder();
        sb.Append("Weighting comparison, ").Append(Model).AppendLine(" model (ranked by Σ|%RE| of the back-calculated standards):");
        foreach (WeightingCandidate c in Candidates)
        {
            if (c.Rank is int rank)
            {
                RegressionCalibration cal = c.Calibration!;
                sb.Append("  ").Append(Text.I(rank)).Append(". ").Append(Text.Pad(c.Name, 20))
                    .Append("Σ|%RE| = ").Append(Text.Pad(Text.F(c.SumAbsRelativeErrorPercent!.Value, 2) + " %", 12))
                    .Append("max |%RE| = ").Append(Text.Pad(Text.F(MaxAbsRe(cal), 2) + " %", 11))
                    .Append("RSE = ").Append(cal.RelativeStandardErrorPercent is double rse ? Text.F(rse, 2) + " %" : "n/a")
                    .AppendLine();
            }
            else
            {
                sb.Append("  refused: ").Append(c.Name).Append(" — ").AppendLine(c.Refusal);
            }
        }

        if (Best is WeightingCandidate best)
        {
            sb.Append("  choice: ").Append(best.Name).Append(", the smallest Σ|%RE| of ")
                .Append(Text.I(Candidates.Count(c => c.Rank is not null))).AppendLine(" fitted weightings");
        }
        else
        {
            sb.AppendLine("  no weighting could be fitted");
        }

        sb.Append("  ").AppendLine(VarianceHomogeneity is null
            ? "variance homogeneity not checked (needs replicate injections at the lowest and highest standard)"
            : VarianceHomogeneity.ToString());
        return sb.ToString();
    }

    private static double MaxAbsRe(RatioCalibration cal) =>
        cal.Calibrators().Select(c => Math.Abs(c.RelativeErrorPercent!.Value)).DefaultIfEmpty(0).Max();
}
