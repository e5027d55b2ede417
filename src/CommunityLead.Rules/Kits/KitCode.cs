using System.Security.Cryptography;
using System.Text;

namespace CommunityLead.Rules.Kits;

/// <summary>
/// Kit codes are typed by people from a label, so they use Crockford's base32 alphabet (no I, L, O, U)
/// with its mod-37 check symbol: one mistyped or swapped character is caught before any lookup.
/// Canonical form: four characters, a hyphen, four characters, a hyphen, the check symbol ("7KQ4-M2XD-H").
/// </summary>
public static class KitCode
{
    public const string Alphabet = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
    // Symbols 32..36 exist only as check symbols.
    public const string CheckAlphabet = Alphabet + "*~$=U";
    public const int PayloadLength = 8;

    public static char CheckSymbol(string payload)
    {
        var remainder = 0;
        foreach (var c in payload)
        {
            var digit = Alphabet.IndexOf(c);
            if (digit < 0) throw new ArgumentException($"'{c}' is not a Crockford base32 digit.", nameof(payload));
            remainder = (remainder * 32 + digit) % 37;
        }
        return CheckAlphabet[remainder];
    }

    /// <summary>A new random code whose check symbol is a letter or digit, so every code stays easy to type.</summary>
    public static string NewCode()
    {
        Span<char> payload = stackalloc char[PayloadLength];
        while (true)
        {
            for (var i = 0; i < payload.Length; i++) payload[i] = Alphabet[RandomNumberGenerator.GetInt32(32)];
            var text = new string(payload);
            var check = CheckSymbol(text);
            if (Alphabet.Contains(check)) return Format(text, check);
        }
    }

    public static KitCodeParse Parse(string? input)
    {
        if (string.IsNullOrWhiteSpace(input)) return KitCodeParse.Malformed("A kit code is required.");
        var cleaned = new StringBuilder();
        foreach (var raw in input.Trim().ToUpperInvariant())
        {
            if (raw is '-' or ' ') continue;
            // Crockford decoding: O reads as zero, I and L as one.
            cleaned.Append(raw switch { 'O' => '0', 'I' or 'L' => '1', _ => raw });
        }
        var text = cleaned.ToString();
        if (text.Length != PayloadLength + 1)
            return KitCodeParse.Malformed($"A kit code has {PayloadLength} characters and a check character, like 7KQ4-M2XD-H.");
        var payload = text[..PayloadLength];
        if (payload.Any(c => !Alphabet.Contains(c)) || !CheckAlphabet.Contains(text[^1]))
            return KitCodeParse.Malformed("This code has characters that never appear in kit codes.");
        var expected = CheckSymbol(payload);
        return expected == text[^1]
            ? KitCodeParse.Valid(Format(payload, expected))
            : KitCodeParse.Mistyped();
    }

    private static string Format(string payload, char check) => $"{payload[..4]}-{payload[4..]}-{check}";
}

public sealed record KitCodeParse(bool IsValid, string? Code, string? Error)
{
    public const string MistypedMessage = "This code looks mistyped (check character). Please compare it with the kit label.";
    public static KitCodeParse Valid(string code) => new(true, code, null);
    public static KitCodeParse Mistyped() => new(false, null, MistypedMessage);
    public static KitCodeParse Malformed(string error) => new(false, null, error);
}
