namespace InternalStdCal.Run;

/// <summary>What an injection of an analytical run is for.</summary>
public enum InjectionRole
{
    /// <summary>A calibration standard of known analyte concentrations (one level of the calibration).</summary>
    CalibrationStandard = 0,

    /// <summary>The calibration blank: acid or solvent with internal standard, no analyte (nominal 0 for every
    /// analyte). It is a calibration point (see <see cref="Calibration.CalibrationOptions.Blanks"/>) and may be the
    /// reference of the internal-standard recovery.</summary>
    CalibrationBlank,

    /// <summary>A method (preparation) blank carried through the sample preparation; quantified like a sample.</summary>
    MethodBlank,

    /// <summary>A quality-control or calibration-check standard of known (nominal) concentrations; its recovery is
    /// judged against a window.</summary>
    QualityControl,

    /// <summary>A sample of unknown concentration.</summary>
    Sample,

    /// <summary>A second, independent preparation of a sample (linked to its parent); judged by the relative
    /// percent difference.</summary>
    SampleDuplicate,

    /// <summary>A sample with a known amount of analyte added (linked to its unspiked parent); judged by the spike
    /// recovery.</summary>
    SpikedSample,
}
