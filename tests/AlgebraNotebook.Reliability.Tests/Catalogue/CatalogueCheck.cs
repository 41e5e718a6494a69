using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Runner.Documents;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>The one check every catalogue entry goes through, and the lookup of an area's entries by name.</summary>
public static class CatalogueCheck
{
    /// <summary>
    /// The exception types an entry may document: ours, the BCL null-argument type, and the runner's load error.
    /// Anything else (NullReferenceException, IndexOutOfRangeException, InvalidCastException, KeyNotFoundException ...)
    /// is a crash and fails the exact-type check below.
    /// </summary>
    private static readonly Type[] Documented =
    [
        typeof(ExactArgumentException), typeof(ExactParseException), typeof(DivideByZeroException),
        typeof(BeyondCapabilityException), typeof(ArgumentNullException), typeof(NotebookLoadException),
    ];

    /// <summary>The theory rows for a list of entries: one visible case per entry name.</summary>
    public static TheoryData<string> Names(IEnumerable<BadInput> entries)
    {
        var data = new TheoryData<string>();
        foreach (var entry in entries)
        {
            data.Add(entry.Name);
        }

        return data;
    }

    /// <summary>Finds an entry by name (names are unique within an area; checked by the catalogue tests).</summary>
    public static BadInput Find(IEnumerable<BadInput> entries, string name) => entries.Single(e => e.Name == name);

    /// <summary>
    /// Runs the call and checks: it throws (so no partial object escapes), the exception has exactly the expected
    /// documented type, and the message contains every expected word.
    /// </summary>
    /// <param name="entry">The catalogue entry.</param>
    /// <param name="output">Receives the message the user would see, so the test log doubles as a review of the messages.</param>
    public static void Refuses(BadInput entry, ITestOutputHelper output)
    {
        Assert.Contains(entry.Expected, Documented);
        object? returned;
        try
        {
            returned = entry.Call();
        }
        catch (Exception exception)
        {
            var actual = exception is AggregateException { InnerExceptions.Count: 1 } aggregate ? aggregate.InnerExceptions[0] : exception;
            output.WriteLine($"{entry.EntryPoint}({entry.Input}) -> {actual.GetType().Name}: {actual.Message}");
            Assert.True(
                actual.GetType() == entry.Expected,
                $"{entry}: expected {entry.Expected.Name} but got {actual.GetType().Name}: {actual.Message}\n{actual.StackTrace}");
            foreach (var word in entry.Words)
            {
                Assert.True(
                    actual.Message.Contains(word, StringComparison.OrdinalIgnoreCase),
                    $"{entry}: the message does not contain \"{word}\":\n{actual.Message}");
            }

            return;
        }

        Assert.Fail($"{entry}: the call returned {Describe(returned)} instead of refusing the input.");
    }

    private static string Describe(object? value)
    {
        try
        {
            return value is null ? "null" : $"a {value.GetType().Name} ({value})";
        }
        catch (Exception e)
        {
            return $"a {value!.GetType().Name} whose ToString threw {e.GetType().Name}";
        }
    }
}
