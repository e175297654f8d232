package org.stellabar.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.stellabar.eos.Composition;
import org.stellabar.eos.EosInversion;
import org.stellabar.eos.GasRadiationEos;
import org.stellabar.output.CsvTableReader;
import org.stellabar.physics.Constants;
import org.stellabar.table.CellTable;

class AuditCommandTest {

    @TempDir
    Path dir;

    private record Run(int status, String out, String err) {
        JsonNode json() throws Exception {
            return new ObjectMapper().readTree(out);
        }
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        picocli.CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        String[] all = new String[args.length + 1];
        all[0] = "audit";
        System.arraycopy(args, 0, all, 1, args.length);
        int status = cl.execute(all);
        return new Run(status, out.toString(), err.toString());
    }

    /**
     * Closed-form n = 1 polytrope θ = sin ξ/ξ (Chandrasekhar 1939, ch. IV) of 10 Msun and 5 Rsun,
     * X = 0.7, Z = 0.02 (invented test values), T from our own (ρ, P) inversion, stopping at
     * ξ = 0.99π; rows {@code wrongFrom..wrongTo} (data-row numbers, centre first) get P × 1.01.
     */
    private static List<double[]> polytrope(int points) {
        double mass = 10 * Constants.SOLAR_MASS;
        double radius = 5 * Constants.SOLAR_RADIUS;
        double alpha = radius / Math.PI;
        double rhoC = Math.PI * mass / (4.0 * radius * radius * radius);
        double k = 2.0 * Math.PI * Constants.GRAVITATION * alpha * alpha;
        EosInversion inversion = new EosInversion(new GasRadiationEos(Composition.of(0.7, 0.28, 0.02)));
        List<double[]> rows = new ArrayList<>();
        for (int i = 0; i < points; i++) {
            double xi = 0.99 * Math.PI * i / (points - 1);
            double theta = xi == 0 ? 1 : Math.sin(xi) / xi;
            double rho = rhoC * theta;
            double p = k * rho * rho;
            double m = 4 * Math.PI * alpha * alpha * alpha * rhoC * (Math.sin(xi) - xi * Math.cos(xi));
            rows.add(new double[] {alpha * xi, m, rho, inversion.temperature(rho, p), p});
        }
        return rows;
    }

    private Path cgsCentreFirst(String name, int points, int wrongFrom, int wrongTo) throws Exception {
        List<String> lines = new ArrayList<>();
        lines.add("# n = 1 polytrope for the audit tests");
        lines.add("r [cm],m [g],rho [g/cm3],T [K],P [dyn/cm2]");
        int row = 0;
        for (double[] v : polytrope(points)) {
            row++;
            double p = row >= wrongFrom && row <= wrongTo ? v[4] * 1.01 : v[4];
            lines.add(v[0] + "," + v[1] + "," + v[2] + "," + v[3] + "," + p);
        }
        Path file = dir.resolve(name);
        Files.write(file, lines);
        return file;
    }

    private Path siSurfaceFirst(String name, int points, int wrongFrom, int wrongTo) throws Exception {
        List<double[]> rows = polytrope(points);
        List<String> lines = new ArrayList<>();
        lines.add("radius_m,mass_kg,density,temp,pressure");
        for (int i = points - 1; i >= 0; i--) {
            double[] v = rows.get(i);
            int centreRow = i + 1;
            double p = centreRow >= wrongFrom && centreRow <= wrongTo ? v[4] * 1.01 : v[4];
            lines.add(String.format(Locale.ROOT, "%s,%s,%s,%s,%s", v[0] / 100, v[1] / 1000, v[2] * 1000, v[3], p / 10));
        }
        Path file = dir.resolve(name);
        Files.write(file, lines);
        return file;
    }

