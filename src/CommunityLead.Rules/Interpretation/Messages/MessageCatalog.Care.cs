namespace CommunityLead.Rules.Interpretation;

// Steps to take and the usual cautions (DOMAIN.md §1 and §6 [published: EPA and state guidance]), and why a
// sample must be taken again.
public static partial class MessageCatalog
{
    public static readonly MessageTemplate StepUseFiltered = new("step.use-filtered",
        "Use filtered or bottled water for drinking, cooking, and baby formula. Do this until the lead problem is fixed.",
        "Use agua filtrada o embotellada para beber, cocinar y preparar la fórmula del bebé, hasta que se resuelva el problema del plomo.");

    /// <summary>
    /// No word on fluoride: carbon filters certified to NSF/ANSI 53 for lead generally do not remove it; only reverse
    /// osmosis (NSF/ANSI 58) does, and that is named only in the copper filter step (DOMAIN.md §6 [memory]).
    /// </summary>
    public static readonly MessageTemplate StepFilter = new("step.filter",
        "Use a filter certified to NSF/ANSI 53 for lead. Look for NSF/ANSI 42 too, for small particles. Change the cartridge when the maker says.",
        "Use un filtro certificado con la norma NSF/ANSI 53 para el plomo. Es mejor si también cumple la NSF/ANSI 42, para partículas. Cambie el cartucho cuando lo diga el fabricante.");

    /// <summary>The urgent plan: bottled water only until a retest (no filter, no running the tap meanwhile).</summary>
    public static readonly MessageTemplate StepBottledOnly = new("step.bottled-only",
        "Use only bottled water for drinking, cooking, and baby formula. Keep doing this until we test your water again and tell you what we found.",
        "Use solo agua embotellada para beber, cocinar y preparar la fórmula del bebé. Siga así hasta que volvamos a analizar su agua y le digamos el resultado.");

    /// <summary>
    /// Why the urgent plan is bottled water and not a filter: NSF/ANSI 53 lead claims are tested on water with
    /// 150 µg/L of lead [memory: NSF/ANSI 53 lead reduction challenge], so a filter's claim says nothing beyond it,
    /// and a very high first result may hide higher ones.
    /// </summary>
    public static readonly MessageTemplate FilterTestedLevel = new("care.filter-tested-level",
        "Filters certified for lead are tested on water with 150 µg/L of lead. Your water may have more lead at times. So please use bottled water, not a filter, until we test again.",
        "Los filtros certificados para plomo se prueban con agua que tiene 150 µg/L de plomo. Su agua puede tener más plomo a veces. Por eso, use agua embotellada y no un filtro hasta que volvamos a analizarla.");

    /// <summary>Copper at its action level: copper's own steps (DOMAIN.md §6 [published: EPA copper health information]).</summary>
    public static readonly MessageTemplate StepCopperRunTap = new("step.copper-run-tap",
        "Copper builds up in water that sits in copper pipes. If the water has not been used for a few hours, run the cold tap for 30 seconds to 2 minutes before you drink it or cook with it.",
        "El cobre se acumula en el agua que se queda quieta en las tuberías de cobre. Si nadie ha usado el agua en varias horas, deje correr el agua fría de 30 segundos a 2 minutos antes de beberla o de cocinar con ella.");

    public static readonly MessageTemplate StepCopperFormula = new("step.copper-formula",
        "Babies are more sensitive to copper. Make baby formula with bottled water until your copper is lower.",
        "Los bebés son más sensibles al cobre. Prepare la fórmula del bebé con agua embotellada hasta que baje el cobre.");

    /// <summary>Reverse osmosis is named here, so fluoride is too: it does remove fluoride (DOMAIN.md §6 [memory]).</summary>
    public static readonly MessageTemplate StepCopperFilter = new("step.copper-filter",
        "If copper stays high, use a filter certified to reduce copper. Check that the label lists copper. Reverse osmosis filters (NSF/ANSI 58) often do. They also take out fluoride, so ask your dentist about fluoride for your children.",
        "Si el cobre sigue alto, use un filtro certificado para reducir el cobre. Revise que la etiqueta diga cobre. Los filtros de ósmosis inversa (NSF/ANSI 58) muchas veces lo están. También quitan el flúor, así que pregunte a su dentista por el flúor para sus hijos.");

    public static readonly MessageTemplate StepColdWater = new("step.cold-water",
        "Use only cold water for drinking, cooking, and baby formula. Hot water is more likely to have lead.",
        "Use solo agua fría para beber, cocinar y preparar la fórmula del bebé. Es más probable que el agua caliente tenga plomo.");

    public static readonly MessageTemplate StepRunTap = new("step.run-tap",
        "If the water has not been used for a few hours, run the cold tap until it is as cold as it gets. This takes 30 seconds to 2 minutes.",
        "Si nadie ha usado el agua en varias horas, deje correr el agua fría hasta que salga lo más fría posible. Esto tarda de 30 segundos a 2 minutos.");

