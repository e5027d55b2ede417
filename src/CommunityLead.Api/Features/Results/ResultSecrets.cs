using System.Security.Cryptography;
using System.Text;
using Microsoft.Extensions.Options;

namespace CommunityLead.Api.Features.Results;

/// <summary>
/// The per-kit secret printed on a household's letter beside its kit code. Derived (HMAC-SHA256 of the code under
/// the ResultAccess:SecretKey setting), so a stored letter renders again to the same bytes without the secret being
/// stored anywhere; the kit keeps only its SHA-256 hash, set when its first letter is issued, which is what a
/// lookup is checked against. Ten Crockford base32 characters: 50 bits, far beyond the rate limit's reach.
/// </summary>
public sealed class ResultSecrets(IOptions<ResultAccessOptions> options)
{
    private const string Alphabet = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
    private const int Length = 10;

    public bool Enabled => options.Value.Enabled;

    public string? PageAddress => options.Value.PageAddress;

    /// <summary>"K7QD2-M9XAT": two groups of five, easy to read out and type on a phone.</summary>
    public string For(string kitCode)
    {
        var mac = HMACSHA256.HashData(Encoding.UTF8.GetBytes(options.Value.SecretKey!), Encoding.UTF8.GetBytes(kitCode));
        var chars = new char[Length];
        ulong bits = BitConverter.ToUInt64(mac, 0);
        for (var i = 0; i < Length; i++, bits >>= 5) chars[i] = Alphabet[(int)(bits & 31)];
        return $"{new string(chars, 0, 5)}-{new string(chars, 5, 5)}";
    }

    public static string Hash(string secret) => Convert.ToHexStringLower(SHA256.HashData(Encoding.ASCII.GetBytes(Normalize(secret))));

    /// <summary>Compared in constant time; a kit without a stored hash (no letter yet) matches nothing.</summary>
    public static bool Matches(string presented, string? storedHash)
    {
        var given = Encoding.ASCII.GetBytes(Hash(presented));
        var stored = Encoding.ASCII.GetBytes(storedHash ?? new string('-', given.Length));
        return CryptographicOperations.FixedTimeEquals(given, stored) && storedHash is not null;
    }

    /// <summary>As typed on a phone: any case, with or without the hyphen or spaces; O and I/L read as 0 and 1.</summary>
    public static string Normalize(string typed)
    {
        var kept = typed.ToUpperInvariant().Where(char.IsAsciiLetterOrDigit)
            .Select(c => c switch { 'O' => '0', 'I' or 'L' => '1', _ => c }).ToArray();
        return kept.Length == Length ? $"{new string(kept, 0, 5)}-{new string(kept, 5, 5)}" : new string(kept);
    }
}
