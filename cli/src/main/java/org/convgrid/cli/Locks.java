package org.convgrid.cli;

import java.io.PrintWriter;
import org.convgrid.survey.RunLock;

/** What the commands that take a run directory's lock tell the user about it. */
final class Locks {

    private Locks() {
    }

    /** Reports a lock file left by a process that ended without releasing it (the lock is taken over). */
    static void reportStale(RunLock lock, PrintWriter err) {
        if (lock.staleHolder().isPresent()) {
            err.println("convgrid: note: " + lock.file().getParent() + " was last locked by process "
                    + lock.staleHolder().getAsLong() + ", which ended without releasing it (killed or stopped); "
                    + "check its files (--resume keeps only complete rows)");
            err.flush();
        }
    }

    /**
     * Releases the lock before the JVM halts on a signal, so that the next command does not report a holder that died
     * (and the lock's own directory goes when it held nothing else); the operating system releases it with the
     * process anyway.
     */
    static void closeQuietly(RunLock lock) {
        try {
            lock.close();
        } catch (java.io.IOException e) {
            // nothing lost: the lock ends with the process
        }
    }
}
