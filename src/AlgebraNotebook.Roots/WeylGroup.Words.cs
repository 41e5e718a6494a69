namespace AlgebraNotebook.Roots;

public sealed partial class WeylGroup
{
    /// <summary>
    /// A reduced word for the element given by <paramref name="word"/>: the element is applied to rho and the image is
    /// walked back to the dominant chamber; each step crosses one wall, so the walk has exactly length(w) steps
    /// (the number of positive roots that w sends to negative roots, Humphreys, Introduction to Lie Algebras, 10.3).
    /// Cost O(length * rank) after O(|word| * rank) to apply the word.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public int[] ReducedWord(IReadOnlyList<int> word)
    {
        var image = Apply(word, System.Rho);
        var (_, back) = ToDominant(image);

        // back * w = 1, so w = back^(-1): the reversed letters.
        Array.Reverse(back);
        return back;
    }

    /// <summary>The length of the element given by a word: the length of a reduced word, = number of positive roots sent negative.</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public int Length(IReadOnlyList<int> word) => ReducedWord(word).Length;

    /// <summary>True when the word is the identity element (it fixes the strictly dominant weight rho).</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public bool IsIdentity(IReadOnlyList<int> word) => Apply(word, System.Rho) == System.Rho;

    /// <summary>True when two words denote the same element (same image of rho, whose stabiliser is trivial).</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public bool AreEqual(IReadOnlyList<int> left, IReadOnlyList<int> right) =>
        Apply(left, System.Rho) == Apply(right, System.Rho);

    /// <summary>A word for the inverse element: the letters reversed.</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public int[] Inverse(IReadOnlyList<int> word)
    {
        RequireWord(word, nameof(word));
        return word.Reverse().ToArray();
    }

    /// <summary>A reduced word for the product of two elements (left then right, as words concatenate).</summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">A letter is not a node number 1..Rank.</exception>
    public int[] Multiply(IReadOnlyList<int> left, IReadOnlyList<int> right)
    {
        RequireWord(left, nameof(left));
        RequireWord(right, nameof(right));
        return ReducedWord(left.Concat(right).ToArray());
    }

    /// <summary>
    /// A reduced word for the longest element w_0, the unique element sending rho to -rho; its length is the number of
    /// positive roots. Found by walking -rho back to the dominant chamber.
    /// </summary>
    public int[] LongestElement()
    {
        var (_, word) = ToDominant(-System.Rho);

        // word(-rho) = rho, so w_0 = word^(-1); w_0 is an involution, the reversed word is the conventional reading.
        Array.Reverse(word);
        return word;
    }

    /// <summary>The words as text, e.g. "s1 s2 s1"; the empty word prints as "1".</summary>
    public static string FormatWord(IReadOnlyList<int> word)
    {
        ArgumentNullException.ThrowIfNull(word);
        return word.Count == 0 ? "1" : string.Join(" ", word.Select(a => $"s{a}"));
    }
}
