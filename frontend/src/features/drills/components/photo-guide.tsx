import CropFreeOutlined from '@mui/icons-material/CropFreeOutlined';
import LightModeOutlined from '@mui/icons-material/LightModeOutlined';
import CropLandscapeOutlined from '@mui/icons-material/CropLandscapeOutlined';
import FilterNoneOutlined from '@mui/icons-material/FilterNoneOutlined';
import List from '@mui/material/List';
import ListItem from '@mui/material/ListItem';
import ListItemIcon from '@mui/material/ListItemIcon';
import ListItemText from '@mui/material/ListItemText';
import Typography from '@mui/material/Typography';

const steps = [
  {
    icon: <CropLandscapeOutlined />,
    title: 'Lay it flat',
    text: 'Paper and card flat on a table, the card over the dry swatch so the swatch shows through its window.',
  },
  {
    icon: <LightModeOutlined />,
    title: 'Even daylight',
    text: 'Near a window but out of direct sun; lamps tint the photo. The card corrects a little, not a lot.',
  },
  {
    icon: <FilterNoneOutlined />,
    title: 'No shadow, no glare',
    text: 'Keep your hand and phone from throwing a shadow; tilt slightly if the wet shine of paint or the card glares.',
  },
  {
    icon: <CropFreeOutlined />,
    title: 'Fill the frame',
    text: 'The whole card with its four corner codes inside the photo, filling most of it, in focus.',
  },
];

/** How to take a photo the server can measure. */
export function PhotoGuide() {
  return (
    <>
      <Typography variant="h3" component="h2">
        How to photograph your swatch
      </Typography>
      <List dense>
        {steps.map((step) => (
          <ListItem key={step.title} disableGutters>
            <ListItemIcon sx={{ minWidth: 40 }} aria-hidden>
              {step.icon}
            </ListItemIcon>
            <ListItemText primary={step.title} secondary={step.text} slotProps={{ primary: { sx: { fontWeight: 700 } } }} />
          </ListItem>
        ))}
      </List>
      <Typography variant="body2" color="text.secondary">
        A phone photo tells value and temperature well and chroma fairly; it cannot see gloss,
        granulation or how the colour shifts as it dries, so photograph a dry swatch.
      </Typography>
    </>
  );
}
