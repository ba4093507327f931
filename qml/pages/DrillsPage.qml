pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The club's drill notes: find drills by words, tag, metric, zone or intensity; write a new one
// or a new version of one; delete (restorable) and restore; go back to an earlier version; undo
// this session's changes. Problems with a save are listed beside the form in plain words.
Page {
    id: root

    required property ClubSession session

    function showDrill(drillId: int) {
        book.selectDrill(drillId)
    }

    background: Rectangle { color: Theme.window }

    DrillBookView {
        id: book
        session: root.session
    }

    Shortcut {
        sequence: "Ctrl+N"
        enabled: root.visible
        onActivated: {
            book.newDrill()
            editor.titleField.forceActiveFocus()
        }
    }
    Shortcut {
        sequence: "Ctrl+S"
        enabled: root.visible
        onActivated: book.save()
    }
    Shortcut {
        sequence: "Ctrl+F"
        enabled: root.visible
        onActivated: search.forceActiveFocus()
    }
    Shortcut {
        // A focused text field undoes its own typing first; elsewhere this undoes the last
        // change to the drill book.
        sequence: "Ctrl+Z"
        enabled: root.visible && book.canUndo
        onActivated: book.undo()
    }

    RowLayout {
        anchors.fill: parent
        anchors.margins: Theme.margin
        spacing: Theme.gapLarge

        // The library
        ColumnLayout {
            Layout.preferredWidth: 290
            Layout.maximumWidth: 290
            Layout.fillHeight: true
            spacing: Theme.gap

            TextField {
                id: search
                objectName: "drillSearch"
                Layout.fillWidth: true
                placeholderText: qsTr("Search words (Ctrl+F)")
                text: book.searchText
                onTextEdited: book.searchText = text
            }
            GridLayout {
                Layout.fillWidth: true
                columns: 2
                columnSpacing: Theme.gap
                rowSpacing: Theme.gapSmall
                ComboBox {
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    model: book.tagOptions
                    textRole: "text"
                    valueRole: "value"
                    currentIndex: Math.max(0, indexOfValue(book.tagFilter))
                    onActivated: book.tagFilter = currentValue
                }
                ComboBox {
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    model: book.intensityOptions
                    textRole: "text"
                    valueRole: "value"
                    currentIndex: book.intensityFilter
                    onActivated: book.intensityFilter = currentValue
                }
                ComboBox {
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    model: book.metricOptions
                    textRole: "text"
                    valueRole: "value"
                    currentIndex: Math.max(0, indexOfValue(book.metricFilter))
                    onActivated: book.metricFilter = currentValue
                }
                ComboBox {
                    Layout.fillWidth: true
                    Layout.preferredWidth: 1
                    model: book.zoneOptions
                    textRole: "text"
                    currentIndex: book.zoneFilter
                    onActivated: index => book.zoneFilter = index
                }
            }
            RowLayout {
                Layout.fillWidth: true
                CheckBox {
                    text: qsTr("Show deleted")
                    checked: book.includeDeleted
                    onToggled: book.includeDeleted = checked
                }
                Item { Layout.fillWidth: true }
                Button {
                    text: qsTr("Clear filters")
                    flat: true
                    enabled: book.filtered || book.includeDeleted
                    onClicked: book.clearFilters()
                }
            }
            Label {
                Layout.fillWidth: true
                text: book.resultText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
            Rectangle {
                Layout.fillWidth: true
                Layout.fillHeight: true
                color: Theme.surface
                radius: Theme.radius
                border.color: Theme.border
                ListView {
                    id: list
                    anchors.fill: parent
                    anchors.margins: 1
                    clip: true
                    model: book.drills
                    boundsBehavior: Flickable.StopAtBounds
                    ScrollBar.vertical: ScrollBar {}
                    delegate: DrillRowDelegate {
                        selected: drillId === book.selectedId
                        onClicked: book.selectDrill(drillId)
                    }
                }
                Label {
                    visible: list.count === 0
                    anchors.centerIn: parent
                    width: parent.width - 2 * Theme.gapLarge
                    horizontalAlignment: Text.AlignHCenter
                    wrapMode: Text.WordWrap
                    color: Theme.text
                    text: book.hasBook ? qsTr("No drill matches these filters.")
                                       : qsTr("No drills yet. Write the first one in the form (Ctrl+N).")
                }
            }
        }

        // The editor
        Card {
            Layout.fillWidth: true
            Layout.fillHeight: true
            title: book.editorTitle

            Label {
                Layout.fillWidth: true
                text: book.editorDetail
                color: book.selectedDeleted ? Theme.error : Theme.textMuted
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
            RowLayout {
                Layout.fillWidth: true
                spacing: Theme.gap
                Button {
                    text: qsTr("New (Ctrl+N)")
                    onClicked: {
                        book.newDrill()
                        editor.titleField.forceActiveFocus()
                    }
                }
                Button {
                    objectName: "saveDrill"
                    text: book.selectedId > 0 ? qsTr("Save version (Ctrl+S)") : qsTr("Add (Ctrl+S)")
                    highlighted: true
                    enabled: !book.selectedDeleted
                    onClicked: book.save()
                }
                Button {
                    visible: book.selectedId > 0 && !book.selectedDeleted
                    text: qsTr("Delete")
                    onClicked: book.deleteSelected()
                }
                Button {
                    visible: book.selectedDeleted
                    text: qsTr("Restore")
                    onClicked: book.restoreSelected()
                }
                Item { Layout.fillWidth: true }
            }
            ScrollView {
                id: scroller
                Layout.fillWidth: true
                Layout.fillHeight: true
                contentWidth: availableWidth
                clip: true
                DrillEditor {
                    id: editor
                    width: scroller.availableWidth - Theme.gap
                    view: book
                    session: root.session
                    enabled: !book.selectedDeleted
                }
            }
        }

        // Checks, versions, undo
        ColumnLayout {
            Layout.preferredWidth: 236
            Layout.maximumWidth: 236
            Layout.fillHeight: true
            spacing: Theme.gapLarge

            Card {
                Layout.fillWidth: true
                title: book.problems.length > 0 ? qsTr("Not saved yet") : qsTr("Checks")
                Repeater {
                    model: book.problems
                    delegate: Label {
                        required property string modelData
                        Layout.fillWidth: true
                        text: "▲ " + modelData
                        color: Theme.error
                        wrapMode: Text.WordWrap
                        font.pixelSize: Theme.fontSmall + 1
                    }
                }
                Label {
                    visible: book.problems.length === 0
                    Layout.fillWidth: true
                    text: qsTr("Each save is checked: title and author, 1–180 minutes, intensity 1–5, 1–40 players, an area up to 120 × 90 m, metrics and zones of this club.")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                Label {
                    Layout.fillWidth: true
                    Layout.topMargin: Theme.gapSmall
                    text: book.loadCaution
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                Label {
                    visible: book.statusText.length > 0
                    Layout.fillWidth: true
                    Layout.topMargin: Theme.gapSmall
                    text: book.statusText
                    color: Theme.accent
                    font.pixelSize: Theme.fontSmall + 1
                    wrapMode: Text.WordWrap
                }
                Button {
                    id: undoButton
                    Layout.fillWidth: true
                    Layout.topMargin: Theme.gapSmall
                    text: book.canUndo ? qsTr("%1 (Ctrl+Z)").arg(book.undoText) : book.undoText
                    enabled: book.canUndo
                    onClicked: book.undo()
                    ToolTip.visible: hovered && book.canUndo
                    ToolTip.delay: 400
                    ToolTip.text: text
                    contentItem: Label {
                        text: undoButton.text
                        elide: Text.ElideRight
                        horizontalAlignment: Text.AlignHCenter
                        color: undoButton.enabled ? Theme.text : Theme.textMuted
                    }
                }
            }

            Card {
                Layout.fillWidth: true
                Layout.fillHeight: true
                title: qsTr("Versions, newest first")
                Label {
                    visible: book.versions.count === 0
                    Layout.fillWidth: true
                    text: qsTr("A saved drill keeps every version here; pick one to put it back in the form.")
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    wrapMode: Text.WordWrap
                }
                ListView {
                    Layout.fillWidth: true
                    Layout.fillHeight: true
                    clip: true
                    model: book.versions
                    boundsBehavior: Flickable.StopAtBounds
                    ScrollBar.vertical: ScrollBar {}
                    delegate: ItemDelegate {
                        id: entry
                        required property int index
                        required property string editedDateText
                        required property string editedBy
                        required property string title
                        required property string detailText
                        required property string changesText
                        required property int version
                        width: ListView.view.width
                        leftPadding: Theme.gapSmall
                        highlighted: book.loadedVersion === entry.version
                        onClicked: book.loadVersion(index)
                        ToolTip.visible: hovered
                        ToolTip.delay: 400
                        ToolTip.text: qsTr("Put this version in the form; saving it makes it the latest")
                        contentItem: ColumnLayout {
                            spacing: 0
                            Label {
                                Layout.fillWidth: true
                                text: qsTr("Version %1 · %2").arg(entry.version).arg(entry.editedDateText)
                                font.bold: entry.index === 0
                                font.pixelSize: Theme.fontSmall + 1
                                color: Theme.text
                                elide: Text.ElideRight
                            }
                            Label {
                                Layout.fillWidth: true
                                text: entry.changesText.length > 0 ? qsTr("by %1 · %2").arg(entry.editedBy).arg(entry.changesText)
                                                                   : qsTr("by %1").arg(entry.editedBy)
                                font.pixelSize: Theme.fontSmall
                                color: Theme.text
                                elide: Text.ElideRight
                            }
                            Label {
                                Layout.fillWidth: true
                                text: entry.title + " · " + entry.detailText
                                font.pixelSize: Theme.fontSmall
                                color: Theme.textMuted
                                elide: Text.ElideRight
                            }
                        }
                    }
                }
            }
        }
    }
}
