using System;
using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations
{
    /// <inheritdoc />
    public partial class Interpretation : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropIndex(
                name: "IX_Attention_ResolvedAtUtc_RaisedAtUtc",
                table: "Attention");

            migrationBuilder.AddColumn<int>(
                name: "Priority",
                table: "Attention",
                type: "INTEGER",
                nullable: false,
                defaultValue: 0);

            migrationBuilder.AddColumn<string>(
                name: "ResolutionNote",
                table: "Attention",
                type: "TEXT",
                maxLength: 500,
                nullable: true);

            migrationBuilder.AddColumn<string>(
                name: "ResolvedBy",
                table: "Attention",
                type: "TEXT",
                maxLength: 100,
                nullable: true);

            migrationBuilder.CreateTable(
                name: "Interpretations",
                columns: table => new
                {
                    Id = table.Column<int>(type: "INTEGER", nullable: false)
                        .Annotation("Sqlite:Autoincrement", true),
                    KitId = table.Column<int>(type: "INTEGER", nullable: false),
                    KitCode = table.Column<string>(type: "TEXT", maxLength: 16, nullable: false),
                    Band = table.Column<string>(type: "TEXT", maxLength: 40, nullable: false),
                    ProfileId = table.Column<string>(type: "TEXT", maxLength: 60, nullable: false),
                    ProfileVersion = table.Column<int>(type: "INTEGER", nullable: false),
                    OutcomeJson = table.Column<string>(type: "TEXT", nullable: false),
                    CreatedAtUtc = table.Column<DateTime>(type: "TEXT", nullable: false),
                    CreatedBy = table.Column<string>(type: "TEXT", maxLength: 100, nullable: false),
                    SupersededAtUtc = table.Column<DateTime>(type: "TEXT", nullable: true)
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

            migrationBuilder.CreateIndex(
                name: "IX_Attention_ResolvedAtUtc_Priority_RaisedAtUtc",
                table: "Attention",
                columns: new[] { "ResolvedAtUtc", "Priority", "RaisedAtUtc" });

            migrationBuilder.CreateIndex(
                name: "IX_Interpretations_KitId_SupersededAtUtc",
                table: "Interpretations",
                columns: new[] { "KitId", "SupersededAtUtc" });
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.DropTable(
                name: "Interpretations");

            migrationBuilder.DropIndex(
                name: "IX_Attention_ResolvedAtUtc_Priority_RaisedAtUtc",
                table: "Attention");

            migrationBuilder.DropColumn(
                name: "Priority",
                table: "Attention");

            migrationBuilder.DropColumn(
                name: "ResolutionNote",
                table: "Attention");

            migrationBuilder.DropColumn(
                name: "ResolvedBy",
                table: "Attention");

            migrationBuilder.CreateIndex(
                name: "IX_Attention_ResolvedAtUtc_RaisedAtUtc",
                table: "Attention",
                columns: new[] { "ResolvedAtUtc", "RaisedAtUtc" });
        }
    }
}
