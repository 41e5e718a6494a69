using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Creation helpers for <see cref="Matrix{T}"/> that let the compiler infer or name the scalar type briefly,
/// and the text reader for matrices written as nested brackets.
/// </summary>
/// <example><c>Matrix.FromRows&lt;Rational&gt;([1, 2], [3, 4])</c>, <c>Matrix.ParseGaussianRational("[[0, -i], [i, 0]]")</c></example>
public static class Matrix
{
    /// <summary>Builds a matrix from its rows (see <see cref="Matrix{T}.FromRows(T[][])"/>).</summary>
    /// <exception cref="ExactArgumentException">The rows have different lengths.</exception>
    public static Matrix<T> FromRows<T>(params T[][] rows)
        where T : IRingElement<T> => Matrix<T>.FromRows(rows);

    /// <summary>Builds a matrix from its columns (see <see cref="Matrix{T}.FromColumns(T[][])"/>).</summary>
    /// <exception cref="ExactArgumentException">The columns have different lengths.</exception>
    public static Matrix<T> FromColumns<T>(params T[][] columns)
        where T : IRingElement<T> => Matrix<T>.FromColumns(columns);

    /// <summary>Places n x 1 column vectors side by side into an n x k matrix.</summary>
    /// <exception cref="ExactArgumentException">A vector is not a column of the common length.</exception>
    public static Matrix<T> FromColumnVectors<T>(IReadOnlyList<Matrix<T>> vectors)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(vectors);
        if (vectors.Count == 0)
        {
            throw new ExactArgumentException("Cannot build a matrix from an empty list of column vectors: the row count is unknown.", nameof(vectors));
        }

        var rows = vectors[0].RowCount;
        for (var k = 0; k < vectors.Count; k++)
        {
            if (vectors[k].ColumnCount != 1 || vectors[k].RowCount != rows)
            {
                throw new ExactArgumentException(
                    $"Vector {k} is a {vectors[k].Shape} matrix but a {rows}x1 column vector is needed.", nameof(vectors));
            }
        }

