namespace CommunityLead.Rules.Interpretation;

// Where the lead seems to come from: first draw against flushed water, the peak of a sequential profile, the
// fifth liter, and what the household told us about its pipes. Private wells get their own wording: they have
// no water utility and no utility service line.
public static partial class MessageCatalog
{
    public static readonly MessageTemplate PatternFaucet = new("pattern.faucet",
        "Lead was high in the first bottle and lower after running the tap. So the lead likely comes from the faucet or pipes close to it. A plumber can replace the faucet.",
        "El plomo salió alto en la primera botella y más bajo después de dejar correr el agua. Eso indica que probablemente viene del grifo o de las tuberías cercanas. Un plomero puede cambiar el grifo.");

    public static readonly MessageTemplate PatternFurther = new("pattern.further",
        "Lead was still in the water after running the tap. So it may come from the service line, the pipe from the street to your home, or other pipes further away. Running the tap pulls more water through that pipe, so it does not help here.",
        "Todavía había plomo en el agua después de dejarla correr. Por eso puede venir de la línea de servicio (el tubo que trae el agua de la calle a su casa) o de otras tuberías más lejanas. Dejar correr el agua trae más agua por ese tubo, así que aquí no ayuda.");

    public static readonly MessageTemplate PatternFurtherWell = new("pattern.further-well",
        "Lead was still in the water after running the tap. So it may come from pipes further from the tap or from parts of your well system. Running the tap pulls more water through those pipes, so it does not help here. A licensed plumber or well contractor can help find the source.",
        "Todavía había plomo en el agua después de dejarla correr. Por eso puede venir de tuberías más alejadas del grifo o de alguna parte de su sistema de pozo. Dejar correr el agua trae más agua por esas tuberías, así que aquí no ayuda. Un plomero o un técnico de pozos con licencia puede ayudarle a encontrar el origen.");

    public static readonly MessageTemplate PatternNone = new("pattern.none",
        "Lead was below our levels in the first bottle and after running the tap. So we cannot point to one source of lead at this tap.",
        "El plomo estuvo por debajo de nuestros niveles en la primera botella y después de dejar correr el agua. Así que no podemos señalar una sola fuente de plomo en este grifo.");

    // Sequential profiles: {position} is the bottle number, {litres} the water drawn before it, {metres} the
    // length of pipe that water fills.
    public static readonly MessageTemplate PeakFaucet = new("peak.faucet",
        "Lead was highest in bottle 1, the first water out of the tap. This points to the faucet or the pipes just behind it.",
        "La botella 1, la primera agua que salió del grifo, fue la que tuvo más plomo. Esto apunta al grifo o a las tuberías que están justo detrás.");

    public static readonly MessageTemplate PeakHomePipes = new("peak.home-pipes",
        "Lead was highest in bottle {position}. About {litres} of water came out before it. That much water fills about {metres} of pipe. So the lead likely comes from pipes inside your home.",
        "La botella {position} fue la que tuvo más plomo. Antes de llenarla salieron unos {litres} de agua, lo que cabe en unos {metres} de tubería. Por eso es probable que el plomo venga de las tuberías dentro de su casa.");

    public static readonly MessageTemplate PeakFurther = new("peak.further",
        "Lead was highest in bottle {position}. About {litres} of water came out before it. That much water fills about {metres} of pipe. So the lead may come from the service line or from pipes far from the tap.",
        "La botella {position} fue la que tuvo más plomo. Antes de llenarla salieron unos {litres} de agua, lo que cabe en unos {metres} de tubería. Por eso el plomo puede venir de la línea de servicio o de tuberías alejadas del grifo.");

    public static readonly MessageTemplate PeakFurtherWell = new("peak.further-well",
        "Lead was highest in bottle {position}. About {litres} of water came out before it. That much water fills about {metres} of pipe. So the lead may come from pipes far from the tap or from parts of your well system.",
        "La botella {position} fue la que tuvo más plomo. Antes de llenarla salieron unos {litres} de agua, lo que cabe en unos {metres} de tubería. Por eso el plomo puede venir de tuberías alejadas del grifo o de alguna parte de su sistema de pozo.");

    public static readonly MessageTemplate PeakLow = new("peak.low",
        "Lead was below our levels in each numbered bottle. It was highest in bottle {position}.",
        "El plomo estuvo por debajo de nuestros niveles en cada una de las botellas numeradas. El valor más alto fue el de la botella {position}.");

    /// <summary>Where lead points to the service line and the household has not been told about its line already.</summary>
    public static readonly MessageTemplate StepAskUtility = new("step.ask-utility",
        "Ask your water utility to check the service line, the pipe from the street to your home.",
        "Pida a su compañía de agua que revise la línea de servicio, el tubo que trae el agua de la calle a su casa.");

    public static readonly MessageTemplate FifthLiterHigher = new("fifth-liter.higher",
        "Lead was higher in the fifth liter than in the first. The fifth liter sat further from the tap, often in the service line.",
        "El quinto litro tuvo más plomo que el primero. El quinto litro estaba más lejos del grifo, muchas veces en la línea de servicio.");

    public static readonly MessageTemplate FifthLiterHigherWell = new("fifth-liter.higher-well",
        "Lead was higher in the fifth liter than in the first. The fifth liter sat in pipes further from the tap.",
        "El quinto litro tuvo más plomo que el primero. El quinto litro estaba en tuberías más alejadas del grifo.");

    public static readonly MessageTemplate ServiceLineLead = new("service-line.lead",
        "Your home is listed as having a lead service line. This is the pipe that brings water from the street to your home. Ask your water utility about programs to replace it.",
        "Según nuestros datos, su casa tiene una línea de servicio de plomo: el tubo que trae el agua de la calle a su casa. Pregunte a su compañía de agua por los programas para reemplazarla.");

    public static readonly MessageTemplate ServiceLineGalvanized = new("service-line.galvanized",
        "Your home is listed as having a galvanized steel service line. Old ones can hold lead from lead pipes they were once joined to. Ask your water utility about programs to replace it.",
        "Según nuestros datos, su casa tiene una línea de servicio de acero galvanizado. Las más viejas pueden retener plomo de las tuberías de plomo a las que estuvieron unidas. Pregunte a su compañía de agua por los programas para reemplazarla.");

    public static readonly MessageTemplate WellPipe = new("service-line.well-pipe",
        "Your home is listed as having lead or galvanized steel pipe. A licensed plumber can check it and tell you how to replace it.",
        "Según nuestros datos, su casa tiene tubos de plomo o de acero galvanizado. Un plomero con licencia puede revisarlos y decirle cómo cambiarlos.");

    public static readonly MessageTemplate WellAdvice = new("well.advice",
        "Your water comes from a private well, so no one else tests it for you. Test it again, and ask your local health department how often to test and how to treat well water.",
        "Su agua viene de un pozo privado, así que nadie más la analiza por usted. Vuelva a hacerle la prueba, y pregunte a su departamento de salud local cada cuánto conviene hacerla y cómo tratar el agua de pozo.");
}
