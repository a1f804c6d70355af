using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.IO;

/// <summary>Value comparison of runs (the run compares dilution steps by reference, files can only keep values).</summary>
internal static class RunAssert
{
    internal static void Equal(AnalyticalRun expected, AnalyticalRun actual)
    {
        Assert.Equal(expected.Name, actual.Name);
        Assert.Equal(expected.Analytes, actual.Analytes);
        Assert.Equal(expected.InternalStandards, actual.InternalStandards);
        Assert.Equal(expected.Injections.Count, actual.Injections.Count);
        for (int i = 0; i < expected.Injections.Count; i++)
        {
            RunInjection e = expected.Injections[i];
            RunInjection a = actual.Injections[i];
            Assert.Equal(e.Order, a.Order);
            Assert.Equal(e.Role, a.Role);
            Assert.Equal(e.Id, a.Id);
            Assert.Equal(e.ParentId, a.ParentId);
            Assert.Equal(e.AcquiredAt, a.AcquiredAt);
            Assert.Equal(e.AcquiredAt?.Offset, a.AcquiredAt?.Offset);
            Assert.Equal(e.Signals, a.Signals);
            SameConcentrations(e.Nominal, a.Nominal);
            SameConcentrations(e.Added, a.Added);
            SamePreparation(e.Preparation, a.Preparation);
        }
    }

    private static void SameConcentrations(System.Collections.Generic.IReadOnlyDictionary<string, Concentration> e, System.Collections.Generic.IReadOnlyDictionary<string, Concentration> a)
    {
        Assert.Equal(e.Keys.ToArray(), a.Keys.ToArray());
        foreach (string k in e.Keys)
        {
            Assert.Equal(e[k].Unit, a[k].Unit);
            Assert.Equal(e[k].Value, a[k].Value);
        }
    }

    private static void SamePreparation(SamplePreparation e, SamplePreparation a)
    {
        Assert.Equal(e.SampleMass, a.SampleMass);
        Assert.Equal(e.DigestVolume, a.DigestVolume);
        Assert.Equal(e.DigestMass, a.DigestMass);
        Assert.Equal(e.ResultUnit, a.ResultUnit);
        Assert.Equal(e.Dilutions.Count, a.Dilutions.Count);
        for (int i = 0; i < e.Dilutions.Count; i++)
        {
            switch (e.Dilutions[i])
            {
                case VolumetricDilution v:
                    var av = Assert.IsType<VolumetricDilution>(a.Dilutions[i]);
                    Assert.Equal(v.AliquotVolume, av.AliquotVolume);
                    Assert.Equal(v.FinalVolume, av.FinalVolume);
                    break;
                case GravimetricDilution g:
                    var ag = Assert.IsType<GravimetricDilution>(a.Dilutions[i]);
                    Assert.Equal(g.AliquotMass, ag.AliquotMass);
                    Assert.Equal(g.TotalMass, ag.TotalMass);
                    break;
            }
        }
    }
}
