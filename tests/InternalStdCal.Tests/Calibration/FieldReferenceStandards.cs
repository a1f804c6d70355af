using System.Collections.Generic;
using System.Linq;
using InternalStdCal.Calibration;
using InternalStdCal.Quantities;

namespace InternalStdCal.Tests.Calibration;

/// <summary>Calibration data sets from the field reference, as typed standards.</summary>
internal static class FieldReferenceStandards
{
    /// <summary>Field-reference §0 constructed RF data set (COMPUTED; areas invented for testing), C_is = 5.
    /// The reference gives no unit; µg/L is used here.</summary>
    internal static IReadOnlyList<CalibrationStandard> ConstructedRf()
    {
        double[] cx = { 1, 2, 5, 10, 20 };
        double[] ax = { 10250, 20900, 50100, 103500, 199000 };
        double[] ais = { 50000, 51200, 49500, 50800, 49800 };
        return cx.Select((c, i) => CalibrationStandard.Create(
            "CAL-" + (i + 1).ToString(System.Globalization.CultureInfo.InvariantCulture),
            Ug(c),
            Ug(5),
            new Injection(ax[i], ais[i]))).ToList();
    }

    /// <summary>Field-reference §1.2 fluorescence data (data FROM MEMORY of Miller &amp; Miller, numbers COMPUTED):
    /// x = 0…12 pg/mL, y = fluorescence. Expressed as ratios y/1 with a constant IS; unit ng/L (= pg/mL).</summary>
    internal static IReadOnlyList<CalibrationStandard> Fluorescence()
    {
        double[] x = { 0, 2, 4, 6, 8, 10, 12 };
        double[] y = { 2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7 };
        return x.Select((c, i) => CalibrationStandard.Create(
            "F" + c.ToString(System.Globalization.CultureInfo.InvariantCulture),
            Concentration.From(c, ConcentrationUnit.NanogramPerLitre),
            Concentration.From(1, ConcentrationUnit.NanogramPerLitre),
            new Injection(y[i], 1))).ToList();
    }

    /// <summary>Field-reference §2.2 weighted example (data FROM MEMORY of Miller &amp; Miller, numbers COMPUTED):
    /// x = 0…50, y = absorbance, with the response SDs <see cref="AbsorbanceSds"/>. Unit µg/L, constant IS.</summary>
    internal static IReadOnlyList<CalibrationStandard> Absorbance()
    {
        double[] x = { 0, 10, 20, 30, 40, 50 };
        double[] y = { 0.009, 0.158, 0.301, 0.472, 0.577, 0.739 };
        return x.Select((c, i) => CalibrationStandard.Create(
            "A" + c.ToString(System.Globalization.CultureInfo.InvariantCulture),
            Ug(c),
            Ug(1),
            new Injection(y[i], 1))).ToList();
    }

    /// <summary>Response SDs s_i of the §2.2 example (FROM MEMORY).</summary>
    internal static double[] AbsorbanceSds => new[] { 0.001, 0.004, 0.010, 0.013, 0.017, 0.022 };

    internal static Concentration Ug(double value) => Concentration.FromMicrogramsPerLitre(value);
}
