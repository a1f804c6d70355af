using System;
using System.Linq;
using InternalStdCal.Preparation;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests.Preparation;

public class VolumetricEquipmentTests
{
    // Class A tolerances, field-reference §7.3 (from memory: ISO 648 one-mark pipettes, ISO 1042 one-mark flasks).
    [Theory]
    [InlineData(1, 0.008)]
    [InlineData(2, 0.010)]
    [InlineData(5, 0.015)]
    [InlineData(10, 0.020)]
    [InlineData(20, 0.030)]
    [InlineData(25, 0.030)]
    [InlineData(50, 0.050)]
    [InlineData(100, 0.080)]
    public void ClassAOneMarkPipetteTolerance_Iso648FromMemory(double nominal, double tolerance) =>
        Assert.Equal(tolerance, VolumetricEquipment.ClassAOneMarkPipetteTolerance(Volume.FromMillilitres(nominal)).Millilitres);

    [Theory]
    [InlineData(10, 0.025)]
    [InlineData(25, 0.04)]
    [InlineData(50, 0.06)] // also VERIFIED (Univ. Tartu example, field-reference §7.3)
    [InlineData(100, 0.10)]
    [InlineData(250, 0.15)]
    [InlineData(500, 0.25)]
    [InlineData(1000, 0.40)]
    [InlineData(2000, 0.60)]
    public void ClassAOneMarkFlaskTolerance_Iso1042FromMemory(double nominal, double tolerance) =>
        Assert.Equal(tolerance, VolumetricEquipment.ClassAOneMarkFlaskTolerance(Volume.FromMillilitres(nominal)).Millilitres);

    [Fact]
    public void Sizes_ListTheTables()
    {
        Assert.Equal(new double[] { 1, 2, 5, 10, 20, 25, 50, 100 }, VolumetricEquipment.ClassAOneMarkPipetteSizes.Select(v => v.Millilitres));
        Assert.Equal(new double[] { 10, 25, 50, 100, 250, 500, 1000, 2000 }, VolumetricEquipment.ClassAOneMarkFlaskSizes.Select(v => v.Millilitres));
    }

    [Fact]
    public void ClassAOneMarkFlask_NominalInLitres_Found()
    {
        Measured<Volume> flask = VolumetricEquipment.ClassAOneMarkFlask(Volume.FromLitres(0.1), ToleranceDistribution.Rectangular);
        Assert.Equal(VolumeUnit.Litre, flask.Value.Unit);
        Assert.Equal(0.1 / Math.Sqrt(3), flask.StandardUncertainty.Millilitres, 15);
    }

    [Fact]
    public void ClassAOneMarkPipette_TriangularAndRectangular()
    {
        // u = a/√6 (triangular) and a/√3 (rectangular), JCGM 100:2008 §4.3.9/§4.3.7.
        Assert.Equal(0.008 / Math.Sqrt(6), VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(1), ToleranceDistribution.Triangular).StandardUncertainty.Millilitres, 15);
        Assert.Equal(0.008 / Math.Sqrt(3), VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(1), ToleranceDistribution.Rectangular).StandardUncertainty.Millilitres, 15);
    }

    [Fact]
    public void ClassAOneMarkPipette_UnknownSize_ThrowsListingSizes()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(15), ToleranceDistribution.Rectangular));
        Assert.Equal("nominal", ex.ParamName);
        Assert.StartsWith("Parameter 'nominal' was 15 mL; class A one-mark pipettes (ISO 648) are tabulated for 1, 2, 5, 10, 20, 25, 50, 100 mL only.", ex.Message, StringComparison.Ordinal);
        var flask = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.ClassAOneMarkFlaskTolerance(Volume.FromMillilitres(200)));
        Assert.StartsWith("Parameter 'nominal' was 200 mL; class A one-mark volumetric flasks (ISO 1042) are tabulated for 10, 25, 50, 100, 250, 500, 1000, 2000 mL only.", flask.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void ClassAOneMarkPipette_UndefinedDistribution_Throws()
    {
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.ClassAOneMarkPipette(Volume.FromMillilitres(10), (ToleranceDistribution)9));
        Assert.Equal("distribution", ex.ParamName);
    }

    [Fact]
    public void TemperatureEffect_QuamA1_0_0485()
    {
        // ±4 °C × 2.1e-4 °C⁻¹ × 100 mL, rectangular → 0.04850 mL (QUAM A1, from memory, field-reference §7.4).
        Volume u = VolumetricEquipment.TemperatureEffect(Volume.FromMillilitres(100), 4, VolumetricEquipment.WaterExpansionCoefficientPerKelvin);
        Assert.Equal(0.04850, u.Millilitres, 5);
        Assert.Equal(VolumeUnit.Millilitre, u.Unit);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.TemperatureEffect(Volume.FromMillilitres(100), -1, 2.1e-4));
        Assert.Equal("temperatureHalfRangeKelvin", ex.ParamName);
        Assert.StartsWith("Parameter 'temperatureHalfRangeKelvin' was -1; it must be a finite number >= 0.", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Combine_QuamA1VolumeComponents_0_06647()
    {
        // Calibration 0.04082 (±0.1 mL triangular), repeatability 0.02, temperature 0.04850 → 0.06647 mL
        // (QUAM A1 components from memory, field-reference §7.4).
        Measured<Volume> v = VolumetricEquipment.Combine(
            Volume.FromMillilitres(100), Volume.FromMillilitres(0.04082), Volume.FromMillilitres(0.02), Volume.FromMillilitres(0.04850));
        Assert.Equal(0.06647, v.StandardUncertainty.Millilitres, 5);
        Assert.Equal(UncertaintyEvaluation.Combined, v.Evaluation);
    }

    [Fact]
    public void Combine_MixedUnitsAndValidation()
    {
        Measured<Volume> v = VolumetricEquipment.Combine(Volume.FromMillilitres(1), Volume.FromMicrolitres(3), Volume.FromMillilitres(0.004));
        Assert.Equal(0.005, v.StandardUncertainty.Millilitres, 15); // 3-4-5
        Assert.Equal("standardUncertainties", Assert.Throws<ArgumentException>(() => VolumetricEquipment.Combine(Volume.FromMillilitres(1))).ParamName);
        var zero = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.Combine(Volume.FromMillilitres(0), Volume.FromMillilitres(0.1)));
        Assert.StartsWith("Parameter 'nominal' was 0 mL; it must be a volume > 0.", zero.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void AdjustablePipette_SystematicRectangularPlusRandom()
    {
        // u = √((e_s/√3)² + s_r²) (common practice): 100 µL, e_s = ±0.8 µL, s_r = 0.3 µL.
        Measured<Volume> v = VolumetricEquipment.AdjustablePipette(Volume.FromMicrolitres(100), Volume.FromMicrolitres(0.8), Volume.FromMicrolitres(0.3), ToleranceDistribution.Rectangular);
        Assert.Equal(VolumeUnit.Microlitre, v.Value.Unit);
        Assert.Equal(Math.Sqrt((0.64 / 3) + 0.09), v.StandardUncertainty.Microlitres, 14);
        var ex = Assert.Throws<ArgumentOutOfRangeException>(() => VolumetricEquipment.AdjustablePipette(Volume.FromMicrolitres(0), Volume.FromMicrolitres(0.8), Volume.FromMicrolitres(0.3), ToleranceDistribution.Rectangular));
        Assert.Equal("setVolume", ex.ParamName);
    }
}
