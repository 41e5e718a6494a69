using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

/// <summary>
/// Everything the first question about a real Lie algebra asks for, in one object: the structure summary, the
/// Killing form and its signature, the name of the real form (simple algebras), and the quadratic Casimir element with
/// the degrees of the independent Casimirs (semisimple algebras). Parts that do not apply, or that an algorithm could
/// not decide, are null and come with a note saying why.
/// </summary>
public sealed class LieAlgebraReport
{
    internal LieAlgebraReport(
        LieAlgebra<Rational> algebra,
        LieAlgebraSummary summary,
        FormSignature killingSignature,
        RealFormIdentification? realForm,
        EnvelopingElement<Rational>? quadraticCasimir,
        CasimirDegrees? casimirDegrees,
        IReadOnlyList<string> notes)
    {
        Algebra = algebra;
        Summary = summary;
        KillingSignature = killingSignature;
        RealForm = realForm;
        QuadraticCasimir = quadraticCasimir;
        CasimirDegrees = casimirDegrees;
        Notes = notes;
    }

    /// <summary>The algebra (its basis names and structure constants; construction warnings in <see cref="LieAlgebra{T}.Warnings"/>).</summary>
    public LieAlgebra<Rational> Algebra { get; }

    /// <summary>Structure: series, centre, radical, nilradical, Levi factor and its type, simple ideals.</summary>
    public LieAlgebraSummary Summary { get; }

    /// <summary>The Killing form K(x, y) = tr(ad x ad y) in the algebra's basis.</summary>
    public Matrix<Rational> KillingForm => Algebra.KillingForm();

    /// <summary>The signature (positive, negative, zero) of the Killing form, exact.</summary>
    public FormSignature KillingSignature { get; }

    /// <summary>The real form's name for a simple algebra; null otherwise (see <see cref="Notes"/>).</summary>
    public RealFormIdentification? RealForm { get; }

    /// <summary>
    /// The quadratic Casimir element built from the inverse Killing form (it acts as 1 on the adjoint representation of
    /// a simple algebra); null when the algebra is not semisimple.
    /// </summary>
    public EnvelopingElement<Rational>? QuadraticCasimir { get; }

    /// <summary>Number and degrees of the independent Casimir elements (simple algebras); null otherwise.</summary>
    public CasimirDegrees? CasimirDegrees { get; }

    /// <summary>Construction warnings of the algebra, then why any part above is missing.</summary>
    public IReadOnlyList<string> Notes { get; }

    /// <inheritdoc />
    public override string ToString()
    {
        var lines = new List<string>
        {
            $"{Algebra.Label}: {Summary}",
            $"Killing signature {KillingSignature}",
        };
        if (RealForm is not null)
        {
            lines.Add($"real form {RealForm.Name}");
        }

        if (QuadraticCasimir is not null)
        {
            lines.Add($"quadratic Casimir (inverse Killing form) {QuadraticCasimir}");
        }

        if (CasimirDegrees is not null)
        {
            lines.Add($"independent Casimirs: {CasimirDegrees.Degrees.Count}, of degrees {string.Join(", ", CasimirDegrees.Degrees)}");
        }

        lines.AddRange(Notes);
        return string.Join("\n", lines);
    }
}

/// <summary>The one-call description of a real Lie algebra.</summary>
public static class LieAlgebraReports
{
    /// <summary>
    /// Describes a real Lie algebra in one call: structure summary, Killing form and signature, real-form name (simple
    /// algebras), quadratic Casimir and the degrees of the independent Casimirs (semisimple, resp. simple algebras).
    /// Every part is computed exactly; a part that does not apply or could not be decided is left null with a note.
    /// </summary>
    public static LieAlgebraReport Describe(this LieAlgebra<Rational> algebra)
    {
        ArgumentNullException.ThrowIfNull(algebra);
        var notes = new List<string>(algebra.Warnings);
        var summary = algebra.Summary();
        var signature = algebra.KillingSignature();
        RealFormIdentification? realForm = null;
        EnvelopingElement<Rational>? casimir = null;
        CasimirDegrees? degrees = null;
        if (!algebra.IsSemisimple)
        {
            notes.Add("Not semisimple (the Killing form is degenerate): no real-form name and no Casimir element from the Killing form.");
        }
        else
        {
            casimir = CasimirElements.QuadraticCasimir(algebra);
            if (algebra.IsSimple)
            {
                try
                {
                    realForm = algebra.IdentifyRealForm();
                }
                catch (BeyondCapabilityException e)
                {
                    notes.Add("Real form not named: " + e.Message);
                }

                try
                {
                    degrees = CasimirElements.BasicInvariantDegrees(algebra);
                }
                catch (BeyondCapabilityException e)
                {
                    notes.Add("Casimir degrees not found: " + e.Message);
                }
            }
            else
            {
                notes.Add("Semisimple but not simple: describe each simple ideal (SimpleIdeals) for its real form and Casimir degrees.");
            }
        }

        return new LieAlgebraReport(algebra, summary, signature, realForm, casimir, degrees, notes);
    }
}
