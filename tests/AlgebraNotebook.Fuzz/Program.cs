using System.Globalization;

namespace AlgebraNotebook.Fuzz;

/// <summary>
/// Command line of the fuzzer. <c>--long</c> tries one million inputs per target (override with --count N);
/// the default is the short mode (3 000 inputs per target). <c>--target NAME</c> runs one target, <c>--seed S</c>
/// and <c>--from I</c> choose the inputs. Each failure is written to standard error as soon as it is found (target,
/// input number, kind, problem, input), and appended to the file given by <c>--failures FILE</c>, so that a run that is
/// stopped early still tells what failed. <c>--slow MS</c> prints every input that takes longer than MS milliseconds
/// (wall time), to find what makes a target slow. Exit code 0 when nothing failed, 1 when a crash, property violation, hang or
/// memory overrun was found, 2 for bad arguments.
/// </summary>
public static class Program
{
    /// <summary>Inputs per target in the short mode.</summary>
    public const long ShortCount = 3_000;

    /// <summary>Inputs per target in the long mode.</summary>
    public const long LongCount = 1_000_000;

    /// <summary>Runs the fuzzer.</summary>
    public static int Main(string[] args)
    {
        long count = ShortCount;
        long from = 0;
        var seed = 20261202;
        string? only = null;
        string? failureFile = null;
        TimeSpan? slow = null;
        try
        {
            for (var k = 0; k < args.Length; k++)
            {
                switch (args[k])
                {
                    case "--long":
                        count = LongCount;
                        break;
                    case "--count":
                        count = long.Parse(args[++k], CultureInfo.InvariantCulture);
                        break;
                    case "--from":
                        from = long.Parse(args[++k], CultureInfo.InvariantCulture);
                        break;
                    case "--seed":
                        seed = int.Parse(args[++k], CultureInfo.InvariantCulture);
                        break;
                    case "--target":
                        only = args[++k];
                        break;
                    case "--slow":
                        slow = TimeSpan.FromMilliseconds(double.Parse(args[++k], CultureInfo.InvariantCulture));
                        break;
                    case "--failures":
                        failureFile = args[++k];
                        break;
                    default:
                        throw new ArgumentException($"unknown argument \"{args[k]}\"");
                }
            }

            var targets = only is null ? FuzzTargets.All() : [FuzzTargets.Named(only)];
            var failed = false;
            Console.WriteLine($"fuzz: seed {seed}, inputs {from:N0} to {from + count - 1:N0} per target, hang bound {FuzzRunner.HangBound.TotalSeconds} s per input, "
                              + $"memory bound {FuzzRunner.MemoryBound / 1048576} MB, {Environment.ProcessorCount} processors");
            foreach (var target in targets)
            {
                var report = FuzzRunner.Run(target, seed, from, count, line => Console.WriteLine("  " + line),
                    failure => ReportNow(target.Name, failure, failureFile), slow);
                Console.WriteLine(report);
                foreach (var failure in report.Failures.Take(20))
                {
                    Console.WriteLine($"  {failure.Kind} at input {failure.Index}: {failure.Problem}\n    input: {failure.Input}");
                }

                failed |= report.Failures.Count > 0;
            }

            Console.WriteLine($"fuzz: process peak working set {System.Diagnostics.Process.GetCurrentProcess().PeakWorkingSet64 / 1048576} MB");
            return failed ? 1 : 0;
        }
        catch (Exception e) when (e is ArgumentException or FormatException or IndexOutOfRangeException or OverflowException)
        {
            Console.Error.WriteLine($"fuzz: {e.Message}. Usage: [--long | --count N] [--from I] [--seed S] [--target NAME] [--failures FILE] [--slow MS]");
            return 2;
        }
    }

    /// <summary>Writes one failure to standard error (and appends it to the file, when given) the moment it is found.</summary>
    private static void ReportNow(string target, FuzzFailure failure, string? file)
    {
        var line = $"fuzz failure: {target} input {failure.Index} {failure.Kind}: {failure.Problem}\n    input: {failure.Input}";
        Console.Error.WriteLine(line);
        Console.Error.Flush();
        if (file is not null)
        {
            File.AppendAllText(file, line + Environment.NewLine);
        }
    }
}
