using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations.Postgres
{
    /// <inheritdoc />
    public partial class AttentionItemInterpretation : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.AddColumn<int>(
                name: "InterpretationId",
                table: "Attention",
                type: "integer",
                nullable: true);

            // Implausible is ranked right after Urgent, so every other flag moves down one place on the list.
            migrationBuilder.Sql("""UPDATE "Attention" SET "Priority" = "Priority" + 1 WHERE "Priority" >= 1;""");
            // Items an interpretation raised carry its time: link them to it, so the open urgent items of a kit's
            // current interpretation hold its letter back as new ones do. Items of lab corrections stay unlinked.
            migrationBuilder.Sql("""
                UPDATE "Attention" SET "InterpretationId" = (
                    SELECT i."Id" FROM "Interpretations" AS i
                    WHERE i."KitId" = "Attention"."KitId" AND i."CreatedAtUtc" = "Attention"."RaisedAtUtc"
                    ORDER BY i."Id" DESC LIMIT 1)
                WHERE "Reason" <> 'CorrectedAfterLetter';
                """);

            migrationBuilder.CreateIndex(
                name: "IX_Attention_InterpretationId",
                table: "Attention",
                column: "InterpretationId");

            migrationBuilder.AddForeignKey(
                name: "FK_Attention_Interpretations_InterpretationId",
                table: "Attention",
                column: "InterpretationId",
                principalTable: "Interpretations",
                principalColumn: "Id",
                onDelete: ReferentialAction.Restrict);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.Sql("""UPDATE "Attention" SET "Priority" = "Priority" - 1 WHERE "Priority" >= 2;""");

            migrationBuilder.DropForeignKey(
                name: "FK_Attention_Interpretations_InterpretationId",
                table: "Attention");

            migrationBuilder.DropIndex(
                name: "IX_Attention_InterpretationId",
                table: "Attention");

            migrationBuilder.DropColumn(
                name: "InterpretationId",
                table: "Attention");
        }
    }
}
