using System.Text;
using System.Text.Json.Nodes;
using AlgebraNotebook.Kernel.Protocol;

namespace AlgebraNotebook.Kernel.Tests.Protocol;

public class WireFormatTests
{
    private static readonly MessageSigner Signer = new("session-key");

    [Fact]
    public void Encoded_frames_follow_the_standard_layout_and_decode_back()
    {
        var message = JupyterMessage.Create("execute_reply", "s1", new JsonObject { ["status"] = "ok" }, null) with
        {
            Identities = new[] { new byte[] { 1, 2, 3 } },
        };

        var frames = WireFormat.Encode(message, Signer);

        // Messaging standard, "The wire protocol": identities, <IDS|MSG>, signature, header, parent, metadata, content.
        Assert.Equal(7, frames.Count);
        Assert.Equal("<IDS|MSG>", Encoding.ASCII.GetString(frames[1]));
        Assert.Equal(64, frames[2].Length);
        Assert.True(WireFormat.TryDecode(frames, Signer, out var decoded, out var problem), problem);
        Assert.Equal("execute_reply", decoded!.MessageType);
        Assert.Equal("5.3", decoded.Header["version"]!.GetValue<string>());
        Assert.Equal(new byte[] { 1, 2, 3 }, decoded.Identities.Single());
        Assert.Equal("ok", decoded.Content["status"]!.GetValue<string>());
    }

    [Fact]
    public void A_tampered_content_frame_is_rejected()
    {
        var frames = WireFormat.Encode(JupyterMessage.Create("execute_request", "s1", new JsonObject { ["code"] = "1" }, null), Signer);
        frames[^1] = Encoding.UTF8.GetBytes("{\"code\":\"2\"}");

        Assert.False(WireFormat.TryDecode(frames, Signer, out _, out var problem));
        Assert.Equal("wrong signature", problem);
    }

    [Fact]
    public void Frames_without_delimiter_or_with_too_few_parts_are_rejected()
    {
        Assert.False(WireFormat.TryDecode(new[] { new byte[] { 1 } }, Signer, out _, out var noDelimiter));
        Assert.Contains("delimiter", noDelimiter);
        Assert.False(WireFormat.TryDecode(new[] { Encoding.ASCII.GetBytes("<IDS|MSG>"), new byte[0] }, Signer, out _, out var tooFew));
        Assert.Contains("at least 5", tooFew);
    }

    [Fact]
    public void A_reply_carries_the_request_header_as_parent_and_its_identities()
    {
        var request = JupyterMessage.Create("kernel_info_request", "client", new JsonObject(), null) with
        {
            Identities = new[] { new byte[] { 9 } },
        };

        var reply = JupyterMessage.Create("kernel_info_reply", "kernel", new JsonObject(), request);

        Assert.Equal(request.MessageId, reply.ParentHeader["msg_id"]!.GetValue<string>());
        Assert.Equal(new byte[] { 9 }, reply.Identities.Single());
        Assert.NotEqual(request.MessageId, reply.MessageId);
    }
}
