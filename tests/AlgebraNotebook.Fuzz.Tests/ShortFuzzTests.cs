using Xunit.Abstractions;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Fuzz.Tests;

/// <summary>
/// The fuzzer's short mode as ordinary tests: 1 500 inputs per target (times ALGEBRANOTEBOOK_TEST_ITERATIONS), the
/// same generator and properties as the long run. A failure lists the inputs that broke a property.
/// </summary>
public class ShortFuzzTests(ITestOutputHelper output)
{
    private const int Seed = 20261202;

    public static TheoryData<string> Targets()
    {
        var data = new TheoryData<string>();
        foreach (var target in FuzzTargets.All())
        {
            data.Add(target.Name);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Targets))]
    public void Fuzzed_inputs_are_accepted_or_refused_with_a_documented_exception_and_never_crash_or_hang(string name)
    {
        var report = FuzzRunner.Run(FuzzTargets.Named(name), Seed, 0, 1_500L * TestIterations.Multiplier);
        output.WriteLine(report.ToString());
        foreach (var failure in report.Failures)
        {
            output.WriteLine($"{failure.Kind} at input {failure.Index}: {failure.Problem}\n  input: {failure.Input}");
        }

        Assert.True(report.Failures.Count == 0,
            $"{report.Failures.Count} failures, first: {report.Failures.FirstOrDefault()?.Problem} on input {report.Failures.FirstOrDefault()?.Input}");
        Assert.Equal(report.Inputs, report.Accepted + report.Refused);
        // The generator reaches both outcomes: a fuzzer that only produced garbage (or only seeds) would test little.
        Assert.True(report.Accepted > 0 && report.Refused > 0, report.ToString());
    }
}
