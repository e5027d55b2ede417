using CommunityLead.Api.Features.Letters;
using CommunityLead.Rules.Households;

namespace CommunityLead.Tests.Features.Letters.Layout;

/// <summary>Letter contents as the composer words them, built by hand so the layout is tested on its own.</summary>
public static class LetterSamples
{
    static readonly ProgramBlock Program = new(
        "Riverbend Community Lead Testing Program",
        ["412 Alder Street, Suite 2", "Riverbend, OR 97000"],
        ["Phone: (555) 010-4477", "Email: leadtest@riverbend.example.org"]);

    static readonly string[] Recipient = ["Maria Lopez", "1187 Cedar Lane, Apt 3", "Riverbend, OR 97000"];

    /// <summary>Action level in the first draw, a child under 6 at home: the longest ordinary letter (two pages).</summary>
    public static LetterContent EnglishActionLevel(PaperSize paper = PaperSize.Letter) => new(
        LetterLanguage.En, LetterKind.Results, paper, Program, "April 14, 2026", Recipient,
        "Your water test results",
        [new("Kit code", "K7QM-4T2X"), new("Date collected", "April 3, 2026"), new("Test", "Lead and copper in tap water")],
        new ResultTable(
            ["Sample", "Test", "Result", "Compared with"],
            [
                ["First water from the tap (first draw)", "Lead", "14.2 µg/L", "Action level 10 µg/L"],
                ["After running the tap (flushed)", "Lead", "3.1 µg/L", "Action level 10 µg/L"],
                ["First water from the tap (first draw)", "Copper", "0.42 mg/L", "Action level 1.3 mg/L"],
            ],
            "Each result is compared with the level next to it. These levels come from: US EPA Lead and Copper Rule Improvements (2024)."),
        [
            new LeadScale("First water from the tap (first draw)", 14.2, "14.2 µg/L",
                [new(5, "Caution level"), new(10, "Action level")], 25, "µg/L"),
            new LeadScale("After running the tap (flushed)", 3.1, "3.1 µg/L",
                [new(5, "Caution level"), new(10, "Action level")], 15, "µg/L"),
        ],
        new LetterSection("What your results mean",
        [
            "The first water from your tap had 14.2 µg/L of lead in it. The action level is 10 µg/L. This is at or above that level.",
            "The water after running the tap had 3.1 µg/L of lead in it. Our caution level is 5 µg/L. This is below that level.",
            "The lead most likely comes from pipes or fixtures close to the tap, since running the water brought the lead down. No amount of lead is known to be safe for children.",
        ]),
        new LetterSection("What to do now",
        [
            "Use filtered or bottled water for drinking, cooking, and baby formula. Do this until the lead problem is fixed.",
            "Use a filter certified to NSF/ANSI 53 for lead. Look for NSF/ANSI 42 too, for small particles. These filters may also remove fluoride. Change the cartridge when the maker says.",
            "Use only cold water for drinking, cooking, and baby formula. Hot water is more likely to have lead.",
            "If the water has not been used for a few hours, run the cold tap until it is as cold as it gets. This takes 30 seconds to 2 minutes.",
            "Every few months, clean the small screen at the tip of your faucet, called the aerator. Bits of lead can collect there.",
        ], Numbered: true),
        new LetterSection("Keep in mind",
        [
            "Boiling water does not remove lead. It can even leave more lead in less water.",
            "Please ask a doctor soon about a blood lead test for each child under 6 and anyone who is pregnant in your home.",
        ]),
        new LetterSection("Who to call",
        [
            "Riverbend County Health Department, Environmental Health: (555) 010-2200, weekdays 8 am to 4:30 pm.",
            "Riverbend Water Utility, customer service: (555) 010-3100. Ask about the pipe that brings water to your home.",
            "Your child's doctor or clinic, about a blood lead test.",
        ]),
        "This letter is not medical advice. For health questions, please follow your local health department and talk with a doctor or other licensed professional. Thank you for taking part.",
        "Riverbend Community Lead Testing Program · Kit code K7QM-4T2X",
        Greeting: "Dear Maria Lopez,",
        Signature: new("Sincerely,", "Dana Whitfield", "Program Coordinator"));

