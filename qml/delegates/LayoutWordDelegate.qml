import QtQuick
import QtQuick.Controls
import QtQuick.Layouts
import Pitchloop

// One word of the table (a team, event, result or period word) in the mapping assistant: how
// often it appears and where first, and what it means in our terms. An unmapped word is marked;
// choosing a meaning emits wordChosen.
Rectangle {
    id: root

    required property int index
    required property var modelData
    required property var choices

    signal wordChosen(string field, string word, string ours)

    readonly property bool unmapped: modelData.ours.length === 0

    implicitHeight: row.implicitHeight + 2 * Theme.gapSmall
    color: unmapped ? "#fbeee6" : (index % 2 === 0 ? Theme.surface : Theme.surfaceAlt)

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
                text: (root.unmapped ? "✕ " : "") + "“" + root.modelData.word + "”"
                font.bold: root.unmapped
                color: root.unmapped ? Theme.error : Theme.text
                elide: Text.ElideRight
            }
            Label {
                Layout.fillWidth: true
                text: qsTr("%1 · %2 × · %3").arg(root.modelData.fieldText).arg(root.modelData.count).arg(root.modelData.linesText)
                color: Theme.textMuted
                font.pixelSize: Theme.fontSmall
                elide: Text.ElideRight
            }
        }
        ComboBox {
            objectName: "word:" + root.modelData.field + ":" + root.modelData.word
            Layout.preferredWidth: 140
            model: root.choices
            textRole: "text"
            valueRole: "id"
            currentIndex: root.modelData.oursIndex
            onActivated: root.wordChosen(root.modelData.field, root.modelData.word, currentValue)
        }
    }
}
