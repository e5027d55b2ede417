using System.Numerics;

namespace CommunityLead.Tests.Rules.Kits;

/// <summary>
/// An independent rendering of Douglas Crockford, "Base32" (https://www.crockford.com/base32.html):
/// the symbols are written out here rather than taken from KitCode, and the check symbol is computed
/// from the whole number with BigInteger instead of KitCode's running remainder.
/// </summary>
internal static class CrockfordReference
{
    // Values 0..31, in order; I, L, O and U are left out.
    public const string Symbols = "0123456789ABCDEFGHJKMNPQRSTVWXYZ";
    // Values 32..36 are check symbols only.
    public const string CheckOnlySymbols = "*~$=U";

    public static BigInteger Value(string payload)
    {
        var value = BigInteger.Zero;
        for (var i = 0; i < payload.Length; i++)
        {
            var digit = Symbols.IndexOf(payload[i], StringComparison.Ordinal);
            if (digit < 0) throw new ArgumentException($"'{payload[i]}' is not a base32 symbol.", nameof(payload));
            value += digit * BigInteger.Pow(32, payload.Length - 1 - i);
        }
        return value;
    }

    public static char Check(string payload) => (Symbols + CheckOnlySymbols)[(int)(Value(payload) % 37)];

    public static string Compact(string code) => code.Replace("-", "", StringComparison.Ordinal);

    public static IEnumerable<string> ValidCodes()
    {
        foreach (var payload in new[] { "7KQ4M2XD", "10A01B01", "ZZZZZZZZ", "DEADBEEF", "S0000000" })
            yield return $"{payload[..4]}-{payload[4..]}-{Check(payload)}";
        // Seeded, so test discovery and test runs see the same codes; checks kept alphanumeric like NewCode's.
        var random = new Random(37);
        for (var found = 0; found < 40;)
        {
            var payload = new string([.. Enumerable.Range(0, 8).Select(_ => Symbols[random.Next(32)])]);
            if (Symbols.Contains(Check(payload)))
            {
                found++;
                yield return $"{payload[..4]}-{payload[4..]}-{Check(payload)}";
            }
        }
    }
}
