using System;
using System.Collections.Generic;
using System.Globalization;
using System.IO;
using System.Linq;
using System.Text.RegularExpressions;

namespace InternalStdCal.Tests.TestSupport;

/// <summary>
/// One NIST StRD linear-regression file (.dat): certified parameters with their standard deviations, residual SD,
/// R² and the (y, x) data. Layout per the folder's README: header lines 5–6 give the line ranges.
/// </summary>
internal sealed class NistStrdDataset
{
    private NistStrdDataset(string name, double[] estimates, double[] sds, double residualSd, double rSquared, double[] x, double[] y)
    {
        Name = name;
        Estimates = estimates;
        StandardDeviations = sds;
        ResidualStandardDeviation = residualSd;
        RSquared = rSquared;
        X = x;
        Y = y;
    }

    internal string Name { get; }

    internal double[] Estimates { get; }

    internal double[] StandardDeviations { get; }

    internal double ResidualStandardDeviation { get; }

    internal double RSquared { get; }

    internal double[] X { get; }

    internal double[] Y { get; }

    internal static NistStrdDataset Load(string folder, string name)
    {
        string[] lines = File.ReadAllLines(Path.Combine(folder, name + ".dat"));
        (int certFirst, int certLast) = Range(lines, "Certified Values");
        (int dataFirst, int dataLast) = Range(lines, "Data");

        var estimates = new List<double>();
        var sds = new List<double>();
        double residualSd = double.NaN, rSquared = double.NaN;
        for (int i = certFirst - 1; i < certLast; i++)
        {
            string[] tokens = Tokens(lines[i]);
            if (tokens.Length == 3 && Regex.IsMatch(tokens[0], @"^B\d+$"))
            {
                estimates.Add(Parse(tokens[1]));
                sds.Add(Parse(tokens[2]));
            }
            else if (lines[i].TrimStart().StartsWith("Standard Deviation", StringComparison.Ordinal))
            {
                residualSd = Parse(tokens[^1]);
            }
            else if (lines[i].TrimStart().StartsWith("R-Squared", StringComparison.Ordinal))
            {
                rSquared = Parse(tokens[^1]);
            }
        }

        var x = new List<double>();
        var y = new List<double>();
        for (int i = dataFirst - 1; i < dataLast; i++)
        {
            string[] tokens = Tokens(lines[i]);
            y.Add(Parse(tokens[0]));
            x.Add(Parse(tokens[1]));
        }

        return new NistStrdDataset(name, estimates.ToArray(), sds.ToArray(), residualSd, rSquared, x.ToArray(), y.ToArray());
    }

    private static (int First, int Last) Range(string[] header, string label)
    {
        var pattern = new Regex(Regex.Escape(label) + @"\s+\(lines (\d+) to (\d+)\)");
        Match match = header.Take(10).Select(l => pattern.Match(l)).First(m => m.Success);
        return (int.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture), int.Parse(match.Groups[2].Value, CultureInfo.InvariantCulture));
    }

    private static string[] Tokens(string line) => line.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);

    private static double Parse(string token) => double.Parse(token, NumberStyles.Float, CultureInfo.InvariantCulture);
}
