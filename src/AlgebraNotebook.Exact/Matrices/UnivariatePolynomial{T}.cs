using System.Numerics;
using System.Text;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// An immutable polynomial in one unnamed variable over a commutative ring, as characteristic and minimal
/// polynomials need. Coefficients are stored lowest degree first with no trailing zeros, so the zero polynomial
/// has no coefficients and degree -1. The variable gets its name only when printed (default "λ").
/// Field-only operations (division with remainder, gcd, square-free part) are in <see cref="UnivariatePolynomial"/>.
/// </summary>
/// <example><c>UnivariatePolynomial&lt;Rational&gt;.FromCoefficients(2, -3, 1).ToString() == "λ^2 - 3*λ + 2"</c></example>
/// <typeparam name="T">The coefficient type.</typeparam>
public sealed class UnivariatePolynomial<T> : IRingElement<UnivariatePolynomial<T>>
    where T : IRingElement<T>
{
    /// <summary>The variable name used by <see cref="ToString()"/>.</summary>
    public const string DefaultVariableName = "λ";

    private readonly T[] _coefficients;

    private UnivariatePolynomial(T[] trimmedCoefficients)
    {
        _coefficients = trimmedCoefficients;
    }

    /// <summary>The coefficients, lowest degree first (index k holds the coefficient of the k-th power); empty for zero.</summary>
    public IReadOnlyList<T> Coefficients => _coefficients;

    /// <summary>The degree; -1 for the zero polynomial.</summary>
    public int Degree => _coefficients.Length - 1;

    /// <summary>The coefficient of the highest power; zero for the zero polynomial.</summary>
    public T LeadingCoefficient => _coefficients.Length == 0 ? T.Zero : _coefficients[^1];

    /// <summary>The coefficient of the k-th power (zero beyond the degree).</summary>
    /// <exception cref="ExactArgumentException"><paramref name="power"/> is negative.</exception>
    public T Coefficient(int power)
    {
        if (power < 0)
        {
            throw new ExactArgumentException($"A polynomial has no coefficient of power {power}.", nameof(power));
        }

        return power < _coefficients.Length ? _coefficients[power] : T.Zero;
    }

    /// <inheritdoc />
    public static UnivariatePolynomial<T> Zero { get; } = new([]);

    /// <inheritdoc />
    public static UnivariatePolynomial<T> One { get; } = new([T.One]);

    /// <summary>The variable itself (the polynomial λ).</summary>
    public static UnivariatePolynomial<T> Variable { get; } = new([T.Zero, T.One]);

    /// <inheritdoc />
    public bool IsZero => _coefficients.Length == 0;

    /// <inheritdoc />
    public bool IsOne => _coefficients.Length == 1 && _coefficients[0].IsOne;

    /// <summary>True when the leading coefficient is one.</summary>
    public bool IsMonic => _coefficients.Length > 0 && _coefficients[^1].IsOne;

    /// <inheritdoc />
    public static UnivariatePolynomial<T> FromInteger(BigInteger value) => Constant(T.FromInteger(value));

    /// <summary>The constant polynomial.</summary>
    public static UnivariatePolynomial<T> Constant(T value) => FromCoefficients(value);

    /// <summary>The polynomial with the given coefficients, lowest degree first (trailing zeros are dropped).</summary>
    public static UnivariatePolynomial<T> FromCoefficients(params T[] coefficients)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        return FromCoefficients((IEnumerable<T>)coefficients);
    }

    /// <summary>The polynomial with the given coefficients, lowest degree first (trailing zeros are dropped).</summary>
    public static UnivariatePolynomial<T> FromCoefficients(IEnumerable<T> coefficients)
    {
        ArgumentNullException.ThrowIfNull(coefficients);
        var array = coefficients.Select(c => c is null ? T.Zero : c).ToArray();
        return FromOwned(array);
    }

    /// <summary>The monomial c λ^k.</summary>
    /// <exception cref="ExactArgumentException"><paramref name="power"/> is negative.</exception>
    public static UnivariatePolynomial<T> Monomial(T coefficient, int power)
    {
        if (power < 0)
        {
            throw new ExactArgumentException($"A polynomial term cannot have the negative power {power}.", nameof(power));
        }

        var array = new T[power + 1];
        Array.Fill(array, T.Zero);
        array[power] = coefficient;
        return FromOwned(array);
    }

    internal static UnivariatePolynomial<T> FromOwned(T[] coefficients)
    {
        var length = coefficients.Length;
        while (length > 0 && coefficients[length - 1].IsZero)
        {
            length--;
        }

        return new UnivariatePolynomial<T>(length == coefficients.Length ? coefficients : coefficients[..length]);
    }

    /// <summary>The value at <paramref name="point"/> by Horner's rule.</summary>
    public T Evaluate(T point)
    {
        var value = T.Zero;
        for (var k = _coefficients.Length - 1; k >= 0; k--)
        {
            value = value * point + _coefficients[k];
        }

        return value;
    }

    /// <summary>The matrix p(A) = sum c_k A^k (with A^0 the identity) by Horner's rule.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public Matrix<T> Evaluate(Matrix<T> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        matrix.RequireSquare("evaluate a polynomial at");
        var n = matrix.RowCount;
        var value = Matrix<T>.Zero(n, n);
        for (var k = _coefficients.Length - 1; k >= 0; k--)
        {
            var c = _coefficients[k];
            value = Matrix<T>.MultiplyCore(value, matrix) + Matrix<T>.Create(n, n, (i, j) => i == j ? c : T.Zero);
        }

        return value;
    }

    /// <summary>The formal derivative.</summary>
    public UnivariatePolynomial<T> Derivative()
    {
        if (_coefficients.Length <= 1)
        {
            return Zero;
        }

        var result = new T[_coefficients.Length - 1];
        for (var k = 1; k < _coefficients.Length; k++)
        {
            result[k - 1] = T.FromInteger(k) * _coefficients[k];
        }

        return FromOwned(result);
    }

    /// <summary>Conjugates every coefficient (the variable is treated as real).</summary>
    public UnivariatePolynomial<T> Conjugate() => FromOwned(_coefficients.Select(c => c.Conjugate()).ToArray());

    /// <summary>Applies <paramref name="map"/> to every coefficient.</summary>
    public UnivariatePolynomial<TResult> Map<TResult>(Func<T, TResult> map)
        where TResult : IRingElement<TResult>
    {
        ArgumentNullException.ThrowIfNull(map);
        return UnivariatePolynomial<TResult>.FromOwned(_coefficients.Select(map).ToArray());
    }

    /// <summary>The non-negative integer power.</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public UnivariatePolynomial<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Pow({exponent}) of the polynomial {this}: the exponent must be non-negative.", nameof(exponent));
        }

        return Powers.BySquaring(One, this, exponent);
    }

    /// <inheritdoc />
    public static UnivariatePolynomial<T> operator +(UnivariatePolynomial<T> left, UnivariatePolynomial<T> right)
    {
        var length = Math.Max(left._coefficients.Length, right._coefficients.Length);
        var result = new T[length];
        for (var k = 0; k < length; k++)
        {
            result[k] = left.Coefficient(k) + right.Coefficient(k);
        }

        return FromOwned(result);
    }

    /// <inheritdoc />
    public static UnivariatePolynomial<T> operator -(UnivariatePolynomial<T> left, UnivariatePolynomial<T> right)
    {
        var length = Math.Max(left._coefficients.Length, right._coefficients.Length);
        var result = new T[length];
        for (var k = 0; k < length; k++)
        {
            result[k] = left.Coefficient(k) - right.Coefficient(k);
        }

        return FromOwned(result);
    }

    /// <inheritdoc />
    public static UnivariatePolynomial<T> operator -(UnivariatePolynomial<T> value) =>
        new(value._coefficients.Select(c => -c).ToArray());

    /// <inheritdoc />
    public static UnivariatePolynomial<T> operator *(UnivariatePolynomial<T> left, UnivariatePolynomial<T> right)
    {
        if (left.IsZero || right.IsZero)
        {
            return Zero;
        }

        var result = new T[left._coefficients.Length + right._coefficients.Length - 1];
        Array.Fill(result, T.Zero);
        for (var i = 0; i < left._coefficients.Length; i++)
        {
            if (left._coefficients[i].IsZero)
            {
                continue;
            }

            for (var j = 0; j < right._coefficients.Length; j++)
            {
                result[i + j] += left._coefficients[i] * right._coefficients[j];
            }
        }

        return FromOwned(result);
    }

    /// <summary>Every coefficient multiplied by the scalar.</summary>
    public static UnivariatePolynomial<T> operator *(T scalar, UnivariatePolynomial<T> polynomial) =>
        FromOwned(polynomial._coefficients.Select(c => scalar * c).ToArray());

    /// <inheritdoc />
    public bool Equals(UnivariatePolynomial<T>? other) =>
        other is not null && _coefficients.AsSpan().SequenceEqual(other._coefficients);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is UnivariatePolynomial<T> other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode()
    {
        var hash = new HashCode();
        foreach (var c in _coefficients)
        {
            hash.Add(c);
        }

        return hash.ToHashCode();
    }

    /// <inheritdoc />
    public static bool operator ==(UnivariatePolynomial<T>? left, UnivariatePolynomial<T>? right) =>
        left is null ? right is null : left.Equals(right);

    /// <inheritdoc />
    public static bool operator !=(UnivariatePolynomial<T>? left, UnivariatePolynomial<T>? right) => !(left == right);

    /// <summary>Plain text in the variable "λ", highest degree first: "λ^2 - 3*λ + 2"; zero prints as "0".</summary>
    public override string ToString() => ToString(DefaultVariableName);

    /// <summary>
    /// Plain text in the given variable, highest degree first: "x^3 - 1/2*x + 2". Coefficients whose text is a
    /// sum (such as "1 + 2 i") are parenthesised.
    /// </summary>
    public string ToString(string variableName)
    {
        ArgumentException.ThrowIfNullOrEmpty(variableName);
        if (IsZero)
        {
            return "0";
        }

        var text = new StringBuilder();
        for (var k = _coefficients.Length - 1; k >= 0; k--)
        {
            var c = _coefficients[k];
            if (c.IsZero)
            {
                continue;
            }

            var coefficientText = c.ToString() ?? "?";
            var negative = coefficientText.StartsWith('-') && !coefficientText.AsSpan(1).ContainsAny(' ', '+', '-');
            if (negative)
            {
                coefficientText = coefficientText[1..];
            }
            else if (coefficientText.AsSpan(1).ContainsAny(' ', '+', '-'))
            {
                coefficientText = "(" + coefficientText + ")";
            }

            if (text.Length == 0)
            {
                text.Append(negative ? "-" : string.Empty);
            }
            else
            {
                text.Append(negative ? " - " : " + ");
            }

            var power = k == 0 ? string.Empty : k == 1 ? variableName : $"{variableName}^{k}";
            if (k == 0)
            {
                text.Append(coefficientText);
            }
            else if (coefficientText == "1")
            {
                text.Append(power);
            }
            else
            {
                text.Append(coefficientText).Append('*').Append(power);
            }
        }

        return text.ToString();
    }
}
