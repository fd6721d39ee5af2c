package org.flyloop.cli.output;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;

class MonteCarloProgressTest {

    @Test
    void silentForTheFirstSecondThenOneLineErasedAtTheEnd() {
        StringWriter err = new StringWriter();
        AtomicLong now = new AtomicLong(0);
        MonteCarloProgress p = new MonteCarloProgress(new PrintWriter(err, true), 1000, true, now::get);
        p.accept(100);
        now.set(900);
        p.accept(300);
        assertEquals("", err.toString(), "a short run prints nothing");
        now.set(1100);
        p.accept(500);
        assertEquals("\rMonte Carlo: 500 of 1000 samples (50 %)", err.toString());
        now.set(1150);
        p.accept(520);
        assertEquals("\rMonte Carlo: 500 of 1000 samples (50 %)", err.toString(), "at most one update per 200 ms");
        p.finish();
        assertTrue(err.toString().endsWith("\r" + " ".repeat(39) + "\r"));
    }

    @Test
    void silentWhenStderrIsNoTerminal() {
        StringWriter err = new StringWriter();
        AtomicLong now = new AtomicLong(0);
        MonteCarloProgress p = new MonteCarloProgress(new PrintWriter(err, true), 10, false, now::get);
        now.set(5000);
        p.accept(5);
        p.finish();
        assertEquals("", err.toString());
    }
}
