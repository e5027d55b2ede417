using CommunityLead.Rules.Households;
using static CommunityLead.Tests.Features.Letters.Composing.LetterCases;

namespace CommunityLead.Tests.Features.Letters.Composing;

/// <summary>The greeting names the household; a staff member from the settings signs after the closing line.</summary>
public class LetterGreetingTests
{
    [Fact]
    public void Compose_EnglishLetter_GreetsByNameAndStaffSigns()
    {
        var letter = Low.Compose();

        Assert.Equal("Dear Ana Quill,", letter.Greeting);
        Assert.Equal(new("Sincerely,", "Dana Whitfield", "Program Coordinator"), letter.Signature);
    }

    [Fact]
    public void Compose_SpanishLetter_WarmGreetingThatGuessesNoGenderAndSpanishTitle()
    {
        var letter = (Low with { To = new("José Ángel Muñoz Peña", "Calle Cedro 1187", null, "Brindle Cove", "TC", "00002") })
            .Compose(LetterLanguage.Es);

        // "Estimado"/"Estimada" would guess who reads the letter; a colon closes a Spanish salutation.
        Assert.Equal("Hola, José Ángel Muñoz Peña:", letter.Greeting);
        Assert.Equal(new("Atentamente,", "Dana Whitfield", "Coordinación del programa"), letter.Signature);
    }

    [Fact]
    public void Compose_NoSpanishTitleSet_UsesTheTitleAsWritten()
    {
        var letter = (Low with { Sender = LongNames }).Compose(LetterLanguage.Es);

        Assert.Equal(new("Atentamente,", "Dana Whitfield-Okonkwo", "Community Lead Testing Program Coordinator"), letter.Signature);
    }

    [Theory]
    [InlineData(LetterLanguage.En, "The Brindle Cove Tap Check team")]
    [InlineData(LetterLanguage.Es, "El equipo de Brindle Cove Tap Check")]
    public void Compose_NoStaffInTheSettings_TheProgramsTeamSigns(LetterLanguage language, string name)
    {
        var letter = (Low with { Sender = Settings with { StaffName = " ", StaffTitle = null, StaffTitleEs = null } }).Compose(language);

        Assert.Equal(name, letter.Signature!.Name);
        Assert.Null(letter.Signature.Title);
    }

    [Theory]
    [InlineData(LetterLanguage.En, "Hello,")]
    [InlineData(LetterLanguage.Es, "Hola:")]
    public void Compose_BlankName_PlainHello(LetterLanguage language, string greeting)
    {
        var letter = (Low with { To = Ana with { Name = "  " } }).Compose(language);

        Assert.Equal(greeting, letter.Greeting);
    }

    [Fact]
    public void Compose_EveryLetterKind_HasGreetingAndSignature()
    {
        foreach (var @case in English)
            foreach (var language in new[] { LetterLanguage.En, LetterLanguage.Es })
            {
                var letter = @case.Compose(language);
                Assert.False(string.IsNullOrWhiteSpace(letter.Greeting), @case.Name);
                Assert.NotNull(letter.Signature);
            }
    }
}
