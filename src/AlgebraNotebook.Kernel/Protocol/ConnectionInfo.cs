using System.Text.Json;

namespace AlgebraNotebook.Kernel.Protocol;

/// <summary>
/// The contents of a Jupyter connection file: where the five sockets bind and how messages are signed.
/// </summary>
/// <remarks>
/// Only the tcp transport and the hmac-sha256 signature scheme are supported. A port of 0 means "pick a free port when
/// binding" (the bound ports are then reported by the server); clients always write real ports.
/// </remarks>
/// <param name="Transport">Always "tcp".</param>
/// <param name="IP">The address every socket binds to, exactly as written in the file (for example 127.0.0.1).</param>
/// <param name="ShellPort">Port of the shell ROUTER socket.</param>
/// <param name="IOPubPort">Port of the iopub PUB socket.</param>
/// <param name="StdinPort">Port of the stdin ROUTER socket.</param>
/// <param name="ControlPort">Port of the control ROUTER socket.</param>
/// <param name="HeartbeatPort">Port of the heartbeat REP socket.</param>
/// <param name="Key">The HMAC key (used as its UTF-8 bytes); empty disables signing, as the messaging standard says.</param>
/// <param name="SignatureScheme">Always "hmac-sha256".</param>
public sealed record ConnectionInfo(
    string Transport,
    string IP,
    int ShellPort,
    int IOPubPort,
    int StdinPort,
    int ControlPort,
    int HeartbeatPort,
    string Key,
    string SignatureScheme)
{
    /// <summary>The only supported signature scheme.</summary>
    public const string HmacSha256 = "hmac-sha256";

    /// <summary>Reads and validates a connection file.</summary>
    /// <param name="path">Path of the JSON connection file written by the Jupyter client.</param>
    /// <returns>The parsed connection information.</returns>
    /// <exception cref="FileNotFoundException">The file does not exist.</exception>
    /// <exception cref="FormatException">The file is not valid JSON, lacks a field, or names an unsupported transport or scheme.</exception>
    public static ConnectionInfo Load(string path)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(path);
        if (!File.Exists(path))
        {
            throw new FileNotFoundException($"The connection file '{path}' does not exist.", path);
        }

        return Parse(File.ReadAllText(path), path);
    }

    /// <summary>Parses the JSON text of a connection file.</summary>
    /// <param name="json">The file contents.</param>
    /// <param name="source">A name for the input used in error messages (a path, or "connection file").</param>
    /// <returns>The parsed connection information.</returns>
    /// <exception cref="FormatException">The text is not valid JSON, lacks a field, or names an unsupported transport or scheme.</exception>
    public static ConnectionInfo Parse(string json, string source = "connection file")
    {
        ArgumentNullException.ThrowIfNull(json);
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(json);
        }
        catch (JsonException e)
        {
            throw new FormatException($"The connection file '{source}' is not valid JSON: {e.Message}", e);
        }
        catch (ArgumentException e)
        {
            // A string holding a lone UTF-16 surrogate cannot be read as JSON text.
            throw new FormatException($"The connection file '{source}' is not valid JSON: {e.Message}", e);
        }

        using (document)
        {
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object)
            {
                throw new FormatException($"The connection file '{source}' must hold a JSON object.");
            }

            var transport = OptionalString(root, "transport", source) ?? "tcp";
            if (transport != "tcp")
            {
                throw new FormatException($"The connection file '{source}' asks for transport '{transport}'; only 'tcp' is supported.");
            }

            var scheme = OptionalString(root, "signature_scheme", source) ?? HmacSha256;
            if (scheme != HmacSha256)
            {
                throw new FormatException($"The connection file '{source}' asks for signature scheme '{scheme}'; only '{HmacSha256}' is supported.");
            }

            var ip = OptionalString(root, "ip", source);
            if (string.IsNullOrWhiteSpace(ip))
            {
                throw new FormatException($"The connection file '{source}' has no 'ip' field.");
            }

            return new ConnectionInfo(
                transport,
                ip,
                Port(root, "shell_port", source),
                Port(root, "iopub_port", source),
                Port(root, "stdin_port", source),
                Port(root, "control_port", source),
                Port(root, "hb_port", source),
                OptionalString(root, "key", source) ?? string.Empty,
                scheme);
        }
    }

    /// <summary>The ZeroMQ endpoint for a port on <see cref="IP"/>, such as tcp://127.0.0.1:50123.</summary>
    /// <param name="port">The port number.</param>
    /// <returns>The endpoint text.</returns>
    public string Endpoint(int port) => $"{Transport}://{IP}:{port}";

    private static string? OptionalString(JsonElement root, string name, string source)
    {
        if (!root.TryGetProperty(name, out var value) || value.ValueKind == JsonValueKind.Null)
        {
            return null;
        }

        if (value.ValueKind != JsonValueKind.String)
        {
            throw new FormatException($"The connection file '{source}' has a non-string '{name}' field.");
        }

        return value.GetString();
    }

    private static int Port(JsonElement root, string name, string source)
    {
        if (!root.TryGetProperty(name, out var value))
        {
            throw new FormatException($"The connection file '{source}' has no '{name}' field.");
        }

        if (value.ValueKind != JsonValueKind.Number || !value.TryGetInt32(out var port) || port < 0 || port > 65535)
        {
            throw new FormatException($"The connection file '{source}' has '{name}' = {value.GetRawText()}, which is not a port number (0-65535).");
        }

        return port;
    }
}
