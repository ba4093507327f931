#pragma once
// Tables of events as clubs receive them: delimited text (CSV, TSV, semicolons, with or without
// quotes and a header) in UTF-8, Latin-1 or Windows-1252, JSON Lines, or a JSON array of flat
// objects. Read into rows of text cells, each remembering the line it started on, so every
// later problem can name the file, the line and the column. Definitions: docs/import.md.

#include "problem.h"

#include <optional>
#include <string>
#include <string_view>
#include <vector>

namespace pitchloop::model {

enum class TextEncoding { Utf8, Latin1, Windows1252 };
std::string_view toString(TextEncoding e);
std::optional<TextEncoding> encodingFromString(std::string_view s);

/// The bytes as UTF-8: a UTF-8 byte order mark is dropped; Latin-1 and Windows-1252 are
/// converted. For UTF-8, the first invalid byte is a problem (with its line and column) — a file
/// saved in another encoding is refused rather than read as mojibake.
struct DecodedText {
    std::string text;
    bool hadBom = false;
    Problems errors;
};
DecodedText decodeText(std::string_view bytes, TextEncoding encoding, const std::string& fileName);

enum class TableLayout { Delimited, JsonLines, JsonArray };
std::string_view toString(TableLayout l);
std::optional<TableLayout> layoutFromString(std::string_view s);

/// How to cut a table's text into rows and cells.
struct TableFormat {
    TableLayout layout = TableLayout::Delimited;
    char delimiter = ',';
    char quote = '"';   ///< 0: no quoting
    bool header = true; ///< the first row names the columns (delimited only)
};

struct Table {
    std::vector<std::string> columns; ///< header names, or "1", "2", ... without a header
    struct Row {
        std::size_t line = 0; ///< 1-based line the row starts on
        std::vector<std::string> cells;
    };
    std::vector<Row> rows;
    bool byLine = true; ///< rows are placed by line; a JSON array's by element ("[3]")
    /// Where a row is, for problems: "line 12" or "[3]".
    std::string place(const Row& r) const {
        return byLine ? "line " + std::to_string(r.line) : "[" + std::to_string(r.line - 1) + "]";
    }
    /// The index of a column by name (or by its 1-based number as text); nullopt if absent.
    std::optional<std::size_t> column(std::string_view name) const;
};

struct TableResult {
    Table table;
    Problems errors;
};

/// Cuts UTF-8 text into a table. Delimited text follows RFC 4180 quoting when `quote` is set
/// (a quoted cell may hold delimiters, doubled quotes and line breaks); CRLF and LF both end a
/// record; blank lines are skipped. A row with more cells than the header is an error naming
/// its line; a shorter row is padded with empty cells. JSON rows must be flat objects (numbers,
/// strings, booleans and nulls become text).
TableResult parseTable(std::string_view text, const TableFormat& format, const std::string& fileName);

} // namespace pitchloop::model
