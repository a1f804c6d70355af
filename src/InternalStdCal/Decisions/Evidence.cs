namespace InternalStdCal.Decisions;

/// <summary>What a rule decides on, in the limit's unit: the result (or mean), its standard uncertainty, the degrees
/// of freedom used (null = normal) and, for replicates, n and s.</summary>
internal readonly record struct Evidence(double Result, double StandardUncertainty, int? DegreesOfFreedom, int? Replicates, double? StandardDeviation);
