using System;
using System.Collections;
using System.Collections.Generic;
using System.Linq;
using System.Reflection;
using InternalStdCal.IO;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Hardening.BadInput;

/// <summary>
/// Every public constructor and method of the core and IO assemblies that takes a number or a collection has at
/// least one row in a bad-input table of this folder, or a justified exemption below.
/// </summary>
public class CoverageTests
{
    // Members whose numeric or collection arguments have no invalid value, with the reason.
    private static readonly Dictionary<string, string> Exempt = new(StringComparer.Ordinal)
    {
        ["Calibration.ConfidenceInterval.Contains"] = "predicate: every double is valid; NaN is documented to give false (tested in RunBadInputTests)",
        ["Run.RecoveryWindow.Contains"] = "predicate: NaN is documented to give false",
        ["Run.InternalStandardRecoveryWindow.Contains"] = "predicate: NaN is documented to give false",
        ["Run.AnalyteResult.Has"] = "flags enum: any combination is a valid question",
        ["Run.RunReport.QualifierText"] = "flags enum: any combination prints",
        ["Run.RunReport.ResultFor"] = "lookup: an unknown id gives null (documented)",
        ["Preparation.Balance.#ctor"] = "Mass arguments are valid by construction (finite, >= 0); absurd magnitudes are checked in PreparationBadInputTests.Magnitudes",
        ["Limits.BlankResult.Numeric"] = "any finite Concentration is a valid blank result (negative blanks are real data)",
        ["Decisions.SpecificationLimit.Upper"] = "any finite Concentration is a valid limit; the name overload is covered",
        ["Decisions.SpecificationLimit.Lower"] = "any finite Concentration is a valid limit; the name overload is covered",
        ["Quantities.Measured.Exact"] = "any quantity is valid; the uncertainty is zero",
        ["Quantities.Concentration.TryParse"] = "never throws by contract; returns false for bad text",
        ["Quantities.Mass.InUnitOf"] = "Mass arguments are valid by construction; a conversion overflow is covered by the ConvertTo rows",
        ["Quantities.Volume.InUnitOf"] = "Volume arguments are valid by construction; a conversion overflow is covered by the In rows",
        ["Uncertainty.UncertainInput.From"] = "Measured<T> arguments are valid by construction; the null name is covered",
    };

    [Fact]
    public void PublicMembersWithNumbersOrCollections_AllHaveABadInputRowOrAnExemption()
    {
        var covered = new HashSet<string>(StringComparer.Ordinal);
        foreach (Type t in typeof(CoverageTests).Assembly.GetTypes().Where(t => t.Namespace == typeof(CoverageTests).Namespace))
        {
            foreach (PropertyInfo p in t.GetProperties(BindingFlags.Public | BindingFlags.Static).Where(p => p.PropertyType == typeof(IEnumerable<object[]>)))
            {
                foreach (object[] row in (IEnumerable<object[]>)p.GetValue(null)!)
                {
                    foreach (object o in row)
                    {
                        if (o is BadInputCase b)
                        {
                            covered.Add(b.EntryPoint);
                        }
                        else if (o is MagnitudeCase m)
                        {
                            covered.Add(m.EntryPoint);
                        }
                    }
                }
            }
        }

        string[] missing = EntryPoints(typeof(Concentration).Assembly).Concat(EntryPoints(typeof(RunCsv).Assembly))
            .Where(e => !covered.Contains(e) && !Exempt.ContainsKey(e))
            .Distinct()
            .OrderBy(e => e, StringComparer.Ordinal)
            .ToArray();

        Assert.True(missing.Length == 0, "No bad-input row for: " + string.Join(", ", missing));
        Assert.True(covered.Count >= 150, $"Only {covered.Count} entry points covered."); // keeps the count in the report honest
    }

    private static IEnumerable<string> EntryPoints(Assembly assembly)
    {
        foreach (Type t in assembly.GetExportedTypes().Where(t => !t.IsEnum && !t.IsInterface && !typeof(Delegate).IsAssignableFrom(t)))
        {
            string prefix = t.Namespace!.Substring("InternalStdCal.".Length) + "." + t.Name + ".";
            foreach (ConstructorInfo c in t.GetConstructors().Where(c => c.GetParameters().Any(Interesting)))
            {
                yield return prefix + "#ctor";
            }

            foreach (MethodInfo m in t.GetMethods(BindingFlags.Public | BindingFlags.Static | BindingFlags.Instance | BindingFlags.DeclaredOnly)
                .Where(m => !m.IsSpecialName && m.Name is not ("Equals" or "GetHashCode" or "ToString" or "CompareTo" or "Deconstruct" or "<Clone>$" or "PrintMembers"))
                .Where(m => m.GetParameters().Any(Interesting)))
            {
                yield return prefix + m.Name;
            }
        }
    }

    // A number, a nullable number, a quantity, or a collection (strings are not collections here).
    private static bool Interesting(ParameterInfo p)
    {
        Type t = p.ParameterType.IsByRef ? p.ParameterType.GetElementType()! : p.ParameterType;
        t = Nullable.GetUnderlyingType(t) ?? t;
        return t == typeof(double) || t == typeof(int) || t == typeof(long)
            || (t.IsValueType && t.Namespace == typeof(Concentration).Namespace && !t.IsEnum)
            || (t != typeof(string) && typeof(IEnumerable).IsAssignableFrom(t));
    }
}
