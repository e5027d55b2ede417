using CommunityLead.Rules.Kits;

namespace CommunityLead.Tests.Rules.Kits;

// Checks against the published definition: Douglas Crockford, "Base32", https://www.crockford.com/base32.html
public class KitCodeCheckSymbolTests
{
    [Fact]
    public void Alphabet_IsCrockfordBase32_WithoutILOU()
    {
        Assert.Equal("0123456789ABCDEFGHJKMNPQRSTVWXYZ", KitCode.Alphabet);
        Assert.Equal(32, KitCode.Alphabet.Distinct().Count());
        Assert.DoesNotContain(KitCode.Alphabet, c => c is 'I' or 'L' or 'O' or 'U');
    }

    [Fact]
    public void CheckAlphabet_ValuesThirtyTwoToThirtySix_AreStarTildeDollarEqualsU()
    {
        Assert.Equal(37, KitCode.CheckAlphabet.Length);
        Assert.Equal("*~$=U", KitCode.CheckAlphabet[32..]);
    }

    // Worked by hand (symbol values: 0-9, A=10 ... H=17, J=18, K=19, M=20, N=21, P=22 ... Z=31):
    //   "00000001" → 1                         → 1 mod 37 = 1   → '1'
    //   "0000000Z" → 31                        → 31             → 'Z'
    //   "00000010" → 1·32 = 32                 → 32             → '*'
    //   "00000014" → 32 + 4 = 36               → 36             → 'U'
    //   "00000015" → 37                        → 0              → '0'
    //   "0000001A" → 32 + 10 = 42              → 5              → '5'
    //   "00000100" → 32² = 1024 = 27·37 + 25   → 25             → 'S'
    //   "ZZZZZZZZ" → 32⁸ − 1; 32 ≡ −5, 32² ≡ 25, 32⁴ ≡ 625 ≡ −4, 32⁸ ≡ 16 (mod 37) → 15 → 'F'
    [Theory]
    [InlineData("00000000", '0')]
    [InlineData("00000001", '1')]
    [InlineData("0000000Z", 'Z')]
    [InlineData("00000010", '*')]
    [InlineData("00000011", '~')]
    [InlineData("00000012", '$')]
    [InlineData("00000013", '=')]
    [InlineData("00000014", 'U')]
    [InlineData("00000015", '0')]
    [InlineData("0000001A", '5')]
    [InlineData("00000100", 'S')]
    [InlineData("ZZZZZZZZ", 'F')]
    public void CheckSymbol_HandWorkedPayload_MatchesValueMod37(string payload, char expected)
    {
        Assert.Equal(expected, KitCode.CheckSymbol(payload));
        Assert.Equal(expected, CrockfordReference.Check(payload));
    }

    [Fact]
    public void CheckSymbol_RandomPayloads_MatchesBigIntegerValueMod37()
    {
        var random = new Random(20260403);
        for (var n = 0; n < 2000; n++)
        {
            var payload = new string([.. Enumerable.Range(0, KitCode.PayloadLength)
                .Select(_ => CrockfordReference.Symbols[random.Next(32)])]);
            Assert.Equal(CrockfordReference.Check(payload), KitCode.CheckSymbol(payload));
        }
    }

    [Theory]
    [InlineData("0000000U")]
    [InlineData("0000000I")]
    [InlineData("0000000o")]
    [InlineData("0000-000")]
    public void CheckSymbol_NonCanonicalSymbol_Throws(string payload) =>
        Assert.Throws<ArgumentException>(() => KitCode.CheckSymbol(payload));
}
