using System.Security.Cryptography;
using CommunityLead.Api.Auth;
using CommunityLead.Api.Data.Entities;
using CommunityLead.Api.Features.Areas;
using CommunityLead.Api.Features.Attention;
using CommunityLead.Api.Features.Households;
using CommunityLead.Api.Features.Kits;
using CommunityLead.Api.Features.LabResults;
using CommunityLead.Api.Features.Wording;
using CommunityLead.Api.Infrastructure;
using CommunityLead.Rules.Interpretation;
using CommunityLead.Rules.Kits;
using CommunityLead.Rules.LabResults;
using CommunityLead.Tests.Commands;
using CommunityLead.Tests.Features.Areas;
using CommunityLead.Tests.Features.Attention;
using CommunityLead.Tests.Features.Households;
using CommunityLead.Tests.Features.Interpretation;
using CommunityLead.Tests.Features.Kits;
using CommunityLead.Tests.Features.LabResults;
using CommunityLead.Tests.Rules.Interpretation;
using CommunityLead.Tests.Rules.Sampling;
using static CommunityLead.Tests.Data.StoreModel;

namespace CommunityLead.Tests.Data;

/// <summary>How a string column is kept within its length. PostgreSQL refuses a longer value; SQLite stores it.</summary>
internal abstract record ColumnDecision(string Column, int? Limit);

/// <summary>A client sends it: <paramref name="Check"/> refuses a longer value before anything is written; <paramref name="Test"/> shows it.</summary>
internal sealed record Validated(string Column, int Length, string Check, string Test) : ColumnDecision(Column, Length);

/// <summary>The server writes it from a closed set or a copy of another column; <paramref name="Longest"/> computes the longest value.</summary>
internal sealed record Bounded(string Column, int Length, string What, Func<int> Longest) : ColumnDecision(Column, Length);

/// <summary>Text the server words from bounded parts; <paramref name="Test"/> builds the worst case and measures it.</summary>
internal sealed record Composed(string Column, int Length, string BoundedBy, string Test) : ColumnDecision(Column, Length);

/// <summary>Text with no limit in either store.</summary>
internal sealed record Unlimited(string Column, string What) : ColumnDecision(Column, null);

/// <summary>The decision for every string column of the model. A new column fails ColumnLengthTests until it has one here.</summary>
internal static class ColumnDecisions
{
    private const string HouseholdOver = nameof(HouseholdLengthTests.Household_SignUpOneCharacterOverAColumn_Is400SayingTheLimitAndWritesNothing);
    private const string AreaOver = nameof(AreaTests.Area_TextOneCharacterOverItsColumn_400NamingItAndNothingAdded);
    private const string KitReasonOver = nameof(KitLengthTests.Kit_TextOneCharacterOverItsColumn_Is400SayingTheLimitAndLeavesTheKitAsItWas);
    private const string BatchHeaderOver = nameof(BatchLengthTests.JsonBatch_HeaderOneCharacterOverItsColumn_422SayingTheLimitAndNothingWritten);
    private const string BatchRowOver = nameof(BatchLengthTests.JsonBatch_RowTextNotInWhatTheColumnHolds_422NamingItAndNothingWritten);

