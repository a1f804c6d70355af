using System;
using System.Collections.Generic;
using InternalStdCal.Internal;

namespace InternalStdCal.Calibration;

/// <summary>
/// A named set of calibration acceptance criteria, held as data: each criterion is a nullable limit (null = not
/// checked). Use a preset (<see cref="IchM10Chromatographic"/>, <see cref="UsEpa8000D"/>) or define your own with
/// object-initialiser syntax, then call <see cref="Evaluate"/>.
/// </summary>
/// <remarks>
/// <para><b>Calibrators.</b> The points judged are the fitted non-blank points of the calibration: each injection
/// when every injection was fitted, each level mean when level means were fitted. Blanks are never judged (their
/// relative error is undefined).</para>
/// <para><b>Point limit.</b> A calibrator at the lowest fitted level uses <see cref="MaxAbsRelativeErrorAtLowestLevelPercent"/>,
/// one at the highest level <see cref="MaxAbsRelativeErrorAtHighestLevelPercent"/>, each falling back to
/// <see cref="MaxAbsRelativeErrorPercent"/> when null. A calibrator passes when |%RE| ≤ its limit; one without a
/// back-calculated value fails.</para>
/// <para><b>Levels.</b> A level passes when at least <see cref="LevelPassingFraction"/> of its calibrators pass.</para>
/// <para>A criterion that applies but cannot be evaluated (e.g. RSE with no degrees of freedom) fails, with the
/// reason; a criterion for another model (e.g. r for a quadratic) is reported as not applicable.</para>
/// </remarks>
public sealed class AcceptanceRuleSet
{
    private readonly double? _maxRe;
    private readonly double? _maxReLow;
    private readonly double? _maxReHigh;
    private readonly double? _minFraction;
    private readonly double _levelFraction = 0.5;
    private readonly int? _minLevels;
    private readonly int? _minPassingLevels;
    private readonly double? _minR;
    private readonly double? _minR2;
    private readonly double? _maxRse;
    private readonly double? _maxRfRsd;

    /// <summary>Creates an empty rule set (no criteria) to be filled with object-initialiser syntax.</summary>
    /// <param name="name">Name printed in verdicts, e.g. "Lab SOP 12 rev 3"; not blank.</param>
    /// <param name="source">Where the numbers come from (document, clause, provenance); not blank.</param>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    /// <exception cref="ArgumentException">An argument is empty or white space.</exception>
    public AcceptanceRuleSet(string name, string source)
    {
        Name = NotBlank(name, nameof(name));
        Source = NotBlank(source, nameof(source));
    }

    /// <summary>
    /// ICH M10 (Bioanalytical method validation and study sample analysis, Step 4, 24 May 2022), chromatographic
    /// assays, calibration curve: back-calculated calibrators within ±15 % of nominal, ±20 % at the LLOQ; at least
    /// 75 % of calibrators and at least 6 levels meeting this; at least 6 non-zero levels.
    /// </summary>
    /// <remarks>Criteria VERIFIED (secondary: summaries of ICH M10, field-reference §4.2). The ULOQ limit equals the
    /// general ±15 %. The level rule "at least 50 % of the replicates of a level pass" is FROM MEMORY.</remarks>
    public static AcceptanceRuleSet IchM10Chromatographic { get; } = new(
        "ICH M10 chromatographic calibration",
        "ICH M10 Step 4 (2022-05-24), §3 chromatography, calibration curve and range: ±15 % (±20 % at LLOQ), ≥ 75 % of calibrators, ≥ 6 levels — VERIFIED (secondary, field-reference §4.2); 50 % per replicated level — FROM MEMORY")
    {
        MaxAbsRelativeErrorPercent = 15,
        MaxAbsRelativeErrorAtLowestLevelPercent = 20,
        MinFractionOfCalibratorsPassing = 0.75,
        LevelPassingFraction = 0.5,
        MinLevels = 6,
        MinPassingLevels = 6,
    };

    /// <summary>
    /// US EPA SW-846 Method 8000D (Rev. 5, 2018) initial calibration: average response factor acceptable when the
    /// RSD of the RFs ≤ 20 %; straight line (not through the origin) r ≥ 0.995; quadratic R² ≥ 0.99; relative
    /// standard error ≤ 20 % for any model.
    /// </summary>
    /// <remarks>Method existence and revision VERIFIED; the numbers are FROM MEMORY (8000C/8000D lineage; the
    /// RSD ≤ 20 % statement VERIFIED secondary) — field-reference §4.1. 8000D offers RSE as an alternative or
    /// additional measure; this preset applies it in addition (the stricter reading). The method-specific RSD limit
    /// may differ; copy the preset with your method's limit where it does.</remarks>
    public static AcceptanceRuleSet UsEpa8000D { get; } = new(
        "US EPA SW-846 8000D initial calibration",
        "US EPA SW-846 Method 8000D Rev. 5 (2018): RF %RSD ≤ 20 % (VERIFIED secondary), linear r ≥ 0.995, non-linear R² ≥ 0.99, RSE ≤ 20 % (FROM MEMORY) — field-reference §4.1")
    {
        MaxResponseFactorRsdPercent = 20,
        MinCorrelationCoefficientLinear = 0.995,
        MinCoefficientOfDeterminationNonLinear = 0.99,
        MaxRelativeStandardErrorPercent = 20,
    };

