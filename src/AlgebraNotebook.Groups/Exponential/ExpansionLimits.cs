using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>
/// Bounds on truncated-series work (series exponentials, logarithms, word expansions). The cost of a matrix series of
/// order N in k parameters grows like the number of monomials of degree &lt; N in k variables times n^3 for n x n matrices,
/// so orders are capped; raise <see cref="MaximumOrder"/> deliberately when a higher order is needed.
/// </summary>
public sealed class ExpansionLimits
{
    /// <summary>The default limits: maximum order 24.</summary>
    public static ExpansionLimits Default { get; } = new();

    /// <summary>The largest accepted truncation order (terms of total degree &lt; order are computed). Default 24.</summary>
    public int MaximumOrder { get; init; } = 24;

    /// <summary>"maximum order 24".</summary>
    public override string ToString() => $"maximum order {MaximumOrder}";

    /// <summary>Throws unless 1 &lt;= order &lt;= <see cref="MaximumOrder"/>.</summary>
    /// <exception cref="ExactArgumentException">The order is below 1 or above the cap; the message names both.</exception>
    public void CheckOrder(int order, string parameterName)
    {
        if (order < 1)
        {
            throw new ExactArgumentException(
                $"The series order {order} is below 1: the order counts the computed degrees 0..order-1, so it must be at least 1.", parameterName);
        }

        if (order > MaximumOrder)
        {
            throw new ExactArgumentException(
                $"The series order {order} is above the cap {MaximumOrder} (ExpansionLimits.MaximumOrder); pass limits with a larger MaximumOrder to allow it.",
                parameterName);
        }
    }
}
