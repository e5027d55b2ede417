using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>A letter holds its own household's data and nobody else's.</summary>
public class LetterPrivacyTests
{
    [Fact]
    public void Compose_TwoHouseholds_NeitherLetterHoldsTheOthersData()
    {
        var ana = ActionWithChild with { To = Ana, KitCode = "7KQ4-M2XD-H" };
        var bo = Low with { To = Bo, KitCode = "3MZR-8PQT-5" };

        var anaText = LetterText.Joined(ana.Compose());
        var boText = LetterText.Joined(bo.Compose());

        Assert.Contains(Ana.Name, anaText);
        Assert.Contains(Bo.Name, boText);
        foreach (var other in new[] { Bo.Name, Bo.Line1, bo.KitCode, "2.1 µg/L" }) Assert.DoesNotContain(other, anaText);
        foreach (var other in new[] { Ana.Name, Ana.Line1, Ana.Line2!, ana.KitCode, "12.4 µg/L" }) Assert.DoesNotContain(other, boText);
    }
}
