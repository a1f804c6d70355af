using System;
using System.IO;
using System.Reflection;
using System.Runtime.Loader;
using Xunit;

namespace InternalStdCal.Tests.CrossBuild;

/// <summary>
/// The netstandard2.0 and net8.0 builds give bit-identical results: each scenario of
/// <see cref="CrossBuildScenarios"/> runs here against the netstandard2.0 builds and, through a second copy of
/// this test assembly in its own load context, against the net8.0 builds (copied to net8-build/ by the csproj).
/// </summary>
public class CrossBuildTests
{
    private static readonly Lazy<Assembly> Net8Tests = new(() =>
    {
        string folder = Path.Combine(AppContext.BaseDirectory, "net8-build");
        return new Net8BuildContext(folder).LoadFromAssemblyPath(typeof(CrossBuildTests).Assembly.Location);
    });

    [Fact]
    public void SecondContext_LoadsTheNet80Build()
    {
        Assert.Equal(".NETStandard,Version=v2.0", CrossBuildScenarios.LoadedCoreFramework());
        Assert.Equal(".NETCoreApp,Version=v8.0", RunInNet8Context(nameof(CrossBuildScenarios.LoadedCoreFramework)));
    }

    [Theory]
    [InlineData(nameof(CrossBuildScenarios.DemoRun))]
    [InlineData(nameof(CrossBuildScenarios.Fits))]
    [InlineData(nameof(CrossBuildScenarios.LineFits))]
    [InlineData(nameof(CrossBuildScenarios.Uncertainty))]
    [InlineData(nameof(CrossBuildScenarios.ProductErrors))]
    [InlineData(nameof(CrossBuildScenarios.UndefinedEnumMessage))]
    public void Scenario_BothBuilds_BitIdentical(string scenario)
    {
        string netStandard = Invoke(typeof(CrossBuildScenarios), scenario);
        string net8 = RunInNet8Context(scenario);
        Assert.Equal(net8, netStandard);
    }

    private static string RunInNet8Context(string scenario) =>
        Invoke(Net8Tests.Value.GetType(typeof(CrossBuildScenarios).FullName!, throwOnError: true)!, scenario);

    private static string Invoke(Type scenarios, string name) =>
        (string)scenarios.GetMethod(name, BindingFlags.Static | BindingFlags.NonPublic)!.Invoke(null, null)!;

    /// <summary>Loads the libraries (and this test assembly, which binds to them) from the net8.0 builds; every
    /// other assembly is shared with the default context.</summary>
    private sealed class Net8BuildContext : AssemblyLoadContext
    {
        private readonly string _folder;

        internal Net8BuildContext(string folder)
            : base("net8.0 builds")
        {
            _folder = folder;
        }

        protected override Assembly? Load(AssemblyName assemblyName) => assemblyName.Name switch
        {
            "InternalStdCal" or "InternalStdCal.IO" => LoadFromAssemblyPath(Path.Combine(_folder, assemblyName.Name + ".dll")),
            _ => null,
        };
    }
}
