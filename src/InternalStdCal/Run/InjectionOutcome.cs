using System;
using System.Collections.Generic;
using System.Linq;

namespace InternalStdCal.Run;

/// <summary>What processing did with an injection.</summary>
public enum InjectionStatus
{
    /// <summary>The injection is a point of the calibration.</summary>
    UsedInCalibration = 0,

    /// <summary>The injection was quantified (sample, duplicate, spiked sample, method blank).</summary>
    Quantified,

    /// <summary>The injection was quantified and judged against its nominal value (quality control).</summary>
    QualityControlEvaluated,

    /// <summary>The injection was set aside; the reasons say why.</summary>
    Excluded,
}

/// <summary>The internal-standard (IS) recovery of one injection: 100 · signal / reference signal.</summary>
public sealed class InternalStandardRecovery
{
    internal InternalStandardRecovery(string internalStandard, double? signal, double? referenceSignal, double? recoveryPercent, bool? withinWindow)
    {
        InternalStandard = internalStandard;
        Signal = signal;
        ReferenceSignal = referenceSignal;
        RecoveryPercent = recoveryPercent;
        WithinWindow = withinWindow;
    }

    /// <summary>IS name.</summary>
    public string InternalStandard { get; }

    /// <summary>IS signal of the injection; null when not recorded.</summary>
    public double? Signal { get; }

    /// <summary>Reference IS signal (mean of the reference injections); null when the run has no valid reference injection.</summary>
    public double? ReferenceSignal { get; }

    /// <summary>Recovery in %; null when the signal is missing or ≤ 0 or there is no reference.</summary>
    public double? RecoveryPercent { get; }

    /// <summary>Whether the recovery is in the window; null when there is no recovery.</summary>
    public bool? WithinWindow { get; }
}

/// <summary>The status row of one input injection: every injection of the run has exactly one.</summary>
public sealed class InjectionOutcome
{
    internal InjectionOutcome(RunInjection injection, IReadOnlyDictionary<string, InjectionStatus> analyteStatuses, IReadOnlyList<InternalStandardRecovery> recoveries, IReadOnlyList<string> reasons)
    {
        Injection = injection;
        AnalyteStatuses = analyteStatuses;
        InternalStandardRecoveries = recoveries;
        Reasons = reasons;
        Status = analyteStatuses.Values.Where(s => s != InjectionStatus.Excluded).Select(s => (InjectionStatus?)s).FirstOrDefault() ?? InjectionStatus.Excluded;
    }

    /// <summary>The input row.</summary>
    public RunInjection Injection { get; }

    /// <summary>Overall status: the role's use when the row was used for at least one analyte, otherwise
    /// <see cref="InjectionStatus.Excluded"/>.</summary>
    public InjectionStatus Status { get; }

    /// <summary>Status per analyte of the method.</summary>
    public IReadOnlyDictionary<string, InjectionStatus> AnalyteStatuses { get; }

    /// <summary>IS recovery for every IS of the run, in the run's IS order.</summary>
    public IReadOnlyList<InternalStandardRecovery> InternalStandardRecoveries { get; }

    /// <summary>Why the row (or one analyte of it) was set aside or flagged; empty when nothing to say.</summary>
    public IReadOnlyList<string> Reasons { get; }
}

/// <summary>Analyte → status of one injection over keys shared by every row of a report, sorted ordinally (as a
/// <see cref="SortedDictionary{TKey, TValue}"/> with an ordinal comparer would be), looked up by binary search.</summary>
internal sealed class AnalyteStatusMap : IReadOnlyDictionary<string, InjectionStatus>
{
    private readonly string[] _keys;
    private readonly InjectionStatus[] _values;

    internal AnalyteStatusMap(string[] sortedKeys, InjectionStatus[] values)
    {
        _keys = sortedKeys;
        _values = values;
    }

    public int Count => _keys.Length;

    public IEnumerable<string> Keys => _keys;

    public IEnumerable<InjectionStatus> Values => _values;

    public InjectionStatus this[string key] =>
        TryGetValue(key, out InjectionStatus value) ? value : throw new KeyNotFoundException("The analyte '" + key + "' is not in the method.");

    public bool ContainsKey(string key) => IndexOf(key) >= 0;

    public bool TryGetValue(string key, out InjectionStatus value)
    {
        int k = IndexOf(key);
        value = k >= 0 ? _values[k] : default;
        return k >= 0;
    }

    public IEnumerator<KeyValuePair<string, InjectionStatus>> GetEnumerator()
    {
        for (int k = 0; k < _keys.Length; k++)
        {
            yield return new KeyValuePair<string, InjectionStatus>(_keys[k], _values[k]);
        }
    }

    System.Collections.IEnumerator System.Collections.IEnumerable.GetEnumerator() => GetEnumerator();

    private int IndexOf(string key) => Array.BinarySearch(_keys, Internal.Guard.NotNull(key, nameof(key)), StringComparer.Ordinal);
}
