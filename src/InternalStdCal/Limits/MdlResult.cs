using System.Collections.Generic;
using InternalStdCal.Quantities;

namespace InternalStdCal.Limits;

/// <summary>Method detection limit by 40 CFR Part 136 Appendix B, Revision 2 (<see cref="MethodDetectionLimit"/>), with
/// both parts and what was used. Immutable; all concentrations in the unit of the spiking level.</summary>
public sealed class MdlResult
{
    internal MdlResult(Concentration mdl, Concentration spikedMdl, Concentration? blankMdl, MdlBlankCase blankCase, int spikedCount, Concentration spikedMean, Concentration spikedStandardDeviation, double spikedT, int blankCount, int numericBlankCount, Concentration? blankMean, Concentration? blankStandardDeviation, double? blankT, Concentration spikeLevel, IReadOnlyList<string> warnings, string formula)
    {
        Mdl = mdl;
        SpikedMdl = spikedMdl;
        BlankMdl = blankMdl;
        BlankCase = blankCase;
        SpikedCount = spikedCount;
        SpikedMean = spikedMean;
        SpikedStandardDeviation = spikedStandardDeviation;
        SpikedT = spikedT;
        BlankCount = blankCount;
        NumericBlankCount = numericBlankCount;
        BlankMean = blankMean;
        BlankStandardDeviation = blankStandardDeviation;
        BlankT = blankT;
        SpikeLevel = spikeLevel;
        Warnings = warnings;
        Formula = formula;
    }

    /// <summary>The MDL: max(MDL_S, MDL_b), or MDL_S when MDL_b does not apply.</summary>
    public Concentration Mdl { get; }

    /// <summary>MDL_S = t(0.99, n_s − 1)·S_s.</summary>
    public Concentration SpikedMdl { get; }

    /// <summary>MDL_b; null when it does not apply (<see cref="MdlBlankCase.NotApplicable"/>).</summary>
    public Concentration? BlankMdl { get; }

    /// <summary>The rule that gave MDL_b.</summary>
    public MdlBlankCase BlankCase { get; }

    /// <summary>True when MDL_b is larger than MDL_S and so sets the MDL.</summary>
    public bool IsSetByBlanks => BlankMdl is Concentration b && b > SpikedMdl;

    /// <summary>n_s.</summary>
    public int SpikedCount { get; }

    /// <summary>Mean of the spiked results.</summary>
    public Concentration SpikedMean { get; }

    /// <summary>S_s, the σ used for MDL_S (SD of the spiked results, n_s − 1).</summary>
    public Concentration SpikedStandardDeviation { get; }

    /// <summary>t(0.99, n_s − 1).</summary>
    public double SpikedT { get; }

    /// <summary>n_b, all blanks.</summary>
    public int BlankCount { get; }

    /// <summary>Blanks with a numeric result.</summary>
    public int NumericBlankCount { get; }

    /// <summary>X̄_b as computed (before a negative mean is taken as 0); only in the <see cref="MdlBlankCase.MeanPlusTTimesSd"/> case.</summary>
    public Concentration? BlankMean { get; }

    /// <summary>S_b, the σ used for MDL_b; only in the <see cref="MdlBlankCase.MeanPlusTTimesSd"/> case.</summary>
    public Concentration? BlankStandardDeviation { get; }

    /// <summary>t(0.99, n_b − 1); only in the <see cref="MdlBlankCase.MeanPlusTTimesSd"/> case.</summary>
    public double? BlankT { get; }

    /// <summary>The spiking level given.</summary>
    public Concentration SpikeLevel { get; }

    /// <summary>Conditions of the procedure that were not met (fewer than 7 blanks, spike level outside 2–10 × MDL, …).</summary>
    public IReadOnlyList<string> Warnings { get; }

    /// <summary>The formulas with the numbers used.</summary>
    public string Formula { get; }

    /// <summary>The regulation.</summary>
    public string Source { get; } = "US EPA 40 CFR Part 136 Appendix B, Definition and Procedure for the Determination of the Method Detection Limit, Revision 2";

    /// <summary>Prints "MDL = … (formula; source)" followed by any warnings.</summary>
    /// <returns>The text.</returns>
    public override string ToString() =>
        "MDL = " + Mdl.ToString("G6", null) + " (" + Formula + "; " + Source + ")" + (Warnings.Count == 0 ? string.Empty : "; warnings: " + string.Join(" ", Warnings));
}
