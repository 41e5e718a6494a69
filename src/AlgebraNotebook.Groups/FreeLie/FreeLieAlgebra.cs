using System.Numerics;
using System.Text;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>
/// The free Lie algebra over Q on named generators, with the Lyndon basis: for each Lyndon word w (letters ordered as
/// the generators are given) the standard bracketing P(w) (see <see cref="LyndonWord"/>). Elements are
/// <see cref="LieSeries"/>. The bracket is computed inside the free associative algebra ([a, b] = ab - ba) and
/// rewritten into the Lyndon basis by triangular peeling (see <see cref="ToLyndonBasis"/>).
/// </summary>
/// <example><c>var L = new FreeLieAlgebra("X", "Y"); L.Parse("[Y, [X, Y]]").ToString() == "-[[X, Y], Y]"</c></example>
public sealed partial class FreeLieAlgebra : IEquatable<FreeLieAlgebra>
{
    /// <summary>Creates the free Lie algebra; the order of the names is the letter order (first = smallest).</summary>
    /// <exception cref="ExactArgumentException">No names, more than 16, a repeated name, or a name that is not an identifier.</exception>
    public FreeLieAlgebra(params string[] generators)
    {
        Alphabet = new Alphabet(generators);
    }

    /// <summary>Creates the free Lie algebra on an alphabet.</summary>
    public FreeLieAlgebra(Alphabet alphabet)
    {
        ArgumentNullException.ThrowIfNull(alphabet);
        Alphabet = alphabet;
    }

    /// <summary>The ordered generators.</summary>
    public Alphabet Alphabet { get; }

    /// <summary>The generator names, smallest first.</summary>
    public IReadOnlyList<string> Generators => Alphabet.Names;

    /// <summary>The zero element (exact).</summary>
    public LieSeries Zero => new(this, [], int.MaxValue);

    /// <summary>A generator as an element.</summary>
    /// <exception cref="ExactArgumentException">Unknown generator name.</exception>
    public LieSeries Generator(string name) => BasisElement(LyndonWord.FromTrusted(Word.Letter(Alphabet.IndexOf(name))));

    /// <summary>The basis element P(w) for a Lyndon word w.</summary>
    /// <exception cref="ExactArgumentException">The word uses a letter outside the generators.</exception>
    public LieSeries BasisElement(LyndonWord word)
    {
        Alphabet.RequireContains(word.Word, nameof(word));
        return new LieSeries(this, [(word, Rational.One)], int.MaxValue);
    }

    /// <summary>The basis element P(w) for a Lyndon word spelled by generator names, e.g. BasisElement("X", "Y", "Y").</summary>
    /// <exception cref="ExactArgumentException">Unknown names, or the word is not a Lyndon word.</exception>
    public LieSeries BasisElement(params string[] letters) => BasisElement(LyndonWord.Create(Alphabet.Spell(letters)));

    /// <summary>The Lyndon words of a degree in increasing lexicographic order (a basis of that degree).</summary>
    /// <exception cref="ExactArgumentException">Degree outside 1..32.</exception>
    public IReadOnlyList<LyndonWord> Basis(int degree) => LyndonWord.Enumerate(Alphabet.Count, degree).ToArray();

    /// <summary>The dimension of the degree-n part, by Witt's formula.</summary>
    /// <exception cref="ExactArgumentException">Degree below 1.</exception>
    public BigInteger Dimension(int degree) => LyndonWord.CountByWitt(Alphabet.Count, degree);

    /// <summary>The standard bracketing of a Lyndon word in generator names, e.g. "[X, [X, Y]]" for XXY.</summary>
    /// <exception cref="ExactArgumentException">The word uses a letter outside the generators.</exception>
    public string FormatBasisElement(LyndonWord word)
    {
        Alphabet.RequireContains(word.Word, nameof(word));
        var builder = new StringBuilder();
        AppendBracketing(builder, word);
        return builder.ToString();
    }

    /// <summary>The expansion of a Lie element into the free associative algebra ([a, b] becomes ab - ba).</summary>
    /// <exception cref="ExactArgumentException">The element belongs to another free Lie algebra.</exception>
    public AssociativeElement Expand(LieSeries element)
    {
        RequireOwn(element, nameof(element));
        var terms = new Dictionary<Word, Rational>();
        foreach (var (w, c) in element.TermsCore)
        {
            foreach (var (u, cu) in LieExpansion.Expand(w))
            {
                AssociativeElement.AddTo(terms, u, c * cu);
            }
        }

        return new AssociativeElement(Alphabet, terms);
    }

