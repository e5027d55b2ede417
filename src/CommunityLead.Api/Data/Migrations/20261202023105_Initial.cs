using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
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
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    Label = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    Role = table.Column<string>(type: "TEXT", maxLength: 20, nullable: false),
                    KeyId = table.Column<string>(type: "TEXT", maxLength: 32, nullable: false),
                    Salt = table.Column<byte[]>(type: "BLOB", nullable: false),
                    SecretHash = table.Column<byte[]>(type: "BLOB", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    RevokedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ApiKeys", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "AuditTrail",
                columns: table => new
                {
                    Id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    AtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    ActorLabel = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    ActorRole = table.Column<string>(type: "TEXT", maxLength: 20, nullable: false),
                    Subject = table.Column<string>(type: "TEXT", maxLength: 20, nullable: false),
                    SubjectKey = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    Action = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    FromState = table.Column<string>(type: "TEXT", maxLength: 20, nullable: true),
                    ToState = table.Column<string>(type: "TEXT", maxLength: 20, nullable: true),
                    Reason = table.Column<string>(type: "TEXT", maxLength: 500, nullable: true),
                    Detail = table.Column<string>(type: "TEXT", maxLength: 1000, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_AuditTrail", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Households",
                columns: table => new
                {
                    Id = table.Column<Guid>(type: "TEXT", nullable: false),
                    Name = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    Phone = table.Column<string>(type: "TEXT", maxLength: 40, nullable: true),
                    Email = table.Column<string>(type: "TEXT", maxLength: 254, nullable: true),
                    Language = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    ConsentVersion = table.Column<string>(type: "TEXT", maxLength: 50, nullable: false),
                    ConsentGivenAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    AreaCode = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    WaterSource = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    YearBuilt = table.Column<int>(type: "INTEGER", nullable: true),
                    ServiceLine = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    ChildUnder6 = table.Column<bool>(type: "INTEGER", nullable: false),
                    Pregnant = table.Column<bool>(type: "INTEGER", nullable: false),
                    FilterInUse = table.Column<bool>(type: "INTEGER", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    Address_City = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    Address_Line1 = table.Column<string>(type: "TEXT", maxLength: 200, nullable: false),
                    Address_Line2 = table.Column<string>(type: "TEXT", maxLength: 200, nullable: true),
                    Address_PostalCode = table.Column<string>(type: "TEXT", maxLength: 20, nullable: false),
                    Address_Region = table.Column<string>(type: "TEXT", maxLength: 100, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_Households", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "Kits",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    Code = table.Column<string>(type: "TEXT", maxLength: 16, nullable: false),
                    Kind = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    State = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    HouseholdId = table.Column<Guid>(type: "TEXT", nullable: false),
                    IssuedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    UpdatedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    ReceivedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: true),
                    StateReason = table.Column<string>(type: "TEXT", maxLength: 500, nullable: true),
                    ReplacesCode = table.Column<string>(type: "TEXT", maxLength: 16, nullable: true),
                    ReplacedByCode = table.Column<string>(type: "TEXT", maxLength: 16, nullable: true),
                    Version = table.Column<int>(type: "INTEGER", nullable: false)
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
                name: "Collections",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    KitId = table.Column<int>(type: "INTEGER", nullable: false),
                    RecordedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    RecordedBy = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    SupersededAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true)
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
                name: "KitFlags",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    CollectionId = table.Column<int>(type: "INTEGER", nullable: false),
                    Code = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Severity = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    SampleIndex = table.Column<int>(type: "INTEGER", nullable: true),
                    Message = table.Column<string>(type: "TEXT", maxLength: 300, nullable: false)
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
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    CollectionId = table.Column<int>(type: "INTEGER", nullable: false),
                    Index = table.Column<int>(type: "INTEGER", nullable: false),
                    Bottle = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Position = table.Column<int>(type: "INTEGER", nullable: true),
                    Location = table.Column<string>(type: "TEXT", maxLength: 40, nullable: true),
                    VolumeMl = table.Column<int>(type: "INTEGER", nullable: true),
                    CollectedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    CollectedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    WaterLastUsedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: true),
                    FlushSeconds = table.Column<int>(type: "INTEGER", nullable: true),
                    Tap = table.Column<string>(type: "TEXT", maxLength: 60, nullable: true),
                    StandingMinutes = table.Column<int>(type: "INTEGER", nullable: true)
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
                name: "IX_KitFlags_CollectionId",
                table: "KitFlags",
                column: "CollectionId");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_Code",
                table: "Kits",
                column: "Code",
                unique: true);

            migrationBuilder.CreateIndex(
                name: "IX_Kits_HouseholdId",
                table: "Kits",
                column: "HouseholdId");

            migrationBuilder.CreateIndex(
                name: "IX_Kits_State_UpdatedAtUtc",
                table: "Kits",
                columns: new[] { "State", "UpdatedAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_Samples_CollectedAtUtc",
                table: "Samples",
                column: "CollectedAtUtc");

            migrationBuilder.CreateIndex(
                name: "IX_Samples_CollectionId",
                table: "Samples",
                column: "CollectionId");

            // The audit trail is append-only: the database itself refuses to change or remove an entry.
            migrationBuilder.Sql("CREATE TRIGGER AuditTrail_NoUpdate BEFORE UPDATE ON AuditTrail BEGIN SELECT RAISE(ABORT, 'the audit trail is append-only'); END;");
            migrationBuilder.Sql("CREATE TRIGGER AuditTrail_NoDelete BEFORE DELETE ON AuditTrail BEGIN SELECT RAISE(ABORT, 'the audit trail is append-only'); END;");
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS AuditTrail_NoUpdate;");
            migrationBuilder.Sql("DROP TRIGGER IF EXISTS AuditTrail_NoDelete;");

            migrationBuilder.DropTable(
                name: "ApiKeys");

            migrationBuilder.DropTable(
                name: "AuditTrail");

            migrationBuilder.DropTable(
                name: "KitFlags");

            migrationBuilder.DropTable(
                name: "Samples");

            migrationBuilder.DropTable(
                name: "Collections");

            migrationBuilder.DropTable(
                name: "Kits");

            migrationBuilder.DropTable(
                name: "Households");
        }
    }
}
