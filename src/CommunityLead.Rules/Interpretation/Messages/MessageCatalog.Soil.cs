namespace CommunityLead.Rules.Interpretation;

// One line per soil result. {location} is where the sample was taken, as a phrase after "soil" ("from the play area"); {margin} is the test's
// uncertainty as ±2 standard deviations (DOMAIN.md §5), with its unit.
public static partial class MessageCatalog
{
    public static readonly MessageTemplate SoilResultNotDetected = new("soil.not-detected",
        "Soil {location} had no lead that the test could find. The test can find {rl} or more.",
        "La muestra de tierra tomada {location} no tenía plomo que la prueba pudiera detectar. La prueba detecta a partir de {rl}.");

    public static readonly MessageTemplate SoilResultMeasured = new("soil.measured",
        "Soil {location} had {result} of lead. We have no level to compare this with.",
        "La muestra de tierra tomada {location} tenía {result} de plomo. No tenemos un nivel con el cual compararla.");

    public static readonly MessageTemplate SoilResultBelow = new("soil.below",
        "Soil {location} had {result} of lead. The level for this place is {level}. This is below that level.",
        "La muestra de tierra tomada {location} tenía {result} de plomo. El nivel para ese lugar es de {level}, y este resultado está por debajo.");

    /// <summary>Below the EPA residential screening level ({level}), itself below every hazard standard.</summary>
    public static readonly MessageTemplate SoilResultBelowScreening = new("soil.below-screening",
        "Soil {location} had {result} of lead. EPA says to look closer at home soil with {level} or more. This is below that.",
        "La muestra de tierra tomada {location} tenía {result} de plomo. La EPA pide revisar más de cerca la tierra de las viviendas con {level} o más. Este resultado está por debajo.");

    /// <summary>
    /// Above the EPA screening level ({level}) but below the federal hazard standard for the place ({hazard}): never
    /// "below that level" alone, which read as safe for 940 mg/kg under a roof edge (EPA 2024 guidance; 40 CFR 745.65).
    /// </summary>
    public static readonly MessageTemplate SoilResultAboveScreening = new("soil.above-screening",
        "Soil {location} had {result} of lead. EPA says to look closer at home soil with {level} or more. This is above that. The federal hazard level for this place is {hazard}. This is below it.",
        "La muestra de tierra tomada {location} tenía {result} de plomo. La EPA pide revisar más de cerca la tierra de las viviendas con {level} o más, y este resultado lo supera. El nivel federal de peligro para ese lugar es de {hazard}. Este resultado está por debajo.");

    /// <summary>Near the drip line, soil lead mostly comes from old exterior paint (DOMAIN.md §5 [practice]).</summary>
    public static readonly MessageTemplate SoilDripLinePaint = new("soil.drip-line-paint",
        "Soil under the edge of the roof often gets lead from old paint on the outside walls. Paint from before 1978 may have lead.",
        "La tierra bajo el borde del techo muchas veces recibe plomo de la pintura vieja de las paredes de afuera. La pintura de antes de 1978 puede tener plomo.");

    public static readonly MessageTemplate SoilResultAbove = new("soil.above",
        "Soil {location} had {result} of lead. The level for this place is {level}. This is at or above that level.",
        "La muestra de tierra tomada {location} tenía {result} de plomo. El nivel para ese lugar es de {level}, y este resultado lo alcanza o lo supera.");

    public static readonly MessageTemplate SoilResultInconclusive = new("soil.inconclusive",
        "Soil {location} had {result} of lead, give or take {margin}. The level for this place is {level}. The result is too close to the level to be sure. We will confirm it with a lab sample.",
        "La muestra de tierra tomada {location} tenía {result} de plomo, con un margen de más o menos {margin}. El nivel para ese lugar es de {level}. El resultado está demasiado cerca del nivel para estar seguros, así que lo vamos a confirmar con una muestra analizada en un laboratorio.");

    /// <summary>Not detected, but the test can't measure as low as the level: we can't say it is below.</summary>
    public static readonly MessageTemplate SoilReportingLimitAtLevel = new("soil.reporting-limit-at-level",
        "Soil {location} had no lead that the test could find. But the test can only find {rl} or more, and the level here is {level}. So we will confirm it with a lab sample.",
        "La muestra de tierra tomada {location} no tenía plomo que la prueba pudiera detectar. Pero la prueba solo detecta a partir de {rl}, y el nivel para ese lugar es de {level}. Por eso lo vamos a confirmar con una muestra analizada en un laboratorio.");

    /// <summary>The lower screening level was used because the home may have another lead source.</summary>
    public static readonly MessageTemplate SoilOtherSource = new("soil.other-source",
        "We used the lower soil level, {level}. Your home may have another source of lead, such as old paint.",
        "Usamos el nivel más bajo para la tierra, {level}, porque en su casa puede haber otra fuente de plomo, como pintura vieja.");

    public static readonly MessageTemplate StepSoilCover = new("step.soil-cover",
        "Cover bare soil with grass, mulch, or wood chips.",
        "Cubra la tierra descubierta con pasto, mantillo o astillas de madera.");

    public static readonly MessageTemplate StepSoilPlay = new("step.soil-play",
        "Keep children off bare soil. Give them a clean place to play.",
        "No deje que los niños jueguen en la tierra descubierta. Busque para ellos un lugar limpio donde jugar.");

    public static readonly MessageTemplate StepSoilClean = new("step.soil-clean",
        "Wash hands, toys, and pet paws often. Take off shoes at the door.",
        "Lave a menudo las manos de todos, los juguetes y las patas de las mascotas. Pida que todos se quiten los zapatos al entrar a la casa.");

    public static readonly MessageTemplate StepSoilDust = new("step.soil-dust",
        "Clean floors and window sills with a wet mop or cloth, not a broom.",
        "Limpie los pisos y los marcos de las ventanas con un trapeador o un trapo húmedo, no con escoba.");

    public static readonly MessageTemplate StepSoilGarden = new("step.soil-garden",
        "Grow vegetables in raised beds filled with clean soil. Wash all produce well, and peel root crops before you eat them.",
        "Siembre sus alimentos en jardineras elevadas con tierra limpia. Lave bien las frutas y verduras, y pele las que crecen bajo tierra, como las papas y las zanahorias, antes de comerlas.");

    /// <summary>Paint work disturbs lead: the renovation, repair and painting rule (40 CFR 745 Subpart E) certifies contractors.</summary>
    public static readonly MessageTemplate StepSoilPaint = new("step.soil-paint",
        "Do not scrape or sand old outside paint yourself. For paint work, hire a contractor certified by the EPA as lead-safe.",
        "No raspe ni lije usted mismo la pintura vieja de afuera. Para trabajos de pintura, contrate a un contratista certificado por la EPA en trabajo seguro con plomo.");

    public static readonly MessageTemplate StepRetestSoil = new("step.retest-soil",
        "We will contact you to take new soil samples.",
        "Nos pondremos en contacto con usted para tomar nuevas muestras de tierra.");
}
