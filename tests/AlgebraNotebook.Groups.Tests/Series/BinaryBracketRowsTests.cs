using AlgebraNotebook.Groups.Series;

namespace AlgebraNotebook.Groups.Tests.Series;

/// <summary>The rows &lt;P(v), x&gt; of the row recurrence against expanded standard bracketings.</summary>
public class BinaryBracketRowsTests
{
    [Fact]
    public void Rows_equal_the_coefficients_of_the_expanded_brackets()
    {
        // Oracle: P(v) = P(a) P(b) - P(b) P(a) multiplied out word by word (the column variant's expansions, standard
        // factorisation as in Lothaire, Combinatorics on Words, Prop. 5.1.3), for every Lyndon word v of length 1..11 and
        // every word x of that length: the row of x holds exactly the v with <P(v), x> non-zero, with that value.
        const int maxLength = 11;
        var rows = new BinaryBracketRows(maxLength, maxLength);
        var expansions = new BinaryExpansionWorker(new BinaryBracketExpansions(0), null);
        for (var length = 1; length <= maxLength; length++)
        {
            var expected = new Dictionary<(int X, int V), long>();
            foreach (var v in rows.Lyndon[length].Words)
            {
                var p = expansions.Compute(v, length);
                for (var i = 0; i < p.Words.Length; i++)
                {
                    expected[(p.Words[i], v)] = p.Coefficients[i];
                }
            }

            var found = 0;
            for (var x = 0; x < (1 << length); x++)
            {
                var row = rows.Row(x, length);
                var previous = -1;
                for (var i = row.Start; i < row.Start + row.Count; i++)
                {
                    var v = row.Keys[i] >> 5;
                    Assert.True(v > previous, $"length {length}, word {x}: row not increasing at {v}");
                    previous = v;
                    Assert.True(expected.TryGetValue((x, v), out var value), $"length {length}: <P({v}), {x}> is zero but the row has {row.Values[i]}");
                    Assert.Equal(value, row.Values[i]);
                    Assert.Equal(length == 1 ? 0 : BinaryLyndonTable.RightFactorLength(v, length), row.Keys[i] & 31);
                    found++;
                }
            }

            Assert.Equal(expected.Count(e => e.Value != 0), found);
        }
    }
}
