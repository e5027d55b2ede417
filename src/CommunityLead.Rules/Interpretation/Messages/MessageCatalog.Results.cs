namespace CommunityLead.Rules.Interpretation;

// One line per water result. {bottle} names the bottle as the subject of a sentence ("The first bottle"); {metal} is lead or copper;
// {result}, {level} and {rl} (the reporting limit) carry their units.
public static partial class MessageCatalog
{
    public static readonly MessageTemplate ResultNotDetected = new("result.not-detected",
        "{bottle} had no {metal} that the lab could find. Its test can find {rl} or more.",
        "{bottle} no tenía {metal} que el laboratorio pudiera detectar. Su prueba detecta a partir de {rl}.");

    /// <summary>A result with no level to compare it with in the profile.</summary>
    public static readonly MessageTemplate ResultMeasured = new("result.measured",
        "{bottle} had {result} of {metal} in it. We have no level to compare this with.",
        "{bottle} tenía {result} de {metal}. No tenemos un nivel con el cual compararlo.");

    /// <summary>
    /// Detected but below the action level ({level} is the action level). Never "low": a detected lead value is not
    /// safe, only under the level at which a water system must act (DOMAIN.md §1: the health goal for lead is zero).
    /// </summary>
    public static readonly MessageTemplate ResultLow = new("result.low",
        "{bottle} had {result} of {metal} in it. The action level is {level}. This is below it.",
        "{bottle} tenía {result} de {metal}. El nivel de acción es de {level}. Este resultado está por debajo.");

    /// <summary>Detected, below the only level the profile has for this metal, which is not an action level.</summary>
    public static readonly MessageTemplate ResultBelowLevel = new("result.below-level",
        "{bottle} had {result} of {metal} in it. Our level for {metal} is {level}. This is below it.",
        "{bottle} tenía {result} de {metal}. Nuestro nivel para el {metal} es de {level}. Este resultado está por debajo.");

    public static readonly MessageTemplate ResultAdvisory = new("result.advisory",
        "{bottle} had {result} of {metal} in it. Our caution level is {level}. This is at or above that level.",
        "{bottle} tenía {result} de {metal}. Nuestro nivel de precaución es de {level}, y este resultado lo alcanza o lo supera.");

    public static readonly MessageTemplate ResultAction = new("result.action",
        "{bottle} had {result} of {metal} in it. The action level is {level}. This is at or above that level.",
        "{bottle} tenía {result} de {metal}. El nivel de acción es de {level}, y este resultado lo alcanza o lo supera.");

    /// <summary>
    /// Both levels, so the table's "urgent level" and the text's action level never seem to disagree: the action
    /// level is the rule's, the urgent level is the program's own choice for calling at once.
    /// </summary>
    public static readonly MessageTemplate ResultUrgent = new("result.urgent",
        "{bottle} had {result} of lead in it. The action level is {level}. We call a result urgent at {urgent} or more. This result is that high.",
        "{bottle} tenía {result} de plomo. El nivel de acción es de {level}. Nosotros llamamos urgente a un resultado de {urgent} o más, y este resultado llega a ese nivel.");

    /// <summary>The lab can't measure low enough to show the water is under the level (e.g. a 1 µg/L school level).</summary>
    public static readonly MessageTemplate ReportingLimitAtLevel = new("result.reporting-limit-at-level",
        "The lab test can only find {metal} at {rl} or more. Our level is {level}. So we cannot tell if your water is below it.",
        "La prueba del laboratorio solo detecta el {metal} a partir de {rl}. Nuestro nivel es de {level}, así que no podemos saber si su agua está por debajo.");

    /// <summary>Copper at or above the taste and staining level (40 CFR 143.3): replaces the caution-level line.</summary>
    public static readonly MessageTemplate CopperTaste = new("copper.taste",
        "{bottle} had {result} of copper in it. At {level} or more, copper can give water a bitter, metal taste and leave blue-green stains. This level is about taste, not health.",
        "{bottle} tenía {result} de cobre. A partir de {level}, el cobre puede darle al agua un sabor amargo o metálico y dejar manchas de color verde azulado. Este nivel tiene que ver con el sabor, no con la salud.");

    /// <summary>Copper's own health words (EPA copper health information; 40 CFR 141 Subpart O, Appendix A): never lead advice.</summary>
    public static readonly MessageTemplate CopperHealth = new("copper.health",
        "Too much copper can upset the stomach. It can cause nausea, throwing up, or cramps. Over many years, it can harm the liver or kidneys. Babies are more sensitive to copper. So are people with Wilson's disease, who should ask their doctor. Copper most often comes from copper pipes in the home.",
        "El exceso de cobre puede causar malestar de estómago, con náuseas, vómitos o cólicos. Con los años, puede dañar el hígado o los riñones. Los bebés son más sensibles al cobre. También lo son las personas con la enfermedad de Wilson, que deben consultar a su médico. Por lo general, el cobre viene de las tuberías de cobre de la casa.");
}
