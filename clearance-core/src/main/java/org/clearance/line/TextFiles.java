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
    try {
      byte[] bytes = Files.readAllBytes(file);
      String text = StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(bytes)).toString();
      return text.startsWith(BOM) ? text.substring(BOM.length()) : text;
    } catch (NoSuchFileException e) {
      throw new InputException(file, null, null, "file not found");
    } catch (CharacterCodingException e) {
      throw new InputException(file, null, null, "not UTF-8 text");
    } catch (IOException e) {
      throw new InputException(file, null, null, "cannot read the file: " + e.getMessage());
    }
  }
}
