package org.clearance.line;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.clearance.InputException;

/** Reading small user text files as strict UTF-8, with input errors a user can act on. */
final class TextFiles {

  private TextFiles() {}

  /** Byte-order mark some editors write at the start of UTF-8 files; not part of the text. */
  private static final String BOM = "\uFEFF";

  /**
   * The whole file as text, without a leading byte-order mark.
   *
   * @throws InputException when the file is missing, unreadable or not UTF-8
   */
  static String read(Path file) {
    return read(file, "a UTF-8 text file");
  }

  /**
   * The whole file as text, without a leading byte-order mark.
   *
   * @param expected what the file should be, for the message when it is not text, e.g.
   *     {@code "the line specification (YAML text)"}
   * @throws InputException when the file is missing, unreadable or not UTF-8; a LAS point file
   *     (signature {@code LASF}, ASPRS LAS 1.4 R15 table 3) is named as such
   */
  static String read(Path file, String expected) {
    byte[] bytes = new byte[0];
    try {
      bytes = Files.readAllBytes(file);
      String text = StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(bytes)).toString();
      return text.startsWith(BOM) ? text.substring(BOM.length()) : text;
    } catch (NoSuchFileException e) {
      throw new InputException(file, null, null, "file not found");
    } catch (CharacterCodingException e) {
      boolean las = bytes.length >= 4 && bytes[0] == 'L' && bytes[1] == 'A' && bytes[2] == 'S'
          && bytes[3] == 'F';
      throw new InputException(file, null, null, (las ? "a LAS point file (give it with "
          + "--survey)" : "not UTF-8 text") + "; expected " + expected);
    } catch (IOException e) {
      throw new InputException(file, null, null, "cannot read the file: " + e.getMessage());
    }
  }
}
