using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.LabResults;
using CommunityLead.Rules.Sampling;

namespace CommunityLead.Api.Features.Letters.Composing;

/// <summary>Names for the results table and the scales: which sample, which metal, which level, the result itself.</summary>
internal static class SampleWords
{
    /// <summary>The bottle in words, with the trade's name in brackets where a household may have heard it.</summary>
    public static Phrase Sample(Finding f) => f.Bottle switch
    {
        BottleType.FirstDraw => new("First water from the tap (first draw)", "Primera agua del grifo (primera extracción)"),
        BottleType.Flushed => new("After running the tap (flushed)", "Después de dejar correr el agua"),
        BottleType.Sequential => Sequential($"{f.Position}"),
        BottleType.FifthLiter => new("Fifth liter", "Quinto litro"),
        _ => f.Location switch
        {
            SoilLocation.PlayArea => new("Play area soil", "Tierra de la zona de juegos"),
            SoilLocation.Garden => new("Garden soil", "Tierra del huerto o jardín"),
            SoilLocation.DripLine => new("Soil under the roof edge", "Tierra bajo el borde del techo"),
            SoilLocation.Yard => new("Yard soil", "Tierra del patio"),
            _ => new("Soil from your yard", "Tierra de su terreno"),
        },
    };

    internal static Phrase Sequential(string position) => new($"Sequential bottle {position}", $"Botella {position} de la serie");

    public static Phrase Metal(Analyte analyte) => analyte == Analyte.Lead ? new("Lead", "Plomo") : new("Copper", "Cobre");

    /// <summary>"12.4 µg/L", or "Not detected (below 1 µg/L)": a censored result is never written as zero.</summary>
    public static Phrase Result(Finding f)
    {
        var amount = MessageWords.Amount(f.Value, f.Unit);
        return f.BelowReportingLimit ? NotDetected(amount) : amount;
    }

    internal static Phrase NotDetected(Phrase amount) => new($"Not detected (below {amount.En})", $"No detectado (menos de {amount.Es})");

    public static Phrase ScaleValue(Finding f) => f.BelowReportingLimit ? NotDetectedOnScale : MessageWords.Amount(f.Value, f.Unit);

    public static readonly Phrase NotDetectedOnScale = new("not detected", "no detectado");

    public static readonly Phrase ActionLevel = new("Action level", "Nivel de acción");
    public static readonly Phrase CautionLevel = new("Caution level", "Nivel de precaución");
    public static readonly Phrase TasteLevel = new("Taste level", "Nivel por sabor");
    public static readonly Phrase UrgentLevel = new("Urgent level", "Nivel urgente");
    public static readonly Phrase LowestLevel = new("Our level", "Nuestro nivel");
    public static readonly Phrase SoilLevel = new("Level for this place", "Nivel para este lugar");
    public static readonly Phrase SoilScreeningLevel = new("EPA screening level", "Nivel de evaluación de la EPA");
    public static readonly Phrase SoilHazardLevel = new("Federal hazard level", "Nivel federal de peligro");

    /// <summary>An urgent result names both levels, as its sentence does: "Action level 10 µg/L; urgent from 50 µg/L".</summary>
    public static Phrase UrgentLevels(double action, double urgent, string unit) =>
        UrgentLevels(MessageWords.Amount(action, unit), MessageWords.Amount(urgent, unit));

    internal static Phrase UrgentLevels(Phrase action, Phrase urgent) =>
        new($"{ActionLevel.En} {action.En}; urgent from {urgent.En}", $"{ActionLevel.Es}: {action.Es}; urgente desde {urgent.Es}");

    /// <summary>"Action level 10 µg/L" / "Nivel de acción: 10 µg/L".</summary>
    public static Phrase Level(Phrase name, double value, string unit) => Level(name, MessageWords.Amount(value, unit));

    internal static Phrase Level(Phrase name, Phrase amount) => new($"{name.En} {amount.En}", $"{name.Es}: {amount.Es}");

    /// <summary>Where a soil result stands against its level; "not sure" when its uncertainty spans the level.</summary>
    public static Phrase SoilComparedWith(SoilComparison comparison, double level, string unit, bool screening = false) =>
        screening ? SoilComparedWithScreening(comparison, MessageWords.Amount(level, unit)) : SoilComparedWith(comparison, MessageWords.Amount(level, unit));

    internal static Phrase SoilComparedWith(SoilComparison comparison, Phrase amount) => comparison switch
    {
        SoilComparison.Above => new($"At or above the level of {amount.En}", $"Igual o por encima del nivel de {amount.Es}"),
        SoilComparison.Below => new($"Below the level of {amount.En}", $"Por debajo del nivel de {amount.Es}"),
        _ => new($"Not sure: close to the level of {amount.En}", $"No es seguro: cerca del nivel de {amount.Es}"),
    };

    /// <summary>Against EPA's residential screening level, which is not a hazard standard: named as such.</summary>
    internal static Phrase SoilComparedWithScreening(SoilComparison comparison, Phrase amount) => comparison switch
    {
        SoilComparison.Above => new($"Above the EPA screening level of {amount.En}", $"Por encima del nivel de evaluación de la EPA, {amount.Es}"),
        SoilComparison.Below => new($"Below the EPA screening level of {amount.En}", $"Por debajo del nivel de evaluación de la EPA, {amount.Es}"),
        _ => new($"Not sure: close to the EPA screening level of {amount.En}", $"No es seguro: cerca del nivel de evaluación de la EPA, {amount.Es}"),
    };
}
