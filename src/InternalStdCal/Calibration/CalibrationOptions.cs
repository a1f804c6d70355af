using System;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>What the calibration's x axis is.</summary>
public enum CalibrationAxis
{
    /// <summary>x = analyte concentration; every standard (and every sample) carries the same IS concentration.</summary>
    AnalyteConcentration = 0,

    /// <summary>x = analyte concentration / IS concentration (dimensionless); the IS concentration may differ between
    /// standards and samples.</summary>
    ConcentrationRatio,
}

/// <summary>How replicate injections of a standard enter the fit.</summary>
public enum ReplicateHandling
{
    /// <summary>Every injection is a separate calibration point (the default; keeps the replicate information in
    /// the residual variance and the degrees of freedom).</summary>
    EveryInjection = 0,

    /// <summary>Each standard contributes one point: the mean response ratio of its injections.</summary>
    LevelMeans,
}

/// <summary>How blanks (standards with analyte concentration 0) are treated.</summary>
public enum BlankHandling
{
    /// <summary>Blanks are calibration points like any other. A weighting undefined at x = 0 (1/x, 1/x²) is then
    /// refused, and the response-factor model (undefined at 0) is refused.</summary>
    Include = 0,

    /// <summary>Blanks are left out of the fit; they are still listed in the result, marked as excluded, and
    /// back-calculated for information.</summary>
    Exclude,
}

/// <summary>
/// Settings of a ratio calibration. Immutable; each property is validated when it is set.
/// </summary>
/// <remarks>Defaults: x = analyte concentration, every injection fitted, blanks included, unit of the first
/// standard, 95 % confidence, significance level 0.01 for the F tests (the 99 % level of ISO 8466-1).</remarks>
public sealed class CalibrationOptions
{
    private readonly CalibrationAxis _axis;
    private readonly ReplicateHandling _replicates;
    private readonly BlankHandling _blanks;
    private readonly ConcentrationUnit? _unit;
    private readonly double _confidenceLevel = 0.95;
    private readonly double _significanceLevel = 0.01;

    /// <summary>The default options.</summary>
    public static CalibrationOptions Default { get; } = new();

    /// <summary>What x is. Default <see cref="CalibrationAxis.AnalyteConcentration"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not defined.</exception>
    public CalibrationAxis Axis
    {
        get => _axis;
        init => _axis = Defined(value, nameof(Axis));
    }

    /// <summary>How replicate injections are fitted. Default <see cref="ReplicateHandling.EveryInjection"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not defined.</exception>
    public ReplicateHandling Replicates
    {
        get => _replicates;
        init => _replicates = Defined(value, nameof(Replicates));
    }

    /// <summary>How blanks are treated. Default <see cref="BlankHandling.Include"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not defined.</exception>
    public BlankHandling Blanks
    {
        get => _blanks;
        init => _blanks = Defined(value, nameof(Blanks));
    }

    /// <summary>The unit of the calibration (concentrations of all standards are converted to it); null means the
    /// unit of the first standard's analyte concentration. Must be of the standards' kind.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The unit is not defined.</exception>
    public ConcentrationUnit? Unit
    {
        get => _unit;
        init
        {
            if (value is ConcentrationUnit u)
            {
                UnitTable.Of(u);
            }

            _unit = value;
        }
    }

    /// <summary>Confidence level of coefficient and prediction intervals, in (0, 1). Default 0.95.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not in (0, 1).</exception>
    public double ConfidenceLevel
    {
        get => _confidenceLevel;
        init => _confidenceLevel = Guard.InOpenRange(value, 0, 1, nameof(ConfidenceLevel));
    }

    /// <summary>Significance level α of the F tests (lack of fit, Mandel, variance homogeneity), in (0, 0.5).
    /// Default 0.01, i.e. the 99 % quantiles ISO 8466-1 uses.</summary>
    /// <exception cref="ArgumentOutOfRangeException">The value is not in (0, 0.5).</exception>
    public double SignificanceLevel
    {
        get => _significanceLevel;
        init => _significanceLevel = Guard.InOpenRange(value, 0, 0.5, nameof(SignificanceLevel));
    }

    private static T Defined<T>(T value, string paramName)
        where T : struct, Enum
    {
#if NET
        bool defined = Enum.IsDefined(value);
        string[] names = Enum.GetNames<T>();
#else
        bool defined = Enum.IsDefined(typeof(T), value);
        string[] names = Enum.GetNames(typeof(T));
#endif
        if (!defined)
        {
            throw new ArgumentOutOfRangeException(paramName, value, $"Parameter '{paramName}' was {value}; it must be one of {string.Join(", ", names)}.");
        }

        return value;
    }
}
