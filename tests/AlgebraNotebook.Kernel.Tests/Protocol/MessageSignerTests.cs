using System.Text;
using AlgebraNotebook.Kernel.Protocol;

namespace AlgebraNotebook.Kernel.Tests.Protocol;

public class MessageSignerTests
{
    // RFC 4231, section 4.3 (test case 2): HMAC-SHA-256 with key "Jefe" of "what do ya want for nothing?".
    private const string Rfc4231Case2 = "5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843";

    [Fact]
    public void Signature_is_the_hmac_sha256_of_the_four_frames_in_order_RFC_4231_case_2()
    {
        var signer = new MessageSigner("Jefe");
        var parts = new[] { "what do ", "ya want ", "for ", "nothing?" }.Select(Encoding.ASCII.GetBytes).ToArray();

        Assert.Equal(Rfc4231Case2, signer.Sign(parts[0], parts[1], parts[2], parts[3]));
    }

    [Fact]
    public void Verification_accepts_the_lowercase_digest_and_rejects_every_other_spelling()
    {
        var signer = new MessageSigner("Jefe");
        var parts = new[] { "what do ", "ya want ", "for ", "nothing?" }.Select(Encoding.ASCII.GetBytes).ToArray();

        Assert.True(signer.Verify(Rfc4231Case2, parts[0], parts[1], parts[2], parts[3]));
        // The reference client compares the lowercase hexdigest text (Jupyter messaging specification, "The Wire Protocol").
        Assert.False(signer.Verify(Rfc4231Case2.ToUpperInvariant(), parts[0], parts[1], parts[2], parts[3]));
        Assert.False(signer.Verify(string.Empty, parts[0], parts[1], parts[2], parts[3]));
        Assert.False(signer.Verify("not hex", parts[0], parts[1], parts[2], parts[3]));
        Assert.False(signer.Verify(Rfc4231Case2[..62], parts[0], parts[1], parts[2], parts[3]));
        Assert.False(signer.Verify(Rfc4231Case2[..63] + "4", parts[0], parts[1], parts[2], parts[3]));
        // The same bytes split differently between frames sign the same; a changed byte does not.
        Assert.False(signer.Verify(Rfc4231Case2, parts[0], parts[1], parts[2], Encoding.ASCII.GetBytes("nothing!")));
    }

    [Fact]
    public void An_empty_key_disables_signing_as_the_messaging_standard_says()
    {
        var signer = new MessageSigner(string.Empty);

        Assert.False(signer.IsEnabled);
        Assert.Equal(string.Empty, signer.Sign(new byte[1], new byte[1], new byte[1], new byte[1]));
        Assert.True(signer.Verify(string.Empty, new byte[1], new byte[1], new byte[1], new byte[1]));
    }
}
