package org.clearance.examples;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import org.clearance.io.JsonFiles;

/**
 * The demo's truth files written through Jackson's streaming generator (RFC 8259): strings
 * escaped and numbers in their shortest round-trip form by the library, NaN and infinities as
 * null, one member per line. The truth does not depend on the code under test: only on Jackson.
 * The {@code inline} flags say which containers are short; the layout is the library's.
 */
final class JsonOut {

  private final JsonGenerator g;

  JsonOut(Writer out) {
    try {
      g = JsonFiles.MAPPER.getFactory().createGenerator(out)
          .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET)
          .setPrettyPrinter(new DefaultPrettyPrinter());
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /** A step of the generator. */
  @FunctionalInterface
  private interface Step {
    void run() throws IOException;
  }

  private JsonOut step(Step s) {
    try {
      s.run();
      if (g.getOutputContext().inRoot()) {
        g.flush();
      }
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return this;
  }

  JsonOut beginObject(boolean inline) {
    return step(g::writeStartObject);
  }

  JsonOut endObject() {
    return step(g::writeEndObject);
  }

  JsonOut beginArray(boolean inline) {
    return step(g::writeStartArray);
  }

  JsonOut endArray() {
    return step(g::writeEndArray);
  }

  JsonOut name(String name) {
    return step(() -> g.writeFieldName(name));
  }

  JsonOut value(String text) {
    return step(() -> g.writeString(text));
  }

  JsonOut value(double v) {
    return step(() -> {
      if (Double.isFinite(v)) {
        g.writeNumber(v);
      } else {
        g.writeNull();
      }
    });
  }

  JsonOut value(long v) {
    return step(() -> g.writeNumber(v));
  }

  JsonOut value(boolean v) {
    return step(() -> g.writeBoolean(v));
  }

  JsonOut member(String name, String text) {
    return name(name).value(text);
  }

  JsonOut member(String name, double v) {
    return name(name).value(v);
  }

  JsonOut member(String name, long v) {
    return name(name).value(v);
  }

  JsonOut member(String name, boolean v) {
    return name(name).value(v);
  }

  /** Shortcut: a named inline array of numbers. */
  JsonOut member(String name, double... values) {
    name(name).beginArray(true);
    for (double v : values) {
      value(v);
    }
    return endArray();
  }
}
