import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
import java.util.Arrays;
import org.convgrid.cli.CommandContext;
import org.convgrid.cli.ConvgridMain;

/**
 * The same `convgrid` command run ROUNDS times in one JVM, printing each round's wall time and the process's CPU time
 * over it: from the second round on the compilers have little left to do, so the rounds show the grid's own cost
 * without the JIT's warm-up (which a whole-process timing, benchmarks/grid-ratio.sh, includes).
 *
 *   java -cp cli/target/convgrid.jar benchmarks/warm/WarmGridRuns.java ROUNDS run GRID.yaml --out DIR ...
 *
 * A source-file program (JEP 330), so it needs no build beyond the command-line jar; benchmarks/warm-grid.sh runs it.
 */
public final class WarmGridRuns {

    public static void main(String[] arguments) {
        int rounds = Integer.parseInt(arguments[0]);
        String[] command = Arrays.copyOfRange(arguments, 1, arguments.length);
        var os = (com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        PrintWriter discarded = new PrintWriter(new StringWriter());
        PrintWriter err = new PrintWriter(System.err, true);
        for (int round = 0; round < rounds; round++) {
            long wall0 = System.nanoTime();
            long cpu0 = os.getProcessCpuTime();
            int exitCode = ConvgridMain.commandLine(discarded, err, CommandContext.production(), command)
                    .execute(command);
            double wall = (System.nanoTime() - wall0) / 1e9;
            double cpu = (os.getProcessCpuTime() - cpu0) / 1e9;
            System.out.printf("round %d exit %d wall %.3f s cpu %.3f s%n", round, exitCode, wall, cpu);
            if (exitCode != 0 && exitCode != 3) {
                System.exit(exitCode);
            }
        }
    }
}
