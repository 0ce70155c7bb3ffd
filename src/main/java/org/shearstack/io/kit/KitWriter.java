package org.shearstack.io.kit;


import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.shearstack.assembly.BomRow;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.assembly.Placement;
import org.shearstack.assembly.PrintPlates;
import org.shearstack.geom.Transform;
import org.shearstack.io.AtomicFolder;
import org.shearstack.io.mesh.StlWriter;
import org.shearstack.io.mesh.ThreeMfModel;
import org.shearstack.io.mesh.ThreeMfWriter;

/**
 * Writes a {@link Kit} into a folder: {@code parts/NAME.stl} per distinct printed part (print orientation),
 * {@code assembly.3mf} and {@code assembly-exploded.3mf} (one object per distinct part, one colour per family,
 * an assembly object with a component per copy), {@code plates/plate-N.3mf} and {@code bom.csv}.
 * Atomic: everything goes to a temporary folder beside the target, which then replaces the target by rename;
 * a failure leaves the previous kit as it was. Output bytes depend only on the kit.
 */
public final class KitWriter {

    private KitWriter() {
    }

    /** The relative paths a kit writes, in writing order. */
    public static List<String> files(Kit kit) {
        List<String> f = new ArrayList<>();
        for (KitPart p : kit.printedParts()) {
            f.add("parts/" + p.name() + ".stl");
        }
        f.add("assembly.3mf");
        f.add("assembly-exploded.3mf");
        for (PrintPlates.Plate plate : kit.plates()) {
            f.add(String.format(Locale.ROOT, "plates/plate-%d.3mf", plate.number()));
        }
        f.add("bom.csv");
        return List.copyOf(f);
    }

    /** Writes the kit into {@code dir} atomically: a failed run leaves the previous folder as it was. */
    public static void write(Kit kit, Path dir) throws IOException {
        AtomicFolder.write(dir, tmp -> writeFiles(kit, tmp));
    }

    /** One file to write. */
    @FunctionalInterface
    private interface FileJob {
        void write() throws IOException;
    }

    /** Writes every file; the files are independent, so they are written in parallel (order of bytes unaffected). */
    /** Writes every file of the kit into an existing folder the caller already writes atomically. */
    public static void writeFiles(Kit kit, Path dir) throws IOException {
        Files.createDirectories(dir.resolve("parts"));
        Files.createDirectories(dir.resolve("plates"));
        List<FileJob> jobs = new ArrayList<>();
        ThreeMfWriter.MeshTexts texts = new ThreeMfWriter.MeshTexts();
        jobs.add(() -> ThreeMfWriter.write(assembly(kit, false), dir.resolve("assembly.3mf"), texts));
        jobs.add(() -> ThreeMfWriter.write(assembly(kit, true), dir.resolve("assembly-exploded.3mf"), texts));
        for (PrintPlates.Plate plate : kit.plates()) {
            jobs.add(() -> ThreeMfWriter.write(plate(kit, plate),
                    dir.resolve("plates").resolve(String.format(Locale.ROOT, "plate-%d.3mf", plate.number())), texts));
        }
        for (KitPart p : kit.printedParts()) {
            jobs.add(() -> StlWriter.write(p.mesh(), kit.name() + " " + p.name(),
                    dir.resolve("parts").resolve(p.name() + ".stl")));
        }
        jobs.add(() -> Files.writeString(dir.resolve("bom.csv"), bomCsv(kit), StandardCharsets.UTF_8));
        try {
            jobs.parallelStream().forEach(j -> {
                try {
                    j.write();
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /** The assembly: one mesh object per distinct part, one assembly object with a component per copy. */
    static ThreeMfModel assembly(Kit kit, boolean exploded) {
        ThreeMfModel.Builder b = ThreeMfModel.builder();
        List<ThreeMfModel.Component> components = new ArrayList<>();
        for (KitPart p : kit.parts()) {
            int id = b.addMesh(p.name(), p.mesh(), Kit.colour(p.family()));
            for (int k = 0; k < p.count(); k++) {
                Placement pl = exploded ? kit.exploded(p, k) : p.placements().get(k);
                components.add(new ThreeMfModel.Component(id, pl.transform()));
            }
        }
        int asm = b.addAssembly(kit.name() + (exploded ? " exploded" : " assembly"), components);
        b.item(asm, Transform.identity(), kit.name());
        b.metadata("Title", kit.name() + (exploded ? " (exploded)" : ""));
        b.metadata("Application", "ShearStack");
        return b.build();
    }

    static ThreeMfModel plate(Kit kit, PrintPlates.Plate plate) {
        ThreeMfModel.Builder b = ThreeMfModel.builder();
        Map<String, Integer> ids = new HashMap<>();
        for (PrintPlates.Item item : plate.items()) {
            if (!ids.containsKey(item.part())) {
                KitPart p = kit.parts().stream().filter(x -> x.name().equals(item.part())).findFirst().orElseThrow();
                ids.put(item.part(), b.addMesh(p.name(), p.mesh(), Kit.colour(p.family())));
            }
        }
        for (PrintPlates.Item item : plate.items()) {
            b.item(ids.get(item.part()), Transform.translation(item.dxMm(), item.dyMm(), 0),
                    item.part() + " #" + item.copy());
        }
        b.metadata("Title", kit.name() + " plate " + plate.number());
        b.metadata("Application", "ShearStack");
        return b.build();
    }

    /** CSV with a header; numbers with a point, fixed decimals; text quoted where it needs it. */
    public static String bomCsv(Kit kit) {
        StringBuilder s = new StringBuilder(
                "kind,item,count,description,volume_mm3_each,mass_g_each,print_time_min_each,mass_g_total\n");
        for (BomRow r : kit.bom()) {
            s.append(r.kind()).append(',').append(csv(r.item())).append(',').append(r.count()).append(',')
                    .append(csv(r.description())).append(',')
                    .append(String.format(Locale.ROOT, "%.1f,%.2f,%.1f,%.2f", r.volumeMm3(), r.massG(),
                            r.printTimeS() / 60, r.massG() * r.count()))
                    .append('\n');
        }
        return s.toString();
    }

    private static String csv(String text) {
        if (text.contains(",") || text.contains("\"") || text.contains("\n")) {
            return '"' + text.replace("\"", "\"\"") + '"';
        }
        return text;
    }

}
