#pragma once
// The mapping assistant of the Load matches page: a table in a layout nobody has saved opens
// here. It shows the table's columns with sample values and a role for each, the time and
// coordinate settings with a live pitch preview of the first events, every word of the side,
// type, result and period columns with what it maps to, the match details and the sanity
// checks; then it saves the layout (a mapping profile) in the club file under a name, and the
// page loads the file with it. The logic is model/layoutdraft; this adapts it to QML.

#include "sessionclient.h"

#include <QString>
#include <QStringList>
#include <QUrl>
#include <QVariantList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <memory>

namespace pitchloop::desktop {

class LayoutAssistant : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    QML_ELEMENT
    /// Whether a table is open in the assistant.
    Q_PROPERTY(bool active READ active NOTIFY changed)
    Q_PROPERTY(QString filePath READ filePath NOTIFY changed)
    Q_PROPERTY(QString fileName READ fileName NOTIFY changed)
    /// "412 rows · 9 columns · semicolons · decimal comma · UTF-8"
    Q_PROPERTY(QString tableText READ tableText NOTIFY changed)
    // How the file is written (a change re-reads it).
    Q_PROPERTY(QString delimiter READ delimiter WRITE setDelimiter NOTIFY changed)
    Q_PROPERTY(bool header READ header WRITE setHeader NOTIFY changed)
    Q_PROPERTY(QString encoding READ encoding WRITE setEncoding NOTIFY changed)
    Q_PROPERTY(bool decimalComma READ decimalComma WRITE setDecimalComma NOTIFY changed)
    Q_PROPERTY(bool delimited READ delimited NOTIFY changed)
    /// [{name, samples, role}] in table order.
    Q_PROPERTY(QVariantList columns READ columns NOTIFY changed)
    /// [{id, text}]: "" (not used) then every role.
    Q_PROPERTY(QVariantList roleChoices READ roleChoices CONSTANT)
    // Time.
    Q_PROPERTY(QString timeForm READ timeForm WRITE setTimeForm NOTIFY changed)
    Q_PROPERTY(double fps READ fps WRITE setFps NOTIFY changed)
    Q_PROPERTY(bool timeFromKickoff READ timeFromKickoff WRITE setTimeFromKickoff NOTIFY changed)
    // Zone labels instead of positions (a column has the zone role): the grid the labels name
    // ("equal:6x5", "markings:6") and how a label names its zone ("B{band}-L{lane}").
    Q_PROPERTY(bool byZone READ byZone NOTIFY changed)
    Q_PROPERTY(QString zoneGrid READ zoneGrid WRITE setZoneGrid NOTIFY changed)
    Q_PROPERTY(QString zonePattern READ zonePattern WRITE setZonePattern NOTIFY changed)
    // Coordinates.
    Q_PROPERTY(double extentWidth READ extentWidth WRITE setExtentWidth NOTIFY changed)
    Q_PROPERTY(double extentHeight READ extentHeight WRITE setExtentHeight NOTIFY changed)
    Q_PROPERTY(QString origin READ origin WRITE setOrigin NOTIFY changed)
    Q_PROPERTY(bool yDown READ yDown WRITE setYDown NOTIFY changed)
    Q_PROPERTY(QString frame READ frame WRITE setFrame NOTIFY changed)
    /// Ground frame: we attack towards x = 0 in the first period (then ends change every
    /// period: 2 the other way, 3 as 1, 4 as 2).
    Q_PROPERTY(bool firstHalfTowardsZero READ firstHalfTowardsZero WRITE setFirstHalfTowardsZero NOTIFY changed)
    /// [{field, fieldText, column, word, count, linesText, ours}] of the side, type, result
    /// and period columns; unmapped words first.
    Q_PROPERTY(QVariantList words READ words NOTIFY changed)
    Q_PROPERTY(int unmappedCount READ unmappedCount NOTIFY changed)
    // Match details for this file (what the table and its name do not say).
    Q_PROPERTY(QString matchId READ matchId WRITE setMatchId NOTIFY changed)
    Q_PROPERTY(QString matchDate READ matchDate WRITE setMatchDate NOTIFY changed)
    Q_PROPERTY(QString opponent READ opponent WRITE setOpponent NOTIFY changed)
    Q_PROPERTY(QString venue READ venue WRITE setVenue NOTIFY changed)
    /// e.g. "{date}_{opponent}.csv": later files of this layout give their details by name.
    Q_PROPERTY(QString fileNamePattern READ fileNamePattern WRITE setFileNamePattern NOTIFY changed)
    /// The match this file will be stored as, once the layout reads it ("KB-01 · 8 Aug 2026 ·
    /// v Nettleby · home"); empty before.
    Q_PROPERTY(QString matchText READ matchText NOTIFY changed)
    // The preview: the first events on the pitch (drawing metres: PitchGeometry's frame).
    Q_PROPERTY(QVariantList previewPoints READ previewPoints NOTIFY changed)
    Q_PROPERTY(QString previewText READ previewText NOTIFY changed)
    Q_PROPERTY(QStringList problems READ problems NOTIFY changed)
    Q_PROPERTY(QStringList warnings READ warnings NOTIFY changed)
    /// The layout reads the whole file with no problem: it can be saved and the file loaded.
    Q_PROPERTY(bool ready READ ready NOTIFY changed)
    Q_PROPERTY(QString layoutName READ layoutName WRITE setLayoutName NOTIFY changed)
    /// After save: what happened; on refusal, why.
    Q_PROPERTY(QString savedText READ savedText NOTIFY changed)
public:
    explicit LayoutAssistant(QObject* parent = nullptr);
    ~LayoutAssistant() override;

