#if !NET5_0_OR_GREATER
namespace System.Runtime.CompilerServices;

/// <summary>Polyfill that lets netstandard2.0 compile <c>init</c> accessors and records.</summary>
internal static class IsExternalInit
{
}
#else
using System.Runtime.CompilerServices;

// Code compiled against the netstandard2.0 build names this assembly's IsExternalInit in every init accessor it
// calls; when a .NET 5+ app then loads the net8.0 build, the forward keeps those calls bound (else
// MissingMethodException; see dotnet/roslyn#69678). Checked by tests/InternalStdCal.NetStandard.Tests/CrossBuild.
// RS0016: a forward of a runtime type, not API of ours; declaring it in the PublicAPI files (shared by both
// targets) would raise RS0017 on netstandard2.0, where it does not exist.
#pragma warning disable RS0016
[assembly: TypeForwardedTo(typeof(IsExternalInit))]
#pragma warning restore RS0016
#endif
