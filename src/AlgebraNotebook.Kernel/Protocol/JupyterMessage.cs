using System.Globalization;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Kernel.Protocol;

/// <summary>
/// One Jupyter message: routing identities, header, parent header, metadata, content and binary buffers
/// (messaging protocol version <see cref="ProtocolVersion"/>).
/// </summary>
/// <param name="Identities">ZeroMQ routing frames before the "&lt;IDS|MSG&gt;" delimiter (the topic on iopub).</param>
/// <param name="Header">The header: msg_id, session, username, date, msg_type, version.</param>
/// <param name="ParentHeader">The header of the request this message answers; empty for unsolicited messages.</param>
/// <param name="Metadata">Message metadata (usually empty).</param>
/// <param name="Content">The message body; its shape depends on the message type.</param>
/// <param name="Buffers">Extra binary frames after the content (unused by this kernel, kept when received).</param>
public sealed record JupyterMessage(
    IReadOnlyList<byte[]> Identities,
    JsonObject Header,
    JsonObject ParentHeader,
    JsonObject Metadata,
    JsonObject Content,
    IReadOnlyList<byte[]> Buffers)
{
    /// <summary>The messaging protocol version this kernel speaks.</summary>
    public const string ProtocolVersion = "5.3";

    /// <summary>The msg_type field of the header, or the empty string when absent or not a string.</summary>
    public string MessageType => TextField(Header, "msg_type");

    /// <summary>The msg_id field of the header, or the empty string when absent or not a string.</summary>
    public string MessageId => TextField(Header, "msg_id");

    /// <summary>Creates a message of the given type with a fresh header.</summary>
    /// <param name="messageType">The msg_type, for example "execute_reply".</param>
    /// <param name="session">The session id written into the header.</param>
    /// <param name="content">The content object (taken over, not copied).</param>
    /// <param name="parent">The request being answered (its header becomes the parent header and its identities are
    /// reused for routing), or null for an unsolicited message.</param>
    /// <returns>The new message.</returns>
    public static JupyterMessage Create(string messageType, string session, JsonObject content, JupyterMessage? parent)
    {
        ArgumentException.ThrowIfNullOrEmpty(messageType);
        ArgumentNullException.ThrowIfNull(session);
        ArgumentNullException.ThrowIfNull(content);
        var header = new JsonObject
        {
            ["msg_id"] = Guid.NewGuid().ToString("N"),
            ["session"] = session,
            ["username"] = "algebranotebook",
            ["date"] = DateTimeOffset.UtcNow.ToString("yyyy-MM-ddTHH:mm:ss.ffffffZ", CultureInfo.InvariantCulture),
            ["msg_type"] = messageType,
            ["version"] = ProtocolVersion,
        };
        var parentHeader = parent is null ? new JsonObject() : (JsonObject)parent.Header.DeepClone();
        return new JupyterMessage(parent?.Identities ?? Array.Empty<byte[]>(), header, parentHeader, new JsonObject(), content,
            Array.Empty<byte[]>());
    }

    private static string TextField(JsonObject header, string name) =>
        header[name] is JsonValue value && value.TryGetValue<string>(out var text) ? text : string.Empty;
}
