using Microsoft.EntityFrameworkCore.Migrations;

#nullable disable

namespace CommunityLead.Api.Data.Migrations.Postgres
{
    /// <inheritdoc />
    public partial class ReportInputsVersion : Migration
    {
        /// <inheritdoc />
        protected override void Up(MigrationBuilder migrationBuilder)
        {
            migrationBuilder.CreateTable(
                name: "ReportInputs",
                columns: table => new
                {
                    Id = table.Column<int>(type: "integer", nullable: false),
                    Version = table.Column<long>(type: "bigint", nullable: false)
                },
                constraints: table =>
                {
                    table.PrimaryKey("PK_ReportInputs", x => x.Id);
                });

            migrationBuilder.InsertData(
                table: "ReportInputs",
                columns: new[] { "Id", "Version" },
                values: new object[] { 1, 0L });

            // Every write to what a health report counts raises the version, whichever code wrote it. The trigger is
            // deferred to commit and raises the version once per transaction, so the single row is locked only while
            // a transaction commits: writers never wait on it mid-transaction, and no deadlock can form around it.
            migrationBuilder.Sql("""
                CREATE FUNCTION report_inputs_changed() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN
                    IF current_setting('communitylead.report_inputs_txid', true) IS DISTINCT FROM txid_current()::text THEN
                        PERFORM set_config('communitylead.report_inputs_txid', txid_current()::text, true);
                        UPDATE "ReportInputs" SET "Version" = "Version" + 1;
                    END IF;
                    RETURN NULL;
                END;
                $$;
                """);
            // TRUNCATE fires no row trigger: a statement trigger of its own catches it.
            foreach (var (table, columns) in ReportInputsVersionTables.Inputs)
                migrationBuilder.Sql($"""
                    CREATE CONSTRAINT TRIGGER "{table}_ReportInputs" AFTER INSERT OR UPDATE OF {columns} OR DELETE ON "{table}"
                        DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION report_inputs_changed();
                    CREATE TRIGGER "{table}_ReportInputs_Truncate" AFTER TRUNCATE ON "{table}"
                        FOR EACH STATEMENT EXECUTE FUNCTION report_inputs_changed();
                    """);
        }

        /// <inheritdoc />
        protected override void Down(MigrationBuilder migrationBuilder)
        {
            foreach (var (table, _) in ReportInputsVersionTables.Inputs)
                migrationBuilder.Sql($"""
                    DROP TRIGGER IF EXISTS "{table}_ReportInputs_Truncate" ON "{table}";
                    DROP TRIGGER IF EXISTS "{table}_ReportInputs" ON "{table}";
                    """);
            migrationBuilder.Sql("DROP FUNCTION IF EXISTS report_inputs_changed();");
            migrationBuilder.DropTable(
                name: "ReportInputs");
        }
    }
}
