using CommunityLead.Rules.Kits;

namespace CommunityLead.Tests.Rules.Kits;

// Crockford, "Base32" (https://www.crockford.com/base32.html): 37 is prime and larger than 32, so a mod-37
// check symbol catches every single wrong symbol and every swap of two neighbouring symbols.
public class KitCodeErrorDetectionTests
{
    public static TheoryData<string> Codes => [.. CrockfordReference.ValidCodes()];

    [Theory]
    [MemberData(nameof(Codes))]
    [InlineData("0000-0012-$")]
    [InlineData("0000-0014-U")]
    public void Parse_EverySingleSubstitution_IsMistyped(string code)
    {
        var compact = CrockfordReference.Compact(code);
        Assert.True(KitCode.Parse(compact).IsValid, code);
        for (var position = 0; position < compact.Length; position++)
        {
            var replacements = position < KitCode.PayloadLength
                ? CrockfordReference.Symbols
                : CrockfordReference.Symbols + CrockfordReference.CheckOnlySymbols;
            foreach (var symbol in replacements.Where(s => s != compact[position]))
            {
                var typo = compact[..position] + symbol + compact[(position + 1)..];
                var parsed = KitCode.Parse(typo);
                Assert.False(parsed.IsValid, $"{typo} (from {code}) was accepted");
                Assert.Equal(KitCodeParse.MistypedMessage, parsed.Error);
            }
        }
    }

    [Theory]
    [MemberData(nameof(Codes))]
    public void Parse_EveryAdjacentTransposition_IsMistyped(string code)
    {
        var compact = CrockfordReference.Compact(code);
        Assert.True(KitCode.Parse(compact).IsValid, code);
        for (var i = 0; i + 1 < compact.Length; i++)
        {
            if (compact[i] == compact[i + 1]) continue;
            var chars = compact.ToCharArray();
            (chars[i], chars[i + 1]) = (chars[i + 1], chars[i]);
            var parsed = KitCode.Parse(new string(chars));
            Assert.False(parsed.IsValid, $"{new string(chars)} (from {code}) was accepted");
            Assert.Equal(KitCodeParse.MistypedMessage, parsed.Error);
        }
    }
}
