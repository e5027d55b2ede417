using PdfSharp.Drawing;

namespace CommunityLead.Api.Features.Letters.Layout;

/// <summary>
/// Grey tones and one calm accent. Nothing on the letter is said by colour alone: every mark has a label,
/// and a black-and-white printer loses nothing.
/// </summary>
internal static class Palette
{
    public static readonly XColor InkColor = XColor.FromArgb(0x1A, 0x1A, 0x1A);
    public static readonly XColor AccentColor = XColor.FromArgb(0x1F, 0x4E, 0x79);

    public static readonly XBrush Ink = new XSolidBrush(InkColor);
    public static readonly XBrush Muted = new XSolidBrush(XColor.FromArgb(0x55, 0x55, 0x55));
    public static readonly XBrush Accent = new XSolidBrush(AccentColor);

    // The scale's bands darken as the level rises, so the picture reads the same printed in grey.
    public static readonly XBrush[] ScaleBands =
    [
        new XSolidBrush(XColor.FromArgb(0xF0, 0xF0, 0xF0)),
        new XSolidBrush(XColor.FromArgb(0xD6, 0xD6, 0xD6)),
        new XSolidBrush(XColor.FromArgb(0xB4, 0xB4, 0xB4)),
    ];

    public static readonly XPen Rule = new(XColor.FromArgb(0xC4, 0xC4, 0xC4), 0.5);
    public static readonly XPen HeaderRule = new(XColor.FromArgb(0x55, 0x55, 0x55), 0.8);
    public static readonly XPen Outline = new(XColor.FromArgb(0x55, 0x55, 0x55), 0.6);
    public static readonly XPen Tick = new(InkColor, 1);
}
