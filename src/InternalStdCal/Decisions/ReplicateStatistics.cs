using System;
using System.Collections.Generic;
using System.Globalization;
using InternalStdCal.Internal;
using InternalStdCal.Quantities;

namespace InternalStdCal.Decisions;

/// <summary>Mean and sample standard deviation of replicate results in a limit's unit (compensated, centred sums).</summary>
internal readonly record struct ReplicateStatistics(double Mean, double StandardDeviation, int Count)
{
    /// <exception cref="ArgumentNullException">replicates is null.</exception>
    /// <exception cref="ArgumentException">Fewer than 2 values, a value of another kind, or a spread that overflows.</exception>
    internal static ReplicateStatistics Of(SpecificationLimit limit, IReadOnlyList<Concentration> replicates, string paramName)
    {
        Guard.NotNull(replicates, paramName);
        if (replicates.Count < 2)
        {
            throw new ArgumentException(
                $"Parameter '{paramName}' has {replicates.Count.ToString(CultureInfo.InvariantCulture)} element(s); at least 2 replicates are needed for a standard deviation.",
                paramName);
        }

        var values = new double[replicates.Count];
        for (int i = 0; i < values.Length; i++)
        {
            Concentration c = replicates[i];
            if (c.Kind != limit.Value.Kind)
            {
                throw new ArgumentException(
                    $"Parameter '{paramName}' element {i.ToString(CultureInfo.InvariantCulture)} was {c} ({c.Kind}) but the limit is {limit.Value} ({limit.Value.Kind}); results must be of the same kind as the limit.",
                    paramName);
            }

            values[i] = c.In(limit.Value.Unit);
        }

        double mean = SampleStatistics.Mean(values);
        double s = SampleStatistics.StandardDeviation(values, mean);
        if (!(Math.Abs(mean) <= double.MaxValue && s <= double.MaxValue))
        {
            throw new ArgumentException($"Parameter '{paramName}': the mean or standard deviation of the replicates overflows a double.", paramName);
        }

        return new ReplicateStatistics(mean, s, values.Length);
    }
}
