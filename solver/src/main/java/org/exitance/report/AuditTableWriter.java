package org.exitance.report;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.exitance.audit.AuditResult;
import org.exitance.audit.AuditRow;
import org.exitance.audit.GrayCause;
import org.exitance.audit.GrayAudit;

/** The gray-body audit as text: one table per (load) case, the causes, and a verdict. */
public final class AuditTableWriter {
    private AuditTableWriter() {
    }

    /** A short audit section for the solve report: the verdict and each flagged surface's cause. */
    public static List<String> summaryLines(List<AuditResult> audits) {
        List<String> out = new ArrayList<>();
        for (AuditResult a : audits) {
            String where = audits.size() > 1 || !a.name().equals("as given") ? " (" + a.name() + ")" : "";
            String thr = Numbers.ratio(a.thresholdPct()).replaceAll("0+$", "").replaceAll("\\.$", "");
            if (a.flaggedCount() == 0) {
                out.add("Gray-body audit" + where + ": the gray shortcut is within " + thr + " % on every surface.");
                continue;
            }
            out.add("Gray-body audit" + where + ": " + a.flaggedCount() + " of " + a.rows().size()
                    + " surfaces off by more than " + thr + " % under the gray shortcut (details: exitance audit):");
            for (AuditRow r : a.rows()) {
                if (r.flagged() && r.cause().kind() == GrayCause.Kind.OTHER_SURFACES) {
                    out.add(String.format(Locale.ROOT, "  %s: gray error %s W, %.2f K (%+.1f %%); the surface is gray,"
                                    + " off only because others are not (%s)", r.surface(), Numbers.power(r.grayErrorW()),
                            r.grayErrorK(), r.grayErrorPct(), String.join(", ", r.cause().nonGraySurfaces())));
                } else if (r.flagged()) {
                    out.add(String.format(Locale.ROOT, "  %s: gray error %s W, %.2f K (%+.1f %%); absorbs with α = %s,"
                                    + " gray uses ε = %s; mostly %s–%s µm", r.surface(), Numbers.power(r.grayErrorW()),
                            r.grayErrorK(), r.grayErrorPct(), Numbers.ratio(r.cause().effectiveAbsorptivity()),
                            Numbers.ratio(r.cause().emissivityAtOwnTemperature()), Numbers.wavelength(r.cause().lowerUm()),
                            Numbers.wavelength(r.cause().upperUm())));
                }
            }
        }
        return out;
    }

    public static void write(String title, List<AuditResult> audits, PrintStream out) {
        out.println("Exitance " + Version.get() + " — gray-body audit" + (title.isEmpty() ? "" : ": " + title));
        for (AuditResult a : audits) {
            out.println();
            if (audits.size() > 1 || !a.name().equals("as given")) {
                out.println("Load case: " + a.name());
            }
            out.println("Reference: " + a.band().bands().size() + " bands (" + a.band().bandOrigin() + "). Gray: one band,"
                    + " each surface's total ε at its own temperature for emission and absorption."
                    + (a.twoBand() == null ? "" : " Two-band: solar below " + Numbers.wavelength(GrayAudit.TWO_BAND_SPLIT_UM)
                    + " µm with source-weighted absorptance, infrared above."));
            boolean two = a.twoBand() != null;
            List<String> head = new ArrayList<>(List.of("Surface", "Band Q W", "Gray Q W"));
            if (two) {
                head.add("Two-band Q W");
            }
            head.addAll(List.of("Band T K", "Gray T K"));
            if (two) {
                head.add("Two-band T K");
            }
            head.addAll(List.of("Gray error W", "Gray error K", "Error %", ""));
            boolean[] num = new boolean[head.size()];
            java.util.Arrays.fill(num, true);
            num[0] = false;
            num[head.size() - 1] = false;
            TextTable t = new TextTable(head, num);
            for (AuditRow r : a.rows()) {
                List<String> row = new ArrayList<>(List.of(r.surface(), Numbers.power(r.bandNetHeatW()),
                        Numbers.power(r.grayNetHeatW())));
                if (two) {
                    row.add(Numbers.power(r.twoBandNetHeatW()));
                }
                row.addAll(List.of(Numbers.temperature(r.bandTemperatureK()), Numbers.temperature(r.grayTemperatureK())));
                if (two) {
                    row.add(Numbers.temperature(r.twoBandTemperatureK()));
                }
                row.addAll(List.of(Numbers.power(r.grayErrorW()), String.format(Locale.ROOT, "%.2f", r.grayErrorK()),
                        String.format(Locale.ROOT, "%+.1f", r.grayErrorPct()), r.flagged() ? "FLAGGED" : ""));
                t.row(row);
            }
            t.render(0).forEach(out::println);
            out.println("  (error %: of |band Q| for a fixed-temperature surface; where the temperature is solved, of"
                    + " its emissive power σT⁴; flagged above " + Numbers.ratio(a.thresholdPct()).replaceAll("0+$", "")
                    .replaceAll("\\.$", "") + " %)");
            for (AuditRow r : a.rows()) {
                if (r.flagged()) {
                    out.println("  " + causeLine(r));
                }
            }
            out.println("Verdict: " + (a.flaggedCount() == 0 ? "the gray shortcut is within "
                    + Numbers.ratio(a.thresholdPct()).replaceAll("0+$", "").replaceAll("\\.$", "") + " % on every surface."
                    : a.flaggedCount() + " of " + a.rows().size() + " surfaces are off by more than the threshold under"
                    + " the gray shortcut."));
        }
        TableFooter.write(out);
    }

    /** One flagged surface's cause in words and numbers. */
    public static String causeLine(AuditRow r) {
        GrayCause c = r.cause();
        if (c.kind() == GrayCause.Kind.OTHER_SURFACES) {
            return r.surface() + ": is gray (ε = " + Numbers.ratio(c.emissivityAtOwnTemperature()) + " at every wavelength),"
                    + " so it absorbs any spectrum with α = ε and has no error of its own; it is off only because "
                    + (c.nonGraySurfaces().isEmpty() ? "other surfaces are not gray"
                    : "the surfaces that are not gray (" + String.join(", ", c.nonGraySurfaces()) + ") change what reaches it")
                    + ".";
        }
        return r.surface() + ": absorbs what reaches it with α = " + Numbers.ratio(c.effectiveAbsorptivity())
                + ", but the gray shortcut uses its emissivity at " + Numbers.temperature(r.bandTemperatureK())
                + " K, ε = " + Numbers.ratio(c.emissivityAtOwnTemperature()) + "; "
                + String.format(Locale.ROOT, "%.0f", 100 * c.shareOfDifference()) + " % of that difference lies in "
                + Numbers.wavelength(c.lowerUm()) + "–" + Numbers.wavelength(c.upperUm()) + " µm.";
    }
}
