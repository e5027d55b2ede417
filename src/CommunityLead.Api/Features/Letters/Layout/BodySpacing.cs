namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// The room between the body's parts, in points. A letter that would spill onto a second page is laid out again
/// with <see cref="Tight"/>: only the white space shrinks, never the type, so a letter that can fit one sheet does.
/// </summary>
internal sealed record BodySpacing(double AfterHeader, double AfterTitle, double Greeting, double Table, double FirstScale,
    double Scale, double Section, double AfterHeading, double Paragraph, double Signature)
{
    public static readonly BodySpacing Regular = new(AfterHeader: 20, AfterTitle: 8, Greeting: 10, Table: 10, FirstScale: 12,
        Scale: 8, Section: 14, AfterHeading: 3, Paragraph: 5, Signature: 10);

    public static readonly BodySpacing Tight = new(AfterHeader: 12, AfterTitle: 5, Greeting: 7, Table: 7, FirstScale: 8,
        Scale: 5, Section: 9, AfterHeading: 2, Paragraph: 3, Signature: 7);
}
