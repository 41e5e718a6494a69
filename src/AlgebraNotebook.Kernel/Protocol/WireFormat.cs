using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Protocol;

/// <summary>
/// Converts between <see cref="JupyterMessage"/> and ZeroMQ multipart frames:
/// identities..., "&lt;IDS|MSG&gt;", signature, header, parent_header, metadata, content, buffers...
/// </summary>
public static class WireFormat
{
    /// <summary>The delimiter frame between routing identities and the signed part.</summary>
    public const string Delimiter = "<IDS|MSG>";

    private static readonly byte[] DelimiterBytes = Encoding.ASCII.GetBytes(Delimiter);

    private static readonly UTF8Encoding StrictUtf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);

    /// <summary>Serializes and signs a message.</summary>
    /// <param name="message">The message.</param>
    /// <param name="signer">The signer holding the session key.</param>
    /// <returns>The frames to send, in order.</returns>
    public static List<byte[]> Encode(JupyterMessage message, MessageSigner signer)
    {
        ArgumentNullException.ThrowIfNull(message);
        ArgumentNullException.ThrowIfNull(signer);
        var header = Serialize(message.Header);
        var parent = Serialize(message.ParentHeader);
        var metadata = Serialize(message.Metadata);
        var content = Serialize(message.Content);
        var frames = new List<byte[]>(message.Identities.Count + 6 + message.Buffers.Count);
        frames.AddRange(message.Identities);
        frames.Add(DelimiterBytes);
        frames.Add(Encoding.ASCII.GetBytes(signer.Sign(header, parent, metadata, content)));
        frames.Add(header);
        frames.Add(parent);
        frames.Add(metadata);
        frames.Add(content);
        frames.AddRange(message.Buffers);
        return frames;
    }

    /// <summary>Parses and verifies received frames.</summary>
    /// <param name="frames">The multipart message as received.</param>
    /// <param name="signer">The signer holding the session key.</param>
    /// <param name="message">The message, when the result is true.</param>
    /// <param name="problem">Why the frames were rejected, when the result is false.</param>
    /// <returns>True when the frames form a well-formed message with a valid signature.</returns>
    public static bool TryDecode(IReadOnlyList<byte[]> frames, MessageSigner signer, out JupyterMessage? message, out string? problem)
    {
        ArgumentNullException.ThrowIfNull(frames);
        ArgumentNullException.ThrowIfNull(signer);
        message = null;
        var delimiter = -1;
        for (var i = 0; i < frames.Count; i++)
        {
            if (frames[i].AsSpan().SequenceEqual(DelimiterBytes))
            {
                delimiter = i;
                break;
            }
        }

        if (delimiter < 0)
        {
            problem = "no <IDS|MSG> delimiter frame";
            return false;
        }

        if (frames.Count < delimiter + 6)
        {
            problem = $"{frames.Count - delimiter - 1} frames after the delimiter, at least 5 expected";
            return false;
        }

        var signature = Encoding.ASCII.GetString(frames[delimiter + 1]);
        var header = frames[delimiter + 2];
        var parent = frames[delimiter + 3];
        var metadata = frames[delimiter + 4];
        var content = frames[delimiter + 5];
        if (!signer.Verify(signature, header, parent, metadata, content))
        {
            problem = signature.Length == 0 ? "missing signature" : "wrong signature";
            return false;
        }

        try
        {
            message = new JupyterMessage(
                frames.Take(delimiter).ToArray(),
                ParseObject(header, "header"),
                ParseObject(parent, "parent_header"),
                ParseObject(metadata, "metadata"),
                ParseObject(content, "content"),
                frames.Skip(delimiter + 6).ToArray());
        }
        catch (FormatException e)
        {
            problem = e.Message;
            return false;
        }

        problem = null;
        return true;
    }

    private static byte[] Serialize(JsonObject value) => Encoding.UTF8.GetBytes(value.ToJsonString());

    /// <summary>Reads every property name and string value once, so that undecodable text fails here and not later.</summary>
    private static void ReadEveryString(JsonNode? node)
    {
        switch (node)
        {
            case JsonObject obj:
                foreach (var (_, value) in obj)
                {
                    ReadEveryString(value);
                }

                break;
            case JsonArray array:
                foreach (var item in array)
                {
                    ReadEveryString(item);
                }

                break;
            case JsonValue value when value.GetValueKind() == JsonValueKind.String:
                _ = value.GetValue<string>();
                break;
        }
    }

    private static JsonObject ParseObject(byte[] frame, string name)
    {
        try
        {
            // The frames are UTF-8 JSON; invalid UTF-8 and duplicate property names are refused here, because the
            // JsonObject would otherwise throw only when the field is first used.
            var text = StrictUtf8.GetString(frame);
            var parsed = JsonNode.Parse(text, documentOptions: new JsonDocumentOptions { AllowDuplicateProperties = false }) as JsonObject
                         ?? throw new FormatException($"the {name} frame is not a JSON object");
            ReadEveryString(parsed);
            return parsed;
        }
        catch (InvalidOperationException)
        {
            // An escaped lone surrogate ("\ud800") is valid JSON syntax but not text; reading it throws.
            throw new FormatException($"the {name} frame holds a string escape that is not valid text (a lone surrogate)");
        }
        catch (DecoderFallbackException)
        {
            throw new FormatException($"the {name} frame is not valid UTF-8");
        }
        catch (JsonException e)
        {
            throw new FormatException($"the {name} frame is not valid JSON ({e.Message})", e);
        }
    }
}
