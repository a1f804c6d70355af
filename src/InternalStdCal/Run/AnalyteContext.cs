using InternalStdCal.Calibration;
using InternalStdCal.Quantities;

namespace InternalStdCal.Run;

/// <summary>What every result of one analyte in a processed run shares: its method, calibration and IS, and where its
/// signals sit in the processor's per-row arrays. One per analyte and run; immutable once the calibration is set.</summary>
internal sealed class AnalyteContext
{
    internal AnalyteContext(RunMethod runMethod, AnalyteMethod method, int index, int internalStandardIndex, Concentration internalStandardConcentration, AnalyteCalibration calibration)
    {
        RunMethod = runMethod;
        Method = method;
        Index = index;
        InternalStandardIndex = internalStandardIndex;
        InternalStandardConcentration = internalStandardConcentration;
        Calibration = calibration;
        CalibrationFailedNote = calibration.Calibration is not null && !calibration.IsAccepted ? "The calibration failed " + calibration.Verdict!.RuleSet.Name + "." : null;
    }

    internal RunMethod RunMethod { get; }

    internal AnalyteMethod Method { get; }

    internal string Analyte => Method.Analyte;

    /// <summary>Index of the analyte in the method.</summary>
    internal int Index { get; }

    /// <summary>Index of the analyte's IS in the run.</summary>
    internal int InternalStandardIndex { get; }

    /// <summary>IS concentration in the measured solutions (from the method).</summary>
    internal Concentration InternalStandardConcentration { get; }

    internal AnalyteCalibration Calibration { get; }

    /// <summary>The note every quantified result carries when the calibration was rejected (one string for all).</summary>
    internal string? CalibrationFailedNote { get; }
}
