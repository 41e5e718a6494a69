using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// A declaration that operators act on the eigenspace H f = E f of an operator H with eigenvalue E (a coefficient,
/// usually a parameter). Under it an operator L may be replaced by any L - Q (H - E); <see cref="Simplify"/> uses this
/// to remove every derivative divisible by the leading derivative of H (division by H - E from the left in the order
/// of <see cref="DifferentialOperator{T}"/> terms: graded, then the ring's coordinate order). Results say so in their
/// text: "... (on the eigenspace H = E)".
/// </summary>
/// <remarks>The remainder R = L - Q (H - E) equals L on every f with H f = E f, and it is unique: two operators that differ
/// by some Q (H - E) have the same remainder (the leading coefficient of H is a unit, so a non-zero Q (H - E) always has a
/// term divisible by H's leading derivative). Cost: one operator product per reduction step.</remarks>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class Eigenspace<T>
    where T : IFieldElement<T>
{
    private readonly DifferentialOperator<T> _shifted;
    private readonly Monomial _lead;
    private readonly Polynomial<T> _leadInverse;

    /// <summary>Declares the eigenspace H f = E f.</summary>
    /// <param name="name">The name of H used in text ("H").</param>
    /// <param name="op">The operator H; its leading coefficient (first term of the normal form) must be invertible in the ring.</param>
    /// <param name="eigenvalue">The eigenvalue E, a coefficient of the same ring.</param>
    /// <exception cref="ExactArgumentException">The name is empty; H is of order 0 or less; the eigenvalue belongs to
    /// another ring; or H's leading coefficient has no inverse in the ring (the message shows it).</exception>
    public Eigenspace(string name, DifferentialOperator<T> op, Coefficient<T> eigenvalue)
    {
        ArgumentNullException.ThrowIfNull(op);
        if (string.IsNullOrWhiteSpace(name))
        {
            throw new ExactArgumentException("The eigenspace declaration needs a name for the operator.", nameof(name));
        }

        if (op.Order < 1)
        {
            throw new ExactArgumentException($"{name} = {op} has order {op.Order}; an eigenspace declaration needs an operator with derivatives.", nameof(op));
        }

        op.Ring.RequireMine(eigenvalue, nameof(eigenvalue));
        Name = name;
        Operator = op;
        Eigenvalue = eigenvalue;
        _shifted = op - DifferentialOperator<T>.Multiplication(op.Ring, eigenvalue);
        var (lead, coefficient) = _shifted.RawTerms[0];
        if (!op.Ring.TryInvertCore(coefficient, out var inverse))
        {
            throw new ExactArgumentException(
                $"The leading coefficient {coefficient} of {name} = {op} (at {DifferentialOperator<T>.DerivativeText(op.Ring, lead)}) has no inverse in ring \"{op.Ring.Name}\"; declare an inverse symbol.",
                nameof(op));
        }

        _lead = lead;
        _leadInverse = inverse;
    }

    /// <summary>The name of H.</summary>
    public string Name { get; }

    /// <summary>The operator H.</summary>
    public DifferentialOperator<T> Operator { get; }

    /// <summary>The eigenvalue E.</summary>
    public Coefficient<T> Eigenvalue { get; }

    /// <summary>
    /// Reduces <paramref name="op"/> by H - E until no term has a derivative divisible by H's leading derivative; the
    /// result equals <paramref name="op"/> on the eigenspace.
    /// </summary>
    /// <exception cref="ExactArgumentException">The operator is over another ring.</exception>
    /// <exception cref="BeyondCapabilityException">More than 100,000 reduction steps were needed.</exception>
    public EigenspaceResult<T> Simplify(DifferentialOperator<T> op)
    {
        Operator.RequireSameRing(op, nameof(op));
        var ring = op.Ring;
        var current = op;
        for (var step = 0; ; step++)
        {
            if (step > 100_000)
            {
                throw new BeyondCapabilityException($"Reducing {op} on the eigenspace {Name} = {Eigenvalue} took more than 100,000 steps.");
            }

            var reducible = current.RawTerms.FirstOrDefault(t => _lead.Divides(t.Derivative));
            if (reducible.Derivative is null)
            {
                return new EigenspaceResult<T>(current, this);
            }

            var factor = new DifferentialOperator<T>(
                ring, [(reducible.Derivative.DivideBy(_lead), ring.Reduce(reducible.Coefficient * _leadInverse))]);
            current -= factor * _shifted;
        }
    }

    /// <summary>"H = E" with the operator written out: "H = E where H = ...".</summary>
    public override string ToString() => $"{Name} = {Eigenvalue} where {Name} = {Operator}";
}
