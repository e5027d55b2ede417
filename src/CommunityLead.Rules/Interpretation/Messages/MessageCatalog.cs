using System.Reflection;

namespace CommunityLead.Rules.Interpretation;

/// <summary>
/// Every message a household can get, in English (at or below 8th grade, checked by a test) and in Spanish
/// written for the household (usted, plain and warm, the same content rather than a word-for-word copy).
/// Codes are stable: letters, the API and tests refer to them. Numbered steps ("step.*") are numbered by the
/// letter, in the order the interpreter lists them.
/// </summary>
public static partial class MessageCatalog
{
    /// <summary>
    /// All templates, found by reflection so a new one can't be left out of the checks. Lazy: static fields spread
    /// over partial files have no defined initialisation order, so they are read only once all are set.
    /// </summary>
    public static IReadOnlyList<MessageTemplate> All => all.Value;

    /// <summary>
    /// Which messages a letter was written with: the first 12 hex digits of the SHA-256 of every code and its two
    /// texts, in code order. Any change of a word gives a new version without anyone remembering to raise a
    /// number. Letters record the API's WordingCatalogue.Version, which also covers the letter's own words; the
    /// exported catalogue carries both.
    /// </summary>
    public static string Version => version.Value;

    public const int VersionLength = 12;

    private static readonly Lazy<string> version = new(() =>
    {
        var text = string.Join("\n", All.OrderBy(t => t.Code, StringComparer.Ordinal).Select(t => $"{t.Code}\t{t.En}\t{t.Es}"));
        return Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(text)))[..VersionLength];
    });

    private static readonly Lazy<IReadOnlyList<MessageTemplate>> all = new(() =>
        [.. typeof(MessageCatalog).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.FieldType == typeof(MessageTemplate))
            .Select(f => (MessageTemplate)f.GetValue(null)!)]);

    // What the kit shows overall, by band. Water and soil differ; retest is shared.
    public static readonly MessageTemplate WaterNotDetected = new("summary.water.not-detected",
        "The lab did not find lead in your water samples.",
        "El laboratorio no encontró plomo en sus muestras de agua.");

    /// <summary>Lead found, below every level: "below the action level", never "low" as if that were safe.</summary>
    public static readonly MessageTemplate WaterLow = new("summary.water.low",
        "The lab found some lead in your water. Each lead result is below the action level. Below the action level does not mean safe, so the steps below still help.",
        "El laboratorio encontró algo de plomo en su agua. Cada resultado de plomo está por debajo del nivel de acción. Eso no quiere decir que sea seguro, así que le conviene seguir los pasos de abajo.");

    public static readonly MessageTemplate WaterAdvisory = new("summary.water.advisory",
        "At least one result is at or above our caution level. It is below the action level. Please take the steps below.",
        "Al menos un resultado llega a nuestro nivel de precaución o lo supera, aunque no alcanza el nivel de acción. Le pedimos que siga los pasos de abajo.");

    public static readonly MessageTemplate WaterCannotTell = new("summary.water.cannot-tell",
        "The lab test could not measure lead low enough to compare with our level. Please take the steps below. We will call you about a new test.",
        "La prueba del laboratorio no pudo medir el plomo tan bajo como para compararlo con nuestro nivel. Por favor, siga los pasos de abajo. Le llamaremos para hacer una nueva prueba.");

    public static readonly MessageTemplate WaterAction = new("summary.water.action",
        "At least one lead result is at or above the action level. Please start the steps below today. We will call you to offer help.",
        "Al menos un resultado de plomo llega al nivel de acción o lo supera. Por favor, empiece hoy mismo con los pasos de abajo. Le vamos a llamar para ofrecerle ayuda.");

    /// <summary>One plan for an urgent result: bottled water, no filter and no running the tap, until a new test.</summary>
    public static readonly MessageTemplate WaterUrgent = new("summary.water.urgent",
        "At least one lead result is very high. Do not drink your tap water or use it for cooking or baby formula. Use bottled water for these until a new test shows the lead is lower. We will call you soon.",
        "Al menos un resultado de plomo es muy alto. No beba el agua del grifo ni la use para cocinar o preparar la fórmula del bebé. Use agua embotellada para todo eso hasta que una nueva prueba muestre que el plomo bajó. Le vamos a llamar muy pronto.");

    /// <summary>Copper at or above its action level: copper's own plan (DOMAIN.md §6), whatever lead showed.</summary>
    public static readonly MessageTemplate WaterCopperAction = new("summary.water.copper-action",
        "Copper in your water is at or above the action level for copper. The steps below help you drink less copper.",
        "El cobre de su agua llega al nivel de acción para el cobre o lo supera. Los pasos de abajo le ayudan a tomar menos cobre.");

    public static readonly MessageTemplate SoilNotDetected = new("summary.soil.not-detected",
        "The test did not find lead in your soil samples.",
        "La prueba no encontró plomo en sus muestras de tierra.");

    public static readonly MessageTemplate SoilLow = new("summary.soil.low",
        "Lead in your soil is below the levels we use, in each place a sample was taken.",
        "El plomo en su tierra está por debajo de los niveles que usamos, en cada lugar donde se tomó una muestra.");

    /// <summary>Above the EPA residential screening level but below the federal hazard standard for the place.</summary>
    public static readonly MessageTemplate SoilAboveScreening = new("summary.soil.above-screening",
        "Lead in at least one part of your yard is above the EPA screening level for homes. That is where EPA says to look closer and act to protect children. Please take the steps below.",
        "En al menos una parte de su patio, el plomo supera el nivel de evaluación de la EPA para viviendas. A partir de ese nivel, la EPA pide revisar más de cerca y proteger a los niños. Le pedimos que siga los pasos de abajo.");

    public static readonly MessageTemplate SoilInconclusive = new("summary.soil.inconclusive",
        "At least one soil result is too close to its level for us to be sure. We will check it with a lab test. Until then, please take the steps below.",
        "Al menos un resultado de tierra está tan cerca de su nivel que no podemos estar seguros. Lo vamos a comprobar con un análisis de laboratorio. Mientras tanto, le pedimos que siga los pasos de abajo.");

    public static readonly MessageTemplate SoilAbove = new("summary.soil.above",
        "Lead in at least one part of your yard is at or above the level for that place. Please take the steps below. We will call you to offer help.",
        "En al menos una parte de su patio, el plomo llega al nivel de ese lugar o lo supera. Le pedimos que siga los pasos de abajo. Le vamos a llamar para ofrecerle ayuda.");

    public static readonly MessageTemplate Retest = new("summary.retest",
        "We cannot rely on this sample, so we ask you to test again.",
        "No podemos confiar en esta muestra, así que le pedimos que repita la prueba.");

    /// <summary>
    /// A sample to be taken again that already reached a level, after water stood too short a time: short standing
    /// biases lead low (DOMAIN.md §6 [practice]), so the result is shown and the precautions start now.
    /// </summary>
    public static readonly MessageTemplate RetestHighShortStanding = new("retest.high-short-standing",
        "Even so, a result below is already at or above a level. Water that sat less than 6 hours often shows less lead than is really there. So your real level is likely as high or higher. Please start the steps below now, and test again.",
        "Aun así, un resultado de abajo ya llega a un nivel o lo supera. El agua que estuvo menos de 6 horas sin usar suele mostrar menos plomo del que hay en realidad. Así que es probable que su nivel real sea igual o más alto. Por favor, empiece ya con los pasos de abajo y repita la prueba.");

    /// <summary>The same for a sample doubted for another reason (holding time, the lab's QC): the bias may go either way.</summary>
    public static readonly MessageTemplate RetestHighOther = new("retest.high-other",
        "Even so, a result below is already at or above a level. The real level could be higher or lower. To be safe, please start the steps below now, and test again.",
        "Aun así, un resultado de abajo ya llega a un nivel o lo supera. El nivel real podría ser más alto o más bajo. Para estar seguros, por favor empiece ya con los pasos de abajo y repita la prueba.");

    public static readonly MessageTemplate Corrected = new("letter.corrected",
        "We found a mistake in a result we sent you before. This letter has the corrected result. Please use this one.",
        "Encontramos un error en un resultado que le enviamos antes. Esta carta trae el resultado corregido; por favor, tome en cuenta este.");

    // The closing every interpretation ends with. Well owners have no utility, so theirs names the health department.
    public static readonly MessageTemplate ClosingPublic = new("closing.public",
        "This letter is not medical advice. Follow what your local health department and your water utility tell you. Also follow what licensed professionals, such as plumbers, tell you.",
        "Esta carta no es un consejo médico. Siga las indicaciones de su departamento de salud local y de su compañía de agua, y también las de profesionales con licencia, como los plomeros.");

    /// <summary>A soil letter names no water utility, service line or plumber: its professionals are lead-safe contractors.</summary>
    public static readonly MessageTemplate ClosingSoil = new("closing.soil",
        "This letter is not medical advice. Follow what your local health department tells you. Also follow what licensed experts tell you, such as lead-safe contractors.",
        "Esta carta no es un consejo médico. Siga las indicaciones de su departamento de salud local, y también las de profesionales con licencia, como los contratistas certificados en trabajo seguro con plomo.");

    public static readonly MessageTemplate ClosingWell = new("closing.well",
        "This letter is not medical advice. Follow what your local health department tells you. Also follow what licensed professionals, such as plumbers and well contractors, tell you.",
        "Esta carta no es un consejo médico. Siga las indicaciones de su departamento de salud local, y también las de profesionales con licencia, como los plomeros y los técnicos de pozos.");
}
