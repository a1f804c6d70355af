using System;
using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>
/// Method detection limit by US EPA 40 CFR Part 136 Appendix B, Revision 2: MDL_S from spiked samples, MDL_b from method
/// blanks, MDL = the larger.
/// </summary>
/// <remarks>
/// <para>Confirmed in the public eCFR/govregs text of Appendix B, Revision 2: the definition (the minimum measured
/// concentration that can be reported with 99 % confidence to be distinguishable from method-blank results) and the
/// method types it does not apply to; the draft text confirms at least 7 spiked samples and 7 method blanks and a spiking
/// level typically 2–10 times the estimated MDL. Recalled from the text, not re-read (from memory):
/// MDL_S = t(0.99, n_s − 1)·S_s; MDL_b: no numeric blank result → not applicable; some numeric → the highest blank
/// result; all numeric → X̄_b + t(0.99, n_b − 1)·S_b with X̄_b taken as 0 if negative; more than 100 blanks → the 99th
/// percentile of the blank results, here the result of rank round(0.99·n) (nearest whole number, halves up) in ascending
/// order, with blanks without a numeric result ranked below every numeric one.</para>
/// <para>Warnings, not exceptions: fewer than 7 blanks; spike level outside 2–10 times the resulting MDL (from memory).
/// The procedure's other conditions (at least three batches on separate dates, spread across instruments, ongoing
/// quarterly samples and annual re-evaluation) are the laboratory's to meet and are not checked here.</para>
/// <para>The library computes; the lab's validated method, its QA system, local regulations and licensed practice decide.</para>
/// </remarks>
public static class MethodDetectionLimit
{
    /// <summary>Minimum number of spiked samples (Appendix B).</summary>
    public const int MinimumSpikedSamples = 7;

    /// <summary>Minimum number of method blanks asked for (Appendix B); fewer gives a warning.</summary>
    public const int MinimumBlanks = 7;

