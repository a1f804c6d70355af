using System;
using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;

namespace InternalStdCal.IO;

/// <summary>Cell texts shared by the CSV and JSON run formats: roles, numbers, times, quantities, preparations.
/// Every parser returns null on success and a problem message otherwise.</summary>
internal static class RunText
{
    internal const string Into = " into ";

    private static readonly (InjectionRole Role, string Token)[] Roles =
    {
        (InjectionRole.CalibrationStandard, "cal"),
        (InjectionRole.CalibrationBlank, "cal-blank"),
        (InjectionRole.MethodBlank, "method-blank"),
        (InjectionRole.QualityControl, "qc"),
        (InjectionRole.Sample, "sample"),
        (InjectionRole.SampleDuplicate, "duplicate"),
        (InjectionRole.SpikedSample, "spike"),
    };

    /// <summary>Drops a byte order mark decoded into the text (a StreamReader drops it itself; other readers may not).</summary>
    internal static string WithoutByteOrderMark(string text) => text.Length > 0 && text[0] == '\uFEFF' ? text.Substring(1) : text;

    internal static string RoleList => string.Join(", ", Roles.Select(r => r.Token));

    internal static string Token(InjectionRole role) => Roles.First(r => r.Role == role).Token;

    internal static string? Role(string text, out InjectionRole role)
    {
        string t = text.Trim();
        foreach ((InjectionRole r, string token) in Roles)
        {
            if (string.Equals(token, t, StringComparison.OrdinalIgnoreCase))
            {
                role = r;
                return null;
            }
        }

        role = default;
        return "unknown role; known roles: " + RoleList;
    }

    internal static string? Order(string text, out int order) =>
        int.TryParse(text.Trim(), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out order)
            ? null
            : "not a whole number (injection order)";

    internal static string? Signal(string text, out double value)
    {
        if (!double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out value))
        {
            return "not a number (invariant culture: '.' decimal point, no thousands separator)";
        }

