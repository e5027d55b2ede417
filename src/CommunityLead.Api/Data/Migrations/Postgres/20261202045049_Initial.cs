using System;
using Microsoft.EntityFrameworkCore.Migrations;
using Npgsql.EntityFrameworkCore.PostgreSQL.Metadata;

#nullable disable

namespace CommunityLead.Api.Data.Migrations.Postgres
{
    /// <inheritdoc />
    public partial class Initial : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "ApiKeys",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    Label = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    Role = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    KeyId = table.Column<string>(type: "character varying(32)", maxLength: 32, nullable: false),
                    Salt = table.Column<byte[]>(type: "bytea", nullable: false),
                    SecretHash = table.Column<byte[]>(type: "bytea", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    RevokedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ApiKeys", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AuditTrail",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    AtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    ActorLabel = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    ActorRole = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    Subject = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    SubjectKey = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Action = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    FromState = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: true),
                    ToState = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: true),
                    Reason = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true),
                    Detail = table.Column<string>(type: "character varying(1000)", maxLength: 1000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AuditTrail", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Households",
                columns: table => new
                {
                    Id = table.Column<Guid>(type: "uuid", nullable: false),
                    Name = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    Phone = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Email = table.Column<string>(type: "character varying(254)", maxLength: 254, nullable: true),
                    Language = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    ConsentVersion = table.Column<string>(type: "character varying(50)", maxLength: 50, nullable: false),
                    ConsentGivenAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    AreaCode = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    WaterSource = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    YearBuilt = table.Column<int>(type: "integer", nullable: true),
                    ServiceLine = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    ChildUnder6 = table.Column<bool>(type: "boolean", nullable: false),
                    Pregnant = table.Column<bool>(type: "boolean", nullable: false),
                    FilterInUse = table.Column<bool>(type: "boolean", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    UpdatedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    Address_City = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    Address_Line1 = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: false),
                    Address_Line2 = table.Column<string>(type: "character varying(200)", maxLength: 200, nullable: true),
                    Address_PostalCode = table.Column<string>(type: "character varying(20)", maxLength: 20, nullable: false),
                    Address_Region = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Households", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "LabBatches",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    BatchId = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Version = table.Column<int>(type: "integer", nullable: false),
                    CorrectionReason = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true),
                    Method = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    AnalyzedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    AnalyzedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    ContentHash = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Format = table.Column<string>(type: "character varying(10)", maxLength: 10, nullable: false),
                    Status = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    QcJson = table.Column<string>(type: "text", nullable: false),
                    ResultCount = table.Column<int>(type: "integer", nullable: false),
                    PostedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    PostedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    ReleasedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: true),
                    ReleasedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true),
                    ReleaseReason = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_LabBatches", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Kits",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    Code = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    Kind = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    State = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    HouseholdId = table.Column<Guid>(type: "uuid", nullable: false),
                    IssuedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    UpdatedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    ReceivedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    StateReason = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true),
                    ReplacesCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: true),
                    ReplacedByCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: true),
                    CollectedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true),
                    PeriodMonth = table.Column<int>(type: "integer", nullable: false),
                    Band = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    LeadBand = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    CopperBand = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Version = table.Column<int>(type: "integer", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Kits", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Kits_Households_HouseholdId",
                        column: x => x.HouseholdId,
                        principalTable: "Households",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "LabQc",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    LabBatchId = table.Column<int>(type: "integer", nullable: false),
                    Type = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Analyte = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Expected = table.Column<double>(type: "double precision", nullable: true),
                    Measured = table.Column<double>(type: "double precision", nullable: true),
                    Unspiked = table.Column<double>(type: "double precision", nullable: true),
                    SpikeAdded = table.Column<double>(type: "double precision", nullable: true),
                    Duplicate = table.Column<double>(type: "double precision", nullable: true),
                    Unit = table.Column<string>(type: "character varying(10)", maxLength: 10, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_LabQc", x => x.Id);
                    table.ForeignKey(
                        name: "FK_LabQc_LabBatches_LabBatchId",
                        column: x => x.LabBatchId,
                        principalTable: "LabBatches",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "Attention",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    KitId = table.Column<int>(type: "integer", nullable: false),
                    KitCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    Reason = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Priority = table.Column<int>(type: "integer", nullable: false),
                    Detail = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: false),
                    RaisedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    ResolvedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true),
                    ResolvedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: true),
                    ResolutionNote = table.Column<string>(type: "character varying(500)", maxLength: 500, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Attention", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Attention_Kits_KitId",
                        column: x => x.KitId,
                        principalTable: "Kits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "Collections",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    KitId = table.Column<int>(type: "integer", nullable: false),
                    RecordedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    RecordedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    SupersededAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Collections", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Collections_Kits_KitId",
                        column: x => x.KitId,
                        principalTable: "Kits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "Interpretations",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    KitId = table.Column<int>(type: "integer", nullable: false),
                    KitCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    Band = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    ProfileId = table.Column<string>(type: "character varying(60)", maxLength: 60, nullable: false),
                    ProfileVersion = table.Column<int>(type: "integer", nullable: false),
                    OutcomeJson = table.Column<string>(type: "text", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    CreatedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    SupersededAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Interpretations", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Interpretations_Kits_KitId",
                        column: x => x.KitId,
                        principalTable: "Kits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "LabResults",
                columns: table => new
                {
                    Id = table.Column<long>(type: "bigint", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    LabBatchId = table.Column<int>(type: "integer", nullable: false),
                    KitId = table.Column<int>(type: "integer", nullable: false),
                    KitCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    Bottle = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Position = table.Column<int>(type: "integer", nullable: true),
                    Location = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    Analyte = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Value = table.Column<double>(type: "double precision", nullable: false),
                    Unit = table.Column<string>(type: "character varying(10)", maxLength: 10, nullable: false),
                    OriginalValue = table.Column<double>(type: "double precision", nullable: false),
                    OriginalUnit = table.Column<string>(type: "character varying(10)", maxLength: 10, nullable: false),
                    Qualifier = table.Column<string>(type: "character varying(2)", maxLength: 2, nullable: true),
                    Mdl = table.Column<double>(type: "double precision", nullable: false),
                    ReportingLimit = table.Column<double>(type: "double precision", nullable: false),
                    Uncertainty = table.Column<double>(type: "double precision", nullable: true),
                    ReplicatesJson = table.Column<string>(type: "character varying(2000)", maxLength: 2000, nullable: true),
                    AcidifiedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    CollectedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    HoldingFlags = table.Column<string>(type: "character varying(1000)", maxLength: 1000, nullable: true),
                    SupersededAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_LabResults", x => x.Id);
                    table.ForeignKey(
                        name: "FK_LabResults_Kits_KitId",
                        column: x => x.KitId,
                        principalTable: "Kits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_LabResults_LabBatches_LabBatchId",
                        column: x => x.LabBatchId,
                        principalTable: "LabBatches",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "KitFlags",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    CollectionId = table.Column<int>(type: "integer", nullable: false),
                    Code = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Severity = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    SampleIndex = table.Column<int>(type: "integer", nullable: true),
                    Message = table.Column<string>(type: "character varying(300)", maxLength: 300, nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_KitFlags", x => x.Id);
                    table.ForeignKey(
                        name: "FK_KitFlags_Collections_CollectionId",
                        column: x => x.CollectionId,
                        principalTable: "Collections",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "Samples",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    CollectionId = table.Column<int>(type: "integer", nullable: false),
                    Index = table.Column<int>(type: "integer", nullable: false),
                    Bottle = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Position = table.Column<int>(type: "integer", nullable: true),
                    Location = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    VolumeMl = table.Column<int>(type: "integer", nullable: true),
                    CollectedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    CollectedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    WaterLastUsedAt = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: true),
                    FlushSeconds = table.Column<int>(type: "integer", nullable: true),
                    Tap = table.Column<string>(type: "character varying(60)", maxLength: 60, nullable: true),
                    StandingMinutes = table.Column<int>(type: "integer", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Samples", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Samples_Collections_CollectionId",
                        column: x => x.CollectionId,
                        principalTable: "Collections",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateTable(
                name: "Letters",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false)
                        .Annotation("Npgsql:ValueGenerationStrategy", NpgsqlValueGenerationStrategy.IdentityByDefaultColumn),
                    KitId = table.Column<int>(type: "integer", nullable: false),
                    KitCode = table.Column<string>(type: "character varying(16)", maxLength: 16, nullable: false),
                    InterpretationId = table.Column<int>(type: "integer", nullable: false),
                    ProfileId = table.Column<string>(type: "character varying(60)", maxLength: 60, nullable: false),
                    ProfileVersion = table.Column<int>(type: "integer", nullable: false),
                    Language = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    Kind = table.Column<string>(type: "character varying(40)", maxLength: 40, nullable: false),
                    ContentJson = table.Column<string>(type: "text", nullable: false),
                    Sha256 = table.Column<string>(type: "character varying(64)", maxLength: 64, nullable: false),
                    Pages = table.Column<int>(type: "integer", nullable: false),
                    IssuedAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: false),
                    IssuedBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: false),
                    CollectedOn = table.Column<DateOnly>(type: "date", nullable: false),
                    SentAtUtc = table.Column<DateTime>(type: "timestamp with time zone", nullable: true),
                    SentBy = table.Column<string>(type: "character varying(100)", maxLength: 100, nullable: true),
                    DaysFromCollection = table.Column<int>(type: "integer", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Letters", x => x.Id);
                    table.ForeignKey(
                        name: "FK_Letters_Interpretations_InterpretationId",
                        column: x => x.InterpretationId,
                        principalTable: "Interpretations",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                    table.ForeignKey(
                        name: "FK_Letters_Kits_KitId",
                        column: x => x.KitId,
                        principalTable: "Kits",
                        principalColumn: "Id",
                        onDelete: ReferentialAction.Restrict);
                });

            migrationBuilder.CreateIndex(
                name: "IX_ApiKeys_KeyId",
                table: "ApiKeys",
                column: "KeyId",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_ApiKeys_Label",
                table: "ApiKeys",
                column: "Label",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_Attention_KitId",
                table: "Attention",
                column: "KitId");

            migrationBuilder.CreateIndex(
                name: "IX_Attention_ResolvedAtUtc_Priority_RaisedAtUtc",
                table: "Attention",
                columns: new[] { "ResolvedAtUtc", "Priority", "RaisedAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_AuditTrail_Subject_SubjectKey",
                table: "AuditTrail",
                columns: new[] { "Subject", "SubjectKey" });

            migrationBuilder.CreateIndex(
                name: "IX_Collections_KitId_SupersededAtUtc",
                table: "Collections",
                columns: new[] { "KitId", "SupersededAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_Households_AreaCode",
                table: "Households",
                column: "AreaCode");

            migrationBuilder.CreateIndex(
                name: "IX_Interpretations_KitId_SupersededAtUtc",
                table: "Interpretations",
                columns: new[] { "KitId", "SupersededAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_KitFlags_CollectionId",
                table: "KitFlags",
                column: "CollectionId");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_Code",
                table: "Kits",
                column: "Code",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_Kits_CollectedAtUtc",
                table: "Kits",
                column: "CollectedAtUtc");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_HouseholdId",
                table: "Kits",
                column: "HouseholdId");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_PeriodMonth",
                table: "Kits",
                column: "PeriodMonth");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_State_UpdatedAtUtc",
                table: "Kits",
                columns: new[] { "State", "UpdatedAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_LabBatches_BatchId_Version",
                table: "LabBatches",
                columns: new[] { "BatchId", "Version" },
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_LabBatches_Status",
                table: "LabBatches",
                column: "Status");

            migrationBuilder.CreateIndex(
                name: "IX_LabQc_LabBatchId",
                table: "LabQc",
                column: "LabBatchId");

            migrationBuilder.CreateIndex(
                name: "IX_LabResults_KitId_SupersededAtUtc",
                table: "LabResults",
                columns: new[] { "KitId", "SupersededAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_LabResults_LabBatchId",
                table: "LabResults",
                column: "LabBatchId");

            migrationBuilder.CreateIndex(
                name: "IX_Letters_InterpretationId",
                table: "Letters",
                column: "InterpretationId");

            migrationBuilder.CreateIndex(
                name: "IX_Letters_KitId_IssuedAtUtc",
                table: "Letters",
                columns: new[] { "KitId", "IssuedAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_Letters_SentAtUtc",
                table: "Letters",
                column: "SentAtUtc");

            migrationBuilder.CreateIndex(
                name: "IX_Samples_CollectedAtUtc",
                table: "Samples",
                column: "CollectedAtUtc");

            migrationBuilder.CreateIndex(
                name: "IX_Samples_CollectionId",
                table: "Samples",
                column: "CollectionId");

            // The audit trail is append-only: the database itself refuses to change or remove an entry,
            // TRUNCATE included (a row trigger alone would not see it).
            migrationBuilder.Sql("""
                CREATE FUNCTION audit_trail_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN
                    RAISE EXCEPTION 'the audit trail is append-only';
                END;
                $$;
                CREATE TRIGGER "AuditTrail_NoChange" BEFORE UPDATE OR DELETE ON "AuditTrail"
                    FOR EACH ROW EXECUTE FUNCTION audit_trail_append_only();
                CREATE TRIGGER "AuditTrail_NoTruncate" BEFORE TRUNCATE ON "AuditTrail"
                    FOR EACH STATEMENT EXECUTE FUNCTION audit_trail_append_only();
                """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("""
                DROP TRIGGER IF EXISTS "AuditTrail_NoTruncate" ON "AuditTrail";
                DROP TRIGGER IF EXISTS "AuditTrail_NoChange" ON "AuditTrail";
                DROP FUNCTION IF EXISTS audit_trail_append_only();
                """);

            migrationBuilder.DropTable(
                name: "ApiKeys");

            migrationBuilder.DropTable(
                name: "Attention");

            migrationBuilder.DropTable(
                name: "AuditTrail");

            migrationBuilder.DropTable(
                name: "KitFlags");

            migrationBuilder.DropTable(
                name: "LabQc");

            migrationBuilder.DropTable(
                name: "LabResults");

            migrationBuilder.DropTable(
                name: "Letters");

            migrationBuilder.DropTable(
                name: "Samples");

            migrationBuilder.DropTable(
                name: "LabBatches");

            migrationBuilder.DropTable(
                name: "Interpretations");

            migrationBuilder.DropTable(
                name: "Collections");

            migrationBuilder.DropTable(
                name: "Kits");

            migrationBuilder.DropTable(
                name: "Households");
        }
    }
}
