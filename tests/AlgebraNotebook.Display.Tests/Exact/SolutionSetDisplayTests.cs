using System.Xml.Linq;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Tests.Exact;

public class SolutionSetDisplayTests
{
    [Fact]
    public void Underdetermined_system_shows_particular_solution_plus_span_of_the_null_space()
    {
        // x1 + x2 = 2: particular solution (2, 0), null space spanned by (-1, 1) (from memory; checked below).
        var a = Matrix.ParseRational("[[1, 1]]");
        var solutions = LinearAlgebra.SolveAll(a, Matrix.ParseRational("[[2]]"));
        Assert.Equal(Matrix.ParseRational("[[2]]"), a * solutions.Particular!);
        Assert.Equal(Matrix<Rational>.Zero(1, 1), a * solutions.NullSpaceBasis.Single());
        Approvals.VerifyAllFormats("Exact_SolutionSet_one_equation_two_unknowns", solutions);
        XDocument.Parse(MathDisplay.ToMathML(solutions));
    }

    [Fact]
    public void Unique_solution_is_an_equation()
    {
        // 2 x1 = 1, 4 x2 = 1 gives x = (1/2, 1/4) (common practice).
        var solutions = LinearAlgebra.SolveAll(Matrix.ParseRational("[[2, 0], [0, 4]]"), Matrix.ParseRational("[[1], [1]]"));
        Assert.Equal("x = [[1/2], [1/4]]", MathDisplay.ToPlainText(solutions));
        Assert.Equal(@"x = \begin{pmatrix} \frac{1}{2} \\ \frac{1}{4} \end{pmatrix}", MathDisplay.ToLatex(solutions));
    }

    [Fact]
    public void Inconsistent_system_says_no_solution()
    {
        // x1 + x2 = 1 and x1 + x2 = 2 contradict each other (common practice).
        var solutions = LinearAlgebra.SolveAll(Matrix.ParseRational("[[1, 1], [1, 1]]"), Matrix.ParseRational("[[1], [2]]"));
        Assert.False(solutions.HasSolution);
        Assert.Equal("no solution", MathDisplay.ToPlainText(solutions));
        Assert.Equal(@"\text{no solution}", MathDisplay.ToLatex(solutions));
    }
}
