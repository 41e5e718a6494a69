using System.Diagnostics;
using AlgebraNotebook.Algebras.Chevalley;
using Xunit.Abstractions;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

public class ProbeTimingTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData("G2")]
    [InlineData("F4")]
    [InlineData("E6")]
    [InlineData("E7")]
    [InlineData("E8")]
    public void Probe(string type)
    {
        var sw = Stopwatch.StartNew();
        var chevalley = ChevalleyBasis.Of(type);
        output.WriteLine($"{type} chevalley {sw.Elapsed}");
        sw.Restart();
        var plain = chevalley.ToLieAlgebra(maximumDimension: 248);
        output.WriteLine($"{type} dense {sw.Elapsed}");
        sw.Restart();
        var algebra = RandomBasisChange.Disguise(plain, chevalley.System.Rank, 7);
        output.WriteLine($"{type} disguise {sw.Elapsed}");
        sw.Restart();
        var d = algebra.TryRootDecompositionModular(out var reason);
        output.WriteLine($"{type} modular {sw.Elapsed} {d?.Type} {reason}");
    }
}
