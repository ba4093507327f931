#pragma once
// The drill book page: a searchable, filterable list of the club's drills, an editor for one
// drill (add, edit as a new version, delete, restore, earlier versions), and an undo of the
// session's own changes that writes the previous state back through the drill book.

#include "drillform.h"
#include "sessionclient.h"

#include <QString>
#include <QStringList>
#include <QVariantList>
#include <QVariantMap>
#include <QtQml/qqmlregistration.h>

#include <functional>
#include <optional>
#include <vector>

namespace pitchloop::model {
class ClubRepository;
}

namespace pitchloop::desktop {

class DrillListModel;
class PitchGeometry;

/// Inputs: the list's filters. Outputs: the list, the form of the chosen drill (selectedId 0:
/// a new one), its versions, the problems of the last save in plain words, and undo.
class DrillBookView : public pitchloop::desktop::SessionClient {
    Q_OBJECT
    Q_MOC_INCLUDE("drilllistmodel.h")
    Q_MOC_INCLUDE("pitchgeometry.h")
    QML_ELEMENT
    Q_PROPERTY(QString searchText READ searchText WRITE setSearchText NOTIFY filtersChanged)
    Q_PROPERTY(QString tagFilter READ tagFilter WRITE setTagFilter NOTIFY filtersChanged)
    Q_PROPERTY(QString metricFilter READ metricFilter WRITE setMetricFilter NOTIFY filtersChanged)
    /// Index into zoneOptions (0: any zone).
    Q_PROPERTY(int zoneFilter READ zoneFilter WRITE setZoneFilter NOTIFY filtersChanged)
    Q_PROPERTY(int intensityFilter READ intensityFilter WRITE setIntensityFilter NOTIFY filtersChanged)
    Q_PROPERTY(bool includeDeleted READ includeDeleted WRITE setIncludeDeleted NOTIFY filtersChanged)
    /// Choices for the filters and the editor, each {text, value}; the first filter choice is "any".
    Q_PROPERTY(QVariantList tagOptions READ tagOptions NOTIFY listChanged)
    Q_PROPERTY(QVariantList metricOptions READ metricOptions NOTIFY listChanged)
    Q_PROPERTY(QVariantList zoneOptions READ zoneOptions NOTIFY listChanged)
    Q_PROPERTY(QVariantList intensityOptions READ intensityOptions CONSTANT)
    Q_PROPERTY(QVariantList intensityLevels READ intensityLevels CONSTANT)
    Q_PROPERTY(pitchloop::desktop::DrillListModel* drills READ drills CONSTANT)
    Q_PROPERTY(QString resultText READ resultText NOTIFY listChanged)
    Q_PROPERTY(bool hasBook READ hasBook NOTIFY listChanged)
    Q_PROPERTY(bool filtered READ filtered NOTIFY filtersChanged)

    Q_PROPERTY(int selectedId READ selectedIdForQml NOTIFY selectionChanged)
    Q_PROPERTY(bool selectedDeleted READ selectedDeleted NOTIFY selectionChanged)
    Q_PROPERTY(QString editorTitle READ editorTitle NOTIFY selectionChanged)
    Q_PROPERTY(QString editorDetail READ editorDetail NOTIFY selectionChanged)
    Q_PROPERTY(pitchloop::desktop::DrillForm* form READ form CONSTANT)
    Q_PROPERTY(pitchloop::desktop::DrillListModel* versions READ versions CONSTANT)
    /// The version shown in the form when it was loaded from the history (0: the latest).
    Q_PROPERTY(int loadedVersion READ loadedVersion NOTIFY selectionChanged)
    Q_PROPERTY(QStringList problems READ problems NOTIFY problemsChanged)
    /// Form field (DrillForm property name) → its first problem.
    Q_PROPERTY(QVariantMap fieldErrors READ fieldErrors NOTIFY problemsChanged)
    Q_PROPERTY(QString statusText READ statusText NOTIFY statusChanged)
    Q_PROPERTY(bool canUndo READ canUndo NOTIFY statusChanged)
    Q_PROPERTY(QString undoText READ undoText NOTIFY statusChanged)
    Q_PROPERTY(pitchloop::desktop::PitchGeometry* geometry READ geometry CONSTANT)
    Q_PROPERTY(QString loadCaution READ loadCaution CONSTANT)
public:
    explicit DrillBookView(QObject* parent = nullptr);
    ~DrillBookView() override;

