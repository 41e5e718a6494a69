namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// The value of a free Lie series in a concrete Lie algebra, with what it rests on: the series was evaluated through
/// degree <see cref="HighestDegree"/>; terms of degree <see cref="Order"/> and above were not included.
/// </summary>
/// <typeparam name="T">The element type.</typeparam>
public sealed class LieEvaluation<T>
{
    internal LieEvaluation(T value, IReadOnlyList<T> degreeValues, int order, int highestDegree)
    {
        Value = value;
        DegreeValues = degreeValues;
        Order = order;
        HighestDegree = highestDegree;
    }

    /// <summary>The sum of the evaluated terms.</summary>
    public T Value { get; }

    /// <summary>The value of each homogeneous part: entry d - 1 is the degree-d part (zero where the series has none).</summary>
    public IReadOnlyList<T> DegreeValues { get; }

    /// <summary>The truncation order of the series: terms of degree at least Order are omitted (int.MaxValue when exact).</summary>
    public int Order { get; }

    /// <summary>The highest degree included.</summary>
    public int HighestDegree { get; }

    /// <summary>True when the series was exact (no truncation).</summary>
    public bool IsExact => Order == int.MaxValue;

    /// <summary>The value, then a line saying which degrees it includes, e.g. "(Lie series through degree 4; degree 5 and higher omitted)".</summary>
    public override string ToString() =>
        $"{Value}\n" + (IsExact
            ? $"(exact Lie element, degrees 1..{HighestDegree})"
            : $"(Lie series through degree {Order - 1}; degree {Order} and higher omitted)");
}
