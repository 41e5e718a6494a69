using System.Numerics;
using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Exact.Scalars;

/// <summary>
/// An exact element a + b i of the Gaussian rationals Q(i), with i^2 = -1. <c>default</c> is 0.
/// </summary>
/// <example><c>GaussianRational.Parse("1/2 - 3/5 i")</c></example>
public readonly struct GaussianRational :
    IFieldElement<GaussianRational>,
    IExactDivision<GaussianRational>
{
    /// <summary>Creates <paramref name="real"/> + <paramref name="imaginary"/> i.</summary>
    public GaussianRational(Rational real, Rational imaginary)
    {
        Real = real;
        Imaginary = imaginary;
    }

    /// <summary>The real part.</summary>
    public Rational Real { get; }

    /// <summary>The imaginary part (the coefficient of i).</summary>
    public Rational Imaginary { get; }

    /// <inheritdoc />
    public static GaussianRational Zero => default;

    /// <inheritdoc />
    public static GaussianRational One => new(Rational.One, Rational.Zero);

    /// <summary>The imaginary unit i.</summary>
    public static GaussianRational I => new(Rational.Zero, Rational.One);

    /// <inheritdoc />
    public bool IsZero => Real.IsZero && Imaginary.IsZero;

    /// <inheritdoc />
    public bool IsOne => Real.IsOne && Imaginary.IsZero;

    /// <summary>True when the imaginary part is zero.</summary>
    public bool IsReal => Imaginary.IsZero;

    /// <summary>The norm a^2 + b^2 (the squared modulus).</summary>
    public Rational Norm => Real * Real + Imaginary * Imaginary;

    /// <inheritdoc />
    public static GaussianRational FromInteger(BigInteger value) => new(new Rational(value), Rational.Zero);

    /// <inheritdoc />
    public static GaussianRational FromRational(Rational value) => new(value, Rational.Zero);

    /// <inheritdoc />
    public GaussianRational Scale(Rational factor) => new(Real * factor, Imaginary * factor);

    /// <summary>The complex conjugate a - b i.</summary>
    public GaussianRational Conjugate() => new(Real, -Imaginary);

    /// <summary>Implicit conversion from a rational.</summary>
    public static implicit operator GaussianRational(Rational value) => new(value, Rational.Zero);

    /// <summary>Implicit conversion from an integer.</summary>
    public static implicit operator GaussianRational(int value) => new(value, Rational.Zero);

    /// <inheritdoc />
    public static GaussianRational operator +(GaussianRational left, GaussianRational right) =>
        new(left.Real + right.Real, left.Imaginary + right.Imaginary);

    /// <inheritdoc />
    public static GaussianRational operator -(GaussianRational left, GaussianRational right) =>
        new(left.Real - right.Real, left.Imaginary - right.Imaginary);

    /// <inheritdoc />
    public static GaussianRational operator -(GaussianRational value) => new(-value.Real, -value.Imaginary);

    /// <inheritdoc />
    public static GaussianRational operator *(GaussianRational left, GaussianRational right)
    {
        if (left.Imaginary.IsZero && right.Imaginary.IsZero)
        {
            return new(left.Real * right.Real, Rational.Zero);
        }

        return new(
            left.Real * right.Real - left.Imaginary * right.Imaginary,
            left.Real * right.Imaginary + left.Imaginary * right.Real);
    }

    /// <inheritdoc />
    public static GaussianRational operator /(GaussianRational left, GaussianRational right)
    {
        if (right.IsZero)
        {
            throw new DivideByZeroException($"Division of {left} by zero.");
        }

        return left * right.Reciprocal();
    }

    /// <inheritdoc />
    public GaussianRational Reciprocal()
    {
        if (IsZero)
        {
            throw new DivideByZeroException("The reciprocal of 0 does not exist.");
        }

        if (Imaginary.IsZero)
        {
            return new(Real.Reciprocal(), Rational.Zero);
        }

        var norm = Norm;
        return new(Real / norm, -Imaginary / norm);
    }

    /// <inheritdoc />
    public static bool TryDivideExact(GaussianRational dividend, GaussianRational divisor, out GaussianRational quotient)
    {
        if (divisor.IsZero)
        {
            quotient = Zero;
            return false;
        }

        quotient = dividend / divisor;
        return true;
    }

    /// <summary>Integer power; negative exponents invert.</summary>
    public GaussianRational Pow(int exponent)
    {
        if (exponent < 0)
        {
            if (IsZero)
            {
                throw new DivideByZeroException($"0 cannot be raised to the negative power {exponent}.");
            }

            // -int.MinValue overflows back to int.MinValue, which would recurse forever.
            var reciprocal = Reciprocal();
            return exponent == int.MinValue ? reciprocal.Pow(int.MaxValue) * reciprocal : reciprocal.Pow(-exponent);
        }

        return Powers.BySquaring(One, this, exponent);
    }

    /// <inheritdoc />
    public bool Equals(GaussianRational other) => Real.Equals(other.Real) && Imaginary.Equals(other.Imaginary);

    /// <inheritdoc />
    public override bool Equals(object? obj) => obj is GaussianRational other && Equals(other);

    /// <inheritdoc />
    public override int GetHashCode() => Imaginary.IsZero ? Real.GetHashCode() : HashCode.Combine(Real, Imaginary);

    /// <inheritdoc />
    public static bool operator ==(GaussianRational left, GaussianRational right) => left.Equals(right);

    /// <inheritdoc />
    public static bool operator !=(GaussianRational left, GaussianRational right) => !left.Equals(right);

    /// <summary>Plain text: "1/2 - 3/5 i", "i", "-2 i", "3".</summary>
    public override string ToString()
    {
        if (Imaginary.IsZero)
        {
            return Real.ToString();
        }

        var imaginaryText = Imaginary.Abs().IsOne ? "i" : $"{Imaginary.Abs()} i";
        if (Real.IsZero)
        {
            return Imaginary.Sign < 0 ? "-" + imaginaryText : imaginaryText;
        }

        return $"{Real} {(Imaginary.Sign < 0 ? "-" : "+")} {imaginaryText}";
    }

    /// <summary>
    /// Parses a Gaussian rational written as a sum of rational and imaginary terms:
    /// "3/4", "i", "-i", "2 i", "2i", "1/2 - 3/5 i", "1/2 - 3/5*i", "(1/3) i".
    /// </summary>
    /// <exception cref="ExactParseException">The message points at the offending character.</exception>
    public static GaussianRational Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var position = 0;
        var result = Zero;
        var first = true;
        Rational.SkipSpaces(text, ref position);
        if (position == text.Length)
        {
            throw new ExactParseException(text, position, "expected a number but the text is empty");
        }

        while (position < text.Length)
        {
            var negative = false;
            if (text[position] == '+' || text[position] == '-')
            {
                negative = text[position] == '-';
                position++;
                Rational.SkipSpaces(text, ref position);
            }
            else if (!first)
            {
                throw new ExactParseException(text, position, $"expected '+' or '-' but found '{text[position]}'");
            }

            first = false;
            var term = ParseTerm(text, ref position);
            result += negative ? -term : term;
            Rational.SkipSpaces(text, ref position);
        }

        return result;
    }

    private static GaussianRational ParseTerm(string text, ref int position)
    {
        if (position < text.Length && text[position] == 'i')
        {
            position++;
            EnsureNotIdentifierContinuation(text, position);
            return I;
        }

        Rational magnitude;
        if (position < text.Length && text[position] == '(')
        {
            var open = position;
            position++;
            var close = text.IndexOf(')', position);
            if (close < 0)
            {
                throw new ExactParseException(text, open, "unmatched '('");
            }

            var inner = text.Substring(position, close - position);
            try
            {
                magnitude = Rational.Parse(inner);
            }
            catch (ExactParseException inside)
            {
                throw new ExactParseException(text, position + inside.Position, inside.Problem);
            }

            position = close + 1;
        }
        else
        {
            magnitude = Rational.ParseSignedDecimal(text, ref position, allowSign: false);
            var save = position;
            Rational.SkipSpaces(text, ref position);
            if (position < text.Length && text[position] == '/')
            {
                position++;
                Rational.SkipSpaces(text, ref position);
                var denominatorStart = position;
                var denominator = Rational.ParseSignedDecimal(text, ref position, allowSign: false);
                if (denominator.IsZero)
                {
                    throw new DivideByZeroException($"Cannot parse \"{text}\": the denominator at position {denominatorStart + 1} is zero.");
                }

                magnitude /= denominator;
            }
            else
            {
                position = save;
            }
        }

        var afterNumber = position;
        Rational.SkipSpaces(text, ref position);
        if (position < text.Length && text[position] == '*')
        {
            position++;
            Rational.SkipSpaces(text, ref position);
            if (position >= text.Length || text[position] != 'i')
            {
                throw new ExactParseException(text, position, "expected 'i' after '*'");
            }
        }

        if (position < text.Length && text[position] == 'i')
        {
            position++;
            EnsureNotIdentifierContinuation(text, position);
            return new GaussianRational(Rational.Zero, magnitude);
        }

        position = afterNumber;
        return magnitude;
    }

    private static void EnsureNotIdentifierContinuation(string text, int position)
    {
        if (position < text.Length && (char.IsLetterOrDigit(text[position]) || text[position] == '_'))
        {
            throw new ExactParseException(text, position, $"unexpected character '{text[position]}' after 'i'");
        }
    }
}
