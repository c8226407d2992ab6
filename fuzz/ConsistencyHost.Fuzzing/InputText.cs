using System.Text;

namespace ConsistencyHost.Fuzzing;

/// <summary>Turns fuzzer bytes into the text a reader gets, the same way under afl-fuzz and in replay.</summary>
internal static class InputText
{
    // Invalid UTF-8 becomes U+FFFD, which is what a reader gets from any text API as well; no BOM sniffing.
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: false);

    public static string Decode(Stream stream)
    {
        using var buffer = new MemoryStream();
        stream.CopyTo(buffer);
        return Utf8.GetString(buffer.GetBuffer(), 0, (int)buffer.Length);
    }

    public static string Decode(byte[] bytes) => Utf8.GetString(bytes);
}