    @Test
    void jsonCarriesTheContractFieldsAndEveryShell() throws Exception {
        Run r = run(cgsCentreFirst("p.csv", 80, 0, -1).toString(), "--format", "json");
        assertEquals(0, r.status(), r.err());
        JsonNode j = r.json();
        for (String field : new String[] {"Gamma1_mean", "virial_ratio", "max_pressure_mismatch", "flagged_rows",
                "shells", "beta_centre", "radiation_dominated_mass_fraction", "zones"}) {
            assertTrue(j.has(field), field);
        }
        assertTrue(j.get("max_pressure_mismatch").asDouble() < 1e-12);
        assertEquals(0, j.get("flagged_rows").size());
        assertEquals(80, j.get("shells").get("rows").asInt());
        // the Gamma1 of a gas-dominated star sits just below 5/3
        double g = j.get("Gamma1_mean").asDouble();
        assertTrue(g > 4.0 / 3.0 && g < 5.0 / 3.0, "" + g);
    }

    @Test
    void wrongPressureBandIsFlaggedInExactlyThoseRows() throws Exception {
        JsonNode j = run(cgsCentreFirst("band.csv", 90, 31, 37).toString(), "--format", "json").json();
        List<Integer> flagged = new ArrayList<>();
        j.get("flagged_rows").forEach(n -> flagged.add(n.asInt()));
        assertEquals(List.of(31, 32, 33, 34, 35, 36, 37), flagged);
        assertEquals(0.01, j.get("max_pressure_mismatch").asDouble(), 1e-12);
    }

    @Test
    void siSurfaceFirstGivesTheSameAuditAsCgsCentreFirst() throws Exception {
        int n = 90;
        JsonNode cgs = run(cgsCentreFirst("cgs.csv", n, 31, 37).toString(), "--format", "json").json();
        Run si = run(siSurfaceFirst("si.csv", n, 31, 37).toString(), "--columns",
                "r=radius_m,m=mass_kg,rho=density,T=temp,P=pressure", "--units", "r=m,m=kg,rho=kg/m3,P=Pa",
                "--format", "json");
        assertEquals(0, si.status(), si.err());
        JsonNode s = si.json();
        assertEquals("surface first", s.get("order").asText());
        // values went through a decimal print and powers of ten: agreement to rounding
        for (String f : new String[] {"Gamma1_mean", "virial_ratio", "beta_centre", "M", "R", "mu_mean"}) {
            assertEquals(cgs.get(f).asDouble(), s.get(f).asDouble(), 1e-13 * Math.abs(cgs.get(f).asDouble()), f);
        }
        assertEquals(cgs.get("max_pressure_mismatch").asDouble(), s.get("max_pressure_mismatch").asDouble(), 1e-13);
        assertEquals(cgs.get("rms_hydrostatic_residual").asDouble(), s.get("rms_hydrostatic_residual").asDouble(), 1e-10);
        // the same shells are flagged; in the surface-first file centre row k is data row n + 1 - k
        List<Integer> mirrored = new ArrayList<>();
        s.get("flagged_rows").forEach(x -> mirrored.add(n + 1 - x.asInt()));
        mirrored.sort(null);
        List<Integer> direct = new ArrayList<>();
        cgs.get("flagged_rows").forEach(x -> direct.add(x.asInt()));
        assertEquals(direct, mirrored);
    }

