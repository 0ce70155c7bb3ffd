package org.shearstack.cli;

import java.io.PrintWriter;
import org.shearstack.profile.Hardware;

/** Prints the hardware tables for {@code profiles}. */
final class HardwareText {

    private HardwareText() {
    }

    static void summary(Hardware h, PrintWriter out) {
    }

    static void show(Hardware h, String kind, String name, PrintWriter out) {
        throw ProfilesCommand.unknown("profile kind", kind, "printers, filaments");
    }
}