    public static readonly MessageTemplate StepAerator = new("step.aerator",
        "Every few months, clean the small screen at the tip of your faucet, called the aerator. Bits of lead can collect there.",
        "Cada pocos meses, limpie la rejilla de la punta del grifo, que se llama aireador. Ahí se pueden juntar partículas de plomo.");

    public static readonly MessageTemplate StepRetestWater = new("step.retest-water",
        "We will send you a new kit. Fill the new bottles the same way. First let the water sit unused for at least 6 hours, such as overnight.",
        "Le vamos a enviar un kit nuevo. Llene las botellas nuevas de la misma manera. Antes, deje el agua sin usar por lo menos 6 horas, por ejemplo durante la noche.");

    public static readonly MessageTemplate NoSafeLevel = new("care.no-safe-level",
        "No amount of lead is known to be safe for children.",
        "No se conoce ninguna cantidad de plomo que sea segura para los niños.");

    public static readonly MessageTemplate NoBoil = new("care.no-boil",
        "Boiling water does not remove lead. It can even leave more lead in less water.",
        "Hervir el agua no quita el plomo. Incluso puede concentrarlo, porque el agua se evapora y el plomo se queda.");

    public static readonly MessageTemplate BloodTest = new("care.blood-test",
        "If a child under 6 lives with you or someone in your home is pregnant, ask a doctor about a blood lead test.",
        "Si vive con usted un niño o una niña menor de 6 años, o si alguien en su casa está embarazada, pregunte a su médico por un análisis de plomo en la sangre.");

    public static readonly MessageTemplate BloodTestSoon = new("care.blood-test-soon",
        "Please ask a doctor soon about a blood lead test for each child under 6 and anyone who is pregnant in your home.",
        "Por favor, pregunte pronto a su médico por un análisis de plomo en la sangre para cada niño o niña menor de 6 años y para quien esté embarazada en su casa.");

    public static readonly MessageTemplate VulnerableWater = new("care.vulnerable-water",
        "Young children and babies before birth are most at risk from lead. Since lead was found in your water, use only cold filtered or bottled water for drinking, cooking, and baby formula.",
        "Los niños pequeños y los bebés antes de nacer son los que corren más riesgo con el plomo. Como se encontró plomo en su agua, use solo agua fría filtrada o agua embotellada para beber, cocinar y preparar la fórmula del bebé.");

    /// <summary>An urgent result in a home with a young child or a pregnancy: the same bottled-water plan, said for them.</summary>
    public static readonly MessageTemplate VulnerableUrgent = new("care.vulnerable-urgent",
        "Young children and babies before birth are most at risk from lead. Make sure children drink only bottled water, and make baby formula with bottled water.",
        "Los niños pequeños y los bebés antes de nacer son los que corren más riesgo con el plomo. Asegúrese de que los niños tomen solo agua embotellada, y prepare la fórmula del bebé con agua embotellada.");

    public static readonly MessageTemplate VulnerableSoil = new("care.vulnerable-soil",
        "Young children are most at risk from lead in soil. They play on the ground and put their hands in their mouths.",
        "Los niños pequeños son los que corren más riesgo con el plomo en la tierra, porque juegan en el suelo y se llevan las manos a la boca.");

    public static readonly MessageTemplate FilterInUse = new("care.filter-in-use",
        "You told us you use a filter. Check that it is certified to NSF/ANSI 53 for lead, and change the cartridge on time.",
        "Usted nos dijo que usa un filtro. Revise que esté certificado según la norma NSF/ANSI 53 para plomo, y cambie el cartucho a tiempo.");

    // Why a sample can't be trusted, one per ValidityIssueCode; the coordinator also sees the lab's own reason.
    public static readonly MessageTemplate RetestStandingShort = new("retest.standing-time-short",
        "Water must sit unused in the pipes for at least 6 hours before you fill the first bottle. This time it sat for less.",
        "El agua tiene que quedarse sin usar en las tuberías por lo menos 6 horas antes de llenar la primera botella. Esta vez estuvo menos tiempo.");

    public static readonly MessageTemplate RetestCollection = new("retest.collection-invalid",
        "Something went wrong when the sample was taken, so the result may not be right.",
        "Algo salió mal al tomar la muestra, así que el resultado podría no ser correcto.");

    public static readonly MessageTemplate RetestHoldingTime = new("retest.outside-holding-time",
        "Too much time passed before the lab could test the sample.",
        "Pasó demasiado tiempo antes de que la muestra se pudiera analizar en el laboratorio.");

    public static readonly MessageTemplate RetestQcHeld = new("retest.qc-held",
        "The lab's own quality checks did not pass, so it could not confirm the result.",
        "Los controles de calidad del propio laboratorio no salieron bien, así que no pudo confirmar el resultado.");
}
