package org.convgrid.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

/** Entry point of the {@code convgrid} command. */
@Command(name = "convgrid", mixinStandardHelpOptions = true, version = "convgrid 0.1.0",
        description = "Where convection operates inside main-sequence stars, across a grid.")
public final class ConvgridMain implements Runnable {

    @Override
    public void run() {
        new CommandLine(this).usage(System.out);
    }

    public static void main(String[] args) {
        System.exit(new CommandLine(new ConvgridMain()).execute(args));
    }
}
