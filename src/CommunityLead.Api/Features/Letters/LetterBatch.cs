using System.IO.Compression;
using System.Text;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data;
using CommunityLead.Api.Features.Reports;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Kits;
using Microsoft.AspNetCore.Http.HttpResults;
using Microsoft.EntityFrameworkCore;

namespace CommunityLead.Api.Features.Letters;

/// <summary>A mailing: every kit ready for a letter in one ZIP, with a manifest and optionally one PDF to print.</summary>
public static class LetterBatch
{
    private const string Header = "kitCode,letterId,kind,language,pages,sha256,status,reason\n";

    /// <summary>
    /// Kits interpreted and not yet sent. Those whose letter is still held back (LetterRelease) get no PDF, here or in
    /// the combined file; the manifest lists each as awaiting-release with the attention items to resolve.
    /// </summary>
    public static async Task<FileContentHttpResult> Create(
        CommunityLeadDb db, LetterIssuing issuing, TimeProvider clock, HttpContext http, CancellationToken ct, bool combined = false)
    {
        var ready = await db.Kits.AsNoTracking().Where(k => k.State == KitState.Interpreted)
            .Select(k => new { k.Id, k.Code }).ToListAsync(ct);
        var releases = await LetterRelease.ForAsync(db, [.. ready.Select(k => k.Id)], ct);
        var held = ready.Where(k => !releases.Of(k.Id).Released).OrderBy(k => k.Code, StringComparer.Ordinal).ToList();
        var released = ready.Where(k => releases.Of(k.Id).Released).Select(k => k.Id).ToList();
        var letters = released.Count == 0 ? [] : await issuing.IssueAsync(released, null, Actor.From(http.User), ct);
        using var buffer = new MemoryStream();
        using (var zip = new ZipArchive(buffer, ZipArchiveMode.Create, leaveOpen: true))
        {
            var manifest = new StringBuilder(Header);
            foreach (var letter in letters)
            {
                // Stored as they are: a letter's streams are compressed already, deflating them again gains nothing.
                await using (var entry = zip.CreateEntry($"letters/{LetterHandlers.FileName(letter.Record)}", CompressionLevel.NoCompression).Open())
                    await entry.WriteAsync(letter.Pdf, ct);
                var r = letter.Record;
                manifest.Append($"{r.KitCode},{r.Id},{KebabEnum.Name(r.Kind)},{KebabEnum.Name(r.Language)},{r.Pages},{r.Sha256},issued,\n");
            }
            foreach (var kit in held)
                manifest.Append($"{kit.Code},,,,,,awaiting-release,{SummaryCsv.Escape(LetterRelease.WhatIsMissing(kit.Code, releases.Of(kit.Id)))}\n");
            await using (var entry = zip.CreateEntry("manifest.csv").Open())
                await entry.WriteAsync(Encoding.UTF8.GetBytes(manifest.ToString()), ct);
            if (combined && letters.Count > 0)
                await using (var entry = zip.CreateEntry("all-letters.pdf", CompressionLevel.NoCompression).Open())
                    await entry.WriteAsync(LetterPdf.Combine(letters.Select(l => l.Pdf)), ct);
        }
        return TypedResults.File(buffer.ToArray(), "application/zip", $"letters-{clock.GetUtcNow():yyyy-MM-dd}.zip");
    }
}
