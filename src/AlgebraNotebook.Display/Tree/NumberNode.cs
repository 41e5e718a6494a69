using System.Numerics;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tree;

/// <summary>A non-negative integer literal. Negative values are written as a <see cref="SumNode"/> with one negative term.</summary>
public sealed record NumberNode : MathNode
{
    /// <summary>Creates the literal.</summary>
    /// <exception cref="ExactArgumentException">The value is negative.</exception>
    public NumberNode(BigInteger value)
    {
        if (value.Sign < 0)
        {
            throw new ExactArgumentException(
                $"Number literal {value} is negative; display numbers are non-negative and the sign belongs to the enclosing sum (use MathNodes.Integer).",
                nameof(value));
        }

        Value = value;
    }

    /// <summary>The value, at least 0.</summary>
    public BigInteger Value { get; }

    /// <inheritdoc />
    public override bool IsTall => false;
}
