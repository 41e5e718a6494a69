using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    /// <summary>
    /// The main invariants in one object (<see cref="LieAlgebraSummary"/>): nilpotent / solvable / semisimple, dimensions
    /// of centre, derived algebra, radical and nilradical, the Levi factor and its Cartan type over C (for
    /// LieAlgebra&lt;Rational&gt; the Levi factor's own root decomposition when it is split over Q, otherwise that of its
    /// complexification), the simple ideals of a semisimple algebra.
    /// When no split Cartan subalgebra is found (a generic dense basis), the type comes from
    /// <see cref="TypeOfComplexification"/> and a note states what it rests on (roots computed modulo primes).
    /// Cost: a Levi decomposition plus a root decomposition of the Levi factor.
    /// </summary>
    public LieAlgebraSummary Summary()
    {
        var notes = new List<string>();
        var semisimple = IsSemisimple;
        var levi = LeviDecomposition();
        Roots.CartanType? type = null;
        if (levi.LeviFactor.Count > 0)
        {
            // A semisimple algebra is its own Levi factor: use it directly, so its cached decompositions are shared with
            // the real-form name and the Casimir degrees.
            var factor = levi.Radical.Count == 0 ? this : SubalgebraOnBasis(levi.LeviFactor.Select(e => e.CoefficientArray).ToArray());
            try
            {
                var roots = factor is LieAlgebra<Rational> real
                    ? real.SplitRootDecompositionForType()
                    : factor.RootDecomposition();
                switch (roots)
                {
                    case RootDecomposition<GaussianRational> complex when complex.IsSplit:
                        type = complex.Type;
                        break;
                    case RootDecomposition<T> own when own.IsSplit:
                        type = own.Type;
                        break;
                    case RootDecomposition<GaussianRational> complex:
                        notes.Add($"type not reached: {complex.Note}");
                        break;
                    case RootDecomposition<T> own:
                        notes.Add($"type not reached: {own.Note}");
                        break;
                }
            }
            catch (BeyondCapabilityException e)
            {
                notes.Add($"type not reached: {e.Message}");
            }

            if (type is null)
            {
                // Fallback without a split Cartan subalgebra: the type of the complexification from roots modulo primes,
                // labelled with what it rests on.
                try
                {
                    var complexified = factor.TypeOfComplexification();
                    type = complexified.Type;
                    notes.Add($"type {complexified.Type} by TypeOfComplexification: {complexified.RestsOn}");
                }
                catch (BeyondCapabilityException e)
                {
                    notes.Add($"type of the complexification not reached either: {e.Message}");
                }
            }
        }

        IReadOnlyList<int> simple = [];
        if (semisimple)
        {
            try
            {
                simple = SimpleIdeals().Select(i => i.Count).ToArray();
            }
            catch (BeyondCapabilityException e)
            {
                notes.Add($"simple ideals not separated: {e.Message}");
            }
        }

        return new LieAlgebraSummary(
            Dimension,
            IsAbelian,
            IsNilpotent,
            IsSolvable,
            semisimple,
            CenterCore().Length,
            BracketSpaces(AllBasis(), AllBasis()).Length,
            levi.Radical.Count,
            Nilradical().Count,
            levi.LeviFactor.Count,
            type,
            simple,
            notes);
    }
}