    /// <summary>Nothing found: a short letter that fits on one page.</summary>
    public static LetterContent EnglishNotDetected(PaperSize paper = PaperSize.Letter) => new(
        LetterLanguage.En, LetterKind.Results, paper, Program, "April 14, 2026", Recipient,
        "Your water test results",
        [new("Kit code", "K7QM-4T2X"), new("Date collected", "April 3, 2026")],
        new ResultTable(
            ["Sample", "Test", "Result", "Compared with"],
            [["First water from the tap (first draw)", "Lead", "Not detected (below 1 µg/L)", "Action level 10 µg/L"]],
            "Each result is compared with the level next to it. These levels come from: US EPA Lead and Copper Rule Improvements (2024)."),
        [new LeadScale("First water from the tap (first draw)", 0, "not detected", [new(5, "Caution level"), new(10, "Action level")], 15, "µg/L")],
        new LetterSection("What your results mean",
            ["The first water from your tap had no lead that the lab could find. Its test can find 1 µg/L or more."]),
        new LetterSection("What to do now",
            ["Use only cold water for drinking, cooking, and baby formula.", "Test again if you change your pipes or faucets."], Numbered: true),
        new LetterSection("Keep in mind", []),
        new LetterSection("Who to call", ["Riverbend County Health Department: (555) 010-2200."]),
        "This letter is not medical advice. For health questions, please follow your local health department and talk with a doctor or other licensed professional.",
        "Riverbend Community Lead Testing Program · Kit code K7QM-4T2X",
        Greeting: "Dear Maria Lopez,",
        Signature: new("Sincerely,", "Dana Whitfield", "Program Coordinator"));

    /// <summary>A Spanish letter on A4: accents, ñ, ¿, µg/L, ≤ and dashes must all come through.</summary>
    public static LetterContent Spanish(PaperSize paper = PaperSize.A4) => new(
        LetterLanguage.Es, LetterKind.Results, paper,
        new ProgramBlock("Programa Comunitario de Análisis de Plomo", ["Calle Alder 412, Oficina 2", "Riverbend, OR 97000"],
            ["Teléfono: (555) 010-4477", "Correo electrónico: plomo@riverbend.example.org"]),
        "14 de abril de 2026", ["José Ángel Muñoz Peña", "Calle Cedro 1187, Depto. 3", "Riverbend, OR 97000"],
        "Resultados de la prueba de su agua",
        [new("Código del kit", "K7QM-4T2X"), new("Fecha de la muestra", "3 de abril de 2026")],
        new ResultTable(
            ["Muestra", "Análisis", "Resultado", "Comparado con"],
            [
                ["Primera agua del grifo (primera extracción)", "Plomo", "6.8 µg/L", "Nivel de precaución: 5 µg/L"],
                ["Después de dejar correr el agua", "Plomo", "No detectado (menos de 1 µg/L)", "Nivel de acción: 10 µg/L"],
            ],
            "Cada resultado se compara con el nivel que aparece a su lado. Un resultado ≤ 1 µg/L no se puede medir. Estos niveles provienen de: EPA de EE. UU. — Mejoras a la Norma de Plomo y Cobre (2024)."),
        [new LeadScale("Primera agua del grifo (primera extracción)", 6.8, "6.8 µg/L",
            [new(5, "Nivel de precaución"), new(10, "Nivel de acción")], 15, "µg/L")],
        new LetterSection("Qué significan sus resultados",
        [
            "La primera agua de su grifo tenía 6.8 µg/L de plomo. Nuestro nivel de precaución es de 5 µg/L, y este resultado lo alcanza o lo supera.",
            "¿Por qué importa? No se conoce ninguna cantidad de plomo que sea segura para los niños y las niñas.",
        ]),
        new LetterSection("Qué hacer ahora",
        [
            "Use solo agua fría para beber, cocinar y preparar la fórmula del bebé. Es más probable que el agua caliente tenga plomo.",
            "Si nadie ha usado el agua en varias horas, deje correr el agua fría hasta que salga lo más fría posible. Esto tarda de 30 segundos a 2 minutos.",
        ], Numbered: true),
        new LetterSection("Tenga en cuenta",
            ["Hervir el agua no quita el plomo. Incluso puede concentrarlo, porque el agua se evapora y el plomo se queda."]),
        new LetterSection("A quién llamar",
            ["Departamento de Salud del Condado de Riverbend, Salud Ambiental: (555) 010-2200.", "Compañía de agua de Riverbend, atención al cliente: (555) 010-3100."]),
        "Esta carta no es un consejo médico. Para sus preguntas de salud, siga las indicaciones del departamento de salud local y hable con un médico u otro profesional con licencia. ¡Gracias por participar!",
        "Programa Comunitario de Análisis de Plomo · Código del kit K7QM-4T2X",
        Greeting: "Hola, José Ángel Muñoz Peña:",
        Signature: new("Atentamente,", "Dana Whitfield", "Coordinación del programa"));
}
