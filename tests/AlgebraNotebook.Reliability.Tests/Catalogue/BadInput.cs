namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// One entry of the bad-input catalogue: a call that must be refused before it returns anything, with the documented
/// exception type and the words its message must contain (at least one naming the offending input, one the problem).
/// </summary>
/// <param name="Name">A short unique name; it is the visible case name of the theory.</param>
/// <param name="EntryPoint">The public member called, e.g. "Rational.Parse".</param>
/// <param name="Input">The bad input as a user would type or pass it (for the test listing).</param>
/// <param name="Expected">The exception type the entry point documents for this input.</param>
/// <param name="Words">Words the message must contain (case-insensitive).</param>
/// <param name="Call">The call; returning a value instead of throwing fails the case.</param>
public sealed record BadInput(string Name, string EntryPoint, string Input, Type Expected, string[] Words, Func<object?> Call)
{
    /// <summary>The case as shown in a failure message.</summary>
    public override string ToString() => $"{Name}: {EntryPoint}({Input})";
}

/// <summary>Shorthand for writing catalogue entries.</summary>
public static class Entry
{
    /// <summary>An entry whose call must throw <paramref name="expected"/> with every word of <paramref name="words"/> in its message.</summary>
    public static BadInput Of(string name, string entryPoint, string input, Type expected, Func<object?> call, params string[] words) =>
        new(name, entryPoint, input, expected, words, call);
}
