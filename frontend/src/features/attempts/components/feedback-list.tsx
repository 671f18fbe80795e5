import BuildOutlined from '@mui/icons-material/BuildOutlined';
import EmojiObjectsOutlined from '@mui/icons-material/EmojiObjectsOutlined';
import ThumbUpOutlined from '@mui/icons-material/ThumbUpOutlined';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import type { FeedbackLine } from '@mixmark/common';

const severityWords: Record<FeedbackLine['severity'], { label: string; icon: React.ReactElement }> = {
  fix: { label: 'To fix', icon: <BuildOutlined /> },
  tip: { label: 'Tip', icon: <EmojiObjectsOutlined /> },
  praise: { label: 'Well done', icon: <ThumbUpOutlined /> },
};

/** The mark's advice in painter's words, the numbers behind each line below it. */
export function FeedbackList({ feedback }: { feedback: FeedbackLine[] }) {
  return (
    <List aria-label="Feedback">
      {feedback.map((line, index) => {
        const words = severityWords[line.severity];
        return (
          <ListItem key={index} alignItems="flex-start" disableGutters>
            <ListItemIcon sx={{ minWidth: 40, mt: 0.5 }} aria-hidden>
              {words.icon}
            </ListItemIcon>
            <ListItemText
              primary={
                <>
                  <strong>{words.label}:</strong> {line.text}
                </>
              }
              secondary={line.numbers}
              slotProps={{ secondary: { sx: { fontVariantNumeric: 'tabular-nums' } } }}
            />
          </ListItem>
        );
      })}
    </List>
  );
}
