package org.shearstack.profile;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.shearstack.spec.Problem;

/**
 * Hardware tables: bearings, fasteners, seals, ports. Each kind is read from every file in its folder
 * (shipped, then the user's; a user file with a shipped file's name replaces it); rows of later files are
 * added to the first file's table and replace rows with the same designation.
 */
public final class Hardware {

    private final BearingTable bearings;
    private final FastenerTable fasteners;
    private final SealTable seals;
    private final PortTable ports;

    private Hardware(BearingTable bearings, FastenerTable fasteners, SealTable seals, PortTable ports) {
        this.bearings = bearings;
        this.fasteners = fasteners;
        this.seals = seals;
        this.ports = ports;
    }

    public BearingTable bearings() {
        return bearings;
    }

    public FastenerTable fasteners() {
        return fasteners;
    }

    public SealTable seals() {
        return seals;
    }

    public PortTable ports() {
        return ports;
    }

    static Hardware load(Optional<Path> userDir, List<Problem> problems) {
        List<BearingTable> b = read("bearings", userDir, problems, HardwareReaders::bearings);
        List<FastenerTable> f = read("fasteners", userDir, problems, HardwareReaders::fasteners);
        List<SealTable> s = read("seals", userDir, problems, HardwareReaders::seals);
        List<PortTable> p = read("ports", userDir, problems, HardwareReaders::ports);
        if (b.isEmpty() || f.isEmpty() || s.isEmpty() || p.isEmpty()) {
            if (problems.isEmpty()) {
                problems.add(new Problem("profiles", 0, 0, "", "bearings, fasteners, seals and ports tables",
                        "a kind without any file", ""));
            }
            return null;
        }
        BearingTable bearings = b.get(0);
        bearings = new BearingTable(bearings.name(), bearings.source(), bearings.standard(),
                merge(b, BearingTable::bearings, Bearing::designation), bearings.tolerances(),
                bearings.speedFactorLimitRpmMm(), bearings.speedFactorSource());
        FastenerTable fasteners = f.get(0);
        fasteners = new FastenerTable(fasteners.name(), fasteners.source(), fasteners.standard(),
                merge(f, FastenerTable::sizes, Fastener::size), fasteners.lengthsMm(), fasteners.lengthsSource());
        SealTable seals = s.get(0);
        seals = new SealTable(seals.name(), seals.source(), seals.standard(),
                merge(s, SealTable::glands, g -> Double.toString(g.crossSectionMm())), seals.squeezeMin(),
                seals.squeezeMax(), seals.fillMax());
        PortTable ports = p.get(0);
        ports = new PortTable(ports.name(), ports.source(), ports.standard(), merge(p, PortTable::ports, Port::port),
                ports.pushInClearanceMm(), ports.pushInDepthFactor());
        return new Hardware(bearings, fasteners, seals, ports);
    }

    private static <T, R> List<R> merge(List<T> tables, Function<T, List<R>> rows, Function<R, String> id) {
        Map<String, R> byId = new LinkedHashMap<>();
        for (T t : tables) {
            for (R r : rows.apply(t)) {
                byId.put(id.apply(r), r);
            }
        }
        return new ArrayList<>(byId.values());
    }

    private static <T> List<T> read(String kind, Optional<Path> userDir, List<Problem> problems,
                                    Profiles.Reader<T> reader) {
        Map<String, ProfileFile> files = new LinkedHashMap<>();
        ProfileFiles.shipped(kind).forEach(f -> files.put(f.stem(), f));
        if (userDir.isPresent()) {
            try {
                ProfileFiles.user(userDir.get(), kind).forEach(f -> files.put(f.stem(), f));
            } catch (IOException e) {
                problems.add(new Problem(userDir.get().toString(), 0, 0, "", "a readable profile folder",
                        "cannot read it (" + e.getMessage() + ")", ""));
            }
        }
        List<T> tables = new ArrayList<>();
        for (ProfileFile f : files.values()) {
            int before = problems.size();
            YamlDoc.parse(f.label(), f.text(), problems).ifPresent(doc -> {
                doc.requireKind(kind);
                T t = reader.read(doc, f.label(), problems);
                if (problems.size() == before) {
                    tables.add(t);
                }
            });
        }
        return tables;
    }
}
