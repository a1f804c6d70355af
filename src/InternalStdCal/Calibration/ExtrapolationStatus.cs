namespace InternalStdCal.Calibration;

/// <summary>Where an inversely predicted x lies relative to the standards of the calibration.</summary>
public enum ExtrapolationStatus
{
    /// <summary>Inside the closed range [lowest standard, highest standard].</summary>
    WithinRange = 0,

    /// <summary>Below the lowest standard's x.</summary>
    BelowLowestStandard = 1,

    /// <summary>Above the highest standard's x.</summary>
    AboveHighestStandard = 2,
}
