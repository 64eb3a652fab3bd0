package org.cupel.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** An input too large for the heap ends with one clear sentence and exit 3, not a stack trace. */
class OutOfMemoryMessageTest {

    @Test
    void heapExhaustionGivesOneSentenceNamingTheSettingAndExitThree() {
        StringWriter text = new StringWriter();
        int code = CupelCommand.outOfMemory(new OutOfMemoryError("Java heap space"), new PrintWriter(text));
        String message = text.toString();
        assertEquals(CupelCommand.INTERNAL_ERROR, code);
        assertTrue(message.startsWith("cupel: the input does not fit in the Java heap"), message);
        assertTrue(message.contains("CUPEL_JAVA_OPTS=-Xmx"), message);
        assertFalse(message.contains("\tat "), "no stack trace: " + message);
        assertEquals(1, message.strip().lines().count(), message);
    }
}