    QString searchText() const { return m_searchText; }
    void setSearchText(const QString& v);
    QString tagFilter() const { return m_tagFilter; }
    void setTagFilter(const QString& v);
    QString metricFilter() const { return m_metricFilter; }
    void setMetricFilter(const QString& v);
    int zoneFilter() const { return m_zoneFilter; }
    void setZoneFilter(int v);
    int intensityFilter() const { return m_intensityFilter; }
    void setIntensityFilter(int v);
    bool includeDeleted() const { return m_includeDeleted; }
    void setIncludeDeleted(bool v);
    Q_INVOKABLE void clearFilters();

    QVariantList tagOptions() const { return m_tagOptions; }
    QVariantList metricOptions() const { return m_metricOptions; }
    QVariantList zoneOptions() const { return m_zoneOptions; }
    QVariantList intensityOptions() const;
    QVariantList intensityLevels() const;
    DrillListModel* drills() const { return m_drills; }
    QString resultText() const { return m_resultText; }
    bool hasBook() const { return m_total > 0; }
    bool filtered() const;

    qint64 selectedId() const { return m_selectedId; }
    /// The id for QML, whose whole numbers are 32-bit (drill and focus ids stay far below).
    int selectedIdForQml() const { return static_cast<int>(m_selectedId); }
    bool selectedDeleted() const { return m_selectedDeleted; }
    QString editorTitle() const { return m_editorTitle; }
    QString editorDetail() const { return m_editorDetail; }
    DrillForm* form() const { return m_form; }
    DrillListModel* versions() const { return m_versions; }
    int loadedVersion() const { return m_loadedVersion; }
    QStringList problems() const { return m_problems; }
    QVariantMap fieldErrors() const { return m_fieldErrors; }
    QString statusText() const { return m_statusText; }
    bool canUndo() const { return !m_undo.empty(); }
    QString undoText() const;
    PitchGeometry* geometry() const { return m_geometry; }
    QString loadCaution() const;

    /// An empty form for a new drill.
    Q_INVOKABLE void newDrill();
    /// Shows a drill's latest version in the form; false for an unknown id.
    Q_INVOKABLE bool selectDrill(qint64 drillId);
    /// Puts an earlier version (a row of `versions`) into the form; saving it makes it the latest.
    Q_INVOKABLE bool loadVersion(int row);
    /// Adds the form as a new drill, or as a new version of the chosen one. On problems the
    /// book and the form stay as they are and `problems` says what to fix.
    Q_INVOKABLE bool save();
    /// Deletes the chosen drill (restorable).
    Q_INVOKABLE bool deleteSelected();
    Q_INVOKABLE bool restoreSelected();
    /// Undoes this session's last add, edit, delete or restore with a write to the book: an
    /// edit writes the previous content back as a new version, an add deletes the drill, a
    /// delete restores it, a restore deletes it again.
    Q_INVOKABLE bool undo();

signals:
    void filtersChanged();
    void listChanged();
    void selectionChanged();
    void problemsChanged();
    void statusChanged();

protected:
    void refresh() override;

private:
    struct UndoStep {
        enum class Kind { Added, Edited, Deleted, Restored } kind;
        qint64 id = 0;
        model::Drill before; ///< content before an edit
        QString title;
        QString by;          ///< who made the change
    };

    /// Runs a write or read the page asked for; a storage fault becomes the status line.
    bool guard(const QString& what, const std::function<bool()>& action);
    bool saveNow();
    bool deleteSelectedNow();
    bool restoreSelectedNow();
    bool undoNow();
    bool selectDrillNow(qint64 drillId);
    model::ClubRepository* repository() const;
    void refreshList();
    void refreshSelection();
    void setProblems(QStringList problems, QVariantMap fieldErrors);
    void setStatus(const QString& text);
    void afterWrite(qint64 selectId);
    QString metricName(const std::string& id) const;

    QString m_searchText, m_tagFilter, m_metricFilter;
    int m_zoneFilter = 0;
    int m_intensityFilter = 0;
    bool m_includeDeleted = false;
    QVariantList m_tagOptions, m_metricOptions, m_zoneOptions;
    int m_total = 0;
    QString m_resultText;

    qint64 m_selectedId = 0;
    bool m_selectedDeleted = false;
    int m_loadedVersion = 0;
    QString m_editorTitle, m_editorDetail;
    QStringList m_problems;
    QVariantMap m_fieldErrors;
    QString m_statusText;
    std::vector<UndoStep> m_undo;
    model::ClubRepository* m_repo = nullptr; ///< the file the form and undo steps belong to
    bool m_firstLoad = false;

    DrillForm* m_form;
    DrillListModel* m_drills;
    DrillListModel* m_versions;
    PitchGeometry* m_geometry;
};

} // namespace pitchloop::desktop
