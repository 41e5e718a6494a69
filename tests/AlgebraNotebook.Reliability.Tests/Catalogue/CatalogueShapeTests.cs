using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>The catalogue itself: unique names, words for every entry, at least 150 entries; and fixed crash regressions.</summary>
public sealed class CatalogueShapeTests
{
    private static readonly (string Area, string[] Names, int WordlessEntries)[] Areas =
    [
        ("scalars", ScalarTextCatalogue.Entries.Select(e => e.Name).ToArray(), ScalarTextCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("polynomials and relations", PolynomialCatalogue.Entries.Select(e => e.Name).ToArray(), PolynomialCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("matrices", MatrixCatalogue.Entries.Select(e => e.Name).ToArray(), MatrixCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("algebras", AlgebraCatalogue.Entries.Select(e => e.Name).ToArray(), AlgebraCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("roots and representations", RootCatalogue.Entries.Select(e => e.Name).ToArray(), RootCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("operators", OperatorCatalogue.Entries.Select(e => e.Name).ToArray(), OperatorCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("series and free Lie algebras", SeriesCatalogue.Entries.Select(e => e.Name).ToArray(), SeriesCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("groups and exponentials", GroupCatalogue.Entries.Select(e => e.Name).ToArray(), GroupCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("notebook files", NotebookFileCatalogue.Entries.Select(e => e.Name).ToArray(), NotebookFileCatalogue.Entries.Count(e => e.Words.Length == 0)),
        ("command lines", CommandLineCatalogue.Entries.Select(e => e.Name).ToArray(), CommandLineCatalogue.Entries.Count(e => e.Words.Length == 0)),
    ];

    /// <summary>Case names are unique within each area, so every theory row is a distinct visible case.</summary>
    [Fact]
    public void Catalogue_names_are_unique_within_each_area()
    {
        foreach (var (area, names, _) in Areas)
        {
            var repeated = names.GroupBy(n => n).Where(g => g.Count() > 1).Select(g => g.Key).ToArray();
            Assert.True(repeated.Length == 0, $"{area}: repeated names {string.Join(", ", repeated)}");
        }
    }

    /// <summary>Every entry states at least one word its message must contain.</summary>
    [Fact]
    public void Every_catalogue_entry_names_words_its_message_must_contain()
    {
        foreach (var (area, _, wordless) in Areas)
        {
            Assert.True(wordless == 0, $"{area}: {wordless} entries without expected words");
        }
    }

    /// <summary>The catalogue covers at least 150 bad inputs.</summary>
    [Fact]
    public void Catalogue_holds_at_least_150_bad_inputs()
    {
        Assert.True(Areas.Sum(a => a.Names.Length) >= 150, $"only {Areas.Sum(a => a.Names.Length)} entries");
    }

    /// <summary>Regression: Pow(int.MinValue) negated the exponent, which overflows back to int.MinValue and recursed until the stack overflowed.</summary>
    [Fact]
    public void Most_negative_power_of_minus_one_is_one_without_unbounded_recursion()
    {
        // Common practice: (-1)^n = 1 for even n, and int.MinValue = -2^31 is even.
        Assert.Equal(Rational.One, Rational.MinusOne.Pow(int.MinValue));
        Assert.Equal(GaussianRational.One, GaussianRational.I.Pow(int.MinValue));
    }
}