    public static readonly ColumnDecision[] All =
    [
        // Households: the sign-up and update body.
        new Validated("Household.Name", 200, nameof(HouseholdValidator), HouseholdOver),
        new Validated("Household.Address.Line1", 200, nameof(AddressValidator), HouseholdOver),
        new Validated("Household.Address.Line2", 200, nameof(AddressValidator), HouseholdOver),
        new Validated("Household.Address.City", 100, nameof(AddressValidator), HouseholdOver),
        new Validated("Household.Address.Region", 100, nameof(AddressValidator), HouseholdOver),
        new Validated("Household.Address.PostalCode", 20, nameof(AddressValidator), HouseholdOver),
        new Validated("Household.Phone", 40, nameof(HouseholdValidator), HouseholdOver),
        new Validated("Household.Email", 254, nameof(HouseholdValidator), HouseholdOver),
        new Validated("Household.ConsentVersion", 50, nameof(HouseholdValidator), HouseholdOver),
        new Validated("Household.AreaCode", 40, $"{nameof(HouseholdValidator)} (pattern of 1 to 40 characters)", HouseholdOver),

        // Areas: the coordinator's list.
        new Validated("Area.Code", 40, $"{nameof(NewAreaValidator)} (pattern of 1 to 40 characters)", AreaOver),
        new Validated("Area.Name", 100, nameof(NewAreaValidator), AreaOver),

        // Kits: reasons, tap notes and the codes the server makes.
        new Validated("Kit.StateReason", 500, $"{nameof(ReasonValidator)}, {nameof(ReplacementValidator)} (else \"replaced by\" a code)", KitReasonOver),
        new Validated("Sample.TapNote", 200, nameof(SampleValidator), KitReasonOver),
        new Bounded("Kit.Code", 16, "a new kit code", () => KitCode.NewCode().Length),
        new Bounded("Kit.ReplacesCode", 16, "a kit's code (the demo's parsed too)", () => MaxLength("Kit.Code")),
        new Bounded("Kit.ReplacedByCode", 16, "a kit's code", () => MaxLength("Kit.Code")),
        new Bounded("Kit.ResultSecretHash", 64, "a SHA-256 in hex", () => Api.Features.Results.ResultSecrets.Hash("K7QD2-M9XAT").Length),
        new Composed("KitFlag.Message", 300, "bottle names, hours and positions 1 to 30 (SampleValidator)",
            nameof(CollectionFlagMessageLengthTests.Flags_WorstCaseWording_FitsTheMessageColumn)),
        new Bounded("Collection.RecordedBy", 100, "an actor's label", ActorLabel),

        // Lab batches: header and rows checked whole by BatchChecker, release reason by its validator.
        new Validated("LabBatch.BatchId", 64, nameof(BatchChecker), BatchHeaderOver),
        new Validated("LabBatch.Method", 100, nameof(BatchChecker), BatchHeaderOver),
        new Validated("LabBatch.CorrectionReason", 500, nameof(BatchChecker), BatchHeaderOver),
        new Validated("LabBatch.ReleaseReason", 500, nameof(ReleaseValidator),
            nameof(BatchLengthTests.Release_ReasonOneCharacterOverItsColumn_400AndTheBatchStaysHeld)),
        new Bounded("LabBatch.ContentHash", 64, "SHA-256 in hex", () => SHA256.HashSizeInBytes * 2),
        new Bounded("LabBatch.Format", 10, "json or csv", () => Math.Max("json".Length, "csv".Length)),
        new Bounded("LabBatch.PostedBy", 100, "an actor's label", ActorLabel),
        new Bounded("LabBatch.ReleasedBy", 100, "an actor's label", ActorLabel),
        new Bounded("LabResult.KitCode", 16, "a kit's code", () => MaxLength("Kit.Code")),
        new Bounded("LabResult.Unit", 10, "an analyte's normal unit", LongestNormalUnit),
        new Validated("LabResult.OriginalUnit", 10, $"{nameof(Units)}.{nameof(Units.TryFactor)} (closed list: µg/L, ug/L, ppb, mg/L, ppm, mg/kg)", BatchRowOver),
        new Validated("LabResult.Qualifier", 2, "ResultRowCheck ('<', 'J' or none)", BatchRowOver),
        new Composed("LabResult.ReplicatesJson", 2000, "at most 20 finite replicates (ResultRowCheck, tested by " + BatchRowOver + ")",
            nameof(BatchLengthTests.Batch_WorstCaseReplicatesAndHoldingFlags_FitTheirColumns)),
        new Composed("LabResult.HoldingFlags", 1000, "two flags at most, worded from day counts and the holding limits",
            nameof(BatchLengthTests.Batch_WorstCaseReplicatesAndHoldingFlags_FitTheirColumns)),
        new Bounded("LabQcEntry.Unit", 10, "an analyte's normal unit", LongestNormalUnit),

        // Interpretation, attention and letters.
        new Bounded("KitInterpretation.KitCode", 16, "a kit's code", () => MaxLength("Kit.Code")),
        new Validated("KitInterpretation.ProfileId", 60, $"{nameof(ProfileReader)}, at start-up",
            nameof(ProfileValidationTests.Read_IdLongerThanItsColumn_IsRefused)),
        new Bounded("KitInterpretation.CreatedBy", 100, "an actor's label", ActorLabel),
        new Bounded("AttentionItem.KitCode", 16, "a kit's code", () => MaxLength("Kit.Code")),
        new Composed("AttentionItem.Detail", 500, "AttentionText: a sentence with one figure, or retest or implausible-result reasons cut to fit; or a batch id (64)",
            nameof(AttentionTextTests.AttentionText_WorstCases_FitTheDetailColumn)),
        new Bounded("AttentionItem.ResolvedBy", 100, "an actor's label", ActorLabel),
        new Validated("AttentionItem.ResolutionNote", 500, $"{nameof(ResolveValidator)} (else a fixed sentence)",
            nameof(AttentionLengthTests.Attention_ResolveNoteOneCharacterOverItsColumn_400AndTheItemStaysOpen)),
        new Bounded("IssuedLetter.KitCode", 16, "a kit's code", () => MaxLength("Kit.Code")),
        new Bounded("IssuedLetter.ProfileId", 60, "its interpretation's profile id", () => MaxLength("KitInterpretation.ProfileId")),
        new Bounded("IssuedLetter.Sha256", 64, "SHA-256 in hex", () => SHA256.HashSizeInBytes * 2),
        new Bounded("IssuedLetter.IssuedBy", 100, "an actor's label", ActorLabel),
        new Bounded("IssuedLetter.SentBy", 100, "an actor's label", ActorLabel),
        new Bounded("IssuedLetter.CatalogVersion", 20, "the wording catalogue's version (messages and letter words)", () => WordingCatalogue.Version.Length),
        new Bounded("IssuedLetter.ReleasedBy", 100, "an actor's label", ActorLabel),

        // Keys and the audit trail.
        new Validated("ApiKey.Label", 100, $"{nameof(ApiKeyService)}.{nameof(ApiKeyService.CreateAsync)} (at most {ApiKeyService.LabelMaxLength})",
            nameof(CommandTests.KeysCreate_LabelOverTheLimit_RefusedSayingItAndNothingWritten)),
        new Bounded("ApiKey.Role", 20, "a role", () => Roles.All.Max(r => r.Length)),
        new Bounded("ApiKey.KeyId", 32, "random bytes in hex", () => ApiKeyService.KeyIdBytes * 2),
        new Bounded("AuditEntry.ActorLabel", 100, "an actor's label", ActorLabel),
        new Bounded("AuditEntry.ActorRole", 20, "a role, or \"unknown\"", () => Roles.All.Append("unknown").Max(r => r.Length)),
        new Bounded("AuditEntry.Subject", 20, "household, kit, lab-batch or key", () => new[] { "household", "kit", "lab-batch", "key" }.Max(s => s.Length)),
        new Bounded("AuditEntry.SubjectKey", 64, "a household id, kit code, batch id or key label", () => new[]
        {
            Guid.Empty.ToString().Length, MaxLength("Kit.Code"), MaxLength("LabBatch.BatchId"), ApiKeyService.LabelMaxLength,
        }.Max()),
        new Bounded("AuditEntry.Action", 40, "a kit action, or a literal such as resolve-attention", () => Enum.GetValues<KitAction>().Select(KebabEnum.Name)
            .Concat(["sign-up", "update", "issue", "post", "post-correction", "release", "resolve-attention", "create-key", "revoke-key"]).Max(a => a.Length)),
        new Bounded("AuditEntry.FromState", 20, "a kit state", LongestState),
        new Bounded("AuditEntry.ToState", 20, "a kit or batch state", LongestState),
        new Bounded("AuditEntry.Reason", 500, "a copy of a validated reason or note", () => new[]
        {
            MaxLength("Kit.StateReason"), MaxLength("LabBatch.CorrectionReason"), MaxLength("LabBatch.ReleaseReason"),
            MaxLength("AttentionItem.ResolutionNote"),
        }.Max()),
        new Composed("AuditEntry.Detail", 1000, "a receipt note (ReceiptValidator, 500, tested by " + KitReasonOver + ") or a summary of counts, codes and field names",
            nameof(HouseholdLengthTests.Household_EveryFieldChanged_AuditDetailFitsItsColumn)),

        new Unlimited("IssuedLetter.ContentJson", "the letter's content, as JSON"),
        new Unlimited("KitInterpretation.OutcomeJson", "the interpretation, as JSON"),
        new Unlimited("LabBatch.QcJson", "the QC verdict, as JSON"),
        new Unlimited("LabBatch.RunJson", "the lab's own run as checked (calibration, positions, XRF), as JSON"),
    ];

    /// <summary>The audit trail and "done by" columns copy the key's label, or name the command line or demo loader.</summary>
    private static int ActorLabel() =>
        new[] { MaxLength("ApiKey.Label"), Actor.CommandLine.Label.Length, "demo-loader".Length, "unknown".Length }.Max();

    private static int LongestNormalUnit() =>
        (from a in Enum.GetValues<Analyte>() from m in Enum.GetValues<Matrix>() select Analytes.NormalUnit(a, m).Length).Max();

    private static int LongestState() =>
        Enum.GetValues<KitState>().Select(KebabEnum.Name).Concat(Enum.GetValues<BatchStatus>().Select(KebabEnum.Name)).Max(s => s.Length);
}