        return double.IsNaN(value) || double.IsInfinity(value) ? "not a finite number; leave a missing signal empty" : null;
    }

    internal static string FormatSignal(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    internal static string? Time(string text, out DateTimeOffset time) =>
        DateTimeOffset.TryParse(text.Trim(), CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out time)
            ? null
            : "not a date and time (ISO 8601, e.g. 2026-03-14T09:30:00+01:00; without an offset it is read as UTC)";

    internal static string FormatTime(DateTimeOffset time) => time.ToString("O", CultureInfo.InvariantCulture);

    /// <summary>A concentration: "number unit", or a plain number when the column states the unit.</summary>
    internal static string? Concentration(string text, ConcentrationUnit? columnUnit, out Concentration value)
    {
        value = default;
        try
        {
            if (columnUnit is ConcentrationUnit unit)
            {
                if (!double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) || double.IsNaN(v) || double.IsInfinity(v))
                {
                    return "not a finite number (the column states the unit " + Quantities.Concentration.SymbolOf(unit) + ")";
                }

                value = Quantities.Concentration.From(v, unit);
                return null;
            }

            value = Quantities.Concentration.Parse(text.Trim());
            return null;
        }
        catch (FormatException ex)
        {
            return "not a concentration: " + ex.Message;
        }
        catch (ArgumentException ex)
        {
            return "not a concentration: " + ex.Message;
        }
    }

    internal static string? Unit(string text, out ConcentrationUnit unit)
    {
        unit = default;
        if (!Quantities.Concentration.TryParse("1 " + text.Trim(), out Concentration c))
        {
            return "not a concentration unit (e.g. µg/L, mg/kg, %)";
        }

        unit = c.Unit;
        return null;
    }

    internal static string FormatUnit(ConcentrationUnit unit) => Quantities.Concentration.SymbolOf(unit);

    internal static string FormatConcentration(Concentration c) => c.ToString();

    internal static string? Measured<T>(string text, Func<string, T> parse, out Measured<T> value)
        where T : struct, IQuantity<T>
    {
        value = default;
        string t = text.Trim();
        int pm = t.IndexOf('±');
        int width = 1;
        if (pm < 0)
        {
            pm = t.IndexOf("+-", StringComparison.Ordinal);
            width = 2;
        }

        try
        {
            if (pm < 0)
            {
                value = Quantities.Measured.Exact(parse(t));
                return null;
            }

            value = Quantities.Measured.WithStandardUncertainty(parse(t.Substring(0, pm)), parse(t.Substring(pm + width)));
            return null;
        }
        catch (FormatException ex)
        {
            return ex.Message;
        }
        catch (ArgumentException ex)
        {
            return ex.Message;
        }
    }

    internal static string FormatMeasured<T>(Measured<T> m)
        where T : struct, IQuantity<T> =>
        m.Evaluation == UncertaintyEvaluation.Exact ? m.Value.ToString(null, CultureInfo.InvariantCulture) : m.Value.ToString(null, CultureInfo.InvariantCulture) + " ± " + m.StandardUncertainty.ToString(null, CultureInfo.InvariantCulture);

    /// <summary>Dilution steps "a into b; c into d" (volumes or masses, optional "± u"), or a bare dilution factor.</summary>
    internal static string? Dilutions(string text, out DilutionStep[] steps)
    {
        steps = Array.Empty<DilutionStep>();
        var list = new List<DilutionStep>();
        foreach (string raw in text.Split(';'))
        {
            string part = raw.Trim();
            if (part.Length == 0)
            {
                continue;
            }

            string? error = Step(part, out DilutionStep? step);
            if (error is not null)
            {
                return "dilution step '" + part + "': " + error;
            }

            list.Add(step!);
        }

        steps = list.ToArray();
        return null;
    }

    internal static string FormatDilutions(IEnumerable<DilutionStep> steps) => string.Join("; ", steps.Select(FormatStep));

    internal static string FormatStep(DilutionStep step) => step switch
    {
        VolumetricDilution v when v.AliquotDensity is null => FormatMeasured(v.AliquotVolume) + Into + FormatMeasured(v.FinalVolume),
        GravimetricDilution g when g.AliquotDensity is null => FormatMeasured(g.AliquotMass) + Into + FormatMeasured(g.TotalMass),
        _ => throw new ArgumentException("Dilution step '" + step.Label + "' changes the concentration kind through a density; the run file formats hold volumetric and gravimetric steps without density only.", nameof(step)),
    };

    private static string? Step(string part, out DilutionStep? step)
    {
        step = null;
        int at = part.IndexOf(Into, StringComparison.OrdinalIgnoreCase);
        try
        {
            if (at < 0)
            {
                if (!double.TryParse(part, NumberStyles.Float, CultureInfo.InvariantCulture, out double df) || !(df > 1) || double.IsInfinity(df))
                {
                    return "expected '<aliquot> into <final>' (volumes or masses) or a dilution factor > 1";
                }

                step = DilutionStep.Volumetric(Quantities.Measured.Exact(Volume.FromMillilitres(1)), Quantities.Measured.Exact(Volume.FromMillilitres(df)));
                return null;
            }

            string a = part.Substring(0, at);
            string b = part.Substring(at + Into.Length);
            if (Measured(a, Volume.Parse, out Measured<Volume> va) is null && Measured(b, Volume.Parse, out Measured<Volume> vb) is null)
            {
                step = DilutionStep.Volumetric(va, vb);
                return null;
            }

            if (Measured(a, Mass.Parse, out Measured<Mass> ma) is null && Measured(b, Mass.Parse, out Measured<Mass> mb) is null)
            {
                step = DilutionStep.Gravimetric(ma, mb);
                return null;
            }

            return "aliquot and final amount must both be volumes (L, mL, µL) or both masses (kg, g, mg, µg), optionally with '± u'";
        }
        catch (ArgumentException ex)
        {
            return ex.Message;
        }
    }
}