    bool active() const;
    QString filePath() const { return m_path; }
    QString fileName() const;
    QString tableText() const;
    QString delimiter() const;
    void setDelimiter(const QString& text);
    bool header() const;
    void setHeader(bool h);
    QString encoding() const;
    void setEncoding(const QString& e);
    bool decimalComma() const;
    void setDecimalComma(bool on);
    bool delimited() const;
    QVariantList columns() const;
    QVariantList roleChoices() const;
    QString timeForm() const;
    void setTimeForm(const QString& f);
    double fps() const;
    void setFps(double fps);
    bool timeFromKickoff() const;
    void setTimeFromKickoff(bool on);
    bool byZone() const;
    QString zoneGrid() const;
    void setZoneGrid(const QString& name);
    QString zonePattern() const;
    void setZonePattern(const QString& pattern);
    double extentWidth() const;
    void setExtentWidth(double w);
    double extentHeight() const;
    void setExtentHeight(double h);
    QString origin() const;
    void setOrigin(const QString& o);
    bool yDown() const;
    void setYDown(bool down);
    QString frame() const;
    void setFrame(const QString& f);
    bool firstHalfTowardsZero() const;
    void setFirstHalfTowardsZero(bool towardsZero);
    QVariantList words() const { return m_words; }
    int unmappedCount() const { return m_unmapped; }
    QString matchId() const { return detail("id"); }
    void setMatchId(const QString& v) { setDetail("id", v); }
    QString matchDate() const { return detail("date"); }
    void setMatchDate(const QString& v) { setDetail("date", v); }
    QString opponent() const { return detail("opponent"); }
    void setOpponent(const QString& v) { setDetail("opponent", v); }
    QString venue() const { return detail("venue"); }
    void setVenue(const QString& v) { setDetail("venue", v); }
    QString fileNamePattern() const;
    void setFileNamePattern(const QString& pattern);
    QString matchText() const { return m_matchText; }
    QVariantList previewPoints() const { return m_points; }
    QString previewText() const { return m_previewText; }
    QStringList problems() const { return m_problems; }
    QStringList warnings() const { return m_warnings; }
    bool ready() const { return m_ready; }
    QString layoutName() const { return m_name; }
    void setLayoutName(const QString& name);
    QString savedText() const { return m_savedText; }

    /// Opens a table (a local-file url or a path) with a first guess at its layout. False, with
    /// the reason in `problems`, when it cannot be read.
    Q_INVOKABLE bool open(const QString& pathOrUrl);
    /// Opens a table with a saved layout to edit it (its columns, words and settings), saving
    /// under the same name unless renamed.
    Q_INVOKABLE bool openWithLayout(const QString& pathOrUrl, const QString& layoutName);
    Q_INVOKABLE void close();
    /// Gives `column` the role `role` (an id of roleChoices; "" for none).
    Q_INVOKABLE void setRole(const QString& column, const QString& role);
    /// The meanings a word of `field` can take, as [{id, text}] with "" (not mapped) first.
    Q_INVOKABLE QVariantList wordChoices(const QString& field) const;
    Q_INVOKABLE void setWord(const QString& field, const QString& word, const QString& ours);
    /// Saves the layout in the club file under layoutName. True when saved.
    Q_INVOKABLE bool save();
    /// The match details the page passes to the load (id, date, opponent, venue, us).
    Q_INVOKABLE QVariantMap loadDetails() const;
    /// The profile as text, for a look or a file (docs/profile.schema.json).
    Q_INVOKABLE QString profileText() const;

signals:
    void changed();
    /// The layout was saved: the page loads `path` with it and these details.
    void saved(const QString& path, const QVariantMap& details);

protected:
    void refresh() override;

private:
    struct State;
    QString detail(const char* key) const;
    void setDetail(const char* key, const QString& value);
    void reread();
    void recompute();

    std::unique_ptr<State> m_state;
    QString m_path;
    QString m_name;
    QString m_savedText;
    QString m_matchText;
    QVariantList m_words;
    int m_unmapped = 0;
    QVariantList m_points;
    QString m_previewText;
    QStringList m_problems;
    QStringList m_warnings;
    bool m_ready = false;
};

} // namespace pitchloop::desktop
