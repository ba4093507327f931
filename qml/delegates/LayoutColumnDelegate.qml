import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One column of a table in the mapping assistant: its name, a few of its values, and the role
// it plays (one of ours, or none). Choosing a role emits roleChosen; the assistant changes it.
Rectangle {
    id: root

    required property int index
    required property var modelData
    required property var roleChoices

    signal roleChosen(string column, string role)

    implicitHeight: row.implicitHeight + 2 * Theme.gapSmall
    color: index % 2 === 0 ? Theme.surface : Theme.surfaceAlt

    RowLayout {
        id: row
        anchors.fill: parent
        anchors.margins: Theme.gapSmall
        spacing: Theme.gap
        ColumnLayout {
            Layout.fillWidth: true
            spacing: 0
            Label {
                Layout.fillWidth: true
                text: root.modelData.name
                font.bold: true
                color: root.modelData.role.length > 0 ? Theme.text : Theme.textMuted
                elide: Text.ElideRight
            }
            Label {
                Layout.fillWidth: true
                text: root.modelData.samples.length > 0 ? root.modelData.samples : qsTr("(empty)")
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
        }
        ComboBox {
            objectName: "role:" + root.modelData.name
            Layout.preferredWidth: 165
            model: root.roleChoices
            textRole: "text"
            valueRole: "id"
            currentIndex: root.modelData.roleIndex
            onActivated: root.roleChosen(root.modelData.name, currentValue)
        }
    }
}
