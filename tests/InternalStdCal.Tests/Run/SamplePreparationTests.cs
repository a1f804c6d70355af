using System;
using System.Collections.Generic;
using InternalStdCal.Calibration;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using InternalStdCal.Run;
using Xunit;

namespace InternalStdCal.Tests.Run;

/// <summary>Bad input to <see cref="SamplePreparation"/>: argument exceptions naming the parameter (project rule).</summary>
public class SamplePreparationTests
{
    [Fact]
    public void SamplePreparation_SolidWithVolumeUnit_Throws() =>
        Assert.Throws<ArgumentOutOfRangeException>("resultUnit", () => SamplePreparation.SolidToVolume(
            Measured.Exact(Volume.FromMillilitres(50)), Measured.Exact(Mass.FromGrams(0.25)), ConcentrationUnit.MicrogramPerLitre));

    [Fact]
    public void SamplePreparation_NullStep_Throws() =>
        Assert.Throws<ArgumentNullException>("dilutions", () => SamplePreparation.Liquid(new DilutionStep[] { null! }));
}
