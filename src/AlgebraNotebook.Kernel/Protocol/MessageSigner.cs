using System.Security.Cryptography;
using System.Text;

namespace AlgebraNotebook.Kernel.Protocol;

/// <summary>
/// Signs and verifies Jupyter messages: HMAC-SHA256 over the header, parent header, metadata and content frames (in
/// that order, as sent), written as lowercase hexadecimal.
/// </summary>
/// <remarks>
/// Verification compares the received text with the expected lowercase hexadecimal digest using
/// <see cref="CryptographicOperations.FixedTimeEquals"/>, so the time taken does not reveal how many leading bytes
/// matched. With an empty key signing is disabled (the messaging standard's rule): the signature frame is empty and
/// every message verifies.
/// </remarks>
public sealed class MessageSigner
{
    private readonly byte[] key;

    /// <summary>Creates a signer for a key taken from a connection file.</summary>
    /// <param name="key">The key text; its UTF-8 bytes are the HMAC key. Empty disables signing.</param>
    public MessageSigner(string key)
    {
        ArgumentNullException.ThrowIfNull(key);
        this.key = Encoding.UTF8.GetBytes(key);
    }

    /// <summary>True when the key is non-empty, so messages are signed and checked.</summary>
    public bool IsEnabled => key.Length > 0;

    /// <summary>The signature of four serialized frames.</summary>
    /// <param name="header">The header frame.</param>
    /// <param name="parentHeader">The parent header frame.</param>
    /// <param name="metadata">The metadata frame.</param>
    /// <param name="content">The content frame.</param>
    /// <returns>64 lowercase hexadecimal digits, or the empty string when signing is disabled.</returns>
    public string Sign(byte[] header, byte[] parentHeader, byte[] metadata, byte[] content)
    {
        if (!IsEnabled)
        {
            return string.Empty;
        }

        return Convert.ToHexStringLower(Digest(header, parentHeader, metadata, content));
    }

    /// <summary>Checks a received signature in constant time.</summary>
    /// <param name="signature">The signature frame as received (hexadecimal text).</param>
    /// <param name="header">The header frame.</param>
    /// <param name="parentHeader">The parent header frame.</param>
    /// <param name="metadata">The metadata frame.</param>
    /// <param name="content">The content frame.</param>
    /// <returns>True when signing is disabled or the signature matches; false when it is missing, malformed or wrong.</returns>
    public bool Verify(string signature, byte[] header, byte[] parentHeader, byte[] metadata, byte[] content)
    {
        ArgumentNullException.ThrowIfNull(signature);
        if (!IsEnabled)
        {
            return true;
        }

        // The signature is the lowercase hexadecimal HMAC digest, as the reference client writes it; the received
        // text is compared with the expected text byte for byte in constant time (any other spelling is rejected).
        var expected = Encoding.ASCII.GetBytes(Convert.ToHexStringLower(Digest(header, parentHeader, metadata, content)));
        var received = Encoding.UTF8.GetBytes(signature);
        // FixedTimeEquals returns false at once for different lengths; the length of a digest is public anyway.
        return CryptographicOperations.FixedTimeEquals(received, expected);
    }

    private byte[] Digest(byte[] header, byte[] parentHeader, byte[] metadata, byte[] content)
    {
        using var hmac = IncrementalHash.CreateHMAC(HashAlgorithmName.SHA256, key);
        hmac.AppendData(header);
        hmac.AppendData(parentHeader);
        hmac.AppendData(metadata);
        hmac.AppendData(content);
        return hmac.GetHashAndReset();
    }
}
