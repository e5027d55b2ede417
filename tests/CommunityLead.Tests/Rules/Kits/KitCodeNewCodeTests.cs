using System.Text.RegularExpressions;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Tests.Rules.Kits;

public class KitCodeNewCodeTests
{
    private static readonly Regex Canonical = new("^[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]$");

    // If the generator kept codes whose check is one of * ~ $ = U, about 5 in 37 would have one;
    // the chance that 2,000 codes show none by luck is (32/37)^2000, below 1e-120.
    private static readonly string[] Codes = [.. Enumerable.Range(0, 2000).Select(_ => KitCode.NewCode())];

    [Fact]
    public void NewCode_Always_HasCanonicalShape()
    {
        foreach (var code in Codes) Assert.Matches(Canonical, code);
    }

    [Fact]
    public void NewCode_Always_ParsesBackValidAndUnchanged()
    {
        foreach (var code in Codes)
        {
            var parsed = KitCode.Parse(code);
            Assert.True(parsed.IsValid, code);
            Assert.Equal(code, parsed.Code);
            Assert.Null(parsed.Error);
        }
    }

    [Fact]
    public void NewCode_CheckCharacter_IsAlwaysLetterOrDigitAndCorrect()
    {
        foreach (var code in Codes)
        {
            var compact = CrockfordReference.Compact(code);
            Assert.True(char.IsAsciiLetterOrDigit(code[^1]), code);
            Assert.DoesNotContain(code[^1], CrockfordReference.CheckOnlySymbols);
            // Crockford, "Base32": the check symbol is the whole number mod 37.
            Assert.Equal(CrockfordReference.Check(compact[..8]), code[^1]);
        }
    }

    [Fact]
    public void NewCode_ManyCalls_AreNotRepeated()
    {
        // 32^8 ≈ 1.1e12 payloads; a repeat among 2,000 would mean the randomness is broken.
        Assert.Equal(Codes.Length, Codes.Distinct().Count());
    }
}
