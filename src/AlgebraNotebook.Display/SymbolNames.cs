namespace AlgebraNotebook.Display;

/// <summary>
/// The convention that turns symbol names into typeset glyphs in MathML and LaTeX (plain text always keeps the name):
/// <list type="bullet">
/// <item>Greek names <c>alpha</c> ... <c>omega</c> and <c>Alpha</c> ... <c>Omega</c> become greek letters; capitals are
/// upright. <c>epsilon</c>, <c>phi</c>, <c>theta</c> follow LaTeX (ϵ, ϕ, θ); <c>varepsilon</c>, <c>varphi</c>,
/// <c>vartheta</c> give ε, φ, ϑ.</item>
/// <item><c>hbar</c> becomes ℏ (LaTeX <c>\hbar</c>). A name that is the letter itself (<c>λ</c>, <c>ℏ</c>) is treated like
/// its spelled-out name.</item>
/// <item>An underscore starts a subscript: <c>J_x</c> is J with subscript x, <c>x_12</c> is x with subscript 12; the
/// part after the first underscore follows the same convention again (<c>J_alpha</c> is J with subscript α).</item>
/// <item>Otherwise trailing digits after a non-digit start form a numeric subscript: <c>t1</c> is t with subscript 1,
/// <c>omega12</c> is ω with subscript 12.</item>
/// <item>Any other name of several letters is set upright as one word (MathML <c>mi</c> with several characters,
/// LaTeX <c>\mathrm{...}</c>); a single letter is italic.</item>
/// </list>
/// The imaginary unit is not a symbol: it is always typeset upright i (see <see cref="Tree.MathNodes.ImaginaryUnit"/>).
/// </summary>
public static class SymbolNames
{
    private static readonly Dictionary<string, (string Glyph, string Latex, bool Upright)> Glyphs = BuildGlyphs();

    /// <summary>
    /// Splits a symbol name into the base and the subscript text (null when there is none) by the rules above:
    /// <c>"J_x"</c> gives ("J", "x"), <c>"t1"</c> gives ("t", "1"), <c>"alpha"</c> gives ("alpha", null).
    /// </summary>
    public static (string Base, string? Subscript) Split(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var underscore = name.IndexOf('_');
        if (underscore > 0 && underscore < name.Length - 1)
        {
            return (name[..underscore], name[(underscore + 1)..]);
        }

        if (underscore < 0)
        {
            var digitsStart = name.Length;
            while (digitsStart > 0 && char.IsAsciiDigit(name[digitsStart - 1]))
            {
                digitsStart--;
            }

            if (digitsStart > 0 && digitsStart < name.Length)
            {
                return (name[..digitsStart], name[digitsStart..]);
            }
        }

        return (name, null);
    }

    /// <summary>
    /// Looks up the glyph for a base name: the Unicode character used in MathML, the LaTeX spelling, and whether
    /// it is upright (greek capitals). False for names that are not greek letters, <c>hbar</c>, or one of those glyphs.
    /// </summary>
    public static bool TryGetGlyph(string baseName, out string glyph, out string latex, out bool upright)
    {
        ArgumentNullException.ThrowIfNull(baseName);
        if (Glyphs.TryGetValue(baseName, out var entry))
        {
            (glyph, latex, upright) = entry;
            return true;
        }

        glyph = latex = string.Empty;
        upright = false;
        return false;
    }

    private static Dictionary<string, (string Glyph, string Latex, bool Upright)> BuildGlyphs()
    {
        var table = new Dictionary<string, (string, string, bool)>(StringComparer.Ordinal);
        // Lower case: name, Unicode (as LaTeX draws it, following the unicode-math correspondence), LaTeX command.
        (string Name, char Glyph, string Latex)[] lower =
        [
            ("alpha", 'α', @"\alpha"), ("beta", 'β', @"\beta"), ("gamma", 'γ', @"\gamma"), ("delta", 'δ', @"\delta"),
            ("epsilon", 'ϵ', @"\epsilon"), ("varepsilon", 'ε', @"\varepsilon"), ("zeta", 'ζ', @"\zeta"),
            ("eta", 'η', @"\eta"), ("theta", 'θ', @"\theta"), ("vartheta", 'ϑ', @"\vartheta"), ("iota", 'ι', @"\iota"),
            ("kappa", 'κ', @"\kappa"), ("lambda", 'λ', @"\lambda"), ("mu", 'μ', @"\mu"), ("nu", 'ν', @"\nu"),
            ("xi", 'ξ', @"\xi"), ("omicron", 'ο', "o"), ("pi", 'π', @"\pi"), ("rho", 'ρ', @"\rho"),
            ("sigma", 'σ', @"\sigma"), ("tau", 'τ', @"\tau"), ("upsilon", 'υ', @"\upsilon"), ("phi", 'ϕ', @"\phi"),
            ("varphi", 'φ', @"\varphi"), ("chi", 'χ', @"\chi"), ("psi", 'ψ', @"\psi"), ("omega", 'ω', @"\omega"),
        ];
        foreach (var (name, glyph, latex) in lower)
        {
            table[name] = (glyph.ToString(), latex, false);
        }

        // Capitals that look like Latin letters have no LaTeX command; LaTeX sets them as upright Latin letters.
        (string Name, char Glyph, string Latex)[] upper =
        [
            ("Alpha", 'Α', @"\mathrm{A}"), ("Beta", 'Β', @"\mathrm{B}"), ("Gamma", 'Γ', @"\Gamma"), ("Delta", 'Δ', @"\Delta"),
            ("Epsilon", 'Ε', @"\mathrm{E}"), ("Zeta", 'Ζ', @"\mathrm{Z}"), ("Eta", 'Η', @"\mathrm{H}"), ("Theta", 'Θ', @"\Theta"),
            ("Iota", 'Ι', @"\mathrm{I}"), ("Kappa", 'Κ', @"\mathrm{K}"), ("Lambda", 'Λ', @"\Lambda"), ("Mu", 'Μ', @"\mathrm{M}"),
            ("Nu", 'Ν', @"\mathrm{N}"), ("Xi", 'Ξ', @"\Xi"), ("Omicron", 'Ο', @"\mathrm{O}"), ("Pi", 'Π', @"\Pi"),
            ("Rho", 'Ρ', @"\mathrm{P}"), ("Sigma", 'Σ', @"\Sigma"), ("Tau", 'Τ', @"\mathrm{T}"), ("Upsilon", 'Υ', @"\Upsilon"),
            ("Phi", 'Φ', @"\Phi"), ("Chi", 'Χ', @"\mathrm{X}"), ("Psi", 'Ψ', @"\Psi"), ("Omega", 'Ω', @"\Omega"),
        ];
        foreach (var (name, glyph, latex) in upper)
        {
            table[name] = (glyph.ToString(), latex, true);
        }

        table["hbar"] = ("ℏ", @"\hbar", false);

        // A name may also be the letter itself ("λ"); it gets the same LaTeX spelling.
        foreach (var entry in table.Values.ToArray())
        {
            table.TryAdd(entry.Item1, entry);
        }

        return table;
    }
}
