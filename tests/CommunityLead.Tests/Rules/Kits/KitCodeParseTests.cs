using System.Text.RegularExpressions;
using CommunityLead.Rules.Kits;

namespace CommunityLead.Tests.Rules.Kits;

// Decoding rules from Douglas Crockford, "Base32" (https://www.crockford.com/base32.html):
// case-insensitive, hyphens ignored, O read as 0, I and L read as 1.
public class KitCodeParseTests
{
    [Theory]
    [InlineData("7KQ4-M2XD-H", "7KQ4-M2XD-H")]
    [InlineData("7kq4-m2xd-h", "7KQ4-M2XD-H")]
    [InlineData("7KQ4M2XDH", "7KQ4-M2XD-H")]
    [InlineData("  7kq4m2xd-h ", "7KQ4-M2XD-H")]
    [InlineData("7-K-Q-4-M-2-X-D-H", "7KQ4-M2XD-H")]
    [InlineData("10A0-1B01-0", "10A0-1B01-0")]
    [InlineData("IOA0-LBOi-o", "10A0-1B01-0")]
    [InlineData("lOa0ib0lO", "10A0-1B01-0")]
    [InlineData("dead-beef-r", "DEAD-BEEF-R")]
    public void Parse_AcceptedSpelling_ReturnsCanonicalCode(string input, string expected)
    {
        var parsed = KitCode.Parse(input);
        Assert.True(parsed.IsValid, parsed.Error);
        Assert.Equal(expected, parsed.Code);
        Assert.Null(parsed.Error);
    }

    // Payloads 00000010..00000014 have values 32..36, so their check symbols are the check-only ones.
    [Theory]
    [InlineData("0000-0010-*")]
    [InlineData("0000-0011-~")]
    [InlineData("0000-0012-$")]
    [InlineData("0000-0013-=")]
    [InlineData("0000-0014-U")]
    [InlineData("0000-0014-u")]
    public void Parse_CheckOnlySymbol_IsAccepted(string input)
    {
        var parsed = KitCode.Parse(input);
        Assert.True(parsed.IsValid, parsed.Error);
        Assert.Equal(input.ToUpperInvariant(), parsed.Code);
    }

    [Theory]
    [InlineData(null)]
    [InlineData("")]
    [InlineData("   ")]
    [InlineData("7KQ4")]
    [InlineData("7KQ4-M2XD")]
    [InlineData("7KQ4-M2XD-HH")]
    [InlineData("7KQ4-M2X!-H")]
    [InlineData("7KQ4-M2XD-!")]
    [InlineData("7KQ4-M2XU-H")]
    [InlineData("7KQ4_M2XD_H")]
    [InlineData("7KQ4-M2XÉ-H")]
    public void Parse_MalformedInput_IsInvalidButNotMistyped(string? input)
    {
        var parsed = KitCode.Parse(input);
        Assert.False(parsed.IsValid);
        Assert.Null(parsed.Code);
        Assert.False(string.IsNullOrWhiteSpace(parsed.Error));
        Assert.NotEqual(KitCodeParse.MistypedMessage, parsed.Error);
        Assert.DoesNotContain("mistyped", parsed.Error, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Parse_WrongLength_ExampleInMessageIsItselfValid()
    {
        var error = KitCode.Parse("7KQ4").Error!;
        var example = Regex.Match(error, @"like (\S+)\.$").Groups[1].Value;
        Assert.True(KitCode.Parse(example).IsValid, $"the example '{example}' shown to people fails its own check");
    }

    [Fact]
    public void Parse_WrongCheckCharacter_SaysMistypedCheckCharacter()
    {
        var parsed = KitCode.Parse("7KQ4-M2XD-J");
        Assert.False(parsed.IsValid);
        Assert.Null(parsed.Code);
        Assert.Contains("mistyped (check character)", parsed.Error);
    }
}
