using System.Text;
using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Protocol;

namespace AlgebraNotebook.Kernel.Tests.Protocol;

/// <summary>
/// Malformed but correctly signed frames, found by the fuzzer (tests/AlgebraNotebook.Fuzz, target kernel-frames), are
/// rejected with a problem instead of throwing later when the kernel reads the message. Jupyter messaging
/// specification, "The Wire Protocol": the four signed frames are UTF-8 encoded JSON dicts, and the signature is
/// the HMAC hex digest of those frames.
/// </summary>
public class WireFormatRejectionTests
{
    private static readonly MessageSigner Signer = new("session-key");

    private static List<byte[]> Frames(string header, string content = "{}", string? signature = null)
    {
        var signed = new[] { Encoding.UTF8.GetBytes(header), "{}"u8.ToArray(), "{}"u8.ToArray(), Encoding.UTF8.GetBytes(content) };
        return Frames(signed, signature);
    }

    private static List<byte[]> Frames(byte[][] signed, string? signature = null)
    {
        var frames = new List<byte[]> { "<IDS|MSG>"u8.ToArray(), Encoding.ASCII.GetBytes(signature ?? Signer.Sign(signed[0], signed[1], signed[2], signed[3])) };
        frames.AddRange(signed);
        return frames;
    }

    [Fact]
    public void A_header_with_a_repeated_field_is_rejected_when_decoded()
    {
        // Found: JsonObject threw ArgumentException on first use of a header with "msg_type" twice.
        var frames = Frames("""{"msg_id":"a","msg_type":"execute_request","msg_type":"kernel_info_request"}""");
        Assert.False(WireFormat.TryDecode(frames, Signer, out _, out var problem));
        Assert.Contains("header", problem);
    }

    [Fact]
    public void A_frame_that_is_not_valid_utf8_is_rejected_when_decoded()
    {
        // Found: a property name with an invalid UTF-8 byte threw InvalidOperationException on first use.
        var header = Encoding.UTF8.GetBytes("""{"msg_id":"a","Xsg_type":"interrupt_request"}""");
        header[Array.IndexOf(header, (byte)'X')] = 0xFF;
        Assert.False(WireFormat.TryDecode(Frames([header, "{}"u8.ToArray(), "{}"u8.ToArray(), "{}"u8.ToArray()]), Signer, out _, out var problem));
        Assert.Equal("the header frame is not valid UTF-8", problem);
    }

    [Theory]
    [InlineData("""{"msg_id":"a","sessio\ud800n":"s1","msg_type":"kernel_info_request"}""")]
    [InlineData("""{"msg_id":"a","msg_type":"execute_request","note":"\udc00"}""")]
    public void A_string_escape_of_a_lone_surrogate_is_rejected_when_decoded(string header)
    {
        // Found: "\ud800" inside a property name threw InvalidOperationException on first use.
        Assert.False(WireFormat.TryDecode(Frames(header), Signer, out _, out var problem));
        Assert.Contains("lone surrogate", problem);
    }

    [Fact]
    public void The_signature_must_be_the_lowercase_hex_digest_and_other_spellings_are_rejected()
    {
        // Found: an upper-case spelling of the right digest was accepted. The reference client writes hexdigest() (lowercase).
        var good = Frames("""{"msg_id":"a","msg_type":"kernel_info_request"}""");
        var signature = Encoding.ASCII.GetString(good[1]);
        Assert.True(WireFormat.TryDecode(good, Signer, out _, out _));
        foreach (var spelling in new[] { signature.ToUpperInvariant(), " " + signature, signature + "00", signature[..62] })
        {
            Assert.False(WireFormat.TryDecode(Frames("""{"msg_id":"a","msg_type":"kernel_info_request"}""", signature: spelling), Signer, out _, out var problem));
            Assert.Equal("wrong signature", problem);
        }
    }

    [Fact]
    public void A_msg_type_that_is_not_a_string_reads_as_empty_instead_of_throwing()
    {
        // Found: Header["msg_type"].GetValue<string>() threw InvalidOperationException for a number.
        Assert.True(WireFormat.TryDecode(Frames("""{"msg_id":7,"msg_type":5}"""), Signer, out var message, out var problem), problem);
        Assert.Equal(string.Empty, message!.MessageType);
        Assert.Equal(string.Empty, message.MessageId);
        var reply = JupyterMessage.Create("status", "s", new JsonObject(), message);
        Assert.True(WireFormat.TryDecode(WireFormat.Encode(reply, Signer), Signer, out _, out _));
    }
}
