using AlgebraNotebook.Groups.Series;
using Xunit.Abstractions;

namespace AlgebraNotebook.Groups.Tests.Series;

public class Scratch(ITestOutputHelper output)
{
    [Fact]
    public void Show()
    {
        output.WriteLine(BakerCampbellHausdorff.Series(5).ToString());
        output.WriteLine(BakerCampbellHausdorff.Symmetric(5).ToString());
        output.WriteLine(Zassenhaus.Compute(4).ToString());
        for (var n = 6; n <= 14; n++)
        {
            var sw = System.Diagnostics.Stopwatch.StartNew();
            var z = BakerCampbellHausdorff.Series(n);
            output.WriteLine($"{n}: {sw.ElapsedMilliseconds} ms, nonzero {z.NonZeroCount(n)}");
        }
    }
}