    @Test
    void outWritesTableSummaryAndReport() throws Exception {
        Path out = dir.resolve("audit");
        Run r = run(cgsCentreFirst("p.csv", 50, 10, 12).toString(), "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        assertTrue(r.out().contains("flagged_rows") && r.out().contains("10-12"), r.out());
        CellTable shells = new CsvTableReader().read(out.resolve("shells.csv"));
        // every input column is kept beside ours, with its unit
        for (String c : new String[] {"row", "r [cm]", "m [g]", "rho [g/cm3]", "T [K]", "P [erg/cm3]", "P_eos [erg/cm3]",
                "beta", "Gamma1_eos", "P_rel_diff", "hydrostatic_residual", "warnings"}) {
            assertTrue(shells.header().contains(c), c + " in " + shells.header());
        }
        assertEquals(50, shells.rows().size());
        JsonNode summary = new ObjectMapper().readTree(out.resolve("summary.json").toFile());
        assertEquals(3, summary.get("flagged_rows").size());
        for (String chart : new String[] {"audit-beta-gamma1", "audit-pressure", "audit-hydrostatic"}) {
            for (String ext : new String[] {"png", "svg", "pdf"}) {
                for (String width : new String[] {"1col", "2col"}) {
                    Path f = out.resolve(chart + "-" + width + "." + ext);
                    assertTrue(Files.size(f) > 1000, f + " written");
                }
            }
        }
        String report = Files.readString(out.resolve("report.md"));
        assertTrue(report.contains("## Assumptions") && report.contains("three-point")
                && report.contains("10-12") && report.contains("audit-beta-gamma1-1col.png"), report);
    }

    /** The same polytrope as a FITS binary table in solar units (TUNIT solRad, solMass ...). */
    private Path fits(String name, int points, int nanRow) throws Exception {
        List<double[]> rows = polytrope(points);
        double[][] cols = new double[5][points];
        for (int i = 0; i < points; i++) {
            double[] v = rows.get(i);
            cols[0][i] = v[0] / Constants.SOLAR_RADIUS;
            cols[1][i] = v[1] / Constants.SOLAR_MASS;
            cols[2][i] = v[2];
            cols[3][i] = i + 1 == nanRow ? Double.NaN : v[3];
            cols[4][i] = v[4];
        }
        // NaN cannot sit in our tables (they refuse non-finite numbers), so the FITS file with a
        // blank is written with a finite placeholder and the column patched through nom-tam-fits
        org.stellabar.table.Table table = new org.stellabar.table.Table.Builder("profile",
                org.stellabar.table.Metadata.of("test profile", org.stellabar.table.Inputs.none(), List.of()))
                .number("r", "Rsun", "radius", cols[0]).number("m", "Msun", "mass", cols[1])
                .number("rho", "g/cm3", "density", cols[2])
                .number("T", "K", "temperature", nanRow > 0 ? fill(cols[3]) : cols[3])
                .number("P", "dyn/cm2", "pressure", cols[4]).build();
        Path file = dir.resolve(name);
        new org.stellabar.output.FitsWriter().write(table, file);
        if (nanRow > 0) {
            try (nom.tam.fits.Fits f = new nom.tam.fits.Fits(file.toFile())) {
                nom.tam.fits.BinaryTableHDU hdu = (nom.tam.fits.BinaryTableHDU) f.getHDU(1);
                hdu.getData().setElement(nanRow - 1, 3, new double[] {Double.NaN});
                Path patched = dir.resolve("patched-" + name);
                f.write(patched.toFile());
                return patched;
            }
        }
        return file;
    }

    private static double[] fill(double[] values) {
        double[] out = values.clone();
        for (int i = 0; i < out.length; i++) {
            if (Double.isNaN(out[i])) {
                out[i] = 1.0;
            }
        }
        return out;
    }

    @Test
    void fitsProfileAuditsLikeItsCsvTwin() throws Exception {
        JsonNode csv = run(cgsCentreFirst("p.csv", 60, 0, -1).toString(), "--format", "json").json();
        Run fits = run(fits("p.fits", 60, 0).toString(), "--format", "json");
        assertEquals(0, fits.status(), fits.err());
        JsonNode j = fits.json();
        // solar units and back: a few ulp
        for (String f : new String[] {"Gamma1_mean", "virial_ratio", "beta_centre", "M", "R"}) {
            assertEquals(csv.get(f).asDouble(), j.get(f).asDouble(), 1e-12 * Math.abs(csv.get(f).asDouble()), f);
        }
        assertTrue(j.get("max_pressure_mismatch").asDouble() < 1e-12);
    }

    @Test
    void fitsBlankCellIsABadRowNamed() throws Exception {
        Run r = run(fits("p.fits", 30, 7).toString());
        assertBadInput(r, "row 7", "(T)", "empty");
    }

    @Test
    void outWritesAFitsTableAstropyCanRead() throws Exception {
        Path out = dir.resolve("fits-out");
        Run r = run(cgsCentreFirst("p.csv", 40, 5, 6).toString(), "--out", out.toString());
        assertEquals(0, r.status(), r.err());
        org.stellabar.output.FitsTable t = org.stellabar.output.FitsTableReader.read(out.resolve("shells.fits"));
        assertEquals(40, t.rowCount());
        assertEquals("dyn/cm2", t.column("P_eos").get().unit());
        double[] diff = t.values("P_rel_diff");
        assertEquals(0.01, diff[4], 1e-12);
        assertEquals(0.01, diff[5], 1e-12);
        assertTrue(Math.abs(diff[6]) < 1e-12);
        // and the FITS table audits again (our own column names are recognised)
        assertEquals(0, run(out.resolve("shells.fits").toString()).status());
    }

    /**
     * The end-to-end round trip: {@code stellabar model --out} writes stars/model.csv and summary.json;
     * auditing the profile reproduces the model's own pressure-weighted Γ1 and margins. Masses and
     * radii are invented test values.
     */
    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"--kind standard --mass 40Msun --radius 12Rsun",
            "--kind polytrope --index 1.5 --mass 10Msun --radius 5Rsun",
            "--kind isentropic --mass 100Msun --radius 20Rsun"})
    void profilesWrittenByModelAuditClean(String modelArgs) throws Exception {
        Path folder = dir.resolve("model");
        List<String> args = new ArrayList<>(List.of("model", "--out", folder.toString(), "--format", "csv"));
        args.addAll(List.of(modelArgs.split(" ")));
        picocli.CommandLine cl = StellabarCommand.commandLine();
        cl.setOut(new PrintWriter(new StringWriter()));
        cl.setErr(new PrintWriter(new StringWriter()));
        assertEquals(0, cl.execute(args.toArray(String[]::new)));
        JsonNode table = new ObjectMapper().readTree(folder.resolve("summary.json").toFile());
        java.util.Map<String, JsonNode> model = new java.util.HashMap<>();
        table.get("columns").forEach(c -> model.put(c.get("name").asText(), c.get("values").get(0)));
        Run audit = run(folder.resolve("stars/model.csv").toString(), "--format", "json");
        assertEquals(0, audit.status(), audit.err());
        JsonNode a = audit.json();
        assertTrue(a.get("max_pressure_mismatch").asDouble() < 1e-10, modelArgs);
        // the model integrates <Gamma1> over its own stability profile, the audit over the printed
        // rows with the same quadrature: equal to 2e-16 for polytropes, 1.5e-10 for the isentropic
        // star (whose printed rows stop at P = 1e-12 P_c); 1e-9 bounds both
        for (String f : new String[] {"Gamma1_mean", "newtonian_margin", "gr_margin"}) {
            assertEquals(model.get(f).asDouble(), a.get(f).asDouble(), 1e-9, modelArgs + " " + f);
        }
        assertEquals(model.get("verdict").asText(), a.get("stability").asText());
        assertEquals(0, a.get("flagged_rows").size());
    }

    @Test
    void csvFormatPrintsThePerShellTable() throws Exception {
        Run r = run(cgsCentreFirst("p.csv", 20, 0, -1).toString(), "--format", "csv");
        assertEquals(0, r.status(), r.err());
        assertEquals(21, r.out().strip().split("\n").length);
        assertTrue(r.out().startsWith("row,r [cm]"), r.out());
    }

    @Test
    void skipBadRowsSaysHowManyWereSkipped() throws Exception {
        Path file = cgsCentreFirst("p.csv", 30, 0, -1);
        List<String> lines = new ArrayList<>(Files.readAllLines(file));
        lines.set(6, lines.get(6).replaceFirst(",[^,]*$", ",n/a"));
        Files.write(file, lines);
        Run stop = run(file.toString());
        assertEquals(2, stop.status());
        assertTrue(stop.err().contains("row 5 (line 7)") && stop.err().contains("--skip-bad-rows"), stop.err());
        Run skip = run(file.toString(), "--skip-bad-rows", "--format", "json");
        assertEquals(0, skip.status(), skip.err());
        assertEquals(1, skip.json().get("skipped_rows").asInt());
        assertEquals(29, skip.json().get("shells_audited").asInt());
        assertEquals(5, skip.json().get("skipped").get(0).get("row").asInt());
    }

    private void assertBadInput(Run r, String... mentions) {
        assertEquals(2, r.status(), r.out() + r.err());
        String err = r.err().strip();
        assertFalse(err.contains("\n"), "one line: " + err);
        assertFalse(err.contains("Exception") || err.contains("\tat "), err);
        for (String m : mentions) {
            assertTrue(err.contains(m), "'" + m + "' in: " + err);
        }
    }

    @Test
    void missingDensityColumn() throws Exception {
        Path f = dir.resolve("nodens.csv");
        Files.write(f, List.of("r,m,T", "0,0,1e7", "1e10,1e32,9e6", "2e10,3e32,8e6"));
        Path out = dir.resolve("o");
        assertBadInput(run(f.toString(), "--out", out.toString()), "density", "rho");
        assertFalse(Files.exists(out), "nothing written on bad input");
    }

    @Test
    void unknownUnit() throws Exception {
        Path f = cgsCentreFirst("p.csv", 10, 0, -1);
        assertBadInput(run(f.toString(), "--units", "rho=g/litre"), "--units rho", "g/litre");
        Path g = dir.resolve("u.csv");
        Files.write(g, List.of("r [parsec],m,rho,T", "0,0,1,1e7", "1,1e32,0.9,9e6", "2,3e32,0.8,8e6"));
        assertBadInput(run(g.toString()), "column 'r'", "parsec");
    }

    @Test
    void nonNumericCell() throws Exception {
        Path f = dir.resolve("text.csv");
        Files.write(f, List.of("# comment", "r,m,rho,T", "0,0,1,1e7", "1e10,1e32,dense,9e6", "2e10,3e32,0.8,8e6"));
        assertBadInput(run(f.toString()), "row 2 (line 4)", "'dense'", "rho");
    }

    @Test
    void emptyFile() throws Exception {
        Path f = dir.resolve("empty.csv");
        Files.write(f, List.of());
        assertBadInput(run(f.toString()), "empty.csv", "no header row");
    }

    @Test
    void singleRow() throws Exception {
        Path f = dir.resolve("one.csv");
        Files.write(f, List.of("rho,T", "1,1e7"));
        assertBadInput(run(f.toString()), "one.csv", "1 usable data row");
    }

    @Test
    void malformedMappingAndToleranceAreBadInput() throws Exception {
        Path f = cgsCentreFirst("p.csv", 10, 0, -1);
        assertBadInput(run(f.toString(), "--columns", "density=rho"), "density");
        assertBadInput(run(f.toString(), "--tolerance", "-1"), "--tolerance");
        assertBadInput(run(f.toString(), "--mu", "0.6", "--X", "0.7"), "--mu");
    }

    @Test
    void compositionForTheWholeStarChangesBeta() throws Exception {
        Path f = cgsCentreFirst("p.csv", 40, 0, -1);
        JsonNode hydrogen = run(f.toString(), "--X", "0.7", "--Z", "0.02", "--format", "json").json();
        JsonNode helium = run(f.toString(), "--mu", "1.3", "--format", "json").json();
        // the profile was made with X = 0.7: our pressure matches only with that composition
        assertTrue(hydrogen.get("max_pressure_mismatch").asDouble() < 1e-12);
        assertTrue(helium.get("max_pressure_mismatch").asDouble() > 0.1);
        assertTrue(helium.get("beta_centre").asDouble() < hydrogen.get("beta_centre").asDouble());
    }
}
