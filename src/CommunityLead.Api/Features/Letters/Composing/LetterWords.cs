using CommunityLead.Rules.Interpretation;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>
/// The letter's own wording, in English and in Spanish written for the household (usted, plain, warm; the same
/// content rather than a word-for-word copy). What the results mean comes from the interpretation's messages.
/// </summary>
internal static class LetterWords
{
    public static readonly Phrase MeaningHeading = new("What your results mean", "Qué significan sus resultados");
    public static readonly Phrase RetestHeading = new("Why we ask you to test again", "Por qué le pedimos repetir la prueba");
    public static readonly Phrase StepsHeading = new("What to do now", "Qué hacer ahora");
    public static readonly Phrase CautionsHeading = new("Keep in mind", "Tenga en cuenta");
    public static readonly Phrase WhoToCallHeading = new("Who to call", "A quién llamar");

    public static readonly Phrase KitCode = new("Kit code", "Código del kit");
    public static readonly Phrase CollectedOn = new("Date collected", "Fecha de la muestra");
    public static readonly Phrase TestKind = new("Test", "Prueba");
    public static readonly Phrase SoilTest = new("Soil test", "Prueba de la tierra");
    public static readonly Phrase Phone = new("Phone", "Teléfono");
    public static readonly Phrase Email = new("Email", "Correo electrónico");

    public static readonly Phrase[] TableHeaders =
        [new("Sample", "Muestra"), new("Test", "Análisis"), new("Result", "Resultado"), new("Compared with", "Comparado con")];

    public static readonly Phrase Corrected = new(
        "An earlier letter from us had a result that the lab has since corrected. This letter replaces that one. Please use the results in this letter.",
        "En una carta anterior le enviamos un resultado que el laboratorio corrigió después. Esta carta reemplaza a la anterior, así que le pedimos que se guíe por los resultados que aparecen aquí.");

    public static Phrase Title(LetterKind kind, bool soil) => (kind, soil) switch
    {
        (LetterKind.Retest, false) => new("Please test your water again", "Por favor, vuelva a hacer la prueba de su agua"),
        (LetterKind.Retest, true) => new("We need new soil samples", "Necesitamos tomar nuevas muestras de tierra"),
        (LetterKind.Corrected, false) => new("Corrected results for your water test", "Resultados corregidos de la prueba de su agua"),
        (LetterKind.Corrected, true) => new("Corrected results for your soil test", "Resultados corregidos de la prueba de la tierra de su patio"),
        (_, false) => new("Your water test results", "Resultados de la prueba de su agua"),
        (_, true) => new("Your soil test results", "Resultados de la prueba de la tierra de su patio"),
    };

    // Two short sentences: a profile's name is often long ("World Health Organization guideline values"), and
    // the plain words around it keep the note readable.
    public static Phrase TableNote(string profileName) => new(
        $"Each result is compared with the level next to it. These levels come from: {profileName}.",
        $"Cada resultado se compara con el nivel que aparece a su lado. Estos niveles provienen de: {profileName}.");

    /// <summary>
    /// "Dear Ana Quill," and "Hola, Ana Quill:". Spanish letters open with a colon; "Estimado" or "Estimada" would
    /// have to guess who reads the letter, and "Hola" is warm without guessing. No name: a plain hello.
    /// </summary>
    public static Phrase Greeting(string name) => string.IsNullOrWhiteSpace(name)
        ? new("Hello,", "Hola:")
        : new($"Dear {name.Trim()},", $"Hola, {name.Trim()}:");

    public static readonly Phrase SignOff = new("Sincerely,", "Atentamente,");

    /// <summary>Who signs when the settings name nobody: the program's team.</summary>
    public static Phrase Team(string programName) => new($"The {programName} team", $"El equipo de {programName}");

    /// <summary>Under the scales when an axis is broken: the bar is drawn with "//" where it breaks.</summary>
    public static readonly Phrase ScaleBreakNote = new(
        "A bar with // is cut there so a very high result fits. After the cut, the bar is not drawn to size.",
        "Una barra con // está cortada ahí para que quepa un resultado muy alto. Después del corte, la barra no está a escala.");

    /// <summary>
    /// Where the household can see its result online. "{secret}" stays a placeholder in the stored letter: the
    /// layout fills it at each rendering (ResultSecrets), so no secret is ever stored in plain text.
    /// </summary>
    public static Phrase Online(string address, string kitCode) => new(
        $"You can also see this result on a phone. Go to {address}. Type the kit code {kitCode} and the secret code {{secret}}. Keep this letter. The secret code is only here.",
        $"Puede ver el resultado en su celular. Vaya a {address}. Ponga el código {kitCode} y la clave {{secret}}. Guarde esta carta. La clave solo está aquí.");

    public static Phrase Footer(string programName, string kitCode) =>
        new($"{programName} · Kit code {kitCode}", $"{programName} · Código del kit {kitCode}");
}
