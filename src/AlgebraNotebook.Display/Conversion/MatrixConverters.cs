using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Conversion;

/// <summary>Display trees for matrices and univariate polynomials, written once for every entry type.</summary>
internal static class MatrixConverters
{
    /// <summary>The matrix between stretchy parentheses; each entry is converted through the registry.</summary>
    public static MathNode FromMatrix<T>(Matrix<T> matrix)
        where T : IRingElement<T>
    {
        var rows = new MathNode[matrix.RowCount][];
        for (var i = 0; i < matrix.RowCount; i++)
        {
            var row = new MathNode[matrix.ColumnCount];
            for (var j = 0; j < matrix.ColumnCount; j++)
            {
                row[j] = ConverterRegistry.ToTree(matrix[i, j]);
            }

            rows[i] = row;
        }

        return new MatrixNode(rows);
    }

    /// <summary>
    /// The polynomial in its default variable (<see cref="UnivariatePolynomial{T}.DefaultVariableName"/>, λ), highest
    /// degree first, coefficients converted through the registry; zero is 0.
    /// </summary>
    public static MathNode FromUnivariatePolynomial<T>(UnivariatePolynomial<T> polynomial)
        where T : IRingElement<T>
    {
        var variable = MathNodes.Symbol(UnivariatePolynomial<T>.DefaultVariableName);
        var terms = new List<SumTerm>();
        for (var power = polynomial.Degree; power >= 0; power--)
        {
            var coefficient = polynomial.Coefficient(power);
            if (coefficient.IsZero)
            {
                continue;
            }

            var coefficientNode = ConverterRegistry.ToTree(coefficient);
            var term = power == 0 ? coefficientNode : MathNodes.Product(coefficientNode, MathNodes.Power(variable, power));
            terms.Add(new SumTerm(false, term));
        }

        return MathNodes.Sum(terms);
    }
}
