import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One block of a proposed session: minutes and role, the drill with its intensity and the focus
// it serves, the planner's one-line reason, and the coach's actions on it.
Rectangle {
    id: root

    required property int index
    required property string roleText
    required property var drillId
    required property string title
    required property string minutesText
    required property string intensityText
    required property bool pinned
    required property string focusText
    required property string why
    property bool actionsEnabled: true

    signal pinToggled(var drillId)
    signal leftOut(var drillId)
    signal swapAsked(var drillId, string title)

    implicitHeight: body.implicitHeight + 2 * Theme.gap
    color: index % 2 === 0 ? Theme.surface : Theme.surfaceAlt
    radius: 4

    RowLayout {
        id: body
        anchors.fill: parent
        anchors.margins: Theme.gap
        spacing: Theme.gapLarge

        ColumnLayout {
            Layout.preferredWidth: 74
            Layout.alignment: Qt.AlignTop
            spacing: 0
            Label {
                text: root.minutesText
                font.bold: true
                color: Theme.text
            }
            Label {
                text: root.roleText
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
            }
        }
        ColumnLayout {
            Layout.fillWidth: true
            spacing: 1
            Label {
                Layout.fillWidth: true
                text: root.title + (root.pinned ? "  ● " + qsTr("pinned") : "")
                font.bold: true
                color: Theme.text
                wrapMode: Text.WordWrap
            }
            Label {
                Layout.fillWidth: true
                text: qsTr("intensity %1").arg(root.intensityText)
                      + (root.focusText.length > 0 ? "  ·  " + qsTr("for %1").arg(root.focusText) : "")
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
            Label {
                Layout.fillWidth: true
                text: root.why
                color: Theme.text
                font.pixelSize: Theme.fontSmall
                wrapMode: Text.WordWrap
            }
        }
        RowLayout {
            Layout.alignment: Qt.AlignTop
            spacing: 2
            Button {
                text: root.pinned ? qsTr("Unpin") : qsTr("Pin")
                enabled: root.actionsEnabled
                flat: true
                onClicked: root.pinToggled(root.drillId)
                ToolTip.visible: hovered
                ToolTip.text: root.pinned ? qsTr("Let the planner choose freely again") : qsTr("Keep this drill when planning again")
            }
            Button {
                text: qsTr("Leave out")
                enabled: root.actionsEnabled
                flat: true
                onClicked: root.leftOut(root.drillId)
            }
            Button {
                text: qsTr("Swap…")
                enabled: root.actionsEnabled
                flat: true
                onClicked: root.swapAsked(root.drillId, root.title)
            }
        }
    }
}
