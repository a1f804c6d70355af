using System.Reflection;
using System.Runtime.Versioning;
using InternalStdCal.IO;
using InternalStdCal.Quantities;
using Xunit;

namespace InternalStdCal.Tests;

/// <summary>Guards that this project really runs the shared tests against the netstandard2.0 builds.</summary>
public class LoadedBuildTests
{
    [Fact]
    public void CoreLibrary_IsTheNetStandard20Build()
    {
        Assembly core = typeof(Concentration).Assembly;
        Assert.Equal(".NETStandard,Version=v2.0", core.GetCustomAttribute<TargetFrameworkAttribute>()?.FrameworkName);
        // The init polyfill is compiled only where the target lacks it (#if !NET5_0_OR_GREATER).
        Assert.NotNull(core.GetType("System.Runtime.CompilerServices.IsExternalInit", throwOnError: false));
    }

    [Fact]
    public void IoLibrary_IsTheNetStandard20Build()
    {
        Assembly io = typeof(RunCsv).Assembly;
        Assert.Equal(".NETStandard,Version=v2.0", io.GetCustomAttribute<TargetFrameworkAttribute>()?.FrameworkName);
    }
}
