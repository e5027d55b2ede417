using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class LabResults : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "Attention",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    KitId = table.Column<int>(type: "INTEGER", nullable: false),
                    KitCode = table.Column<string>(type: "TEXT", maxLength: 16, nullable: false),
                    Reason = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Detail = table.Column<string>(type: "TEXT", maxLength: 500, nullable: false),
                    RaisedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    ResolvedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true)
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
                name: "LabBatches",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    BatchId = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    Version = table.Column<int>(type: "INTEGER", nullable: false),
                    CorrectionReason = table.Column<string>(type: "TEXT", maxLength: 500, nullable: true),
                    Method = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    AnalyzedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    AnalyzedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    ContentHash = table.Column<string>(type: "TEXT", maxLength: 64, nullable: false),
                    Format = table.Column<string>(type: "TEXT", maxLength: 10, nullable: false),
                    Status = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    QcJson = table.Column<string>(type: "TEXT", nullable: false),
                    ResultCount = table.Column<int>(type: "INTEGER", nullable: false),
                    PostedBy = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    PostedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    ReleasedBy = table.Column<string>(type: "TEXT", maxLength: 100, nullable: true),
                    ReleasedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true),
                    ReleaseReason = table.Column<string>(type: "TEXT", maxLength: 500, nullable: true)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_LabBatches", x => x.Id);
                });

            migrationBuilder.CreateTable(
                name: "LabQc",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    LabBatchId = table.Column<int>(type: "INTEGER", nullable: false),
                    Type = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Analyte = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Expected = table.Column<double>(type: "REAL", nullable: true),
                    Measured = table.Column<double>(type: "REAL", nullable: true),
                    Unspiked = table.Column<double>(type: "REAL", nullable: true),
                    SpikeAdded = table.Column<double>(type: "REAL", nullable: true),
                    Duplicate = table.Column<double>(type: "REAL", nullable: true),
                    Unit = table.Column<string>(type: "TEXT", maxLength: 10, nullable: false)
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
                name: "LabResults",
                columns: table => new
                {
                    Id = table.Column<long>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    LabBatchId = table.Column<int>(type: "INTEGER", nullable: false),
                    KitId = table.Column<int>(type: "INTEGER", nullable: false),
                    KitCode = table.Column<string>(type: "TEXT", maxLength: 16, nullable: false),
                    Bottle = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Position = table.Column<int>(type: "INTEGER", nullable: true),
                    Location = table.Column<string>(type: "TEXT", maxLength: 40, nullable: true),
                    Analyte = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    Value = table.Column<double>(type: "REAL", nullable: false),
                    Unit = table.Column<string>(type: "TEXT", maxLength: 10, nullable: false),
                    OriginalValue = table.Column<double>(type: "REAL", nullable: false),
                    OriginalUnit = table.Column<string>(type: "TEXT", maxLength: 10, nullable: false),
                    Qualifier = table.Column<string>(type: "TEXT", maxLength: 2, nullable: true),
                    Mdl = table.Column<double>(type: "REAL", nullable: false),
                    ReportingLimit = table.Column<double>(type: "REAL", nullable: false),
                    Uncertainty = table.Column<double>(type: "REAL", nullable: true),
                    ReplicatesJson = table.Column<string>(type: "TEXT", maxLength: 2000, nullable: true),
                    AcidifiedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: true),
                    CollectedAt = table.Column<DateTimeOffset>(type: "TEXT", nullable: false),
                    HoldingFlags = table.Column<string>(type: "TEXT", maxLength: 1000, nullable: true),
                    SupersededAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true)
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

            migrationBuilder.CreateIndex(
                name: "IX_Attention_KitId",
                table: "Attention",
                column: "KitId");

            migrationBuilder.CreateIndex(
                name: "IX_Attention_ResolvedAtUtc_RaisedAtUtc",
                table: "Attention",
                columns: new[] { "ResolvedAtUtc", "RaisedAtUtc" });

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
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "Attention");

            migrationBuilder.DropTable(
                name: "LabQc");

            migrationBuilder.DropTable(
                name: "LabResults");

            migrationBuilder.DropTable(
                name: "LabBatches");
        }
    }
}
