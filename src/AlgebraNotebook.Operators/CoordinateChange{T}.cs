using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Operators;

/// <summary>
/// A change of coordinates from a source ring (coordinates x_1..x_n) to a target ring (coordinates q_1..q_n): an image
/// in the target ring for the source symbols (x = r*st*cp, ...) and, for each source coordinate, the chain rule
/// d/dx_i = sum_j (dq_j/dx_i) d/dq_j as a first-order operator of the target. Operators of any order are rewritten
/// exactly (<see cref="Apply(DifferentialOperator{T})"/>): coefficients are mapped, d^alpha becomes the product of the
/// chain-rule images.
/// </summary>
/// <remarks>
/// <para>Construction checks that the map is consistent: every relation of the source maps to zero in the target, and
/// for every mapped symbol s, the image of d s/dx_i equals the chain-rule image of d/dx_i applied to the image of s. A
/// failure throws <see cref="ExactArgumentException"/> naming the relation or symbol.</para>
/// <para>Symbols may stay without image (e.g. the angles theta, phi when going back to Cartesian coordinates, where only
/// their sines and cosines are algebraic); an operator whose coefficients use such a symbol cannot be rewritten and the
/// error names the symbol. Parameters without a given image map to the target's parameter of the same name, if any.</para>
/// </remarks>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class CoordinateChange<T>
    where T : IFieldElement<T>
{
    private readonly Dictionary<Symbol, Polynomial<T>> _images;
    private readonly Dictionary<Symbol, DifferentialOperator<T>> _partials;
    private readonly Polynomial<T>[,]? _jacobian;

    private CoordinateChange(
        CoefficientRing<T> source,
        CoefficientRing<T> target,
        Dictionary<Symbol, Polynomial<T>> images,
        Dictionary<Symbol, DifferentialOperator<T>> partials,
        Polynomial<T>[,]? jacobian,
        Coefficient<T>? determinant)
    {
        Source = source;
        Target = target;
        _images = images;
        _partials = partials;
        _jacobian = jacobian;
        JacobianDeterminant = determinant;
        Validate();
    }

    /// <summary>The ring operators are rewritten from.</summary>
    public CoefficientRing<T> Source { get; }

    /// <summary>The ring operators are rewritten into.</summary>
    public CoefficientRing<T> Target { get; }

    /// <summary>
    /// For changes built from coordinate formulas: det(dx_i/dq_j) in the target ring (rows: source coordinates, columns:
    /// target coordinates, each in declaration order), e.g. r^2*st for spherical coordinates. Null for reversed changes.
    /// </summary>
    public Coefficient<T>? JacobianDeterminant { get; }

    /// <summary>
    /// Builds the change from formulas giving source symbols in terms of the target ring (at least every source
    /// coordinate, e.g. x = "r*st*cp"). The Jacobian dx_i/dq_j is computed with the target's derivations and inverted
    /// exactly; its determinant must be a constant times a product of symbols with declared inverses.
    /// </summary>
    /// <exception cref="ExactArgumentException">A name is not a source symbol; a source coordinate has no formula; the
    /// coordinate counts differ; a formula uses symbols the target does not declare; the Jacobian determinant is not
    /// invertible in the target (the message shows it); or the consistency checks fail.</exception>
    public static CoordinateChange<T> FromCoordinateFormulas(
        CoefficientRing<T> source, CoefficientRing<T> target, IReadOnlyDictionary<string, string> images)
    {
        ArgumentNullException.ThrowIfNull(source);
        ArgumentNullException.ThrowIfNull(target);
        ArgumentNullException.ThrowIfNull(images);
        var map = ReadImages(source, target, images);
        foreach (var x in source.Coordinates)
        {
            if (!map.ContainsKey(x))
            {
                throw new ExactArgumentException(
                    $"Source coordinate {x} of ring \"{source.Name}\" has no formula in terms of ring \"{target.Name}\".", nameof(images));
            }
        }

        var n = source.Coordinates.Count;
        if (target.Coordinates.Count != n)
        {
            throw new ExactArgumentException(
                $"Ring \"{source.Name}\" has {n} coordinates but ring \"{target.Name}\" has {target.Coordinates.Count}; a change of coordinates needs equal numbers.",
                nameof(target));
        }

        var jacobian = new Polynomial<T>[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                jacobian[i, j] = target.Differentiate(map[source.Coordinates[i]], target.Coordinates[j]);
            }
        }

        var det = target.Reduce(Determinant(jacobian, Enumerable.Range(0, n).ToArray(), Enumerable.Range(0, n).ToArray()));
        if (!target.TryInvertCore(det, out var detInverse))
        {
            throw new ExactArgumentException(
                $"The Jacobian determinant {det} of the change from \"{source.Name}\" to \"{target.Name}\" is not invertible in the target ring: it must be a non-zero constant times symbols with declared inverses.",
                nameof(images));
        }

        // d/dx_i = sum_j (J^-1)_{j i} d/dq_j with J^-1 = adj(J)/det, adj(J)_{j i} = cofactor C_{i j}.
        var partials = new Dictionary<Symbol, DifferentialOperator<T>>();
        for (var i = 0; i < n; i++)
        {
            var sum = new Dictionary<Monomial, Polynomial<T>>();
            for (var j = 0; j < n; j++)
            {
                var rows = Enumerable.Range(0, n).Where(r => r != i).ToArray();
                var columns = Enumerable.Range(0, n).Where(c => c != j).ToArray();
                var cofactor = Determinant(jacobian, rows, columns);
                if ((i + j) % 2 == 1)
                {
                    cofactor = -cofactor;
                }

                DifferentialOperator<T>.Accumulate(sum, Monomial.Of(target.Coordinates[j]), cofactor * detInverse);
            }

            partials[source.Coordinates[i]] = DifferentialOperator<T>.FromUnreduced(target, sum);
        }

        return new CoordinateChange<T>(source, target, map, partials, jacobian, new Coefficient<T>(target, det));
    }

    /// <summary>
    /// The change back, from <see cref="Target"/> to <see cref="Source"/>, for a change built from coordinate formulas:
    /// images of target symbols in the source ring are given (target coordinates such as angles may be left out), and
    /// d/dq_j = sum_i (dx_i/dq_j) d/dx_i uses the Jacobian entries mapped back into the source ring.
    /// </summary>
    /// <exception cref="ExactArgumentException">This change was not built from formulas; a name is not a target symbol;
    /// a Jacobian entry uses a symbol without image (the message names it); or the consistency checks fail.</exception>
    public CoordinateChange<T> Reverse(IReadOnlyDictionary<string, string> imagesInSource)
    {
        ArgumentNullException.ThrowIfNull(imagesInSource);
        if (_jacobian is null)
        {
            throw new ExactArgumentException("Only a change built by FromCoordinateFormulas can be reversed.", nameof(imagesInSource));
        }

        var map = ReadImages(Target, Source, imagesInSource);
        var n = Source.Coordinates.Count;
        var partials = new Dictionary<Symbol, DifferentialOperator<T>>();
        for (var j = 0; j < n; j++)
        {
            var sum = new Dictionary<Monomial, Polynomial<T>>();
            for (var i = 0; i < n; i++)
            {
                var entry = MapPolynomial(map, _jacobian[i, j], Target, Source, $"the Jacobian entry d{Source.Coordinates[i]}/d{Target.Coordinates[j]} = {_jacobian[i, j]}");
                DifferentialOperator<T>.Accumulate(sum, Monomial.Of(Source.Coordinates[i]), entry);
            }

            partials[Target.Coordinates[j]] = DifferentialOperator<T>.FromUnreduced(Source, sum);
        }

        return new CoordinateChange<T>(Target, Source, map, partials, null, null);
    }

    /// <summary>The image in the target of the source partial derivative d/d<paramref name="sourceCoordinate"/> (the chain rule).</summary>
    /// <exception cref="ExactArgumentException">The name is not a source coordinate.</exception>
    public DifferentialOperator<T> PartialImage(string sourceCoordinate) => _partials[Source.Coordinate(sourceCoordinate)];

    /// <summary>Rewrites a coefficient of the source ring in the target ring.</summary>
    /// <exception cref="ExactArgumentException">The coefficient is from another ring or uses a symbol without image.</exception>
    public Coefficient<T> Apply(Coefficient<T> value)
    {
        Source.RequireMine(value, nameof(value));
        return new Coefficient<T>(Target, Target.Reduce(MapPolynomial(_images, value.Polynomial, Source, Target, $"coefficient {value}")));
    }

    /// <summary>Rewrites an operator of the source ring in the target ring by the chain rule (any order).</summary>
    /// <exception cref="ExactArgumentException">The operator is over another ring than <see cref="Source"/>, or a
    /// coefficient uses a symbol without image.</exception>
    public DifferentialOperator<T> Apply(DifferentialOperator<T> op)
    {
        ArgumentNullException.ThrowIfNull(op);
        if (!ReferenceEquals(op.Ring, Source))
        {
            throw new ExactArgumentException(
                $"{op} is over ring \"{op.Ring.Name}\", but this change rewrites operators from ring \"{Source.Name}\" to ring \"{Target.Name}\".",
                nameof(op));
        }

        var result = DifferentialOperator<T>.Zero(Target);
        foreach (var (alpha, c) in op.RawTerms)
        {
            var coefficient = Target.Reduce(MapPolynomial(_images, c, Source, Target, $"coefficient {c} of {op}"));
            var term = new DifferentialOperator<T>(Target, coefficient.IsZero ? [] : [(Monomial.One, coefficient)]);
            foreach (var (x, e) in alpha.Factors)
            {
                term *= _partials[x].Pow(e);
            }

            result += term;
        }

        return result;
    }

    /// <summary>Plain text: the rings, the symbol images and the chain rule for each source coordinate.</summary>
    public override string ToString()
    {
        var images = string.Join(", ", Source.Symbols.Where(_images.ContainsKey).Select(s => $"{s} = {_images[s]}"));
        var chain = string.Join(", ", Source.Coordinates.Select(x => $"d_{x} = {_partials[x]}"));
        return $"from \"{Source.Name}\" to \"{Target.Name}\": {images}; {chain}";
    }

    private void Validate()
    {
        foreach (var relation in Source.Quotient.Relations)
        {
            var image = Target.Reduce(MapPolynomial(_images, relation, Source, Target, $"relation {relation} = 0"));
            if (!image.IsZero)
            {
                throw new ExactArgumentException(
                    $"The change from \"{Source.Name}\" to \"{Target.Name}\" does not respect the relation {relation} = 0: its image reduces to {image}, not 0.",
                    "images");
            }
        }

        foreach (var (s, image) in _images)
        {
            foreach (var x in Source.Coordinates)
            {
                var derivative = Source.Differentiate(Polynomial<T>.Variable(s), x);
                var left = Target.Reduce(MapPolynomial(_images, derivative, Source, Target, $"d{s}/d{x} = {derivative}"));
                var right = _partials[x].Apply(new Coefficient<T>(Target, image)).Polynomial;
                if (!left.Equals(right))
                {
                    throw new ExactArgumentException(
                        $"The change from \"{Source.Name}\" to \"{Target.Name}\" is inconsistent for {s} = {image}: d{s}/d{x} maps to {left}, but the chain rule gives {right}.",
                        "images");
                }
            }
        }
    }

    private static Dictionary<Symbol, Polynomial<T>> ReadImages(CoefficientRing<T> from, CoefficientRing<T> to, IReadOnlyDictionary<string, string> images)
    {
        var map = new Dictionary<Symbol, Polynomial<T>>();
        foreach (var (name, formula) in images)
        {
            var symbol = from.Symbols.FirstOrDefault(s => s.Name == name)
                ?? throw new ExactArgumentException($"\"{name}\" is not a symbol of ring \"{from.Name}\" (declared: {string.Join(", ", from.Symbols)}).", nameof(images));
            map[symbol] = to.Element(formula).Polynomial;
        }

        foreach (var p in from.Parameters)
        {
            if (!map.ContainsKey(p) && to.Parameters.Contains(p))
            {
                map[p] = Polynomial<T>.Variable(p);
            }
        }

        return map;
    }

    private static Polynomial<T> MapPolynomial(
        Dictionary<Symbol, Polynomial<T>> map, Polynomial<T> polynomial, CoefficientRing<T> from, CoefficientRing<T> to, string what)
    {
        var sum = Polynomial<T>.Zero;
        foreach (var (monomial, c) in polynomial.Terms)
        {
            var term = Polynomial<T>.Constant(c);
            foreach (var (s, e) in monomial.Factors)
            {
                if (!map.TryGetValue(s, out var image))
                {
                    throw new ExactArgumentException(
                        $"Cannot rewrite {what} from ring \"{from.Name}\" in ring \"{to.Name}\": {s} has no image there.", "images");
                }

                term = to.Reduce(term * image.Pow(e));
            }

            sum += term;
        }

        return sum;
    }

    private static Polynomial<T> Determinant(Polynomial<T>[,] m, int[] rows, int[] columns)
    {
        if (rows.Length == 0)
        {
            return Polynomial<T>.One;
        }

        var sum = Polynomial<T>.Zero;
        for (var k = 0; k < columns.Length; k++)
        {
            var entry = m[rows[0], columns[k]];
            if (entry.IsZero)
            {
                continue;
            }

            var minor = Determinant(m, rows[1..], columns.Where((_, index) => index != k).ToArray());
            sum = k % 2 == 0 ? sum + entry * minor : sum - entry * minor;
        }

        return sum;
    }
}
