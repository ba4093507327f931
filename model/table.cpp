#include "table.h"

#include <nlohmann/json.hpp>

#include <algorithm>
#include <array>
#include <cstdint>

namespace pitchloop::model {

namespace {

void appendUtf8(std::string& out, std::uint32_t cp) {
    if (cp < 0x80) {
        out += static_cast<char>(cp);
    } else if (cp < 0x800) {
        out += static_cast<char>(0xC0 | (cp >> 6));
        out += static_cast<char>(0x80 | (cp & 0x3F));
    } else {
        out += static_cast<char>(0xE0 | (cp >> 12));
        out += static_cast<char>(0x80 | ((cp >> 6) & 0x3F));
        out += static_cast<char>(0x80 | (cp & 0x3F));
    }
}

// Windows-1252 bytes 0x80–0x9F (0 where the code page leaves a byte undefined); the rest of the
// code page is Latin-1.
constexpr std::array<std::uint16_t, 32> kCp1252High{
    0x20AC, 0,      0x201A, 0x0192, 0x201E, 0x2026, 0x2020, 0x2021, 0x02C6, 0x2030, 0x0160,
    0x2039, 0x0152, 0,      0x017D, 0,      0,      0x2018, 0x2019, 0x201C, 0x201D, 0x2022,
    0x2013, 0x2014, 0x02DC, 0x2122, 0x0161, 0x203A, 0x0153, 0,      0x017E, 0x0178};

std::string lineColumn(std::string_view bytes, std::size_t at) {
    std::size_t line = 1, column = 1;
    for (std::size_t i = 0; i < at && i < bytes.size(); ++i) {
        if (bytes[i] == '\n') {
            ++line;
            column = 1;
        } else if ((static_cast<unsigned char>(bytes[i]) & 0xC0) != 0x80) {
            ++column;
        }
    }
    return "line " + std::to_string(line) + ", column " + std::to_string(column);
}

/// Length of the valid UTF-8 sequence at `i`, or 0.
std::size_t utf8Length(std::string_view s, std::size_t i) {
    const auto b = [&](std::size_t k) { return static_cast<unsigned char>(s[k]); };
    const unsigned char c = b(i);
    std::size_t n = 0;
    std::uint32_t cp = 0;
    if (c < 0x80) return 1;
    if (c >= 0xC2 && c <= 0xDF) { n = 2; cp = c & 0x1F; }
    else if (c >= 0xE0 && c <= 0xEF) { n = 3; cp = c & 0x0F; }
    else if (c >= 0xF0 && c <= 0xF4) { n = 4; cp = c & 0x07; }
    else return 0;
    if (i + n > s.size()) return 0;
    for (std::size_t k = 1; k < n; ++k) {
        if ((b(i + k) & 0xC0) != 0x80) return 0;
        cp = (cp << 6) | (b(i + k) & 0x3F);
    }
    // Overlong forms, surrogates and values past U+10FFFF are not UTF-8.
    if ((n == 3 && cp < 0x800) || (n == 4 && (cp < 0x10000 || cp > 0x10FFFF)) ||
        (cp >= 0xD800 && cp <= 0xDFFF))
        return 0;
    return n;
}

} // namespace

std::string_view toString(TextEncoding e) {
    switch (e) {
    case TextEncoding::Utf8: return "utf-8";
    case TextEncoding::Latin1: return "latin-1";
    case TextEncoding::Windows1252: return "windows-1252";
    }
    return "?";
}

std::optional<TextEncoding> encodingFromString(std::string_view s) {
    for (TextEncoding e : {TextEncoding::Utf8, TextEncoding::Latin1, TextEncoding::Windows1252})
        if (toString(e) == s) return e;
    return std::nullopt;
}

DecodedText decodeText(std::string_view bytes, TextEncoding encoding, const std::string& fileName) {
    DecodedText d;
    if (encoding == TextEncoding::Utf8) {
        if (bytes.substr(0, 3) == "\xEF\xBB\xBF") {
            d.hadBom = true;
            bytes.remove_prefix(3);
        }
        for (std::size_t i = 0; i < bytes.size();) {
            const std::size_t n = utf8Length(bytes, i);
            if (n == 0) {
                char hex[8];
                std::snprintf(hex, sizeof hex, "0x%02X", static_cast<unsigned char>(bytes[i]));
                d.errors.push_back({fileName, lineColumn(bytes, i), "",
                                    std::string("byte ") + hex +
                                        " is not UTF-8: the file was saved in another encoding "
                                        "(say which in the profile: latin-1 or windows-1252)"});
                return d;
            }
            i += n;
        }
        d.text.assign(bytes);
        return d;
    }
    d.text.reserve(bytes.size() + bytes.size() / 8);
    for (std::size_t i = 0; i < bytes.size(); ++i) {
        const unsigned char c = static_cast<unsigned char>(bytes[i]);
        if (encoding == TextEncoding::Windows1252 && c >= 0x80 && c <= 0x9F) {
            const std::uint16_t cp = kCp1252High[c - 0x80];
            if (cp == 0) {
                char hex[8];
                std::snprintf(hex, sizeof hex, "0x%02X", c);
                d.errors.push_back({fileName, lineColumn(bytes, i), "",
                                    std::string("byte ") + hex + " has no character in windows-1252"});
                return d;
            }
            appendUtf8(d.text, cp);
        } else {
            appendUtf8(d.text, c);
        }
    }
    return d;
}

std::string_view toString(TableLayout l) {
    switch (l) {
    case TableLayout::Delimited: return "delimited";
    case TableLayout::JsonLines: return "json-lines";
    case TableLayout::JsonArray: return "json-array";
    }
    return "?";
}

std::optional<TableLayout> layoutFromString(std::string_view s) {
    for (TableLayout l : {TableLayout::Delimited, TableLayout::JsonLines, TableLayout::JsonArray})
        if (toString(l) == s) return l;
    return std::nullopt;
}

std::optional<std::size_t> Table::column(std::string_view name) const {
    for (std::size_t i = 0; i < columns.size(); ++i)
        if (columns[i] == name) return i;
    return std::nullopt;
}

namespace {

TableResult parseDelimited(std::string_view text, const TableFormat& f, const std::string& fileName) {
    TableResult r;
    std::vector<std::pair<std::size_t, std::vector<std::string>>> records;
    std::vector<std::string> cells;
    std::string cell;
    std::size_t line = 1, recordLine = 1;
    bool inQuotes = false, quotedCell = false, any = false;
    auto endCell = [&] {
        cells.push_back(std::move(cell));
        cell.clear();
        quotedCell = false;
    };
    auto endRecord = [&] {
        endCell();
        const bool blank = cells.size() == 1 && cells[0].empty() && !any;
        if (!blank) records.push_back({recordLine, std::move(cells)});
        cells.clear();
        any = false;
    };
    for (std::size_t i = 0; i < text.size(); ++i) {
        const char c = text[i];
        if (inQuotes) {
            if (c == f.quote) {
                if (i + 1 < text.size() && text[i + 1] == f.quote) {
                    cell += c;
                    ++i;
                } else {
                    inQuotes = false;
                }
            } else {
                if (c == '\n') ++line;
                cell += c;
            }
            continue;
        }
        if (f.quote && c == f.quote && cell.empty() && !quotedCell) {
            inQuotes = quotedCell = any = true;
        } else if (c == f.delimiter) {
            endCell();
            any = true;
        } else if (c == '\r' && i + 1 < text.size() && text[i + 1] == '\n') {
            // CRLF: the LF ends the record.
        } else if (c == '\n') {
            endRecord();
            ++line;
            recordLine = line;
        } else {
            cell += c;
            any = true;
        }
    }
    if (inQuotes) {
        r.errors.push_back({fileName, "line " + std::to_string(recordLine), "",
                            "a quoted cell is never closed"});
        return r;
    }
    if (any || !cell.empty() || !cells.empty()) endRecord();
    if (records.empty()) {
        r.errors.push_back({fileName, "", "", "the table is empty"});
        return r;
    }
    std::size_t first = 0;
    if (f.header) {
        r.table.columns = records[0].second;
        for (auto& name : r.table.columns) {
            // Header names are compared trimmed: "Time " and "Time" are one column.
            const auto b = name.find_first_not_of(" \t");
            const auto e = name.find_last_not_of(" \t");
            name = b == std::string::npos ? std::string() : name.substr(b, e - b + 1);
        }
        first = 1;
    } else {
        std::size_t widest = 0;
        for (const auto& rec : records) widest = std::max(widest, rec.second.size());
        for (std::size_t i = 0; i < widest; ++i) r.table.columns.push_back(std::to_string(i + 1));
    }
    for (std::size_t k = first; k < records.size(); ++k) {
        auto& [at, row] = records[k];
        if (row.size() > r.table.columns.size()) {
            r.errors.push_back({fileName, "line " + std::to_string(at), "",
                                std::to_string(row.size()) + " cells, but the header names " +
                                    std::to_string(r.table.columns.size()) + " columns"});
            if (r.errors.size() >= 25) break;
            continue;
        }
        row.resize(r.table.columns.size());
        r.table.rows.push_back({at, std::move(row)});
    }
    return r;
}

std::string cellText(const nlohmann::json& v) {
    if (v.is_string()) return v.get<std::string>();
    if (v.is_null()) return {};
    if (v.is_boolean()) return v.get<bool>() ? "true" : "false";
    return v.dump(); // numbers as JSON writes them (shortest round trip)
}

TableResult parseJsonRows(std::string_view text, const TableFormat& f, const std::string& fileName) {
    TableResult r;
    auto addRow = [&](const nlohmann::json& obj, std::size_t line, const std::string& place) {
        if (!obj.is_object()) {
            r.errors.push_back({fileName, place, "", "expected a flat object for each event"});
            return;
        }
        Table::Row row;
        row.line = line;
        row.cells.resize(r.table.columns.size());
        for (const auto& [key, value] : obj.items()) {
            if (value.is_object() || value.is_array()) {
                r.errors.push_back({fileName, place, key, "nested values are not read: flatten the column"});
                continue;
            }
            auto at = r.table.column(key);
            if (!at) {
                r.table.columns.push_back(key);
                for (auto& old : r.table.rows) old.cells.emplace_back();
                row.cells.emplace_back();
                at = r.table.columns.size() - 1;
            }
            row.cells[*at] = cellText(value);
        }
        r.table.rows.push_back(std::move(row));
    };
    if (f.layout == TableLayout::JsonLines) {
        std::size_t line = 0, start = 0;
        while (start <= text.size()) {
            const std::size_t end = std::min(text.find('\n', start), text.size());
            ++line;
            std::string_view one = text.substr(start, end - start);
            if (!one.empty() && one.back() == '\r') one.remove_suffix(1);
            if (one.find_first_not_of(" \t") != std::string_view::npos) {
                try {
                    addRow(nlohmann::json::parse(one), line, "line " + std::to_string(line));
                } catch (const nlohmann::json::exception& e) {
                    r.errors.push_back({fileName, "line " + std::to_string(line), "",
                                        std::string("not valid JSON: ") + e.what()});
                }
                if (r.errors.size() >= 25) break;
            }
            if (end == text.size()) break;
            start = end + 1;
        }
    } else {
        try {
            const auto all = nlohmann::json::parse(text);
            if (!all.is_array()) {
                r.errors.push_back({fileName, "", "", "expected a JSON array of events"});
                return r;
            }
            r.table.byLine = false;
            for (std::size_t i = 0; i < all.size(); ++i)
                addRow(all[i], i + 1, "[" + std::to_string(i) + "]");
        } catch (const nlohmann::json::exception& e) {
            r.errors.push_back({fileName, "", "", std::string("not valid JSON: ") + e.what()});
        }
    }
    if (r.errors.empty() && r.table.rows.empty())
        r.errors.push_back({fileName, "", "", "the table is empty"});
    return r;
}

} // namespace

TableResult parseTable(std::string_view text, const TableFormat& format, const std::string& fileName) {
    if (format.layout == TableLayout::Delimited) return parseDelimited(text, format, fileName);
    return parseJsonRows(text, format, fileName);
}

} // namespace pitchloop::model
