using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>
/// Ring axioms plus the Q-algebra structure: FromRational is a ring map and Scale(r) is multiplication by FromRational(r)
/// (common practice: definition of an algebra over a field).
/// </summary>
/// <typeparam name="T">The element type.</typeparam>
public class RationalAlgebraAxioms<T> : RingAxioms<T>
    where T : IRationalAlgebraElement<T>
{
    /// <summary>Creates the harness; see <see cref="RingAxioms{T}"/>.</summary>
    public RationalAlgebraAxioms(Func<Random, T> generate, Func<T, bool>? cancelsToZero = null, int baseIterations = 100)
        : base(generate, cancelsToZero, baseIterations)
    {
    }

    /// <inheritdoc />
    public override void CheckAll()
    {
        base.CheckAll();
        CheckRationalScaling();
    }

    /// <summary>FromRational(r + s) = FromRational(r) + FromRational(s), likewise for products; a.Scale(r) = a FromRational(r).</summary>
    public void CheckRationalScaling()
    {
        var random = RandomisedTesting.NewRandom(8);
        for (var iteration = 0; iteration < Iterations; iteration++)
        {
            var r = RandomisedTesting.Rational(random);
            var s = RandomisedTesting.Rational(random);
            var a = Generate(random);
            Assert.True(T.FromRational(r) + T.FromRational(s) == T.FromRational(r + s), $"FromRational is not additive for r = {r}, s = {s}");
            Assert.True(T.FromRational(r) * T.FromRational(s) == T.FromRational(r * s), $"FromRational is not multiplicative for r = {r}, s = {s}");
            Assert.True(a.Scale(r) == a * T.FromRational(r),
                $"a.Scale(r) != a*FromRational(r) for a = {a}, r = {r}: {a.Scale(r)} vs {a * T.FromRational(r)}");
            Assert.True(a.Scale(r).Scale(s) == a.Scale(r * s), $"Scale is not compatible with the product of rationals for a = {a}, r = {r}, s = {s}");
        }
    }
}
