using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Calibration;

/// <summary>
/// The standards of one calibration, checked and converted to one unit, with the x values of the chosen axis and
/// the list of fit points (every injection or level means, blanks kept or excluded).
/// </summary>
internal sealed class StandardSet
{
    // Relative tolerance for "same IS concentration" after unit conversion (one rounding per conversion).
    private const double SameIsTolerance = 1e-9;

    private StandardSet(
        IReadOnlyList<CalibrationStandard> standards,
        ConcentrationUnit unit,
        CalibrationOptions options,
        double[] analyte,
        double[] internalStandard,
        double[] axisValues,
        bool[] included,
        double referenceIs,
        IReadOnlyList<FitPoint> points)
    {
        Standards = standards;
        Unit = unit;
        Options = options;
        Analyte = analyte;
        InternalStandard = internalStandard;
        AxisValues = axisValues;
        Included = included;
        ReferenceIs = referenceIs;
        Points = points;
    }

    internal IReadOnlyList<CalibrationStandard> Standards { get; }

    internal ConcentrationUnit Unit { get; }

    internal CalibrationOptions Options { get; }

    /// <summary>Nominal analyte concentration of each standard, in <see cref="Unit"/>.</summary>
    internal double[] Analyte { get; }

    /// <summary>IS concentration of each standard, in <see cref="Unit"/>.</summary>
    internal double[] InternalStandard { get; }

    /// <summary>x of each standard on the calibration axis.</summary>
    internal double[] AxisValues { get; }

    /// <summary>Whether each standard enters the fit.</summary>
    internal bool[] Included { get; }

    /// <summary>IS concentration (in <see cref="Unit"/>) that turns an axis value into a concentration ratio:
    /// the common IS concentration for <see cref="CalibrationAxis.AnalyteConcentration"/>, 1 for the ratio axis.</summary>
    internal double ReferenceIs { get; }

    internal IReadOnlyList<FitPoint> Points { get; }

    internal int IncludedLevelCount
    {
        get
        {
            int count = 0;
            foreach (bool b in Included)
            {
                count += b ? 1 : 0;
            }

            return count;
        }
    }

    internal static StandardSet Create(IReadOnlyList<CalibrationStandard>? standards, CalibrationOptions? options)
    {
        Guard.NotEmpty(standards, nameof(standards));
        options ??= CalibrationOptions.Default;
        var labels = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < standards!.Count; i++)
        {
            if (standards[i] is null)
            {
                throw new ArgumentNullException(nameof(standards), FormattableString.Invariant($"Parameter 'standards' has a null element at index {i}."));
            }

            if (!labels.Add(standards[i].Label))
            {
                throw new ArgumentException($"Parameter 'standards' has two standards labelled '{standards[i].Label}'; labels must be unique so results can be traced.", nameof(standards));
            }
        }

        ConcentrationUnit unit = options.Unit ?? standards[0].AnalyteConcentration.Unit;
        ConcentrationKind kind = Concentration.KindOf(unit);
        int n = standards.Count;
        double[] analyte = new double[n];
        double[] internalStandard = new double[n];
        for (int i = 0; i < n; i++)
        {
            CalibrationStandard s = standards[i];
            analyte[i] = InUnit(s.AnalyteConcentration, unit, kind, s.Label, "analyte", nameof(standards));
            internalStandard[i] = InUnit(s.InternalStandardConcentration, unit, kind, s.Label, "internal-standard", nameof(standards));
        }

        double referenceIs = 1;
        double[] axis = new double[n];
        if (options.Axis == CalibrationAxis.AnalyteConcentration)
        {
            referenceIs = internalStandard[0];
            for (int i = 0; i < n; i++)
            {
                if (Math.Abs(internalStandard[i] - referenceIs) > SameIsTolerance * referenceIs)
                {
                    throw new ArgumentException(
                        $"Parameter 'standards': standard '{standards[i].Label}' has IS concentration {standards[i].InternalStandardConcentration} but '{standards[0].Label}' has {standards[0].InternalStandardConcentration}; "
                        + "with CalibrationAxis.AnalyteConcentration every standard must carry the same IS concentration. Use CalibrationAxis.ConcentrationRatio for a variable IS concentration.",
                        nameof(standards));
                }

                axis[i] = analyte[i];
            }
        }
        else
        {
            for (int i = 0; i < n; i++)
            {
                axis[i] = analyte[i] / internalStandard[i];
            }
        }

        bool[] included = new bool[n];
        var points = new List<FitPoint>();
        for (int i = 0; i < n; i++)
        {
            CalibrationStandard s = standards[i];
            included[i] = !(s.IsBlank && options.Blanks == BlankHandling.Exclude);
            if (!included[i])
            {
                continue;
            }

            if (options.Replicates == ReplicateHandling.LevelMeans)
            {
                points.Add(new FitPoint(i, -1, axis[i], MeanRatio(s)));
            }
            else
            {
                for (int j = 0; j < s.Injections.Count; j++)
                {
                    points.Add(new FitPoint(i, j, axis[i], s.Injections[j].Ratio));
                }
            }
        }

        if (points.Count == 0)
        {
            throw new ArgumentException("Parameter 'standards' holds only blanks and BlankHandling.Exclude leaves nothing to fit.", nameof(standards));
        }

        return new StandardSet(standards, unit, options, analyte, internalStandard, axis, included, referenceIs, points);
    }

    /// <summary>The concentration, in <see cref="Unit"/>, of a solution with IS concentration
    /// <paramref name="isConcentration"/> whose x on the calibration axis is <paramref name="axisValue"/>.</summary>
    internal double ToConcentration(double axisValue, double isConcentration) =>
        Options.Axis == CalibrationAxis.AnalyteConcentration
            ? axisValue * (isConcentration / ReferenceIs)
            : axisValue * isConcentration;

    /// <summary>x on the calibration axis for a solution with the given concentrations (both in <see cref="Unit"/>).</summary>
    internal double ToAxis(double analyteConcentration, double isConcentration) =>
        Options.Axis == CalibrationAxis.AnalyteConcentration
            ? analyteConcentration * (ReferenceIs / isConcentration)
            : analyteConcentration / isConcentration;

    internal static double MeanRatio(CalibrationStandard standard)
    {
        double sum = 0;
        foreach (Injection injection in standard.Injections)
        {
            sum += injection.Ratio;
        }

        return sum / standard.Injections.Count;
    }

    internal string Symbol => Concentration.SymbolOf(Unit);

    internal string AxisSymbol => Options.Axis == CalibrationAxis.AnalyteConcentration ? Symbol : "1";

    private static double InUnit(Concentration value, ConcentrationUnit unit, ConcentrationKind kind, string label, string what, string paramName)
    {
        if (value.Kind != kind)
        {
            throw new ArgumentException(
                string.Format(
                    CultureInfo.InvariantCulture,
                    "Parameter '{6}': the {0} concentration of standard '{1}' is {2} ({3}), but the calibration unit {4} is a {5}; all concentrations of a calibration must be of one kind (convert with a MolarMass or Density first).",
                    what,
                    label,
                    value,
                    value.Kind,
                    Concentration.SymbolOf(unit),
                    kind,
                    paramName),
                paramName);
        }

        return value.In(unit);
    }
}

/// <summary>One calibration point: the standard it comes from, the injection (−1 for a level mean), x and y.</summary>
internal readonly struct FitPoint
{
    internal FitPoint(int standard, int injection, double x, double y)
    {
        Standard = standard;
        Injection = injection;
        X = x;
        Y = y;
    }

    internal int Standard { get; }

    internal int Injection { get; }

    internal double X { get; }

    internal double Y { get; }
}
