package org.assay.cli;

/** Entry point placeholder; the command tree is added with the CLI. */
public final class Main {
    public static void main(String[] args) {
        System.out.println("assay");
    }
}
