pragma ComponentBehavior: Bound
import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// The table layouts saved in the club file, each with the columns it reads; edit one (on a
// table in that layout), duplicate it to start a variant, or remove it. Emits; changes nothing.
Card {
    id: root

    required property var layouts

    signal editRequested(string name)
    signal duplicateRequested(string name)
    signal removeRequested(string name)

    title: qsTr("Saved table layouts (%1)").arg(layouts.length)

    Repeater {
        model: root.layouts
        delegate: RowLayout {
            id: row
            required property var modelData
            Layout.fillWidth: true
            spacing: Theme.gap
            ColumnLayout {
                Layout.fillWidth: true
                spacing: 0
                Label {
                    Layout.fillWidth: true
                    text: row.modelData.name
                    font.bold: true
                    color: Theme.text
                    elide: Text.ElideRight
                }
                Label {
                    Layout.fillWidth: true
                    text: qsTr("saved %1 · columns %2").arg(row.modelData.savedAt).arg(row.modelData.columnsText)
                    color: Theme.textMuted
                    font.pixelSize: Theme.fontSmall
                    elide: Text.ElideRight
                }
            }
            Button {
                text: qsTr("Edit…")
                onClicked: root.editRequested(row.modelData.name)
                ToolTip.visible: hovered
                ToolTip.text: qsTr("Choose a table in this layout to edit it on")
            }
            Button {
                text: qsTr("Duplicate")
                onClicked: root.duplicateRequested(row.modelData.name)
            }
            Button {
                text: qsTr("Remove")
                onClicked: root.removeRequested(row.modelData.name)
            }
        }
    }
}
