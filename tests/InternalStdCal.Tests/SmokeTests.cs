using Xunit;

namespace InternalStdCal.Tests;

public class SmokeTests
{
    [Fact]
    public void Assembly_Loads() => Assert.NotNull(typeof(InternalStdCal.Internal.Guard).Assembly);
}
