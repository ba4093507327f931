import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One loaded file: its outcome as a badge (a symbol and a word on the outcome's colour), the
// match it holds, and for a failed file every problem with its place and field.
Rectangle {
    id: root

    required property string fileName
    required property int outcome
    required property string outcomeText
    required property string detail
    required property string problemText
    required property string warningText

    readonly property bool failed: outcome === ImportResultModel.Failed
    readonly property color badgeColour: {
        switch (outcome) {
        case ImportResultModel.Stored:
        case ImportResultModel.Replaced: return Theme.onTarget
        case ImportResultModel.Failed: return Theme.error
        case ImportResultModel.NotLoaded: return Theme.watch
        default: return Theme.textMuted
        }
    }
    readonly property string symbol: ["✓", "↻", "=", "✕", "–"][outcome] ?? ""

    implicitHeight: column.implicitHeight + 2 * Theme.gap
    color: failed ? "#fbf1ec" : "transparent"

    Rectangle {
        anchors.bottom: parent.bottom
        width: parent.width
        height: 1
        color: Theme.border
    }

    ColumnLayout {
        id: column
        anchors.left: parent.left
        anchors.right: parent.right
        anchors.verticalCenter: parent.verticalCenter
        anchors.leftMargin: Theme.gap
        anchors.rightMargin: Theme.gap
        spacing: 3

        RowLayout {
            Layout.fillWidth: true
            spacing: Theme.gap + 2
            Rectangle {
                Layout.preferredWidth: 112
                Layout.preferredHeight: 22
                radius: 11
                color: root.badgeColour
                Label {
                    anchors.centerIn: parent
                    text: root.symbol + "  " + root.outcomeText
                    color: root.outcome === ImportResultModel.NotLoaded ? Theme.text : "#ffffff"
                    font.pixelSize: Theme.fontSmall
                    font.bold: true
                }
            }
            Label {
                text: root.fileName
                font.bold: true
                color: Theme.text
            }
            Label {
                Layout.fillWidth: true
                text: root.detail
                color: Theme.textMuted
                elide: Text.ElideRight
            }
        }
        Label {
            Layout.fillWidth: true
            Layout.leftMargin: 112 + Theme.gap + 2
            visible: root.problemText.length > 0
            text: root.problemText
            color: Theme.error
            wrapMode: Text.Wrap
            font.pixelSize: Theme.fontSmall + 1
        }
        Label {
            Layout.fillWidth: true
            Layout.leftMargin: 112 + Theme.gap + 2
            visible: root.warningText.length > 0
            text: root.warningText
            color: Theme.textMuted
            wrapMode: Text.Wrap
            font.pixelSize: Theme.fontSmall
        }
    }
}
