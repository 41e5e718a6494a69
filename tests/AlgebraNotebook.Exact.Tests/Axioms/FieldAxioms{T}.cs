using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>
/// Q-algebra axioms plus field inverses: a a^-1 = 1 for a != 0, (a / b) b = a, and division by zero throws
/// (common practice: definition of a field).
/// </summary>
/// <typeparam name="T">The field element type.</typeparam>
public class FieldAxioms<T> : RationalAlgebraAxioms<T>
    where T : IFieldElement<T>
{
    /// <summary>Creates the harness; see <see cref="RingAxioms{T}"/>.</summary>
    public FieldAxioms(Func<Random, T> generate, int baseIterations = 100)
        : base(generate, null, baseIterations)
    {
    }

    /// <inheritdoc />
    public override void CheckAll()
    {
        base.CheckAll();
        CheckInverses();
    }

    /// <summary>Multiplicative inverses and exact division; zero has no inverse.</summary>
    public void CheckInverses()
    {
        Assert.Throws<DivideByZeroException>(() => T.Zero.Reciprocal());
        ForTriples(9, (a, b, _) =>
        {
            Assert.Throws<DivideByZeroException>(() => a / T.Zero);
            if (!a.IsZero)
            {
                Assert.True((a * a.Reciprocal()).IsOne, $"a * a^-1 != 1 for a = {a}: a^-1 = {a.Reciprocal()}");
                Assert.True(a.Reciprocal().Reciprocal() == a, $"(a^-1)^-1 != a for a = {a}");
            }

            if (!b.IsZero)
            {
                Assert.True((a / b) * b == a, $"(a / b)*b != a for a = {a}, b = {b}: a / b = {a / b}");
                Assert.True(a / b == a * b.Reciprocal(), $"a / b != a * b^-1 for a = {a}, b = {b}");
            }
        });
    }
}