    /// <summary>Name printed in verdicts.</summary>
    public string Name { get; }

    /// <summary>Where the criteria come from, with provenance.</summary>
    public string Source { get; }

    /// <summary>Maximum |%RE| of a back-calculated calibrator, in % (&gt; 0); null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or ≤ 0.</exception>
    public double? MaxAbsRelativeErrorPercent { get => _maxRe; init => _maxRe = PositiveOrNull(value, nameof(MaxAbsRelativeErrorPercent)); }

    /// <summary>Maximum |%RE| at the lowest fitted level (LLOQ), in %; null = use <see cref="MaxAbsRelativeErrorPercent"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or ≤ 0.</exception>
    public double? MaxAbsRelativeErrorAtLowestLevelPercent { get => _maxReLow; init => _maxReLow = PositiveOrNull(value, nameof(MaxAbsRelativeErrorAtLowestLevelPercent)); }

    /// <summary>Maximum |%RE| at the highest fitted level (ULOQ), in %; null = use <see cref="MaxAbsRelativeErrorPercent"/>.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or ≤ 0.</exception>
    public double? MaxAbsRelativeErrorAtHighestLevelPercent { get => _maxReHigh; init => _maxReHigh = PositiveOrNull(value, nameof(MaxAbsRelativeErrorAtHighestLevelPercent)); }

    /// <summary>Minimum fraction of calibrators within their limit, in (0, 1]; null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 1].</exception>
    public double? MinFractionOfCalibratorsPassing
    {
        get => _minFraction;
        init => _minFraction = value is double v ? Guard.InLeftOpenRange(v, 0, 1, nameof(MinFractionOfCalibratorsPassing)) : null;
    }

    /// <summary>A level passes when at least this fraction of its calibrators pass, in (0, 1]. Default 0.5.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 1].</exception>
    public double LevelPassingFraction { get => _levelFraction; init => _levelFraction = Guard.InLeftOpenRange(value, 0, 1, nameof(LevelPassingFraction)); }

    /// <summary>Minimum number of fitted non-blank levels (≥ 1); null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Less than 1.</exception>
    public int? MinLevels { get => _minLevels; init => _minLevels = value is int v ? Guard.AtLeast(v, 1, nameof(MinLevels)) : null; }

    /// <summary>Minimum number of passing levels (≥ 1); null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Less than 1.</exception>
    public int? MinPassingLevels { get => _minPassingLevels; init => _minPassingLevels = value is int v ? Guard.AtLeast(v, 1, nameof(MinPassingLevels)) : null; }

    /// <summary>Minimum correlation coefficient r of a straight line with intercept (<see cref="RatioModel.Linear"/>),
    /// in (0, 1]; null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 1].</exception>
    public double? MinCorrelationCoefficientLinear
    {
        get => _minR;
        init => _minR = value is double v ? Guard.InLeftOpenRange(v, 0, 1, nameof(MinCorrelationCoefficientLinear)) : null;
    }

    /// <summary>Minimum coefficient of determination R² of a quadratic (<see cref="RatioModel.Quadratic"/>), in (0, 1];
    /// null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not in (0, 1].</exception>
    public double? MinCoefficientOfDeterminationNonLinear
    {
        get => _minR2;
        init => _minR2 = value is double v ? Guard.InLeftOpenRange(v, 0, 1, nameof(MinCoefficientOfDeterminationNonLinear)) : null;
    }

    /// <summary>Maximum relative standard error (US EPA 8000D) in % (&gt; 0), any model; null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or ≤ 0.</exception>
    public double? MaxRelativeStandardErrorPercent { get => _maxRse; init => _maxRse = PositiveOrNull(value, nameof(MaxRelativeStandardErrorPercent)); }

    /// <summary>Maximum %RSD of the response factors (response-factor models) in % (&gt; 0); null = not checked.</summary>
    /// <exception cref="ArgumentOutOfRangeException">Not finite or ≤ 0.</exception>
    public double? MaxResponseFactorRsdPercent { get => _maxRfRsd; init => _maxRfRsd = PositiveOrNull(value, nameof(MaxResponseFactorRsdPercent)); }

    /// <summary>Judges a calibration against every criterion of this rule set.</summary>
    /// <param name="calibration">The calibration.</param>
    /// <returns>The verdict, listing every criterion and every calibrator with its outcome.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="calibration"/> is null.</exception>
    public AcceptanceVerdict Evaluate(RatioCalibration calibration) =>
        AcceptanceEvaluator.Evaluate(this, Guard.NotNull(calibration, nameof(calibration)));

    /// <inheritdoc />
    public override string ToString() => Name + " (" + Source + ")";

    private static double? PositiveOrNull(double? value, string paramName) =>
        value is double v ? Guard.Positive(v, paramName) : null;

    private static string NotBlank(string value, string paramName)
    {
        Guard.NotNull(value, paramName);
        if (string.IsNullOrWhiteSpace(value))
        {
            throw new ArgumentException($"Parameter '{paramName}' is empty or white space.", paramName);
        }

        return value;
    }
}
