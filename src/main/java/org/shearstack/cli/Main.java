package org.shearstack.cli;

/** Entry point; the command tree lives in the root command once the foundation lands. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.out.println("shearstack: under construction");
    }
}
