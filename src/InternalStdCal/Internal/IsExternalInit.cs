#if !NET5_0_OR_GREATER
namespace System.Runtime.CompilerServices;

/// <summary>Polyfill that lets netstandard2.0 compile <c>init</c> accessors and records.</summary>
internal static class IsExternalInit
{
}
#endif
