using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Groups.FreeLie;

namespace AlgebraNotebook.Groups.Tests.FreeLie;

public class LyndonWordTests
{
    // OEIS A001037: number of Lyndon words (binary), = dimensions of the free Lie algebra on two generators by degree.
    private static readonly int[] A001037 = [2, 1, 2, 3, 6, 9, 18, 30, 56, 99, 186, 335];

    // OEIS A027376 (ternary Lyndon words), from memory; the enumeration below is the independent check.
    private static readonly int[] A027376 = [3, 3, 8, 18, 48, 116, 312, 810, 2184];

    [Fact]
    public void Lyndon_words_on_two_letters_per_degree_match_OEIS_A001037()
    {
        for (var n = 1; n <= 12; n++)
        {
            // OEIS A001037
            Assert.Equal(A001037[n - 1], LyndonWord.Enumerate(2, n).Count());
            Assert.Equal(new BigInteger(A001037[n - 1]), LyndonWord.CountByWitt(2, n));
        }
    }

    [Fact]
    public void Witt_formula_for_three_letters_agrees_with_enumeration_and_OEIS_A027376()
    {
        for (var n = 1; n <= 9; n++)
        {
            var enumerated = LyndonWord.Enumerate(3, n).Count();
            Assert.Equal(new BigInteger(enumerated), LyndonWord.CountByWitt(3, n));
            // OEIS A027376, from memory
            Assert.Equal(A027376[n - 1], enumerated);
        }
    }

    [Fact]
    public void Witt_formula_agrees_with_enumeration_for_four_and_five_letters()
    {
        for (var k = 4; k <= 5; k++)
        {
            for (var n = 1; n <= 6; n++)
            {
                Assert.Equal(new BigInteger(LyndonWord.Enumerate(k, n).Count()), LyndonWord.CountByWitt(k, n));
            }
        }
    }

    [Fact]
    public void Enumeration_is_strictly_increasing_and_lists_exactly_the_Lyndon_words()
    {
        // Brute force over all 3^6 words: the definition (smaller than every proper suffix) is the oracle.
        var all = new List<Word>();
        for (var i = 0; i < 729; i++)
        {
            var letters = new int[6];
            var x = i;
            for (var p = 5; p >= 0; p--)
            {
                letters[p] = x % 3;
                x /= 3;
            }

            all.Add(new Word(letters));
        }

        var bruteForce = all.Where(w => Enumerable.Range(1, 5).All(s => w.Subword(s, 6 - s).CompareTo(w) > 0)).OrderBy(w => w).ToList();
        var enumerated = LyndonWord.Enumerate(3, 6).Select(l => l.Word).ToList();
        Assert.Equal(bruteForce, enumerated);
        Assert.All(enumerated, w => Assert.True(LyndonWord.IsLyndon(w), w.ToString()));
    }

    [Fact]
    public void Standard_factorisation_takes_the_longest_proper_Lyndon_suffix()
    {
        // Definition of the standard factorisation (Lothaire, Combinatorics on Words, section 5.1; Reutenauer, section 5.1).
        var algebra = new FreeLieAlgebra("X", "Y");
        Assert.Equal("[[X, Y], Y]", algebra.FormatBasisElement(LyndonWord.Create(algebra.Alphabet.Spell("X", "Y", "Y"))));
        Assert.Equal("[X, [X, Y]]", algebra.FormatBasisElement(LyndonWord.Create(algebra.Alphabet.Spell("X", "X", "Y"))));
        // XXYXY: proper Lyndon suffixes are Y and XY (XYXY is a square, YXY starts with Y), so XXYXY = (XXY)(XY).
        var w = LyndonWord.Create(algebra.Alphabet.Spell("X", "X", "Y", "X", "Y"));
        var (u, v) = w.StandardFactorization();
        Assert.Equal(algebra.Alphabet.Spell("X", "X", "Y"), u.Word);
        Assert.Equal(algebra.Alphabet.Spell("X", "Y"), v.Word);
        Assert.Equal("[[X, [X, Y]], [X, Y]]", algebra.FormatBasisElement(w));
    }

    [Fact]
    public void Standard_factorisation_factors_are_Lyndon_and_ordered()
    {
        // Lothaire, Prop. 5.1.3: in w = uv (standard), u and v are Lyndon and u < v.
        foreach (var w in LyndonWord.Enumerate(3, 7))
        {
            var (u, v) = w.StandardFactorization();
            Assert.True(LyndonWord.IsLyndon(u.Word) && LyndonWord.IsLyndon(v.Word), w.ToString());
            Assert.True(u.CompareTo(v) < 0, w.ToString());
            Assert.Equal(w.Word, Word.Concat(u.Word, v.Word));
            // v is the longest proper Lyndon suffix
            for (var start = 1; start < u.Degree; start++)
            {
                Assert.False(LyndonWord.IsLyndon(w.Word.Subword(start, w.Degree - start)), $"{w}: longer Lyndon suffix at {start}");
            }
        }
    }

    [Fact]
    public void Words_are_ordered_lexicographically_with_prefixes_first()
    {
        // Lexicographic order as in Lothaire, section 5.1 (common practice).
        var x = Word.Letter(0);
        var xy = new Word([0, 1]);
        var y = Word.Letter(1);
        Assert.True(x < xy && xy < y);
        Assert.True(new Word([1]) < new Word([1, 0]));
        Assert.Equal(new Word([0, 1, 1, 0]), Word.Concat(xy, new Word([1, 0])));
    }

    [Fact]
    public void Moebius_function_matches_its_first_values()
    {
        // OEIS A008683, from memory: mu(1..12) = 1, -1, -1, 0, -1, 1, -1, 0, 0, 1, -1, 0.
        int[] expected = [1, -1, -1, 0, -1, 1, -1, 0, 0, 1, -1, 0];
        Assert.Equal(expected, Enumerable.Range(1, 12).Select(LyndonWord.Moebius).ToArray());
    }

    [Fact]
    public void Bad_input_is_rejected_with_a_named_reason()
    {
        var e = Assert.Throws<ExactArgumentException>(() => LyndonWord.Create(new Word([1, 0])));
        Assert.Contains("not a Lyndon word", e.Message);
        Assert.Throws<ExactArgumentException>(() => LyndonWord.Create(Word.Empty));
        Assert.Throws<ExactArgumentException>(() => LyndonWord.Enumerate(2, 0).ToList());
        Assert.Throws<ExactArgumentException>(() => LyndonWord.Enumerate(17, 3).ToList());
        Assert.Throws<ExactArgumentException>(() => LyndonWord.CountByWitt(2, 0));
        Assert.Throws<ExactArgumentException>(() => new Word([16]));
        Assert.Throws<ExactArgumentException>(() => new Word(new int[33]));
        Assert.Throws<InvalidOperationException>(() => LyndonWord.Create(Word.Letter(0)).StandardFactorization());
    }
}