    /// <summary>Computes MDL_S, MDL_b and the MDL.</summary>
    /// <param name="spikedResults">Measured concentrations of at least 7 spiked samples, of the kind of
    /// <paramref name="spikeLevel"/>; not all equal.</param>
    /// <param name="blankResults">Method-blank results (numeric or explicitly without a numeric result); may be empty
    /// (MDL_b then does not apply, with a warning).</param>
    /// <param name="spikeLevel">The spiking concentration, &gt; 0; results are in its unit.</param>
    /// <returns>The result with both parts, the case used for MDL_b, warnings, formula and source.</returns>
    /// <exception cref="ArgumentNullException">A list or an element of a list is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 7 spiked results, all spiked results equal (S_s = 0), a result of
    /// another kind than the spike level, or all blanks numeric but only one of them (no S_b).</exception>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="spikeLevel"/> is ≤ 0.</exception>
    public static MdlResult Compute(IReadOnlyList<Concentration> spikedResults, IReadOnlyList<BlankResult> blankResults, Concentration spikeLevel)
    {
        Guard.NotNull(spikedResults, nameof(spikedResults));
        Guard.NotNull(blankResults, nameof(blankResults));
        Guard.PositiveQuantity(spikeLevel, nameof(spikeLevel), "a spiking level");
        ConcentrationUnit unit = spikeLevel.Unit;
        if (spikedResults.Count < MinimumSpikedSamples)
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{nameof(spikedResults)}' has {spikedResults.Count} results; 40 CFR Part 136 Appendix B needs at least {MinimumSpikedSamples} spiked samples."),
                nameof(spikedResults));
        }

        double[] spiked = spikedResults.Select((c, i) => In(c, unit, nameof(spikedResults), i)).ToArray();
        int ns = spiked.Length;
        double spikedMean = SampleStatistics.Mean(spiked);
        double ss = SampleStatistics.StandardDeviation(spiked, spikedMean);
        if (!(ss > 0))
        {
            throw new ArgumentException($"Parameter '{nameof(spikedResults)}' holds {Text.I(ns)} equal results; S_s = 0 gives no MDL_S.", nameof(spikedResults));
        }

        double ts = StudentTQuantile.OneSided(0.99, ns - 1);
        double mdlS = ts * ss;
        string symbol = Concentration.SymbolOf(unit);
        var warnings = new List<string>();
        var formula = new List<string> { "MDL_S = t(0.99, n_s − 1)·S_s = " + Text.G(ts) + "·" + Text.G(ss) + " = " + Text.G(mdlS) + " " + symbol + " (n_s = " + Text.I(ns) + ")" };

        var blanks = new double?[blankResults.Count];
        for (int i = 0; i < blanks.Length; i++)
        {
            BlankResult b = blankResults[i] ?? throw new ArgumentNullException(nameof(blankResults), FormattableString.Invariant($"Parameter '{nameof(blankResults)}' has null at index {i}; use BlankResult.NoNumericResult for a blank without a number."));
            blanks[i] = b.Value is Concentration c ? In(c, unit, nameof(blankResults), i) : null;
        }

        int nb = blanks.Length;
        int numeric = blanks.Count(v => v is not null);
        if (nb < MinimumBlanks)
        {
            warnings.Add(FormattableString.Invariant($"Only {nb} method blank(s); 40 CFR Part 136 Appendix B asks for at least {MinimumBlanks}."));
        }

        MdlBlankCase blankCase;
        double? mdlB = null, blankMean = null, blankSd = null, tb = null;
        if (numeric == 0)
        {
            blankCase = MdlBlankCase.NotApplicable;
            formula.Add("MDL_b not applicable: no method blank gave a numeric result (" + Text.I(nb) + " blanks)");
        }
        else if (nb > 100)
        {
            int rank = (int)(((99L * nb) + 50) / 100); // round(0.99·n), halves up, in exact integer arithmetic
            double?[] sorted = blanks.OrderBy(v => v is null ? 0 : 1).ThenBy(v => v ?? 0).ToArray();
            if (sorted[rank - 1] is double p)
            {
                blankCase = MdlBlankCase.Percentile99;
                mdlB = p;
                formula.Add("MDL_b = 99th percentile of " + Text.I(nb) + " blanks = result of rank round(0.99·" + Text.I(nb) + ") = " + Text.I(rank) + " in ascending order = " + Text.G(p) + " " + symbol);
            }
            else
            {
                blankCase = MdlBlankCase.NotApplicable;
                formula.Add("MDL_b not applicable: the blank of rank " + Text.I(rank) + " (99th percentile of " + Text.I(nb) + ") has no numeric result");
                warnings.Add("The 99th percentile of the blanks falls on a blank without a numeric result; MDL_b does not apply.");
            }
        }
        else if (numeric < nb)
        {
            blankCase = MdlBlankCase.HighestResult;
            mdlB = blanks.Where(b => b is not null).Max(b => b!.Value);
            formula.Add("MDL_b = highest blank result = " + Text.G(mdlB.Value) + " " + symbol + " (" + Text.I(numeric) + " of " + Text.I(nb) + " blanks numeric)");
        }
        else
        {
            if (nb < 2)
            {
                throw new ArgumentException($"Parameter '{nameof(blankResults)}' has a single numeric blank; X̄_b + t·S_b needs at least 2 (7 are asked for).", nameof(blankResults));
            }

            double[] values = blanks.Select(v => v!.Value).ToArray();
            blankCase = MdlBlankCase.MeanPlusTTimesSd;
            blankMean = SampleStatistics.Mean(values);
            blankSd = SampleStatistics.StandardDeviation(values, blankMean.Value);
            tb = StudentTQuantile.OneSided(0.99, nb - 1);
            double meanUsed = Math.Max(0, blankMean.Value);
            mdlB = meanUsed + (tb.Value * blankSd.Value);
            formula.Add("MDL_b = X̄_b + t(0.99, n_b − 1)·S_b = " + Text.G(meanUsed) + " + " + Text.G(tb.Value) + "·" + Text.G(blankSd.Value) + " = " + Text.G(mdlB.Value) + " " + symbol
                + " (n_b = " + Text.I(nb) + (blankMean.Value < 0 ? ", X̄_b = " + Text.G(blankMean.Value) + " < 0 taken as 0" : string.Empty) + ")");
        }

        double mdl = mdlB is double mb ? Math.Max(mdlS, mb) : mdlS;
        formula.Add("MDL = " + (mdlB is null ? "MDL_S" : "max(MDL_S, MDL_b)") + " = " + Text.G(mdl) + " " + symbol);
        double ratio = spikeLevel.Value / mdl;
        if (ratio < 2 || ratio > 10)
        {
            warnings.Add("The spiking level " + spikeLevel.ToString("G6", null) + " is " + Text.G(ratio) + " times the MDL, outside 2–10 times (40 CFR Part 136 Appendix B chooses the spiking level at 2–10 times the estimated MDL; checking it against the resulting MDL is from memory).");
        }

        return new MdlResult(
            Concentration.From(mdl, unit),
            Concentration.From(mdlS, unit),
            mdlB is double v ? Concentration.From(v, unit) : null,
            blankCase,
            ns,
            Concentration.From(spikedMean, unit),
            Concentration.From(ss, unit),
            ts,
            nb,
            numeric,
            blankMean is double bm ? Concentration.From(bm, unit) : null,
            blankSd is double bs ? Concentration.From(bs, unit) : null,
            tb,
            spikeLevel,
            warnings,
            string.Join("; ", formula));
    }

    private static double In(Concentration value, ConcentrationUnit unit, string paramName, int index)
    {
        if (value.Kind != Concentration.KindOf(unit))
        {
            throw new ArgumentException(
                FormattableString.Invariant($"Parameter '{paramName}' has {value} ({value.Kind}) at index {index}; every result must be of the spiking level's kind ({Concentration.KindOf(unit)})."),
                paramName);
        }

        return value.In(unit);
    }
}
