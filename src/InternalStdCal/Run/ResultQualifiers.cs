using System;

namespace InternalStdCal.Run;

/// <summary>Qualifier flags of a run result: what a reviewer should look at (combinable).</summary>
[Flags]
public enum ResultQualifiers
{
    /// <summary>Nothing to report.</summary>
    None = 0,

    /// <summary>The result lies outside the calibrated range (below the lowest or above the highest non-blank standard).</summary>
    Extrapolated = 1,

    /// <summary>An injection used has an internal-standard recovery outside the method's window.</summary>
    InternalStandardRecoveryOutOfWindow = 2,

    /// <summary>The original-sample result is below the limit of quantitation (and not below the LOD), see
    /// <see cref="AnalyteResult.Reported"/>; the value is kept.</summary>
    BelowLimitOfQuantitation = 4,

    /// <summary>The original-sample result is below the limit of detection (not detected), see
    /// <see cref="AnalyteResult.Reported"/>; the value is kept.</summary>
    BelowLimitOfDetection = 8,

    /// <summary>A quality-control check bracketing an injection of the result failed.</summary>
    QualityControlFailureInBracket = 16,

    /// <summary>An injection of the result had a missing or invalid signal (missing analyte or IS signal, IS signal ≤ 0)
    /// and was set aside.</summary>
    MissingOrInvalidSignal = 32,

    /// <summary>The calibration failed its acceptance rule set.</summary>
    CalibrationRejected = 64,

    /// <summary>No value: no calibration, no valid injection, or the response could not be read off the calibration.</summary>
    NotQuantified = 128,

    /// <summary>An injection used has an analyte signal ≤ 0 (kept; blank-corrected signals scatter around zero).</summary>
    NonPositiveAnalyteSignal = 256,

    /// <summary>The sample/duplicate RPD exceeds the method's limit (or could not be computed).</summary>
    DuplicateRpdExceeded = 512,

    /// <summary>The spike recovery is outside the method's window (or could not be computed).</summary>
    SpikeRecoveryOutOfWindow = 1024,

    /// <summary>With at least 3 replicate injections used, Grubbs' test flags one injection's ratio as a suspect outlier
    /// (see <see cref="RunMethod.ReplicateOutlierSignificance"/>); it is kept in the mean.</summary>
    SuspectReplicate = 2048,
}