    /// <summary>
    /// Rewrites an element of the free associative algebra that is a Lie element into the Lyndon basis (exact result).
    /// Method: per degree, the smallest word present is the smallest Lyndon word with a non-zero coordinate, with that
    /// coordinate as coefficient (triangularity, Reutenauer, Free Lie Algebras, Thm 5.1); subtract and repeat.
    /// </summary>
    /// <exception cref="ExactArgumentException">Different alphabet, or the element is not a Lie element (the message names the degree and the word).</exception>
    public LieSeries ToLyndonBasis(AssociativeElement element)
    {
        ArgumentNullException.ThrowIfNull(element);
        if (!element.Alphabet.Equals(Alphabet))
        {
            throw new ExactArgumentException($"The element is over the generators ({element.Alphabet}), not ({Alphabet}).", nameof(element));
        }

        if (TryToLyndonBasisCore(element.TermsCore, out var result, out var failedDegree))
        {
            return new LieSeries(this, result, int.MaxValue);
        }

        throw new ExactArgumentException(
            $"The element is not a Lie element: its degree-{failedDegree} part is not a combination of commutators.", nameof(element));
    }

    /// <summary>Like <see cref="ToLyndonBasis"/>, returning false instead of throwing when the element is not a Lie element.</summary>
    public bool TryToLyndonBasis(AssociativeElement element, out LieSeries? result)
    {
        ArgumentNullException.ThrowIfNull(element);
        result = null;
        if (!element.Alphabet.Equals(Alphabet) || !TryToLyndonBasisCore(element.TermsCore, out var terms, out _))
        {
            return false;
        }

        result = new LieSeries(this, terms, int.MaxValue);
        return true;
    }

    /// <summary>The bracket [a, b] in the Lyndon basis (see <see cref="LieSeries.Bracket"/>).</summary>
    /// <exception cref="ExactArgumentException">An element of another free Lie algebra.</exception>
    public LieSeries Bracket(LieSeries a, LieSeries b) => LieSeries.Bracket(a, b);

    /// <summary>Rewrites a nested commutator of generators into the Lyndon basis.</summary>
    /// <exception cref="ExactArgumentException">The tree names an unknown generator.</exception>
    public LieSeries Rewrite(BracketTree tree)
    {
        ArgumentNullException.ThrowIfNull(tree);
        if (tree.IsGenerator)
        {
            return Generator(tree.Name!);
        }

        return LieSeries.Bracket(Rewrite(tree.Left!), Rewrite(tree.Right!));
    }

    /// <inheritdoc />
    public bool Equals(FreeLieAlgebra? other) => other is not null && Alphabet.Equals(other.Alphabet);

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as FreeLieAlgebra);

    /// <inheritdoc />
    public override int GetHashCode() => Alphabet.GetHashCode();

    /// <summary>"free Lie algebra on X &lt; Y".</summary>
    public override string ToString() => $"free Lie algebra on {Alphabet}";

    internal void RequireOwn(LieSeries element, string paramName)
    {
        ArgumentNullException.ThrowIfNull(element, paramName);
        if (!element.Algebra.Equals(this))
        {
            throw new ExactArgumentException($"The element belongs to the {element.Algebra}, not the {this}.", paramName);
        }
    }

    internal bool TryToLyndonBasisCore(IReadOnlyDictionary<Word, Rational> terms, out List<(LyndonWord Word, Rational Coefficient)> result, out int failedDegree)
    {
        result = [];
        failedDegree = 0;
        if (terms.TryGetValue(Word.Empty, out var constant) && !constant.IsZero)
        {
            return false;
        }

        var expansions = new DenseExpansions(Alphabet.Count);
        foreach (var group in terms.GroupBy(p => p.Key.Length).OrderBy(g => g.Key))
        {
            var degree = group.Key;
            var size = (double)Math.Pow(Alphabet.Count, degree);
            bool ok;
            // The dense array has one entry per word of the degree (k^degree); a sparse element, such as the expansion
            // of [X, [X, ... [X, Y]]] with degree + 1 words, goes to the sparse variant instead of allocating it.
            if (size <= DenseProjectionLimit && (size <= DenseAlwaysBelow || group.Count() * DenseMinimumFill >= size))
            {
                var dense = new Rational[(int)size];
                foreach (var (w, c) in group)
                {
                    dense[w.DenseIndex(Alphabet.Count)] = c;
                }

                ok = LieExpansion.TryProjectDense(Alphabet.Count, degree, dense, result, expansions);
            }
            else
            {
                ok = LieExpansion.TryProjectReference(group.ToDictionary(p => p.Key, p => p.Value), result);
            }

            if (!ok)
            {
                failedDegree = degree;
                return false;
            }
        }

        return true;
    }

    /// <summary>Words per degree up to which projection works on a dense array.</summary>
    internal const int DenseProjectionLimit = 1 << 22;

    /// <summary>Words per degree below which the dense array is used whatever the fill.</summary>
    internal const int DenseAlwaysBelow = 1 << 12;

    /// <summary>Above <see cref="DenseAlwaysBelow"/>, the dense array is used when at least one word in this many occurs.</summary>
    internal const int DenseMinimumFill = 16;

    private void AppendBracketing(StringBuilder builder, LyndonWord word)
    {
        if (word.IsLetter)
        {
            builder.Append(Alphabet.Names[word.Word.LetterAt(0)]);
            return;
        }

        var (u, v) = LyndonWord.StandardFactorizationCore(word.Word);
        builder.Append('[');
        AppendBracketing(builder, u);
        builder.Append(", ");
        AppendBracketing(builder, v);
        builder.Append(']');
    }
}
