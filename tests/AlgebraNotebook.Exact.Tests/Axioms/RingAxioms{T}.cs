using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>
/// The axioms of a commutative ring with identity, checked on random elements (common practice: the definition of a
/// commutative ring, e.g. Lang, Algebra, ch. II, section 1). Failing inputs are printed in the assertion message.
/// </summary>
/// <typeparam name="T">The ring element type.</typeparam>
public class RingAxioms<T>
    where T : IRingElement<T>
{
    /// <summary>Creates the harness.</summary>
    /// <param name="generate">Draws a random element.</param>
    /// <param name="cancelsToZero">
    /// Decides whether a + (-a) counts as zero. Default: equal to <c>T.Zero</c>. Types with a precision (truncated series)
    /// pass a weaker test, because a - a is zero only up to the precision of a.
    /// </param>
    /// <param name="baseIterations">Iterations before the ALGEBRANOTEBOOK_TEST_ITERATIONS multiplier.</param>
    public RingAxioms(Func<Random, T> generate, Func<T, bool>? cancelsToZero = null, int baseIterations = 100)
    {
        Generate = generate;
        CancelsToZero = cancelsToZero ?? (value => value.Equals(T.Zero));
        Iterations = RandomisedTesting.Iterations(baseIterations);
    }

    /// <summary>The random generator.</summary>
    protected Func<Random, T> Generate { get; }

    /// <summary>The zero test for a + (-a).</summary>
    protected Func<T, bool> CancelsToZero { get; }

    /// <summary>The number of random cases per check.</summary>
    protected int Iterations { get; }

    /// <summary>Runs every ring check.</summary>
    public virtual void CheckAll()
    {
        CheckAdditionAssociativeAndCommutative();
        CheckMultiplicationAssociativeAndCommutative();
        CheckDistributivity();
        CheckIdentities();
        CheckAdditiveInverses();
        CheckEqualityAndHashing();
        CheckIntegerEmbedding();
        CheckConjugation();
    }

    /// <summary>(a + b) + c = a + (b + c) and a + b = b + a.</summary>
    public void CheckAdditionAssociativeAndCommutative() => ForTriples(1, (a, b, c) =>
    {
        Assert.True((a + b) + c == a + (b + c), $"(a + b) + c != a + (b + c) for a = {a}, b = {b}, c = {c}: {(a + b) + c} vs {a + (b + c)}");
        Assert.True(a + b == b + a, $"a + b != b + a for a = {a}, b = {b}: {a + b} vs {b + a}");
    });

    /// <summary>(a b) c = a (b c) and a b = b a.</summary>
    public void CheckMultiplicationAssociativeAndCommutative() => ForTriples(2, (a, b, c) =>
    {
        Assert.True((a * b) * c == a * (b * c), $"(a*b)*c != a*(b*c) for a = {a}, b = {b}, c = {c}: {(a * b) * c} vs {a * (b * c)}");
        Assert.True(a * b == b * a, $"a*b != b*a for a = {a}, b = {b}: {a * b} vs {b * a}");
    });

    /// <summary>a (b + c) = a b + a c and (a + b) c = a c + b c.</summary>
    public void CheckDistributivity() => ForTriples(3, (a, b, c) =>
    {
        Assert.True(a * (b + c) == a * b + a * c, $"a*(b + c) != a*b + a*c for a = {a}, b = {b}, c = {c}: {a * (b + c)} vs {a * b + a * c}");
        Assert.True((a + b) * c == a * c + b * c, $"(a + b)*c != a*c + b*c for a = {a}, b = {b}, c = {c}");
        Assert.True(a * (b - c) == a * b - a * c, $"a*(b - c) != a*b - a*c for a = {a}, b = {b}, c = {c}");
    });

    /// <summary>a + 0 = a, 0 + a = a, a 1 = a, 1 a = a; Zero and One report themselves; default(T) is Zero for structs.</summary>
    public void CheckIdentities()
    {
        Assert.True(T.Zero.IsZero, $"Zero.IsZero is false for {typeof(T).Name}");
        Assert.True(T.One.IsOne, $"One.IsOne is false for {typeof(T).Name}");
        Assert.False(T.One.IsZero, $"One.IsZero is true for {typeof(T).Name}");
        Assert.True(T.Zero != T.One, $"Zero == One for {typeof(T).Name}");
        if (typeof(T).IsValueType)
        {
            Assert.True(default(T)!.Equals(T.Zero), $"default({typeof(T).Name}) = {default(T)} is not Zero");
            Assert.True(default(T)!.IsZero, $"default({typeof(T).Name}).IsZero is false");
        }

        ForSingles(4, a =>
        {
            Assert.True(a + T.Zero == a && T.Zero + a == a, $"a + 0 != a for a = {a}");
            Assert.True(a * T.One == a && T.One * a == a, $"a*1 != a for a = {a}: {a * T.One}");
            Assert.True(a - T.Zero == a, $"a - 0 != a for a = {a}");
            Assert.True(a.IsZero == a.Equals(T.Zero), $"IsZero disagrees with Equals(Zero) for a = {a}");
            Assert.True(a.IsOne == a.Equals(T.One), $"IsOne disagrees with Equals(One) for a = {a}");
        });
    }

    /// <summary>a + (-a) = 0, a - b = a + (-b), -(-a) = a, (-a) b = -(a b).</summary>
    public void CheckAdditiveInverses() => ForTriples(5, (a, b, _) =>
    {
        Assert.True(CancelsToZero(a + (-a)), $"a + (-a) is not zero for a = {a}: {a + (-a)}");
        Assert.True(CancelsToZero(a - a), $"a - a is not zero for a = {a}: {a - a}");
        Assert.True(a - b == a + (-b), $"a - b != a + (-b) for a = {a}, b = {b}");
        Assert.True(-(-a) == a, $"-(-a) != a for a = {a}");
        Assert.True((-a) * b == -(a * b), $"(-a)*b != -(a*b) for a = {a}, b = {b}");
    });

    /// <summary>
    /// Equal values built independently are Equals, ==, and have equal hash codes; != and Equals(object) agree.
    /// </summary>
    public void CheckEqualityAndHashing()
    {
        var seeds = RandomisedTesting.NewRandom(6);
        for (var iteration = 0; iteration < Iterations; iteration++)
        {
            var seed = seeds.Next();
            var a = Generate(new Random(seed));
            var same = Generate(new Random(seed));
            var b = Generate(seeds);
            Assert.True(a.Equals(same) && a == same && !(a != same) && a.Equals((object)same),
                $"Two independently built copies of {a} are not equal (seed {seed})");
            Assert.True(a.GetHashCode() == same.GetHashCode(), $"Equal values {a} have different hash codes (seed {seed})");
            Assert.True((a + b).GetHashCode() == (b + a).GetHashCode(), $"a + b and b + a hash differently for a = {a}, b = {b}");
            Assert.True((a * b).GetHashCode() == (b * a).GetHashCode(), $"a*b and b*a hash differently for a = {a}, b = {b}");
            Assert.True(a.Equals(b) == (a == b) && (a == b) != (a != b), $"Equals, == and != disagree for a = {a}, b = {b}");
            Assert.True(a.Equals(b) == b.Equals(a), $"Equals is not symmetric for a = {a}, b = {b}");
            Assert.False(a.Equals((object)"not an element"), $"{a} equals a string");
        }
    }

    /// <summary>FromInteger is a ring map: it sends 0, 1, m + n and m n to Zero, One, sums and products.</summary>
    public void CheckIntegerEmbedding()
    {
        Assert.True(T.FromInteger(BigInteger.Zero) == T.Zero, "FromInteger(0) != Zero");
        Assert.True(T.FromInteger(BigInteger.One) == T.One, "FromInteger(1) != One");
        var random = RandomisedTesting.NewRandom(7);
        for (var iteration = 0; iteration < Iterations; iteration++)
        {
            var m = RandomisedTesting.Integer(random);
            var n = RandomisedTesting.Integer(random);
            Assert.True(T.FromInteger(m) + T.FromInteger(n) == T.FromInteger(m + n), $"FromInteger is not additive for m = {m}, n = {n}");
            Assert.True(T.FromInteger(m) * T.FromInteger(n) == T.FromInteger(m * n), $"FromInteger is not multiplicative for m = {m}, n = {n}");
            Assert.True(-T.FromInteger(m) == T.FromInteger(-m), $"FromInteger does not commute with negation for m = {m}");
        }
    }

    /// <summary>Conjugation is an involutive ring map: it respects sums and products, fixes 1, and undoes itself.</summary>
    public void CheckConjugation()
    {
        Assert.True(T.One.Conjugate() == T.One, "Conjugate(1) != 1");
        ForTriples(10, (a, b, _) =>
        {
            Assert.True(a.Conjugate().Conjugate() == a, $"conj(conj(a)) != a for a = {a}");
            Assert.True((a + b).Conjugate() == a.Conjugate() + b.Conjugate(), $"conj(a + b) != conj(a) + conj(b) for a = {a}, b = {b}");
            Assert.True((a * b).Conjugate() == a.Conjugate() * b.Conjugate(), $"conj(a*b) != conj(a)*conj(b) for a = {a}, b = {b}");
        });
    }

    /// <summary>Runs <paramref name="check"/> on random single elements.</summary>
    protected void ForSingles(int offset, Action<T> check)
    {
        var random = RandomisedTesting.NewRandom(offset);
        for (var iteration = 0; iteration < Iterations; iteration++)
        {
            check(Generate(random));
        }
    }

    /// <summary>Runs <paramref name="check"/> on random triples.</summary>
    protected void ForTriples(int offset, Action<T, T, T> check)
    {
        var random = RandomisedTesting.NewRandom(offset);
        for (var iteration = 0; iteration < Iterations; iteration++)
        {
            check(Generate(random), Generate(random), Generate(random));
        }
    }
}