        return Matrix<T>.Create(rows, vectors.Count, (i, j) => vectors[j].At(i, 0));
    }

    /// <summary>The square matrix with the given diagonal entries.</summary>
    public static Matrix<T> Diagonal<T>(params T[] entries)
        where T : IRingElement<T> => Matrix<T>.Diagonal(entries);

    /// <summary>A column vector (an n x 1 matrix).</summary>
    public static Matrix<T> ColumnVector<T>(params T[] entries)
        where T : IRingElement<T> => Matrix<T>.ColumnVector(entries);

    /// <summary>The n x n identity matrix over <typeparamref name="T"/>.</summary>
    /// <exception cref="ExactArgumentException"><paramref name="size"/> is negative.</exception>
    public static Matrix<T> Identity<T>(int size)
        where T : IRingElement<T> => Matrix<T>.Identity(size);

    /// <summary>The direct sum (block diagonal matrix) of the blocks, in order.</summary>
    public static Matrix<T> DirectSum<T>(params Matrix<T>[] blocks)
        where T : IRingElement<T> => Matrix<T>.DirectSum(blocks);

    /// <summary>Reads a matrix of rationals written as "[[1, 2], [3/4, -5]]" (entries as in <see cref="Rational.Parse(string)"/>).</summary>
    /// <exception cref="ExactParseException">The text is malformed; the message points at the offending character.</exception>
    public static Matrix<Rational> ParseRational(string text) => Parse(text, Rational.Parse);

    /// <summary>
    /// Reads a matrix of Gaussian rationals written as "[[0, -i], [i, 0]]" or "[[1/2 + i, 2], [3 i, (1/3) i]]"
    /// (entries as in <see cref="GaussianRational.Parse(string)"/>).
    /// </summary>
    /// <exception cref="ExactParseException">The text is malformed; the message points at the offending character.</exception>
    public static Matrix<GaussianRational> ParseGaussianRational(string text) => Parse(text, GaussianRational.Parse);

    /// <summary>
    /// Reads a matrix written as nested brackets, "[[a, b], [c, d]]": an outer bracket holding one bracketed,
    /// comma-separated row per matrix row. Each entry's text (up to the next comma or closing bracket outside
    /// parentheses) goes to <paramref name="parseEntry"/>; an <see cref="ExactParseException"/> thrown there is re-thrown
    /// with its position moved into the whole text. "[]" is the 0x0 matrix. Spaces and line breaks are ignored between tokens.
    /// </summary>
    /// <exception cref="ExactParseException">The text is malformed or the rows have different lengths; the message points at the offending character.</exception>
    /// <exception cref="DivideByZeroException">An entry has a zero denominator; the message names the entry and its position.</exception>
    public static Matrix<T> Parse<T>(string text, Func<string, T> parseEntry)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(parseEntry);
        var position = 0;
        Expect(text, ref position, '[', "expected '[' to open the matrix");
        var rows = new List<T[]>();
        SkipSpaces(text, ref position);
        if (position < text.Length && text[position] == ']')
        {
            position++;
        }
        else
        {
            while (true)
            {
                SkipSpaces(text, ref position);
                var rowStart = position;
                var row = ParseRow(text, ref position, parseEntry);
                if (rows.Count > 0 && row.Length != rows[0].Length)
                {
                    throw new ExactParseException(
                        text,
                        rowStart,
                        $"row {rows.Count + 1} has {row.Length} entries but row 1 has {rows[0].Length}");
                }

                rows.Add(row);
                SkipSpaces(text, ref position);
                if (position < text.Length && text[position] == ',')
                {
                    position++;
                    continue;
                }

                Expect(text, ref position, ']', "expected ',' or ']' after a row");
                break;
            }
        }

        SkipSpaces(text, ref position);
        if (position < text.Length)
        {
            throw new ExactParseException(text, position, $"unexpected character '{text[position]}' after the matrix");
        }

        return Matrix<T>.FromRows(rows.ToArray());
    }

    private static T[] ParseRow<T>(string text, ref int position, Func<string, T> parseEntry)
    {
        Expect(text, ref position, '[', "expected '[' to open a row");
        var entries = new List<T>();
        SkipSpaces(text, ref position);
        if (position < text.Length && text[position] == ']')
        {
            position++;
            return [];
        }

        while (true)
        {
            SkipSpaces(text, ref position);
            var start = position;
            var depth = 0;
            while (position < text.Length)
            {
                var c = text[position];
                if (c == '(')
                {
                    depth++;
                }
                else if (c == ')')
                {
                    depth--;
                }
                else if (depth <= 0 && (c == ',' || c == ']'))
                {
                    break;
                }
                else if (c == '[')
                {
                    throw new ExactParseException(text, position, "unexpected '[' inside an entry");
                }

                position++;
            }

            if (position == text.Length)
            {
                throw new ExactParseException(text, position, "expected ']' to close the row but the text ended");
            }

            var entryText = text.Substring(start, position - start);
            if (string.IsNullOrWhiteSpace(entryText))
            {
                throw new ExactParseException(text, start, "expected an entry");
            }

            try
            {
                entries.Add(parseEntry(entryText));
            }
            catch (ExactParseException inner) when (inner.Input == entryText)
            {
                throw new ExactParseException(text, start + inner.Position, inner.Problem);
            }
            catch (DivideByZeroException inner)
            {
                throw new DivideByZeroException(
                    $"Cannot read the matrix entry \"{entryText.Trim()}\" at position {start + 1} of \"{text}\": {inner.Message}", inner);
            }

            if (text[position] == ',')
            {
                position++;
                continue;
            }

            position++;
            return entries.ToArray();
        }
    }

    private static void Expect(string text, ref int position, char expected, string problem)
    {
        SkipSpaces(text, ref position);
        if (position >= text.Length)
        {
            throw new ExactParseException(text, position, problem + " but the text ended");
        }

        if (text[position] != expected)
        {
            throw new ExactParseException(text, position, $"{problem} but found '{text[position]}'");
        }

        position++;
    }

    private static void SkipSpaces(string text, ref int position)
    {
        while (position < text.Length && char.IsWhiteSpace(text[position]))
        {
            position++;
        }
    }
}
