using System;
using System.Collections.Concurrent;
using System.Threading;

namespace InternalStdCal.Internal;

/// <summary>
/// Thread-safe memo of a distribution quantile by (probability, df1, df2): the value stored is the one the
/// computation returned, so a cached call is bit-identical to an uncached one. Holds at most
/// <see cref="Capacity"/> entries; beyond that it computes without storing.
/// </summary>
internal sealed class QuantileCache
{
    internal const int Capacity = 4096;

    private readonly ConcurrentDictionary<(long P, int Df1, int Df2), double> _values = new();
    private int _count;

    internal double GetOrAdd(double probability, int df1, int df2, Func<double, int, int, double> compute)
    {
        var key = (BitConverter.DoubleToInt64Bits(probability), df1, df2);
        if (_values.TryGetValue(key, out double value))
        {
            return value;
        }

        value = compute(probability, df1, df2);
        if (Volatile.Read(ref _count) < Capacity && _values.TryAdd(key, value))
        {
            Interlocked.Increment(ref _count);
        }

        return value;
    }
}
